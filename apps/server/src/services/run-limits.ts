/**
 * The largest graph a run takes: the bounds and the server's re-verification of the certificate stay
 * within seconds there, and a stored certificate (one label per vertex) within a few megabytes. Larger
 * graphs belong to the CLI on one's own machine.
 */
export const MAX_RUN_VERTICES = 1_000_000;
export const MAX_RUN_EDGES = 4_000_000;
