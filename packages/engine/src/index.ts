export { Graph } from './graph/graph';
export { graphFromEdges } from './graph/from-edges';
export { pathGraph } from './families/path';
export { verifyRanking } from './ranking/verify';
export type { RankingVerdict, RankingViolation } from './ranking/verify';
