import { gridGraph, verifyRanking } from '@cairn/engine';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { labelColour } from '@cairn/web/label-colours';
import { hoverPair, verifiedGridCase } from '../picture/grid-cases';
import type { PictureCase } from '../picture/page/protocol';
import { callBench, openPictureSession, type PictureSession } from '../picture/session';

// What bench:picture times is the real thing: the web app's RankingPicture in Debian's Chromium, drawing
// the engine's verified ranking. No timings are asserted here; bench/results/picture.json has them.

const OCHRE: readonly number[] = [0xc9, 0x8a, 0x3a];
const rgb = (hex: string) => [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16));
const asCase = (c: PictureCase): PictureCase => ({ rows: c.rows, cols: c.cols, labels: c.labels, parents: c.parents });

let session: PictureSession;
beforeAll(async () => {
  session = await openPictureSession();
}, 60_000);
afterAll(async () => {
  await session?.close();
});

describe('the bench page draws the verified ranking', () => {
  const big = verifiedGridCase(300, 300);

  it('draws the 300 x 300 grid on a canvas, one square cell per vertex, coloured by its label', async () => {
    // The labels handed to the page are a ranking by the engine's verifier (verifiedGridCase throws otherwise).
    expect(verifyRanking(gridGraph(300, 300), big.labels).valid).toBe(true);
    await callBench(session.page, 'setCase', asCase(big));
    expect((await callBench(session.page, 'mount')).renderer).toBe('canvas');
    const drawn = await callBench(session.page, 'readCanvas');
    expect(Number.isInteger(drawn.cellPx) && drawn.cellPx >= 1).toBe(true);
    expect([drawn.width, drawn.height]).toEqual([300 * drawn.cellPx, 300 * drawn.cellPx]);
    const mismatched: number[] = [];
    for (let v = 0; v < 300 * 300; v++) {
      const want = [...rgb(labelColour(big.labels[v]!, big.labelCount)), 255];
      if (want.some((x, i) => drawn.centres[4 * v + i] !== x)) mismatched.push(v);
    }
    expect(mismatched).toEqual([]);
    // The colours keep the labels' order: a higher label is never drawn lighter than a lower one.
    const lightness = (v: number) => drawn.centres[4 * v]! + drawn.centres[4 * v + 1]! + drawn.centres[4 * v + 2]!;
    const darkestUpTo = new Map<number, number>();
    for (let v = 0; v < 300 * 300; v++) {
      const l = big.labels[v]!;
      darkestUpTo.set(l, Math.min(darkestUpTo.get(l) ?? Infinity, lightness(v)));
    }
    const byLabel = [...darkestUpTo.entries()].sort((a, b) => a[0] - b[0]).map(([, light]) => light);
    for (let i = 1; i < byLabel.length; i++) expect(byLabel[i]!).toBeLessThanOrEqual(byLabel[i - 1]!);
  });

  it('on hover lights the cells above the hovered one in the elimination forest and dims other labels', async () => {
    const [{ v, probe }] = hoverPair(big);
    const timing = await callBench(session.page, 'hover', v, probe);
    expect(timing.renderer).toBe('canvas');
    const drawn = await callBench(session.page, 'readCanvas');
    const above = new Set<number>();
    for (let p = big.parents[v]!; p >= 0; p = big.parents[p]!) above.add(p);
    expect(above.size).toBeGreaterThan(0);
    const wrong: number[] = [];
    for (let u = 0; u < 300 * 300; u++) {
      const px = drawn.centres.slice(4 * u, 4 * u + 4);
      const ok = above.has(u)
        ? px.slice(0, 3).every((x, i) => x === OCHRE[i]) && px[3] === 255
        : big.labels[u] === big.labels[v]
          ? px[3] === 255
          : px[3]! < 255; // drawn at a quarter opacity
      if (!ok) wrong.push(u);
    }
    expect(wrong).toEqual([]);
  });

  it('keeps the 64 x 64 grid, the largest SVG, in SVG with the verified labels', async () => {
    const small = verifiedGridCase(64, 64);
    await callBench(session.page, 'setCase', asCase(small));
    expect((await callBench(session.page, 'mount')).renderer).toBe('svg');
    const cells = await callBench(session.page, 'readSvgCells');
    expect(cells.map(([v]) => v)).toEqual(Array.from({ length: 64 * 64 }, (_, i) => i));
    expect(cells.map(([, l]) => l)).toEqual(small.labels);
    await callBench(session.page, 'unmount');
  });
});
