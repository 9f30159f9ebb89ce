/** One cell of a sweep, as written to its output. */
export interface SweepRow {
  family: string;
  rows: number;
  cols: number | null;
  rankNumber: number | null;
  lower: number;
  upper: number;
  provenance: string;
  elapsedMs: number;
  /** exact: the value is proven; bounds: a limit came first; interrupted: Ctrl-C came first (rerun on --resume). */
  status: 'exact' | 'bounds' | 'interrupted';
}

export const SWEEP_COLUMNS = ['family', 'rows', 'cols', 'rank_number', 'lower', 'upper', 'provenance', 'elapsed_ms', 'status'] as const;

const cell = (v: number | null) => (v === null ? '' : String(v));
const fields = (r: SweepRow) => [r.family, String(r.rows), cell(r.cols), cell(r.rankNumber), String(r.lower), String(r.upper), r.provenance, String(r.elapsedMs), r.status];

export function csvHeader(): string {
  return `${SWEEP_COLUMNS.join(',')}\n`;
}

export function csvLine(r: SweepRow): string {
  return `${fields(r).join(',')}\n`;
}

export function jsonLine(r: SweepRow): string {
  return `${JSON.stringify(r)}\n`;
}

/** A value as the table shows it: the rank number, or the interval still open. */
const shown = (r: SweepRow) => (r.rankNumber !== null ? String(r.rankNumber) : `[${r.lower}, ${r.upper}]`);

/** The sweep as a grid of values (rows down, columns across) in plain text, Markdown or LaTeX. */
export function renderTable(rows: SweepRow[], format: 'table' | 'md' | 'tex'): string {
  const rowKeys = [...new Set(rows.map((r) => r.rows))].sort((a, b) => a - b);
  const colKeys = [...new Set(rows.map((r) => r.cols ?? 0))].sort((a, b) => a - b);
  const at = new Map(rows.map((r) => [`${r.rows},${r.cols ?? 0}`, shown(r)]));
  const single = colKeys.length === 1 && colKeys[0] === 0;
  const head = single ? ['size', 'rank number'] : ['m \\ n', ...colKeys.map(String)];
  const body = rowKeys.map((m) => (single ? [String(m), at.get(`${m},0`) ?? ''] : [String(m), ...colKeys.map((n) => at.get(`${m},${n}`) ?? '')]));
  if (format === 'md') {
    return [`| ${head.join(' | ')} |`, `|${head.map(() => ' --- ').join('|')}|`, ...body.map((b) => `| ${b.join(' | ')} |`)].join('\n') + '\n';
  }
  if (format === 'tex') {
    const spec = `r|${'r'.repeat(head.length - 1)}`;
    return [`\\begin{tabular}{${spec}}`, `${head.join(' & ')} \\\\ \\hline`, ...body.map((b) => `${b.join(' & ')} \\\\`), '\\end{tabular}'].join('\n') + '\n';
  }
  const widths = head.map((h, i) => Math.max(h.length, ...body.map((b) => b[i]!.length)));
  const line = (cells: string[]) => cells.map((c, i) => c.padStart(widths[i]!)).join('  ');
  return [line(head), ...body.map(line)].join('\n') + '\n';
}

/** Rows already in an output file (CSV with the header, or JSON lines), for --resume. */
export function readDoneRows(text: string, format: 'csv' | 'json'): SweepRow[] {
  const lines = text.split('\n').filter((l) => l.trim() !== '');
  if (format === 'json') return lines.map((l) => JSON.parse(l) as SweepRow);
  return lines.slice(1).map((l) => {
    const [family, rows, cols, rankNumber, lower, upper, provenance, elapsedMs, status] = l.split(',');
    const num = (v: string | undefined) => (v === undefined || v === '' ? null : Number(v));
    return { family: family!, rows: Number(rows), cols: num(cols), rankNumber: num(rankNumber), lower: Number(lower), upper: Number(upper), provenance: provenance!, elapsedMs: Number(elapsedMs), status: status as SweepRow['status'] };
  });
}
