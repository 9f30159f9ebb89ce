// @cairn/engine/pool: engine tasks on worker threads. The only part of the engine that uses node: modules.
export { EnginePool } from './engine-pool';
export type { EnginePoolOptions, RunOptions } from './engine-pool';
export type { EngineTask, EngineTaskResult, ExactProgress } from './task';
