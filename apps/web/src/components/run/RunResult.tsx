import type { RunPlan, RunView, SolveResult } from '@cairn/schema';
import { lazy, Suspense, useMemo } from 'react';
import type { ExportBase } from '../../api/runs';
import { ErrorNote, Loading } from './bits';
import { ExportLinks } from './ExportLinks';
import { RunDrawing, cellLayoutOf } from './RunDrawing';
import { StepPlanTable, stepsFromLabels } from './StepPlanTable';
import { formatDuration, METHOD_WORDS, provenanceWords } from './words';

// The tree layout (d3-hierarchy) loads only when a forest is shown.
const ForestTree = lazy(() => import('../forest/ForestTree'));

export interface PlanState {
  data: RunPlan | undefined;
  isPending: boolean;
  error: Error | null;
}

export interface RunResultProps {
  run: RunView;
  result: SolveResult;
  /** The plan of the run (forest, steps); undefined where there is no plan route (a shared link). */
  plan?: PlanState | undefined;
  exportBase: ExportBase;
  /** Whether the reader may fetch the uploaded file itself (members; not readers of a share link). */
  mayReadGraph: boolean;
}

const STOP_WORDS = { aborted: 'the search was stopped', 'time-limit': 'the time limit ran out', 'memory-limit': 'the memory limit was reached' } as const;

function Section({ title, children, id }: { title: string; children: React.ReactNode; id: string }) {
  return (
    <section aria-labelledby={id} className="space-y-3">
      <h2 id={id} className="font-display text-xl font-semibold">
        {title}
      </h2>
      {children}
    </section>
  );
}

/** What a witness is, in a few words (its kind and size), for the lower side. */
function witnessWords(w: Record<string, unknown> | null): string | null {
  if (!w) return null;
  const kind = typeof w.kind === 'string' ? w.kind : 'structure';
  const parts = Object.entries(w)
    .filter(([k, v]) => k !== 'kind' && (typeof v === 'number' || typeof v === 'string'))
    .map(([k, v]) => `${k} ${v}`);
  const lists = Object.entries(w).filter(([, v]) => Array.isArray(v)).map(([k, v]) => `${(v as unknown[]).length} ${k}`);
  return [kind, ...parts, ...lists].join(', ');
}

/**
 * A finished (or stopped) run's result, read-only: the value and how it is known, the ranking drawn, the
 * elimination forest, the step plan and the downloads. The run page and the shared page both show it.
 */
export function RunResult({ run, result, plan, exportBase, mayReadGraph }: RunResultProps) {
  const exact = result.rankNumber !== null;
  const cells = useMemo(() => cellLayoutOf(result.graph.family, run.spec), [result.graph.family, run.spec]);
  const nameOf = useMemo(() => {
    if (!cells) return String;
    const { cols, cellOf } = cells.layout;
    return (v: number) => `(${Math.floor(cellOf[v]! / cols) + 1},${(cellOf[v]! % cols) + 1})`;
  }, [cells]);
  const steps = useMemo(() => plan?.data?.steps ?? stepsFromLabels(result.labels), [plan?.data, result.labels]);
  const witness = witnessWords(result.witness);
  const fileStem = `cairn-${run.specText.replace(/[^A-Za-z0-9._-]+/g, '-')}-${run.id.slice(0, 8)}`;

  return (
    <div className="space-y-8">
      <section aria-labelledby="value-heading" className="space-y-2 rounded-xl bg-stone-100/60 p-4 ring-1 ring-stone-200">
        <h2 id="value-heading" className="sr-only">
          Value
        </h2>
        <p className="font-display text-3xl" data-testid="run-value">
          {exact ? (
            <>
              rank number <strong>{result.rankNumber}</strong>
            </>
          ) : (
            <>
              rank number between <strong>{result.lower}</strong> and <strong>{result.upper}</strong>
            </>
          )}
        </p>
        <p data-testid="run-provenance">{provenanceWords(result)}</p>
        {witness && <p className="text-sm text-lichen-700">Lower-bound witness: {witness}.</p>}
        <p className="flex flex-wrap items-center gap-x-4 gap-y-1 text-sm">
          <span className={`rounded-full px-2 py-0.5 text-xs font-medium ${result.verified ? 'bg-lichen-700 text-stone-50' : 'bg-alarm-600 text-stone-50'}`} data-testid="run-verified">
            {result.verified ? 'certificate verified' : 'certificate not verified'}
          </span>
          <span>
            {result.graph.vertexCount.toLocaleString('en')} vertices, {result.graph.edgeCount.toLocaleString('en')} edges
          </span>
          <span>{METHOD_WORDS[result.stats.method].name}</span>
          <span>{formatDuration(result.stats.elapsedMs)}</span>
          {result.stats.nodes > 0 && <span>{result.stats.nodes.toLocaleString('en')} search nodes</span>}
          {result.stats.stopReason && <span className="text-ochre-700">{STOP_WORDS[result.stats.stopReason]}</span>}
        </p>
      </section>

      <Section title="The ranking" id="picture-heading">
        <RunDrawing run={run} result={result} plan={plan?.data} exportBase={exportBase} mayReadGraph={mayReadGraph} />
      </Section>

      <Section title="Elimination forest" id="forest-heading">
        {!plan ? (
          <p className="text-sm text-lichen-700">The elimination forest is shown to members on the run's own page.</p>
        ) : plan.isPending ? (
          <Loading what="the plan" />
        ) : plan.error || !plan.data ? (
          <ErrorNote error={plan.error ?? new Error('no plan')} what="No forest" />
        ) : (
          <Suspense fallback={<Loading what="the tree drawing" />}>
            <ForestTree forestParents={plan.data.forestParents} labels={result.labels} />
          </Suspense>
        )}
      </Section>

      <Section title="Step plan" id="steps-heading">
        <p className="text-sm text-lichen-700">
          Step s handles every vertex labelled s; the vertices of a step are independent and may run in parallel. {steps.length} step{steps.length === 1 ? '' : 's'} in all.
        </p>
        <StepPlanTable steps={steps} nameOf={nameOf} />
      </Section>

      <Section title="Downloads" id="exports-heading">
        <ExportLinks base={exportBase} fileStem={fileStem} />
      </Section>
    </div>
  );
}
