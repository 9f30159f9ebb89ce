import type { QuickAnswer } from '@cairn/schema';
import { useId, useState, type FormEvent } from 'react';
import { Link, useNavigate } from 'react-router';
import { useQuickAnswer, useRecentAtlas } from '../api/quick';
import { useCreateRun, useRunList } from '../api/runs';
import { signInHref, useCan, useMe } from '../api/me';
import { HealthStatus } from '../components/HealthStatus';
import { FieldError } from '../components/form/Field';
import { ErrorNote, Loading, StatusBadge, buttonClass, inputClass, linkClass, quietButtonClass } from '../components/run/bits';
import { parseQuickInput, type TextFamily } from '../components/run/spec-text';
import { provenanceTag, valueText } from '../components/run/words';

// The home page is in the first chunk every visitor downloads: no charts, no tables, no drawings here.

export function HomePage() {
  return (
    <section className="space-y-10">
      <div className="space-y-4">
        <h1 className="font-display text-3xl font-semibold leading-tight sm:text-4xl">Rank numbers, proven bounds and certificates</h1>
        <p className="max-w-2xl text-lg text-lichen-700">
          Cairn labels the vertices of a graph so that every path between two equal labels climbs over a larger one, with as few labels as it
          can, and says how far from the optimum that is.
        </p>
        <HealthStatus />
      </div>
      <QuickSolve />
      <RecentResults />
    </section>
  );
}

/** The families the picker offers, with the sizes each takes. */
const PICKER: { family: TextFamily; label: string; sizes: [string] | [string, string] }[] = [
  { family: 'grid', label: 'Grid', sizes: ['rows', 'columns'] },
  { family: 'cylinder', label: 'Cylinder', sizes: ['rows', 'columns'] },
  { family: 'torus', label: 'Torus', sizes: ['rows', 'columns'] },
  { family: 'staircase', label: 'Staircase S(t)', sizes: ['t'] },
  { family: 'path', label: 'Path', sizes: ['n'] },
  { family: 'cycle', label: 'Cycle', sizes: ['n'] },
  { family: 'complete', label: 'Complete graph', sizes: ['n'] },
  { family: 'bipartite', label: 'Complete bipartite', sizes: ['a', 'b'] },
  { family: 'star', label: 'Star', sizes: ['leaves'] },
];

