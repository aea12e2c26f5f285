'use client';
/**
 * One part: header, features with their datum letters, tolerances with resolved
 * limits, CSV import and export, and the 3D view. Data through TanStack Query,
 * first paint from the server's copy.
 */
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { toast } from 'sonner';
import type { PartDetail } from '@/db/queries/parts';
import { PartView3D } from '@/components/three/lazy-views';
import { QueryProvider } from '@/components/programs/client/query-provider';
import { api, errorMessage } from '@/components/programs/client/api';
import { FeatureForm } from './feature-form';
import { ToleranceForm } from './tolerance-form';
import { CsvImport } from './csv-import';
import { PartHeaderForm } from './part-header-form';
import { frameText, toleranceText } from './tolerance-text';

type Props = { initial: PartDetail; canEdit: boolean };

function featureSize(f: PartDetail['features'][number]): string {
  switch (f.type) {
    case 'plane': return `${f.size[0]} × ${f.size[1]}`;
    case 'bore': return `⌀${f.diameter} × ${f.depth} deep`;
    case 'boss': return `⌀${f.diameter} × ${f.height} high`;
    case 'slot': case 'web': return `${f.width} × ${f.length} × ${f.depth}`;
    case 'sphere': return `⌀${f.diameter}`;
  }
}
const where = (f: PartDetail['features'][number]) => (f.type === 'plane' ? f.origin : f.center).join(', ');

function Screen({ initial, canEdit }: Props) {
  const qc = useQueryClient();
  const key = ['part', initial.id];
  const { data: part = initial } = useQuery({ queryKey: key, queryFn: async () => (await api<{ part: PartDetail }>(`/api/parts/${initial.id}`)).part, initialData: initial });
  const refresh = () => void qc.invalidateQueries({ queryKey: key });
  const [panel, setPanel] = useState<'none' | 'feature' | 'tolerance' | 'csv' | 'header'>('none');
  const letterOf = new Map(Object.entries(part.datums).map(([l, id]) => [id, l] as const));
  const featureOf = new Map(part.features.map((f) => [f.uuid, f] as const));

  const act = async (what: string, run: () => Promise<unknown>) => {
    try { await run(); toast.success(what); refresh(); } catch (e) { toast.error(errorMessage(e)); }
  };
  const assignDatum = (featureId: string) => {
    const letter = window.prompt('Datum letter for this feature (A–Z):')?.trim().toUpperCase();
    if (letter) void act(`Datum ${letter} assigned`, () => api(`/api/parts/${part.id}/datums`, { method: 'PUT', body: { letter, featureId } }));
  };

  return (
    <div className="space-y-6">
      {canEdit ? (
        <div className="flex flex-wrap gap-2" role="toolbar" aria-label="Part actions">
          <button type="button" className="btn-secondary" onClick={() => setPanel(panel === 'feature' ? 'none' : 'feature')}>Add feature</button>
          <button type="button" className="btn-secondary" onClick={() => setPanel(panel === 'tolerance' ? 'none' : 'tolerance')}>Add tolerance</button>
          <button type="button" className="btn-secondary" onClick={() => setPanel(panel === 'csv' ? 'none' : 'csv')}>Import CSV</button>
          <button type="button" className="btn-secondary" onClick={() => setPanel(panel === 'header' ? 'none' : 'header')}>Edit part details</button>
          <a className="btn-secondary" href={`/api/parts/${part.id}/export`}>Export CSV</a>
        </div>
      ) : <a className="btn-secondary" href={`/api/parts/${part.id}/export`}>Export CSV</a>}
      {panel !== 'none' ? (
        <section className="card p-4">
          {panel === 'feature' ? <FeatureForm partId={part.id} onSaved={refresh} /> : null}
          {panel === 'tolerance' ? <ToleranceForm partId={part.id} features={part.features} datumLetters={Object.keys(part.datums)} onSaved={refresh} /> : null}
          {panel === 'csv' ? <CsvImport partId={part.id} onImported={() => { refresh(); setPanel('none'); }} /> : null}
          {panel === 'header' ? <PartHeaderForm partId={part.id} initial={part} onSaved={() => { refresh(); setPanel('none'); }} /> : null}
        </section>
      ) : null}

      <section className="card overflow-x-auto" aria-label="Features">
        <h2 className="px-3 pt-3 text-title">Features</h2>
        <table className="data-table mt-2">
          <thead><tr><th>Label</th><th>Type</th><th>Datum</th><th>Position (mm)</th><th>Size (mm)</th><th>Points</th>{canEdit ? <th /> : null}</tr></thead>
          <tbody>
            {part.features.length === 0 ? <tr><td colSpan={7} className="text-ink-muted">No features yet.</td></tr> : part.features.map((f) => (
              <tr key={f.uuid}>
                <td className="font-mono font-semibold">{f.label}</td><td>{f.type}</td>
                <td>{letterOf.get(f.uuid) ? <span className="rounded border border-ink px-1.5 font-mono font-bold">{letterOf.get(f.uuid)}</span> : '—'}</td>
                <td className="font-mono tabular-nums">{where(f)}</td><td className="tabular-nums">{featureSize(f)}</td><td>{f.points ?? 'recommended'}</td>
                {canEdit ? (
                  <td className="whitespace-nowrap">
                    <button type="button" className="text-brand hover:underline" onClick={() => assignDatum(f.uuid)}>Set datum</button>{' · '}
                    <button type="button" className="text-danger hover:underline" onClick={() => { if (window.confirm(`Delete feature ${f.label} and its tolerances?`)) void act(`Feature ${f.label} deleted`, () => api(`/api/parts/${part.id}/features/${f.uuid}`, { method: 'DELETE' })); }}>Delete</button>
                  </td>
                ) : null}
              </tr>
            ))}
          </tbody>
        </table>
      </section>

      <section className="card overflow-x-auto" aria-label="Tolerances">
        <h2 className="px-3 pt-3 text-title">Tolerances</h2>
        <table className="data-table mt-2">
          <thead><tr><th>Feature</th><th>Characteristic</th><th>Tolerance</th><th>Resolved limits</th><th>Material · datums</th>{canEdit ? <th /> : null}</tr></thead>
          <tbody>
            {part.tolerances.length === 0 ? <tr><td colSpan={6} className="text-ink-muted">No tolerances yet.</td></tr> : part.tolerances.map((t) => {
              const txt = toleranceText(t, featureOf.get(t.featureUuid));
              return (
                <tr key={t.id}>
                  <td className="font-mono">{featureOf.get(t.featureUuid)?.label ?? '?'}</td><td>{t.characteristic}</td>
                  <td className="font-mono">{txt.text}</td>
                  <td className="font-mono tabular-nums">{txt.error ? <span className="text-danger">{txt.error}</span> : txt.limits}</td>
                  <td>{frameText(t)}</td>
                  {canEdit ? <td><button type="button" className="text-danger hover:underline" onClick={() => void act('Tolerance deleted', () => api(`/api/parts/${part.id}/tolerances/${t.id}`, { method: 'DELETE' }))}>Delete</button></td> : null}
                </tr>
              );
            })}
          </tbody>
        </table>
      </section>

      <section aria-label="3D view of the features">
        <h2 className="mb-2 text-title">3D view</h2>
        <PartView3D features={part.features} />
      </section>
    </div>
  );
}

export function PartScreen(props: Props) {
  return <QueryProvider><Screen {...props} /></QueryProvider>;
}
