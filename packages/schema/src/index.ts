export { HealthResponse } from './health';
export { ApiError } from './api-error';
export { GraphSpec, MAX_GRAPH_VERTICES } from './graph-spec';
export { SolveMethod, SolveResult } from './solve-result';
export { ApiScope, Role, RunStatus, Visibility } from './access';
export * from './api-auth';
export * from './api-runs';
export * from './api-uploads';
