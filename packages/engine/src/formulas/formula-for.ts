import type { Graph } from '../graph/graph';
import {
  CLOSED_FORMS,
  completeBipartiteRankNumber,
  completeRankNumber,
  cycleRankNumber,
  grid2RankNumber,
  pathRankNumber,
  starRankNumber,
  type ClosedForm,
} from './closed-forms';

/** The rank number of a graph by a closed form, with the form that gave it. */
export interface FormulaValue {
  value: number;
  formula: ClosedForm;
  /** `formula:<id>`, as runs and the atlas record it. */
  provenance: string;
}

const found = (value: number, formula: ClosedForm): FormulaValue => ({ value, formula, provenance: `formula:${formula.id}` });

/**
 * The closed-form rank number of g when its family has one Cairn can attribute, else undefined (such
 * graphs are served by search and bounds). Recognises families by what the graph was built as.
 */
export function formulaFor(g: Graph): FormulaValue | undefined {
  const f = g.family;
  if (!f) return undefined;
  switch (f.kind) {
    case 'path':
      return found(pathRankNumber(f.n), CLOSED_FORMS.path);
    case 'cycle':
      return found(cycleRankNumber(f.n), CLOSED_FORMS.cycle);
    case 'complete':
      return found(completeRankNumber(f.n), CLOSED_FORMS.complete);
    case 'completeBipartite':
      return found(completeBipartiteRankNumber(f.a, f.b), CLOSED_FORMS.completeBipartite);
    case 'star':
      return found(starRankNumber(f.leaves), CLOSED_FORMS.star);
    case 'grid': {
      const short = Math.min(f.rows, f.cols);
      const long = Math.max(f.rows, f.cols);
      if (short === 1) return found(pathRankNumber(long), CLOSED_FORMS.path);
      if (short === 2) return found(grid2RankNumber(long), CLOSED_FORMS.grid2);
      return undefined;
    }
    default:
      return undefined;
  }
}
