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

/** What a member of this role may have queued and run (an API key acts with its owner's role). */
export function limitsOf(config: Pick<Config, 'memberLimits'>, role: Role): MemberLimits {
  return role === 'viewer' ? NOTHING : config.memberLimits[role];
}
