import { describe, expect, it } from 'vitest';
import { runCases } from '../harness';

describe('bench harness', () => {
  it('measures each case and reports figures in its own units', () => {
    let calls = 0;
    const [figures] = runCases({ 'count calls': () => void calls++ }, 0.05);
    expect(figures?.name).toBe('count calls');
    expect(calls).toBeGreaterThan(0);
    expect(figures!.opsPerSecond).toBeGreaterThan(0);
    expect(figures!.meanMs).toBeCloseTo(1000 / figures!.opsPerSecond, 6);
  });
});
