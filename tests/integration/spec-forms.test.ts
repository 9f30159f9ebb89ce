import { describe, expect, it } from 'vitest';
import { parseGraphSpec, SpecError } from '@cairn/engine';
import { GraphSpec } from '@cairn/schema';

// The text form (engine) and the JSON form (schema) must accept and refuse the same sizes.
const texts = [
  'grid:4x7', 'grid:1x1', 'grid:0x7', 'grid:3162x3162', 'grid:3163x3163', 'cylinder:4x6', 'cylinder:4x2',
  'torus:4x4', 'torus:2x4', 'staircase:6', 'staircase:4471', 'staircase:4472', 'path:10', 'path:0',
  'cycle:9', 'cycle:2', 'complete:5', 'complete:14142', 'complete:14143', 'bipartite:3x4', 'bipartite:0x4',
  'star:8', 'star:0', 'random-tree:100:7', 'gnp:60:0.1:7', 'gnp:60:1.1:7',
];

describe('graph spec text form and JSON form', () => {
  it('agree on which sizes are allowed', () => {
    for (const text of texts) {
      let parsed: unknown;
      try {
        parsed = parseGraphSpec(text);
      } catch (err) {
        expect(err).toBeInstanceOf(SpecError);
      }
      if (parsed === undefined) {
        const [family, body] = text.split(':') as [string, string];
        const numbers = body.split(/[x:]/).map(Number);
        const guess: Record<string, unknown> = { grid: { rows: numbers[0], cols: numbers[1] }, cylinder: { rows: numbers[0], cols: numbers[1] }, torus: { rows: numbers[0], cols: numbers[1] }, staircase: { t: numbers[0] }, path: { n: numbers[0] }, cycle: { n: numbers[0] }, complete: { n: numbers[0] }, bipartite: { a: numbers[0], b: numbers[1] }, star: { leaves: numbers[0] }, gnp: { n: numbers[0], p: numbers[1], seed: numbers[2] } }[family] as Record<string, unknown>;
        expect(GraphSpec.safeParse({ family, ...guess }).success, text).toBe(false);
      } else {
        expect(GraphSpec.safeParse(parsed).success, text).toBe(true);
      }
    }
  });
});
