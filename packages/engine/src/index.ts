// @cairn/engine: the public surface. See packages/engine/README.md for an example per function.
export { EngineError, LabelError, ParseError, SizeError, SpecError } from './errors';
export type { TextPosition } from './errors';

export { Graph } from './graph/graph';
export type { Family, GridLayout, MaskShape } from './graph/family';
export { Bitset } from './graph/bitset';
export { componentIds, componentsOf } from './graph/components';
export { isForest } from './graph/is-forest';
export { checkVertexCount, graphFromEdges } from './graph/from-edges';
export { MAX_EDGES, MAX_VERTICES } from './graph/limits';

export { gridGraph } from './families/grid';
export { cylinderGraph } from './families/cylinder';
export { torusGraph } from './families/torus';
export { maskGraph } from './families/mask';
export { staircaseGraph } from './families/staircase';
export { completeBipartiteGraph, completeGraph, cycleGraph, pathGraph, starGraph } from './families/classic';
export { randomTree, treeFromParents } from './families/tree';
export { randomGraph } from './families/random-graph';
export { seededRandom } from './families/seeded-random';

export type { GraphSpec, GraphSpecFamily } from './spec/graph-spec';
export { SPEC_FAMILIES } from './spec/graph-spec';
export { formatGraphSpec, parseGraphSpec } from './spec/parse-spec';
export { graphFromSpec, readGraphSpec } from './spec/graph-from-spec';
export type { FileLoader } from './spec/graph-from-spec';
export { parseParentArray } from './spec/parent-array-text';

export { verifyRanking } from './ranking/verify';
export type { RankingVerdict, RankingViolation } from './ranking/verify';
export { isMinimalRanking } from './ranking/minimal';
export type { MinimalityVerdict } from './ranking/minimal';
export { normalizeLabels } from './ranking/normalize';
export { eliminationForest } from './ranking/elimination-forest';
export { eliminationOrder, stepPlan } from './ranking/step-plan';
export type { PlanStep } from './ranking/step-plan';

export * from './io/index';
export * from './drawing/index';

export {
  CLOSED_FORMS,
  completeBipartiteRankNumber,
  completeMultipartiteRankNumber,
  completeRankNumber,
  cycleRankNumber,
  floorLog2,
  grid2RankNumber,
  pathRankNumber,
  starRankNumber,
} from './formulas/closed-forms';
export type { ClosedForm } from './formulas/closed-forms';
export { formulaFor } from './formulas/formula-for';
export type { FormulaValue } from './formulas/formula-for';
export type { FormulaSource } from './formulas/sources';

export { optimalTreeRanking } from './bounds/tree-ranking';
export { MidlineSplit, midlineSplitRanking } from './bounds/midline-split';
export type { UpperBound } from './bounds/upper-bound';
export { rankingFromOrder } from './bounds/elimination-ranking';
export { nestedDissectionRanking } from './bounds/nested-dissection';
export { greedyEliminationRanking } from './bounds/greedy-elimination';
export { bestUpperBound } from './bounds/best-upper-bound';
export { boxRestrictionRanking } from './bounds/box-restriction';
export type { BestUpperBound } from './bounds/best-upper-bound';
export { exactTreeDepth } from './exact/exact-tree-depth';
export type { ExactOptions, ExactProgress, ExactResult } from './exact/exact-tree-depth';
export { TreeDepthSearch } from './exact/tree-depth-search';
export type { StopReason } from './exact/search-stop';
export { gridLowerBounds } from './bounds/grid-lower-bounds';
export type { GridLowerBound } from './bounds/grid-lower-bounds';
export { boundsTable } from './bounds/bounds-table';
export type { BoundsTableRow } from './bounds/bounds-table';
export { diagonalSplitWins } from './bounds/bounds-table';
export { DiagonalSplit, diagonalSplitRanking } from './bounds/diagonal-split';
export type { DiagonalCut } from './bounds/diagonal-split';
export { StaircaseRanking, staircaseRanking, staircaseVertex } from './bounds/staircase-ranking';
export { FourRowDoubling, fourRowDoublingRanking } from './bounds/four-row-doubling';
export { BevelledSplit } from './bounds/bevelled-split';
export type { BevelledSplitOptions, BoxMove } from './bounds/bevelled-split';
export { cellCount as boxCellCount, rectangleBox, staircaseBox } from './bounds/bevelled-box';
export type { Box as BevelledBox } from './bounds/bevelled-box';
export { solve } from './solve/solve';
export type { Solution, SolveMethod, SolveOptions } from './solve/solve';

export * from './edge/index';
export * from './bounds/lower/index';
