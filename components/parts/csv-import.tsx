'use client';
/**
 * CSV import with a preview: the server reads the file and reports per row (line,
 * column, what is wrong); nothing is stored until the whole file is valid, or the
 * user explicitly imports only the valid rows.
 */
import { useState } from 'react';
import { toast } from 'sonner';
import type { ImportOutcome } from '@/lib/server/parts/import-features';
import { csvColumns } from '@/lib/csv/columns';
import { api, ApiError, errorMessage } from '@/components/programs/client/api';

export function CsvImport({ partId, onImported }: { partId: string; onImported: () => void }) {
  const [csv, setCsv] = useState<string | null>(null);
  const [fileName, setFileName] = useState('');
  const [report, setReport] = useState<ImportOutcome['report'] | null>(null);
  const [busy, setBusy] = useState(false);

  const send = async (mode: 'preview' | 'all' | 'valid-only', text = csv) => {
    if (!text) return;
    setBusy(true);
    try {
      const out = await api<ImportOutcome>(`/api/parts/${partId}/import`, { body: { csv: text, mode } });
      setReport(out.report);
      if (out.stored) {
        toast.success(`Imported ${out.features} feature(s) and ${out.tolerances} tolerance(s)`);
        setCsv(null); setReport(null); setFileName('');
        onImported();
      }
    } catch (e) {
      const body = e instanceof ApiError ? (e.body as Partial<ImportOutcome> | undefined) : undefined;
      if (body?.report) setReport(body.report);
      toast.error(errorMessage(e));
    } finally { setBusy(false); }
  };

  const onFile = async (file: File | undefined) => {
    if (!file) return;
    const text = await file.text();
    setCsv(text); setFileName(file.name);
    await send('preview', text);
  };

  const issuesByLine = new Map<number, string[]>();
  for (const i of report?.issues ?? []) issuesByLine.set(i.line, [...(issuesByLine.get(i.line) ?? []), `${i.field}: ${i.message}`]);
  const bad = report ? new Set(report.issues.map((i) => i.line)).size : 0;

  return (
    <div className="space-y-3" aria-label="Import features from CSV">
      <p className="text-small text-ink-muted">Columns: <code className="font-mono text-caption">{csvColumns.join(', ')}</code>. One feature or tolerance a row; a tolerance names its feature by label.</p>
      <label className="btn-secondary cursor-pointer">
        Choose a CSV file
        <input type="file" accept=".csv,text/csv" className="sr-only" aria-label="CSV file" onChange={(e) => void onFile(e.target.files?.[0])} />
      </label>
      {fileName ? <span className="ml-2 text-small">{fileName}</span> : null}
      {report ? (
        <div className="space-y-2">
          {report.fileIssues.map((i) => <p key={`${i.line}-${i.field}`} className="field-error" role="alert">Line {i.line}, {i.field}: {i.message}</p>)}
          {report.rows.length > 0 ? (
            <>
              <p role="status" className={bad > 0 ? 'text-small font-medium text-danger' : 'text-small font-medium text-brand'}>
                {bad > 0 ? `${bad} row(s) have problems; nothing has been imported.` : `All ${report.rows.length} rows are valid.`}
              </p>
              <div className="max-h-80 overflow-auto rounded border border-line">
                <table className="data-table" aria-label="Import preview">
                  <thead><tr><th>Line</th><th>Record</th><th>Label</th><th>Summary</th><th>Problems</th></tr></thead>
                  <tbody>
                    {report.rows.map((r) => (
                      <tr key={r.line} data-ok={r.ok ? 'true' : 'false'} className={r.ok ? '' : 'bg-danger-soft'}>
                        <td className="tabular-nums">{r.line}</td><td>{r.record}</td><td className="font-mono">{r.label}</td><td>{r.summary}</td>
                        <td>{r.ok ? <span aria-label="valid">✓ valid</span> : <ul>{(issuesByLine.get(r.line) ?? []).map((m) => <li key={m}>✗ {m}</li>)}</ul>}</td>
                      </tr>
                    ))}
                  </tbody>
                </table>
              </div>
              <div className="flex flex-wrap gap-2">
                <button type="button" className="btn-primary" disabled={busy || bad > 0} onClick={() => void send('all')}>Import all rows</button>
                {bad > 0 && bad < report.rows.length ? (
                  <button type="button" className="btn-secondary" disabled={busy} onClick={() => void send('valid-only')}>Import only the {report.rows.length - report.rows.filter((r) => !r.ok).length} valid rows</button>
                ) : null}
              </div>
            </>
          ) : null}
        </div>
      ) : null}
    </div>
  );
}