/** A quick box: type a graph or pick one, get what Cairn already knows at once, then start a full run. */
export function QuickSolve() {
  const [text, setText] = useState('');
  const [problem, setProblem] = useState<string | undefined>();
  const [spec, setSpec] = useState<string | null>(null);
  const [pickFamily, setPickFamily] = useState<TextFamily>('grid');
  const [sizeA, setSizeA] = useState('4');
  const [sizeB, setSizeB] = useState('9');
  const answer = useQuickAnswer(spec);
  const ids = { input: useId(), error: useId(), family: useId(), a: useId(), b: useId(), pickError: useId() };
  const [pickProblem, setPickProblem] = useState<string | undefined>();
  const picked = PICKER.find((p) => p.family === pickFamily)!;

  const ask = (e: FormEvent) => {
    e.preventDefault();
    const read = parseQuickInput(text);
    if (!read.ok) {
      setProblem(read.message);
      return;
    }
    setProblem(undefined);
    setSpec(read.spec);
  };
  const askPicked = (e: FormEvent) => {
    e.preventDefault();
    const read = parseQuickInput(`${pickFamily} ${sizeA}${picked.sizes.length === 2 ? `x${sizeB}` : ''}`);
    if (!read.ok) {
      setPickProblem(read.message);
      return;
    }
    setPickProblem(undefined);
    setText(read.spec);
    setProblem(undefined);
    setSpec(read.spec);
  };

  return (
    <section aria-labelledby="quick-heading" className="space-y-4 rounded-xl border border-stone-200 bg-stone-100/50 p-4 sm:p-6">
      <h2 id="quick-heading" className="font-display text-2xl font-semibold">
        Ask about a graph
      </h2>
      <form onSubmit={ask} className="space-y-1" noValidate>
        <label htmlFor={ids.input} className="block text-sm font-medium">
          Graph
        </label>
        <div className="flex flex-col gap-2 sm:flex-row">
          <input
            id={ids.input}
            className={`${inputClass} font-mono sm:max-w-md`}
            value={text}
            onChange={(e) => setText(e.target.value)}
            placeholder="4x9, grid 4x9, staircase 7, path:100"
            autoComplete="off"
            spellCheck={false}
            aria-invalid={problem ? true : undefined}
            aria-describedby={problem ? ids.error : undefined}
          />
          <button type="submit" className={buttonClass}>
            Answer
          </button>
        </div>
        <FieldError id={ids.error} message={problem} />
      </form>

      <form onSubmit={askPicked} className="space-y-1" aria-label="Pick a family and sizes" noValidate>
        <fieldset className="flex flex-wrap items-end gap-2">
          <legend className="mb-1 text-sm text-lichen-700">…or pick a family and its sizes</legend>
          <span>
            <label htmlFor={ids.family} className="block text-xs text-lichen-700">
              Family
            </label>
            <select id={ids.family} className={inputClass} value={pickFamily} onChange={(e) => setPickFamily(e.target.value as TextFamily)}>
              {PICKER.map((p) => (
                <option key={p.family} value={p.family}>
                  {p.label}
                </option>
              ))}
            </select>
          </span>
          <span className="w-24">
            <label htmlFor={ids.a} className="block text-xs text-lichen-700">
              {picked.sizes[0]}
            </label>
            <input id={ids.a} className={inputClass} inputMode="numeric" value={sizeA} onChange={(e) => setSizeA(e.target.value)} aria-describedby={pickProblem ? ids.pickError : undefined} />
          </span>
          {picked.sizes.length === 2 && (
            <span className="w-24">
              <label htmlFor={ids.b} className="block text-xs text-lichen-700">
                {picked.sizes[1]}
              </label>
              <input id={ids.b} className={inputClass} inputMode="numeric" value={sizeB} onChange={(e) => setSizeB(e.target.value)} aria-describedby={pickProblem ? ids.pickError : undefined} />
            </span>
          )}
          <button type="submit" className={quietButtonClass}>
            Answer picked graph
          </button>
        </fieldset>
        <FieldError id={ids.pickError} message={pickProblem} />
      </form>

      <div aria-live="polite">
        {spec !== null && answer.isPending && <Loading what={`what Cairn knows of ${spec}`} />}
        {answer.isError && <ErrorNote error={answer.error} what={`No quick answer for ${spec}`} />}
        {answer.data && <QuickAnswerCard answer={answer.data} />}
      </div>
    </section>
  );
}

const SOURCE_WORDS: Record<QuickAnswer['source'], string> = {
  atlas: 'from the atlas: values Cairn has established in earlier runs',
  formula: 'from a published closed form',
  bounds: 'from bounds computed just now (no search): a lower bound against a construction',
};

function QuickAnswerCard({ answer }: { answer: QuickAnswer }) {
  const exact = answer.rankNumber !== null;
  return (
    <article className="space-y-3 rounded-lg bg-stone-50 p-4 ring-1 ring-stone-200" data-testid="quick-answer">
      <p className="text-sm text-lichen-700">
        Read as <span className="font-mono text-slate-ink">{answer.spec}</span> · {answer.vertexCount.toLocaleString('en')} vertices, {answer.edgeCount.toLocaleString('en')} edges
      </p>
      <p className="font-display text-2xl">
        {exact ? (
          <>
            rank number <strong data-testid="quick-value">{answer.rankNumber}</strong>
          </>
        ) : (
          <>
            rank number between <strong data-testid="quick-value">{answer.lower}</strong> and <strong>{answer.upper}</strong>
          </>
        )}
      </p>
      <p className="text-sm">{SOURCE_WORDS[answer.source]}.</p>
      <dl className="grid gap-1 text-sm sm:grid-cols-[auto_1fr] sm:gap-x-3">
        <dt className="font-medium">at least {answer.lower}</dt>
        <dd>
          {answer.lowerArgument}
          {answer.lowerRunId && (
            <>
              {' '}
              (<Link className={linkClass} to={`/runs/${answer.lowerRunId}`}>the run that proved it</Link>)
            </>
          )}
        </dd>
        <dt className="font-medium">at most {answer.upper}</dt>
        <dd>
          {answer.upperArgument}
          {answer.upperRunId && (
            <>
              {' '}
              (<Link className={linkClass} to={`/runs/${answer.upperRunId}`}>the run with the ranking</Link>)
            </>
          )}
        </dd>
      </dl>
      <StartFullRun spec={answer.spec} exact={exact} />
    </article>
  );
}

