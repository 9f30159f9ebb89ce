import type { Role } from '@cairn/schema';
import type { Config, MemberLimits } from '../config';

/**
 * The largest graph a run takes: the bounds and the server's re-verification of the certificate stay
 * within seconds there, and a stored certificate (one label per vertex) within a few megabytes. Larger
 * graphs belong to the CLI on one's own machine. The limits by role (config) never exceed these.
 */
export const MAX_RUN_VERTICES = 1_000_000;
export const MAX_RUN_EDGES = 4_000_000;

/** Viewers start nothing; the permission check refuses them first, this keeps the limits total. */
const NOTHING: MemberLimits = { activeRuns: 0, activeSweeps: 0, runVertices: 0, runEdges: 0 };

/**
 * Why a graph of this size is too large for a member of this role (an API key acts as its owner), or
 * undefined when it fits: the one wording of 413 graph_too_large for runs, uploads and sweep cells.
 */
export function tooLargeFor(what: string, vertices: number, edges: number, role: Role, limits: MemberLimits): string | undefined {
  if (vertices <= limits.runVertices && edges <= limits.runEdges) return undefined;
  const has = vertices > limits.runVertices ? `${vertices} vertices` : `${edges} edges`;
  return `${what} has ${has}; a ${role} may run graphs of at most ${limits.runVertices} vertices and ${limits.runEdges} edges`;
}

/** What a member of this role may have queued and run (an API key acts with its owner's role). */
export function limitsOf(config: Pick<Config, 'memberLimits'>, role: Role): MemberLimits {
  return role === 'viewer' ? NOTHING : config.memberLimits[role];
}
