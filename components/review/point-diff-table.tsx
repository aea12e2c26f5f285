/** The point-by-point table beside the text diff: one row per touch point, keyed by UUID. */
import type { PlanDiff, PointChange, PointDiffRow } from '@/lib/program/diff';

const f3 = (v: number) => v.toFixed(3);
const f4 = (v: number) => v.toFixed(4);

function changeText(c: PointChange): string {
  switch (c.kind) {
    case 'moved': return `moved ${f4(c.distanceMm)} mm`;
    case 'direction': return `direction turned ${f3(c.angleDeg)}°`;
    case 'approach': return `start moved ${f4(c.distanceMm)} mm`;
    case 'feeds': return `feeds ${c.from.join('/') || '–'} → ${c.to.join('/') || '–'} mm/min`;
    case 'rotary': return c.axes.map((a) => `${a.word} ${a.from ?? '–'}° → ${a.to ?? '–'}°`).join(', ');
    case 'order': return `order ${c.from} → ${c.to}`;
  }
}

const STATUS_WORD: Record<PointDiffRow['status'], string> = { added: 'Added', removed: 'Removed', changed: 'Changed', unchanged: 'Same' };
const STATUS_MARK: Record<PointDiffRow['status'], string> = { added: '+', removed: '−', changed: '~', unchanged: '=' };

export function PointDiffSummary({ diff }: { diff: PlanDiff }) {
  const s = diff.summary;
  const items: [string, number][] = [
    ['added', s.added], ['removed', s.removed], ['changed', s.changed], ['unchanged', s.unchanged],
    ['moved', s.byKind.moved], ['direction', s.byKind.direction], ['approach', s.byKind.approach],
    ['feeds', s.byKind.feeds], ['rotary', s.byKind.rotary], ['order', s.byKind.order],
  ];
  return (
    <dl className="flex flex-wrap gap-x-4 gap-y-1 text-small" data-testid="point-diff-summary">
      <div className="font-semibold"><dt className="inline">points </dt><dd className="inline">{s.total}</dd></div>
      {items.map(([k, v]) => (
        <div key={k} className={v > 0 ? 'text-ink' : 'text-ink-faint'}><dt className="inline">{k} </dt><dd className="inline font-mono">{v}</dd></div>
      ))}
    </dl>
  );
}

export function PointDiffTable({ diff, labels, changedOnly = false }: { diff: PlanDiff; labels: Record<string, string>; changedOnly?: boolean }) {
  const rows = changedOnly ? diff.rows.filter((r) => r.status !== 'unchanged') : diff.rows;
  return (
    <div className="overflow-x-auto">
      <table className="data-table" data-testid="point-diff-table">
        <thead>
          <tr><th scope="col">Balloon</th><th scope="col">#</th><th scope="col">Touch point</th><th scope="col">What changed</th></tr>
        </thead>
        <tbody>
          {rows.length === 0 ? <tr><td colSpan={4} className="text-ink-muted">No touch point changed.</td></tr> : null}
          {rows.map((r) => (
            <tr key={r.uuid} data-status={r.status}>
              <td>{labels[r.featureUuid] ?? '?'}</td>
              <td className="font-mono">{r.after ?? r.before}</td>
              <td className="font-mono text-caption" title={r.uuid}>{r.uuid.slice(0, 8)}…</td>
              <td>
                <span className="mr-2 inline-block w-20 font-semibold" aria-label={STATUS_WORD[r.status]}>
                  <span aria-hidden="true" className="mr-1 font-mono">{STATUS_MARK[r.status]}</span>{STATUS_WORD[r.status]}
                </span>
                {r.changes.map(changeText).join('; ')}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