/** A full run for members who may start one; a sign-in link for visitors. */
function StartFullRun({ spec, exact }: { spec: string; exact: boolean }) {
  const me = useMe();
  const canWrite = useCan('runs:write');
  const create = useCreateRun();
  const navigate = useNavigate();
  if (me.isPending) return null;
  if (!canWrite) {
    if (me.data?.user) return <p className="text-sm text-lichen-700">Your role reads runs but does not start them.</p>;
    return (
      <p className="text-sm">
        <a className={linkClass} href={signInHref('/')}>
          Sign in
        </a>{' '}
        to start a full run with a certificate you can download.
      </p>
    );
  }
  return (
    <div className="space-y-2">
      <button
        type="button"
        className={buttonClass}
        disabled={create.isPending}
        onClick={() => create.mutate({ spec }, { onSuccess: (run) => navigate(`/runs/${run.id}`) })}
      >
        {create.isPending ? 'Starting…' : exact ? `Start a run on ${spec} (for its certificate)` : `Start a full run on ${spec}`}
      </button>
      {create.isError && <ErrorNote error={create.error} what="The run was not started" />}
    </div>
  );
}

/** Finished public runs for members; the atlas's newest rows for visitors (who may not list runs). */
function RecentResults() {
  const me = useMe();
  const canRead = useCan('runs:read');
  const decided = !me.isPending;
  const runs = useRunList({ limit: 8, status: 'done' }, { enabled: decided && canRead });
  const atlas = useRecentAtlas(decided && !canRead);
  return (
    <section aria-labelledby="recent-heading" className="space-y-3">
      <h2 id="recent-heading" className="font-display text-2xl font-semibold">
        Recent results
      </h2>
      {!decided && <Loading what="recent results" />}
      {decided && canRead && (
        <>
          {runs.isPending && <Loading what="recent runs" />}
          {runs.isError && <ErrorNote error={runs.error} what="Recent runs could not be read" />}
          {runs.data && runs.data.runs.length === 0 && <p className="text-sm text-lichen-700">No finished runs yet. Ask about a graph above and start one.</p>}
          {runs.data && runs.data.runs.length > 0 && (
            <ul className="divide-y divide-stone-200 rounded-lg ring-1 ring-stone-200" data-testid="recent-runs">
              {runs.data.runs.map((r) => (
                <li key={r.id} className="flex flex-wrap items-center gap-x-3 gap-y-1 px-3 py-2 text-sm">
                  <Link className={`${linkClass} font-mono`} to={`/runs/${r.id}`}>
                    {r.specText}
                  </Link>
                  <span className="font-medium">{valueText(r)}</span>
                  <span className="text-lichen-700">{provenanceTag(r.provenance)}</span>
                  <span className="ml-auto flex items-center gap-2 text-xs text-lichen-500">
                    <StatusBadge status={r.status} /> {r.owner.login}
                  </span>
                </li>
              ))}
            </ul>
          )}
          <p className="text-sm">
            <Link className={linkClass} to="/runs">
              All runs
            </Link>
          </p>
        </>
      )}
      {decided && !canRead && (
        <>
          {atlas.isPending && <Loading what="the atlas" />}
          {atlas.isError && <ErrorNote error={atlas.error} what="The atlas could not be read" />}
          {atlas.data && atlas.data.entries.length === 0 && <p className="text-sm text-lichen-700">The atlas is empty so far.</p>}
          {atlas.data && atlas.data.entries.length > 0 && (
            <ul className="divide-y divide-stone-200 rounded-lg ring-1 ring-stone-200" data-testid="recent-atlas">
              {atlas.data.entries.map((e) => (
                <li key={e.graphKey} className="flex flex-wrap items-center gap-x-3 gap-y-1 px-3 py-2 text-sm">
                  <span className="font-mono">{e.graphKey}</span>
                  <span className="font-medium">{valueText(e)}</span>
                  <span className="text-lichen-700">{e.exact ? 'exact' : 'bounds'}</span>
                  <span className="ml-auto text-xs text-lichen-500">{e.vertexCount.toLocaleString('en')} vertices</span>
                </li>
              ))}
            </ul>
          )}
          <p className="text-sm">
            <Link className={linkClass} to="/atlas">
              The whole atlas
            </Link>
          </p>
        </>
      )}
    </section>
  );
}
