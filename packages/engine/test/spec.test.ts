import { describe, expect, it } from 'vitest';
import { formatGraphSpec, graphFromSpec, readGraphSpec, ParseError, parseGraphSpec, parseParentArray, SpecError, type GraphSpec } from '../src/index';

describe('parseGraphSpec', () => {
  it('reads every family of the text form', () => {
    const cases: [string, GraphSpec][] = [
      ['grid:4x7', { family: 'grid', rows: 4, cols: 7 }],
      ['cylinder:4x6', { family: 'cylinder', rows: 4, cols: 6 }],
      ['torus:4x4', { family: 'torus', rows: 4, cols: 4 }],
      ['staircase:6', { family: 'staircase', t: 6 }],
      ['path:10', { family: 'path', n: 10 }],
      ['cycle:9', { family: 'cycle', n: 9 }],
      ['complete:5', { family: 'complete', n: 5 }],
      ['bipartite:3x4', { family: 'bipartite', a: 3, b: 4 }],
      ['star:8', { family: 'star', leaves: 8 }],
      ['random-tree:100:7', { family: 'random-tree', n: 100, seed: 7 }],
      ['gnp:60:0.1:7', { family: 'gnp', n: 60, p: 0.1, seed: 7 }],
      ['mask:shapes/notch.mask', { family: 'mask', file: 'shapes/notch.mask' }],
      ['tree:assembly.parents', { family: 'tree', file: 'assembly.parents' }],
      ['meshes/plate.mtx', { family: 'file', file: 'meshes/plate.mtx' }],
    ];
    for (const [text, spec] of cases) {
      expect(parseGraphSpec(text)).toEqual(spec);
      expect(parseGraphSpec(formatGraphSpec(spec))).toEqual(spec);
    }
    expect(parseGraphSpec('  grid:4×7 ')).toEqual({ family: 'grid', rows: 4, cols: 7 });
    expect(parseGraphSpec('random-tree:30')).toEqual({ family: 'random-tree', n: 30, seed: 1 });
  });

  it('says clearly what is wrong with a bad spec', () => {
    const message = (text: string) => {
      try {
        parseGraphSpec(text);
      } catch (err) {
        expect(err).toBeInstanceOf(SpecError);
        return (err as Error).message;
      }
      throw new Error(`${text} parsed`);
    };
    expect(message('grdi:4x7')).toMatch(/unknown graph family 'grdi'.*expected one of grid, cylinder/);
    expect(message('grid:4')).toMatch(/expected grid:ROWSxCOLS/);
    expect(message('grid:0x7')).toMatch(/rows must be a whole number >= 1, got 0/);
    expect(message('grid:-3x7')).toMatch(/rows must be a whole number/);
    expect(message('grid:4x7.5')).toMatch(/cols must be a whole number/);
    expect(message('grid:10000x10000')).toMatch(/100000000 vertices; a graph may have at most 10000000/);
    expect(message('grid:99999999999999999999x2')).toMatch(/more than a graph may hold/);
    expect(message('cycle:2')).toMatch(/>= 3/);
    expect(message('complete:50000')).toMatch(/edges/);
    expect(message('gnp:10:1.5')).toMatch(/probability/);
    expect(message('mask:')).toMatch(/a file to read/);
    expect(message('   ')).toMatch(/empty graph spec/);
  });
});

describe('graphFromSpec', () => {
  it('builds each family by name', () => {
    expect(graphFromSpec('grid:4x7').vertexCount).toBe(28);
    expect(graphFromSpec('staircase:6').vertexCount).toBe(21);
    expect(graphFromSpec('bipartite:3x4').edgeCount).toBe(12);
    expect(graphFromSpec({ family: 'tree', parents: [-1, 0, 0, 2] }).edgeCount).toBe(3);
    expect(graphFromSpec({ family: 'mask', text: '##\n#.\n' }).vertexCount).toBe(3);
  });

  it('reads named files only through the loader it is given', () => {
    const files: Record<string, string> = {
      'notch.mask': '###\n##.\n',
      'assembly.parents': '-1 0 0\n1 1\n',
      'plate.txt': '0 1\n1 2\n2 0\n2 2\n',
      'corner.mask': '##\n#.\n',
    };
    const loader = (path: string) => {
      const content = files[path];
      if (content === undefined) throw new Error(`no file ${path}`);
      return content;
    };
    expect(graphFromSpec('mask:notch.mask', loader).vertexCount).toBe(5);
    expect(graphFromSpec('tree:assembly.parents', loader).edgeCount).toBe(4);
    const plate = graphFromSpec('plate.txt', loader);
    expect([plate.vertexCount, plate.edgeCount]).toEqual([3, 3]);
    expect(plate.family).toMatchObject({ kind: 'file', name: 'plate.txt' });
    expect(readGraphSpec('plate.txt', loader)).toMatchObject({ warningCount: 1, warnings: [{ kind: 'self-loop', line: 4 }] });
    expect(graphFromSpec('corner.mask', loader).family).toMatchObject({ kind: 'mask' });
    expect(() => graphFromSpec('mask:notch.mask')).toThrow(/no way to read files/);
  });
});

describe('parseParentArray', () => {
  it('reads numbers split by spaces, commas and lines, with comments', () => {
    expect(parseParentArray('-1, 0, 0 # root and two children\n1\n')).toEqual([-1, 0, 0, 1]);
  });

  it('names the line and column of a bad entry', () => {
    try {
      parseParentArray('-1 0\n0 x1 2');
      throw new Error('parsed');
    } catch (err) {
      expect(err).toBeInstanceOf(ParseError);
      expect(err).toMatchObject({ line: 2, column: 3 });
    }
  });
});
