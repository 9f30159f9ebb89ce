import { labelColour } from './label-colours';

/** The scale from label 1 to the top label, as a row of swatches (at most a dozen, evenly spaced). */
export function LabelLegend({ labelCount }: { labelCount: number }) {
  if (labelCount === 0) return null;
  const shown = labelCount <= 12 ? Array.from({ length: labelCount }, (_, i) => i + 1) : Array.from({ length: 12 }, (_, i) => 1 + Math.round((i * (labelCount - 1)) / 11));
  return (
    <span className="inline-flex items-center gap-1" aria-label={`labels 1 to ${labelCount}`} data-testid="label-legend">
      <span className="mr-1">label</span>
      {shown.map((l) => (
        <span key={l} className="inline-flex flex-col items-center">
          <span className="h-3 w-5 rounded-sm" style={{ background: labelColour(l, labelCount) }} />
          <span className="font-mono text-[10px]">{l}</span>
        </span>
      ))}
    </span>
  );
}
