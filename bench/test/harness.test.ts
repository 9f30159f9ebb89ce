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
    expect(figures!.medianMs).toBeGreaterThan(0);
  });

  it('says whether the median meets a target', () => {
    const [fast, slow] = runCases(
      { fast: { run: () => undefined, targetMs: 1000 }, slow: { run: () => { const end = Date.now() + 3; while (Date.now() < end); }, targetMs: 0.001 } },
      0.05,
    );
    expect(fast).toMatchObject({ targetMs: 1000, meetsTarget: true });
    expect(slow).toMatchObject({ targetMs: 0.001, meetsTarget: false });
  });
});
