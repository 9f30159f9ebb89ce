export { HealthResponse } from './health';
export { ApiError } from './api-error';
