import { describe, expect, it } from 'vitest';
import { assemblyPlan, lineGraph, optimalTreeEdgeRanking, verifyEdgeRanking } from '../../src/edge/index';
import { LabelError, randomTree, stepPlan, treeFromParents } from '../../src/index';
import { bruteForceTreeDepth } from '../brute-force-td';

// An invented workshop job: a wooden cabinet whose parts are joined pairwise, the joints forming a tree.
const parts = ['base', 'left side', 'right side', 'top', 'back panel', 'shelf', 'door', 'hinge', 'handle', 'plinth'];
const cabinet = treeFromParents([-1, 0, 0, 1, 3, 1, 7, 2, 6, 0]);

describe('assemblyPlan', () => {
  it('plans the cabinet in the fewest steps, each a set of joints that share no part and no earlier subassembly', () => {
    const labels = optimalTreeEdgeRanking(cabinet);
    const plan = assemblyPlan(cabinet, labels);
    const joints = [...cabinet.edges()];
    // As many steps as the edge rank number, td of the line graph (brute force).
    expect(plan).toHaveLength(bruteForceTreeDepth(lineGraph(cabinet).graph));
    expect(plan.map((s) => s.step)).toEqual(plan.map((_, i) => i + 1));
    expect(plan.map((s) => s.label)).toEqual([...plan.map((s) => s.label)].sort((a, b) => a - b));
    expect(plan.flatMap((s) => s.edges).sort((a, b) => a - b)).toEqual(joints.map((_, i) => i));
    // Replay the plan: subassemblies are sets of parts; a step's joints must touch different subassemblies.
    const group = parts.map((_, i) => i);
    const find = (x: number): number => (group[x] === x ? x : (group[x] = find(group[x]!)));
    for (const step of plan) {
      expect(step.pairs).toEqual(step.edges.map((e) => joints[e]));
      const touched = new Set<number>();
      for (const [u, v] of step.pairs) {
        for (const piece of new Set([find(u), find(v)])) {
          expect(touched.has(piece), `step ${step.step}: ${parts[u]}-${parts[v]}`).toBe(false);
          touched.add(piece);
        }
      }
      for (const [u, v] of step.pairs) group[find(u)] = find(v);
    }
    expect(new Set(parts.map((_, i) => find(i))).size).toBe(1); // one cabinet at the end
  });

  it('reads like stepPlan on the line graph', () => {
    for (let seed = 1; seed <= 20; seed++) {
      const tree = randomTree(30, seed);
      const labels = optimalTreeEdgeRanking(tree);
      expect(assemblyPlan(tree, labels).map(({ step, label, edges }) => ({ step, label, vertices: edges }))).toEqual(stepPlan(lineGraph(tree).graph, labels));
    }
  });

  it('refuses a labelling that is not an edge ranking with a LabelError naming the path', () => {
    // The base-left and left-top joints in one step would both need the left side.
    const labels = Int32Array.from(optimalTreeEdgeRanking(cabinet));
    labels.fill(1);
    expect(verifyEdgeRanking(cabinet, labels).valid).toBe(false);
    expect(() => assemblyPlan(cabinet, labels)).toThrow(LabelError);
    expect(() => assemblyPlan(cabinet, labels)).toThrow(/edges 0 and 1 both have label 1 and the path 1-0-2/);
    expect(() => assemblyPlan(cabinet, [1, 2])).toThrow(LabelError);
  });
});
