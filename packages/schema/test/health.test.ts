import { describe, expect, it } from 'vitest';
import { ApiError, HealthResponse } from '../src/index';

describe('HealthResponse', () => {
  it('accepts the two answers the server gives', () => {
    expect(HealthResponse.parse({ status: 'ok', db: 'ok', version: '0.1.0' })).toEqual({ status: 'ok', db: 'ok', version: '0.1.0' });
    expect(HealthResponse.safeParse({ status: 'degraded', db: 'down', reason: 'no answer within 2000 ms', version: '0.1.0' }).success).toBe(true);
  });

  it('rejects a status it does not know and a missing version', () => {
    expect(HealthResponse.safeParse({ status: 'fine', db: 'ok', version: '1' }).success).toBe(false);
    expect(HealthResponse.safeParse({ status: 'ok', db: 'ok' }).success).toBe(false);
  });
});

describe('ApiError', () => {
  it('needs a code and a message', () => {
    expect(ApiError.safeParse({ error: { code: 'not_found', message: 'no such run' } }).success).toBe(true);
    expect(ApiError.safeParse({ error: { message: 'no code' } }).success).toBe(false);
  });
});
