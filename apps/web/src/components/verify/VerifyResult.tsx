import type { VerifyResponse } from '@cairn/schema';
import { useMemo } from 'react';
import { RankingPicture } from '../ranking/RankingPicture';
import { vertexName, type GraphInput } from './graph-input';

/** The longest path listed in full; longer ones show both ends. */
const PATH_SHOWN = 16;

/** What the server said of the labelling: a ranking, or the two vertices and the path that break it, drawn. */
export function VerifyResult({ verdict, input, labels }: { verdict: VerifyResponse; input: GraphInput | null; labels: readonly number[] }) {
  const layout = input?.layout && input.layout.cellOf.length === labels.length ? input.layout : null;
  const marked = useMemo(() => (verdict.valid ? undefined : new Set(verdict.violation.path)), [verdict]);
  const counts = `${verdict.vertexCount} vertices, ${verdict.labelCount} different labels, highest label ${verdict.maxLabel}`;

  return (
    <section aria-labelledby="verify-verdict" className="space-y-4" data-testid="verify-result">
      {verdict.valid ? (
        <div className="rounded-md border border-lichen-500/50 bg-lichen-300/20 px-4 py-3">
          <h2 id="verify-verdict" className="font-display text-xl font-semibold text-lichen-700">
            A ranking
          </h2>
          <p className="text-sm text-slate-ink">
            Every path between two equal labels passes a larger one. {counts}.
          </p>
        </div>
      ) : (
        <div className="space-y-2 rounded-md border border-alarm-600/40 bg-alarm-600/5 px-4 py-3">
          <h2 id="verify-verdict" className="font-display text-xl font-semibold text-alarm-600">
            Not a ranking
          </h2>
          <p className="text-sm text-slate-ink" data-testid="violation-summary">
            <strong>{vertexName(verdict.violation.u, input?.layout ?? null)}</strong> and <strong>{vertexName(verdict.violation.v, input?.layout ?? null)}</strong> both have label{' '}
            {verdict.violation.label}, and no vertex on the path between them has a larger one
            {input?.layout ? ` (vertices ${verdict.violation.u} and ${verdict.violation.v})` : ''}.
          </p>
          <p className="text-sm text-lichen-700">
            Path ({verdict.violation.path.length} vertices):{' '}
            <span className="font-mono text-xs">
              {(verdict.violation.path.length <= PATH_SHOWN
                ? verdict.violation.path
                : [...verdict.violation.path.slice(0, PATH_SHOWN / 2), -1, ...verdict.violation.path.slice(-PATH_SHOWN / 2)]
              )
                .map((v) => (v < 0 ? '…' : `${v}${labels[v] !== undefined ? `[${labels[v]}]` : ''}`))
                .join(' → ')}
            </span>
          </p>
          <p className="text-xs text-lichen-500">{counts}.</p>
        </div>
      )}
      {layout ? (
        // The picture fills its box; a small grid gets a box to its size, not the page's width.
        <div style={{ maxWidth: Math.max(320, layout.cols * 44) }}>
          <RankingPicture
            layout={layout}
            labels={labels}
            marked={marked}
            title={verdict.valid ? 'The labelling, checked: a ranking' : `The labelling; the violating path between ${vertexName(verdict.violation.u, layout)} and ${vertexName(verdict.violation.v, layout)} is outlined`}
          />
        </div>
      ) : (
        input === null && <p className="text-sm text-lichen-500">Uploaded graphs are checked without a picture; the path above names their vertices by number.</p>
      )}
    </section>
  );
}
