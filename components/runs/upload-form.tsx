'use client';
/**
 * Results upload: drag and drop (or choose) the control's output, with serial, part
 * temperature and the revision (its machine shown). Sent with XMLHttpRequest for the
 * progress bar. A refused file lists every problem by line; nothing was stored.
 */
import { useRouter } from 'next/navigation';
import { useRef, useState, type DragEvent, type FormEvent } from 'react';
import { toast } from 'sonner';

export interface UploadChoice { id: string; label: string; machineName: string }
interface Problem { line: number | null; code: string; message: string }

const MAX_BYTES = 2 * 1024 * 1024;

function send(form: FormData, onProgress: (p: number) => void): Promise<{ status: number; body: unknown }> {
  return new Promise((resolve) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', '/api/runs');
    xhr.upload.onprogress = (e) => { if (e.lengthComputable) onProgress(e.loaded / e.total); };
    xhr.onload = () => { let body: unknown = null; try { body = JSON.parse(xhr.responseText); } catch { /* not JSON */ } resolve({ status: xhr.status, body }); };
    xhr.onerror = () => resolve({ status: 0, body: null });
    xhr.send(form);
  });
}

export function UploadForm({ choices, defaultRevisionId }: { choices: UploadChoice[]; defaultRevisionId?: string }) {
  const router = useRouter();
  const input = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [over, setOver] = useState(false);
  const [progress, setProgress] = useState<number | null>(null);
  const [problems, setProblems] = useState<Problem[]>([]);
  const [message, setMessage] = useState<string | null>(null);
  const [revisionId, setRevisionId] = useState(defaultRevisionId ?? choices[0]?.id ?? '');
  const machine = choices.find((c) => c.id === revisionId)?.machineName ?? '—';

  function pick(f: File | undefined) {
    setProblems([]); setMessage(null);
    if (!f) return;
    if (f.size > MAX_BYTES) { setMessage(`${f.name} is ${(f.size / 1024 / 1024).toFixed(1)} MiB; the limit is 2 MiB.`); return; }
    setFile(f);
  }
  function drop(e: DragEvent) { e.preventDefault(); setOver(false); pick(e.dataTransfer.files[0]); }

  async function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    if (!file) { setMessage('Choose or drop the result file first.'); return; }
    const form = new FormData(e.currentTarget);
    form.set('file', file);
    setProgress(0); setProblems([]); setMessage(null);
    const { status, body } = await send(form, setProgress);
    setProgress(null);
    const b = body as { runId?: string; error?: { message?: string }; problems?: Problem[]; moreProblems?: number; warnings?: string[] } | null;
    if (status === 201 && b?.runId) {
      toast.success('Results stored and evaluated.');
      router.push(`/runs/${b.runId}`);
      return;
    }
    setMessage(b?.error?.message ?? (status === 0 ? 'The server could not be reached.' : `Upload refused (HTTP ${status}).`));
    setProblems(b?.problems ?? []);
  }

  return (
    <form className="card space-y-4 p-4" onSubmit={submit} aria-label="Upload results">
      <div className="grid gap-3 sm:grid-cols-2">
        <label className="block"><span className="field-label">Approved revision that ran</span>
          <select name="revisionId" className="field-input" value={revisionId} onChange={(e) => setRevisionId(e.target.value)} required>
            {choices.map((c) => <option key={c.id} value={c.id}>{c.label}</option>)}
          </select>
        </label>
        <div><span className="field-label">Machine</span><p className="py-2 text-body" data-testid="upload-machine">{machine}</p></div>
        <label className="block"><span className="field-label">Part serial or lot</span><input name="serial" className="field-input" required maxLength={80} /></label>
        <label className="block"><span className="field-label">Part temperature (°C, optional)</span><input name="temperatureC" className="field-input" inputMode="decimal" /></label>
      </div>
      <details className="text-small">
        <summary className="cursor-pointer">Work offset G54 as it is on the control now (for absolute correction lines)</summary>
        <div className="mt-2 grid grid-cols-3 gap-2">
          {(['X', 'Y', 'Z'] as const).map((a) => <label key={a}><span className="field-label">{a}</span><input name={`offset${a}`} className="field-input" inputMode="decimal" placeholder="0" /></label>)}
        </div>
      </details>
      <div
        role="button" tabIndex={0} aria-label="Result file: drop it here or press to choose"
        onClick={() => input.current?.click()} onKeyDown={(e) => { if (e.key === 'Enter' || e.key === ' ') input.current?.click(); }}
        onDragOver={(e) => { e.preventDefault(); setOver(true); }} onDragLeave={() => setOver(false)} onDrop={drop}
        className={`flex min-h-28 flex-col items-center justify-center rounded-card border-2 border-dashed p-4 text-center text-small ${over ? 'border-brand bg-brand-soft' : 'border-line-strong'}`}
        data-testid="drop-zone"
      >
        <input ref={input} type="file" className="sr-only" accept=".txt,.log,.csv,.nc,.ngc,text/plain,text/csv" onChange={(e) => pick(e.target.files?.[0])} data-testid="results-file" />
        {file ? <span><strong>{file.name}</strong> · {(file.size / 1024).toFixed(1)} KiB</span> : <span>Drop the control&apos;s output here — the ngc log, the iso-skip print-out or a uuid,x,y,z CSV — or press to choose it.</span>}
      </div>
      {progress !== null ? <progress className="w-full" max={1} value={progress} aria-label="Upload progress">{Math.round(progress * 100)} %</progress> : null}
      {message ? <div role="alert" data-testid="upload-message" className="rounded-control border border-danger bg-danger-soft p-3 text-small text-danger">
        <p className="font-semibold">{message}</p>
        {problems.length > 0 ? <ul className="mt-2 max-h-64 list-disc overflow-y-auto pl-5" data-testid="upload-problems">{problems.map((p, i) => <li key={i}>{p.message}</li>)}</ul> : null}
      </div> : null}
      <button type="submit" className="btn-primary" disabled={progress !== null || choices.length === 0}>Upload and evaluate</button>
    </form>
  );
}
