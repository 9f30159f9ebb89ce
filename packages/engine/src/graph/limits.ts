/** The most vertices a Graph may have: its arrays stay well inside what typed arrays and memory hold. */
export const MAX_VERTICES = 10_000_000;
/** The most edges a Graph may have (each is stored twice in the adjacency). */
export const MAX_EDGES = 100_000_000;
