'use client';
/** A run chart (recharts): each real run's value in time order, the limits and the mean. */
import { CartesianGrid, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { Trend } from '@/lib/trends/series';

export function RunChart({ trend }: { trend: Trend }) {
  const data = trend.points.map((p) => ({ index: p.index, value: p.value, serial: p.serial ?? '' }));
  const { lower, upper } = trend.limits;
  const values = [...data.map((d) => d.value), ...(lower !== null ? [lower] : []), ...(upper !== null ? [upper] : [])];
  const lo = Math.min(...values);
  const hi = Math.max(...values);
  const pad = (hi - lo) * 0.1 || 0.001;
  return (
    <div className="h-56 w-full" data-testid="run-chart" data-points={data.length}>
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={data} margin={{ top: 8, right: 24, bottom: 8, left: 8 }}>
          <CartesianGrid stroke="#D6DAD2" strokeDasharray="3 3" />
          <XAxis dataKey="index" type="number" domain={[1, Math.max(2, data.length)]} allowDecimals={false} label={{ value: 'run', position: 'insideBottomRight', offset: -4 }} />
          <YAxis domain={[lo - pad, hi + pad]} tickFormatter={(v: number) => v.toFixed(4)} width={72} />
          <Tooltip formatter={(v) => (typeof v === 'number' ? v.toFixed(4) : String(v))} labelFormatter={(l) => `run ${String(l)}`} />
          {upper !== null ? <ReferenceLine y={upper} stroke="#D55E00" strokeWidth={2} label={{ value: `upper ${upper.toFixed(4)}`, position: 'insideTopRight', fill: '#1A201B' }} /> : null}
          {lower !== null ? <ReferenceLine y={lower} stroke="#D55E00" strokeWidth={2} label={{ value: `lower ${lower.toFixed(4)}`, position: 'insideBottomRight', fill: '#1A201B' }} /> : null}
          {trend.stats.mean !== null ? <ReferenceLine y={trend.stats.mean} stroke="#0072B2" strokeDasharray="6 4" label={{ value: 'mean', position: 'insideLeft', fill: '#1A201B' }} /> : null}
          <Line type="linear" dataKey="value" stroke="#1A201B" strokeWidth={1.5} dot={{ r: 3 }} isAnimationActive={false} />
        </LineChart>
      </ResponsiveContainer>
    </div>
  );
}
