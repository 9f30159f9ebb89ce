// The engine's file formats: readers and writers over strings and bytes (no file system here).
export type { GraphFormat } from './formats';
export type { TextInput } from './text-input';
export type { ReadResult, ReadWarning } from './warnings';
export { MAX_LISTED_WARNINGS } from './warnings';
export { readEdgeList, writeEdgeList } from './edge-list';
export type { EdgeListReadOptions, EdgeListWriteOptions } from './edge-list';
export { readDimacs, writeDimacs } from './dimacs';
export type { DimacsReadOptions, DimacsVariant, DimacsWriteOptions } from './dimacs';
export { readMatrixMarket, writeMatrixMarket } from './matrix-market';
export type { MatrixMarketReadOptions } from './matrix-market';
export { readJsonGraph, writeJsonGraph } from './json-graph';
export type { JsonGraphReadOptions } from './json-graph';
export { formatMaskText, parseMaskText } from './mask-text';
export { readLabelsCsv, writeLabelsCsv } from './labels-csv';
export { detectFormat } from './detect';
export { readGraph, writeGraph } from './read-write-graph';
export type { ReadGraphOptions } from './read-write-graph';
