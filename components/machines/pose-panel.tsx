'use client';
/**
 * Try a pose on the machine's current version: axis values → tip and tool axis
 * (forward), or tip and tool axis → every solution with the chosen one marked,
 * or the reason in words (inverse). The server runs the engine.
 */
import { useState } from 'react';
import { api, errorMessage } from '@/components/programs/client/api';
import type { FkResult, IkResult } from '@/lib/server/machines/try-pose';

const numbers = (s: string) => s.split(/[\s,]+/).filter(Boolean).map(Number);
const fmt = (v: readonly number[]) => v.map((n) => n.toFixed(4)).join(', ');

export function PosePanel({ machineId, axisWords }: { machineId: string; axisWords: string[] }) {
  const [axes, setAxes] = useState<Record<string, string>>(Object.fromEntries(axisWords.map((w) => [w, '0'])));
  const [probeLength, setProbeLength] = useState('0');
  const [tip, setTip] = useState('0, 0, 0');
  const [axis, setAxis] = useState('0, 0, 1');
  const [fk, setFk] = useState<FkResult | null>(null);
  const [ik, setIk] = useState<IkResult | null>(null);
  const [error, setError] = useState<string | null>(null);

  const runFk = async () => {
    setError(null);
    try { setFk(await api<FkResult>(`/api/machines/${machineId}/pose`, { body: { mode: 'fk', axes: Object.fromEntries(Object.entries(axes).map(([k, v]) => [k, Number(v)])), probeLengthMm: Number(probeLength) } })); } catch (e) { setError(errorMessage(e)); }
  };
  const runIk = async () => {
    setError(null);
    try { setIk(await api<IkResult>(`/api/machines/${machineId}/pose`, { body: { mode: 'ik', tip: numbers(tip), axis: numbers(axis), probeLengthMm: Number(probeLength) } })); } catch (e) { setError(errorMessage(e)); }
  };

  return (
    <section className="card space-y-4 p-4" aria-label="Try a pose">
      <h2 className="text-title">Try a pose</h2>
      <div className="max-w-xs"><label className="field-label" htmlFor="pose-probe">Probe length (mm)</label><input id="pose-probe" className="field-input" value={probeLength} onChange={(e) => setProbeLength(e.target.value)} /></div>
      <div className="grid gap-6 lg:grid-cols-2">
        <div className="space-y-2">
          <h3 className="font-semibold">Axis values → tip and tool axis</h3>
          <div className="grid grid-cols-5 gap-2">
            {axisWords.map((w) => <div key={w}><label className="text-caption text-ink-muted" htmlFor={`pose-${w}`}>{w}</label><input id={`pose-${w}`} className="field-input" value={axes[w] ?? ''} onChange={(e) => setAxes({ ...axes, [w]: e.target.value })} /></div>)}
          </div>
          <button type="button" className="btn-secondary" onClick={() => void runFk()}>Compute tip</button>
          {fk ? <p role="status" className="font-mono text-small" data-testid="fk-result">tip {fmt(fk.tip)} · tool axis {fmt(fk.axis)}</p> : null}
        </div>
        <div className="space-y-2">
          <h3 className="font-semibold">Tip and tool axis → axis values</h3>
          <div className="grid grid-cols-2 gap-2">
            <div><label className="text-caption text-ink-muted" htmlFor="pose-tip">Tip x, y, z (part frame)</label><input id="pose-tip" className="field-input" value={tip} onChange={(e) => setTip(e.target.value)} /></div>
            <div><label className="text-caption text-ink-muted" htmlFor="pose-axis">Tool axis i, j, k</label><input id="pose-axis" className="field-input" value={axis} onChange={(e) => setAxis(e.target.value)} /></div>
          </div>
          <button type="button" className="btn-secondary" onClick={() => void runIk()}>Find every solution</button>
          {ik ? (ik.ok ? (
            <table className="data-table" aria-label="Solutions" data-testid="ik-result">
              <thead><tr><th />{axisWords.map((w) => <th key={w}>{w}</th>)}</tr></thead>
              <tbody>{ik.solutions.map((s, i) => (
                <tr key={i} className={i === ik.chosen ? 'bg-brand-soft font-semibold' : ''}>
                  <td>{i === ik.chosen ? '● chosen' : `${i + 1}`}</td>{axisWords.map((w) => <td key={w} className="font-mono tabular-nums">{(s[w] ?? 0).toFixed(4)}</td>)}
                </tr>
              ))}</tbody>
              {ik.singular ? <caption className="caption-bottom text-left text-small">Singular pose: one rotary angle is free and keeps its previous value.</caption> : null}
            </table>
          ) : <p role="alert" className="text-small text-danger" data-testid="ik-result">{ik.message}</p>) : null}
        </div>
      </div>
      {error ? <p role="alert" className="field-error">{error}</p> : null}
    </section>
  );
}
