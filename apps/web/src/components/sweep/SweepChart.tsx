import type { SweepView } from '@cairn/schema';
import { useMemo } from 'react';
import { CartesianGrid, Legend, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis, type DotItemDotProps } from 'recharts';
import { seriesColour, sweepChartData } from './chart-data';

/**
 * A dot per known cell: a hollow ochre-rimmed square where a closed form gives the value, a small disc
 * otherwise. Recharts calls it for every point, known or not, so a missing value draws nothing.
 */
function cellDot(rows: number, colour: string) {
  return function CellDot(props: DotItemDotProps) {
    const { cx, cy, payload, index } = props;
    if (cx === undefined || cy === undefined || cx === null || cy === null || payload?.[`u${rows}`] === null || payload?.[`u${rows}`] === undefined) return <g key={index} />;
    if (payload[`f${rows}`] === true) {
      return <rect key={index} x={Number(cx) - 4.5} y={Number(cy) - 4.5} width={9} height={9} fill="#f6f3ec" stroke="#c98a3a" strokeWidth={2.5} data-formula="true" />;
    }
    return <circle key={index} cx={cx} cy={cy} r={3} fill={colour} />;
  };
}

/**
 * The sweep drawn against the column count: per row count, a solid line through the upper bound (the
 * value where it is exact) and a dashed one through the lower bound, in the same colour; where both meet,
 * the value is known. Loaded on its own so the charting code stays out of the first page.
 */
export default function SweepChart({ view }: { view: SweepView }) {
  const data = useMemo(() => sweepChartData(view), [view]);
  return (
    <figure className="space-y-2" aria-label={`Chart of ${view.sweep.name}: rank number bounds against the column count, one series per row count`}>
      <div className="h-80 w-full">
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={data.points} margin={{ top: 8, right: 16, bottom: 8, left: 0 }}>
            <CartesianGrid stroke="#d9d0bd" strokeDasharray="2 4" />
            <XAxis dataKey="cols" type="number" domain={['dataMin', 'dataMax']} allowDecimals={false} stroke="#3f5a55" label={{ value: 'columns', position: 'insideBottomRight', offset: -4, fill: '#3f5a55' }} />
            <YAxis allowDecimals={false} stroke="#3f5a55" width={40} label={{ value: 'rank number', angle: -90, position: 'insideLeft', fill: '#3f5a55' }} />
            <Tooltip
              contentStyle={{ background: '#f6f3ec', border: '1px solid #d9d0bd', borderRadius: 6, fontSize: 12 }}
              labelFormatter={(c) => `${c} columns`}
              formatter={(value, name) => [value, name]}
            />
            <Legend wrapperStyle={{ fontSize: 12 }} />
            {data.rowCounts.flatMap((r, i) => [
              <Line
                key={`u${r}`}
                dataKey={`u${r}`}
                name={`${r} row${r === 1 ? '' : 's'}`}
                stroke={seriesColour(i)}
                strokeWidth={2}
                dot={cellDot(r, seriesColour(i))}
                connectNulls={false}
                isAnimationActive={false}
              />,
              <Line
                key={`l${r}`}
                dataKey={`l${r}`}
                name={`${r} row${r === 1 ? '' : 's'}, lower`}
                stroke={seriesColour(i)}
                strokeWidth={1.5}
                strokeDasharray="4 3"
                dot={false}
                legendType="none"
                connectNulls={false}
                isAnimationActive={false}
              />,
            ])}
            {data.curveRows.map((r) => (
              <Line
                key={`c${r}`}
                dataKey={`c${r}`}
                name={`${r} row${r === 1 ? '' : 's'}, closed form`}
                stroke="#c98a3a"
                strokeWidth={1.5}
                strokeDasharray="1 3"
                strokeLinecap="round"
                dot={false}
                connectNulls={false}
                isAnimationActive={false}
                data-testid={`closed-form-curve-${r}`}
              />
            ))}
          </LineChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="text-sm text-lichen-700">
        Solid: upper bound (the value where exact). Dashed: lower bound. Where they meet the value is known.
        {data.curveRows.length > 0 ? ' Dotted ochre: the closed form, where one is published.' : ''}{' '}
        <span className="inline-flex items-center gap-1">
          <span className="inline-block h-2.5 w-2.5 border-2 border-ochre-500 bg-stone-50" aria-hidden="true" /> a closed form gives the value
        </span>
        {data.formulaCells > 0 ? ` (${data.formulaCells} cell${data.formulaCells === 1 ? '' : 's'}).` : '.'}
      </figcaption>
    </figure>
  );
}
