import { execFile, spawn } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { graphFromSpec, verifyEdgeRanking, verifyRanking } from '@cairn/engine';
import { SolveResult } from '@cairn/schema';
import { repoRoot } from '../support/test-env';

const bin = join(repoRoot, 'packages/cli/bin/cairn.js');
const work = mkdtempSync(join(tmpdir(), 'cairn-cli-'));

/** Runs the built command as a process; resolves with its exit status and output, whatever the status. */
function cairn(args: string[], input?: string): Promise<{ code: number; stdout: string; stderr: string }> {
  return new Promise((resolve) => {
    const child = execFile(process.execPath, [bin, ...args], { cwd: work, timeout: 60_000 }, (err, stdout, stderr) => {
      resolve({ code: err ? (typeof err.code === 'number' ? err.code : 1) : 0, stdout, stderr });
    });
    if (input !== undefined) child.stdin!.end(input);
  });
}

describe('the cairn command', () => {
  it('ends quietly when its reader goes away (a pipe into head or true), with no stack trace', async () => {
    // The reader closes its end at once, before the command has printed anything.
    for (const args of [['solve', 'grid:6x6'], ['sweep', 'grid', '--rows', '1..3', '--cols', '1..30', '--format', 'csv', '--quiet']]) {
      const child = spawn(process.execPath, [bin, ...args], { cwd: work });
      let stderr = '';
      child.stderr.on('data', (d) => (stderr += String(d)));
      child.stdout.destroy();
      const code = await new Promise<number | null>((resolve) => child.on('close', (c) => resolve(c)));
      expect(stderr, args.join(' ')).not.toMatch(/EPIPE|\n\s+at /);
      expect(code, args.join(' ')).toBe(0);
    }
  });

  it('solve --json: the closed forms for the cycle (Bodlaender et al. 1998) and the 2 x n grid (Alpert 2010), labels verified again', async () => {
    for (const [spec, value] of [['cycle:20', 6], ['grid:2x9', 6], ['path:1000', 10]] as const) {
      const { code, stdout } = await cairn(['solve', spec, '--json', '--quiet']);
      expect(code, spec).toBe(0);
      const result = SolveResult.parse(JSON.parse(stdout));
      expect(result.rankNumber, spec).toBe(value);
      expect(verifyRanking(graphFromSpec(spec), result.labels)).toMatchObject({ valid: true, maxLabel: value });
    }
  });

  it('solve stops at its time limit with bounds only and exit status 3', async () => {
    const { code, stdout } = await cairn(['solve', 'grid:12x12', '--time-limit', '0.5', '--json', '--quiet']);
    expect(code).toBe(3);
    const result = SolveResult.parse(JSON.parse(stdout));
    expect(result.rankNumber).toBeNull();
    expect(result.lower).toBeLessThan(result.upper);
    expect(result.stats.stopReason).toBe('time-limit');
  });

  it('solve --picture draws the ranking of a grid', async () => {
    const { code, stdout } = await cairn(['solve', 'grid:2x3', '--picture', '--quiet']);
    expect(code).toBe(0);
    expect(stdout.trim().split('\n').slice(-2).every((line) => line.trim().split(/\s+/).length === 3)).toBe(true);
  });

  it('solve --svg and --tikz draw the certificate, one labelled cell or node per vertex', async () => {
    const { code, stdout } = await cairn(['solve', 'grid:3x5', '--json', '--quiet', '--svg', 'g.svg', '--tikz', 'g.tex']);
    expect(code).toBe(0);
    const labels = SolveResult.parse(JSON.parse(stdout)).labels;
    const svg = readFileSync(join(work, 'g.svg'), 'utf8');
    expect(svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
    expect(svg.match(/<rect /g)).toHaveLength(15);
    expect([...svg.matchAll(/>(\d+)<\/text>/g)].map((m) => Number(m[1]))).toEqual(labels);
    const tikz = readFileSync(join(work, 'g.tex'), 'utf8');
    expect([...tikz.matchAll(/\{(\d+)\};/g)].map((m) => Number(m[1]))).toEqual(labels);
    expect(tikz).toMatch(/\\begin\{tikzpicture\}[\s\S]*\\end\{tikzpicture\}/);
  });

  it('verify: exit 0 for a ranking, 1 with the offending path otherwise, 2 with the line for a malformed file', async () => {
    writeFileSync(join(work, 'good.csv'), '1,3,1\n2,4,2\n'); // 4 labels: the 2 x 3 rank number (Alpert 2010)
    writeFileSync(join(work, 'bad.csv'), '1,2,1\n1,3,2\n');
    writeFileSync(join(work, 'broken.csv'), '1,2,1\n3,x,2\n');
    expect(await cairn(['verify', 'good.csv', '--graph', 'grid:2x3'])).toMatchObject({ code: 0, stdout: expect.stringMatching(/^valid ranking with 4 labels/) });
    const bad = await cairn(['verify', 'bad.csv', '--graph', 'grid:2x3']);
    expect(bad.code).toBe(1);
    expect(bad.stdout).toMatch(/not a ranking: vertices \d and \d both have label 1, joined by the path/);
    const broken = await cairn(['verify', 'broken.csv', '--graph', 'grid:2x3']);
    expect(broken.code).toBe(2);
    expect(broken.stderr).toMatch(/line 2, column 3/);
    expect(await cairn(['verify', '-', '--graph', 'path:3'], '1\n2\n1\n')).toMatchObject({ code: 0 });
  });

  it('bad specs and malformed files exit 2 with a one-line message naming the problem', async () => {
    const spec = await cairn(['solve', 'grid:0x7']);
    expect(spec.code).toBe(2);
    expect(spec.stderr.trim()).toBe('cairn: grid:0x7: rows must be a whole number >= 1, got 0');
    writeFileSync(join(work, 'plate.mtx'), '%%MatrixMarket matrix coordinate pattern symmetric\n3 3 2\n2 1\n4 1\n');
    const mtx = await cairn(['solve', 'plate.mtx']);
    expect(mtx.code).toBe(2);
    expect(mtx.stderr).toMatch(/^cairn: matrix-market: line 4, column 1: /);
    expect(mtx.stderr.split('\n').filter(Boolean)).toHaveLength(1);
    expect((await cairn(['solve', 'missing.gr'])).stderr.trim()).toBe('cairn: no file missing.gr');
    expect((await cairn(['solve'])).code).toBe(2);
  });

  it('formula gives the value with its source, or says there is none (exit 1)', async () => {
    const path = await cairn(['formula', 'path', '1000', '--json']);
    expect(JSON.parse(path.stdout)).toMatchObject({ value: 10, id: 'path', source: { year: 1998 } });
    const none = await cairn(['formula', 'grid', '3', '3']);
    expect(none.code).toBe(1);
    expect(none.stdout).toMatch(/no closed form/);
  });

  it('sweep tabulates a range on worker threads: the 1 x n and 2 x n rows meet their closed forms', async () => {
    const { code, stdout } = await cairn(['sweep', 'grid', '--rows', '1..2', '--cols', '1..8', '--format', 'csv', '--jobs', '2', '--quiet']);
    expect(code).toBe(0);
    const lines = stdout.trim().split('\n');
    expect(lines[0]).toBe('family,rows,cols,rank_number,lower,upper,provenance,elapsed_ms,status');
    expect(lines).toHaveLength(17);
    for (const line of lines.slice(1)) {
      const [, m, n, value] = line.split(',').map(Number);
      // P_n: ⌊log2 n⌋ + 1 (Bodlaender et al. 1998); P_2 x P_n: ⌊log2(n+1)⌋ + ⌊log2((n+1)/3)⌋ + 2 (Alpert 2010).
      const expected = m === 1 ? Math.floor(Math.log2(n!)) + 1 : Math.floor(Math.log2(n! + 1)) + (n! + 1 >= 3 ? Math.floor(Math.log2((n! + 1) / 3)) : -1) + 2;
      expect(value, line).toBe(expected);
    }
    const md = await cairn(['sweep', 'staircase', '--sizes', '1..4', '--format', 'md', '--quiet']);
    expect(md.stdout.split('\n')[0]).toBe('| size | rank number |');
  });

  it('sweep --resume keeps the cells already written and computes only the rest', async () => {
    const out = join(work, 'grids.csv');
    writeFileSync(out, 'family,rows,cols,rank_number,lower,upper,provenance,elapsed_ms,status\ngrid,1,1,1,1,1,formula:path,3,exact\ngrid,1,2,2,2,2,formula:path,2,exact\ngrid,1,3,,1,9,bound,5,interrupted\n');
    const { code, stderr } = await cairn(['sweep', 'grid', '--rows', '1..2', '--cols', '1..3', '--format', 'csv', '--out', out, '--resume']);
    expect(code).toBe(0);
    expect(stderr).toMatch(/resuming: 2 cells already in .*grids\.csv, 4 to go/);
    const lines = readFileSync(out, 'utf8').trim().split('\n');
    expect(lines).toHaveLength(7);
    expect(lines.filter((l) => l.startsWith('grid,1,3,')).map((l) => l.split(',')[8])).toEqual(['exact']);
    expect(lines[1]).toBe('grid,1,1,1,1,1,formula:path,3,exact'); // kept as it was, not recomputed
    expect((await cairn(['sweep', 'grid', '--rows', '1..2', '--cols', '1..3', '--resume'])).code).toBe(2);
  });

  it('bounds, plan, edge-rank and convert give consistent answers', async () => {
    const bounds = JSON.parse((await cairn(['bounds', 'grid:6x6', '--json'])).stdout) as { lower: { value: number }[]; upper: { value: number }[] };
    expect(bounds.lower[0]!.value).toBeLessThanOrEqual(bounds.upper[0]!.value);
    const plan = JSON.parse((await cairn(['plan', 'path:7', '--json'])).stdout) as { steps: { vertices: number[] }[]; eliminationOrder: number[] };
    expect(plan.steps.map((s) => s.vertices.length)).toEqual([4, 2, 1]); // the ruler ranking of P_7
    writeFileSync(join(work, 'cabinet.parents'), '-1 0 0 1 1 2 # an invented cabinet: carcass, two side panels, three shelves\n');
    const edges = JSON.parse((await cairn(['edge-rank', 'tree:cabinet.parents', '--json'])).stdout) as { optimal: boolean; labels: number[] };
    expect(edges.optimal).toBe(true);
    expect(verifyEdgeRanking(graphFromSpec({ family: 'tree', parents: [-1, 0, 0, 1, 1, 2] }), edges.labels).valid).toBe(true);
    expect((await cairn(['convert', 'grid:3x4', 'grid.mtx'])).code).toBe(0);
    const back = SolveResult.parse(JSON.parse((await cairn(['solve', 'grid.mtx', '--method', 'bounds', '--json'])).stdout));
    expect([back.graph.vertexCount, back.graph.edgeCount]).toEqual([12, 17]);
  });
});
