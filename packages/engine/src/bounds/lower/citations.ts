/**
 * The sources the lower bounds rest on, as one-line citations for the `argument` of each bound. Each
 * bound's file repeats the one it uses beside the code.
 */
export const CITE = {
  /** td is monotone under subgraphs and minors; χr (the rank number) is tree-depth. */
  sparsity: 'Nešetřil & Ossona de Mendez, Sparsity, Springer 2012',
  /** χr(P_k) = ⌊log2 k⌋ + 1. */
  rankings: 'Bodlaender et al., "Rankings of graphs", SIAM J. Discrete Math. 1998',
  /** χr(P_2 × P_n) closed form (stated from memory and checked by exhaustive search in formulas.test.ts). */
  alpert: 'Alpert, "Rank numbers of grid graphs", Discrete Math. 2010',
  /** Smallest-last ordering and the bucket algorithm for degeneracy. */
  matulaBeck: 'Matula & Beck, "Smallest-last ordering and clustering and graph coloring algorithms", J. ACM 1983',
  /** Minor-min-width with the min-d contraction rule. */
  gogateDechter: 'Gogate & Dechter, "A complete anytime algorithm for treewidth", UAI 2004',
  /** tw >= degeneracy, tw >= minor-min-width. */
  bodlaenderKoster: 'Bodlaender & Koster, "Treewidth computations II. Lower bounds", Information and Computation 2011',
  /** Bron–Kerbosch maximal-clique search. */
  bronKerbosch: 'Bron & Kerbosch, "Algorithm 457: finding all cliques of an undirected graph", Comm. ACM 1973',
  /** The pivot rule: pick the pivot with the most candidates among its neighbours. */
  tomita: 'Tomita, Tanaka & Takahashi, "The worst-case time complexity for generating all maximal cliques", Theor. Comput. Sci. 2006',
  /** Bron–Kerbosch over a degeneracy ordering, for sparse graphs. */
  eppstein: 'Eppstein, Löffler & Strash, "Listing all maximal cliques in sparse graphs in near-optimal time", ISAAC 2010',
  /** Facts with no single source. */
  common: 'common practice',
} as const;
