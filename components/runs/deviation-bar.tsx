/**
 * Where a value sits between its limits: the tolerance zone, the guard bands of U at each
 * limit (ISO 14253-1 default rule), and a mark at the value. Text beside it says the same.
 */
export function DeviationBar({ value, lower, upper, U }: { value: number | null; lower: number | null; upper: number | null; U: number | null }) {
  if (value === null || upper === null) return <span className="text-caption text-ink-faint">—</span>;
  const lo = lower ?? 0;
  const span = upper - lo;
  if (!(span > 0)) return <span className="text-caption text-ink-faint">—</span>;
  const min = lo - span * 0.25;
  const max = upper + span * 0.25;
  const pos = (v: number) => `${Math.max(0, Math.min(100, ((v - min) / (max - min)) * 100))}%`;
  const u = U ?? 0;
  return (
    <div className="relative h-4 w-40 rounded-sm bg-sunken" role="img" aria-label={`value ${value.toFixed(4)} between ${lo.toFixed(4)} and ${upper.toFixed(4)}`}>
      <div className="absolute inset-y-0 bg-status-conforming/25" style={{ left: pos(lo), width: `calc(${pos(upper)} - ${pos(lo)})` }} />
      {u > 0 ? <>
        {lower !== null ? <div className="absolute inset-y-0 bg-status-marginal/40" style={{ left: pos(lo), width: `calc(${pos(lo + u)} - ${pos(lo)})` }} /> : null}
        <div className="absolute inset-y-0 bg-status-marginal/40" style={{ left: pos(upper - u), width: `calc(${pos(upper)} - ${pos(upper - u)})` }} />
      </> : null}
      <div className="absolute inset-y-[-2px] w-0.5 bg-ink" style={{ left: pos(value) }} />
    </div>
  );
}
