// The edge-ranking module: line graphs, edge-ranking verification, optimal edge rankings of trees, a
// heuristic for any graph, and assembly plans.
export { lineGraph, lineGraphEdgeCount } from './line-graph';
export type { LineGraph } from './line-graph';
export { verifyEdgeRanking } from './verify-edge-ranking';
export type { EdgeRankingVerdict, EdgeRankingViolation } from './verify-edge-ranking';
export { optimalTreeEdgeRanking } from './tree-edge-ranking';
export { edgeRankingByLineGraph } from './line-graph-ranking';
export { separatorRanking } from './separator-ranking';
export { assemblyPlan } from './assembly-plan';
export type { AssemblyStep } from './assembly-plan';
export { requireEdgeRanking } from './require-edge-ranking';
