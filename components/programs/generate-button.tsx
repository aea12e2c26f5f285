'use client';
/**
 * Generate / regenerate: streams the server's stages (planning, posting,
 * verifying, storing) so a large part shows where it is, then reports the new
 * revision and any plan warnings by feature label.
 */
import { useEffect, useRef, useState } from 'react';
import { toast } from 'sonner';
import type { Generated } from '@/lib/server/programs/generate-revision';

type Line = { stage: string; detail?: string; revision?: Generated; error?: { message: string } };
const stageWords: Record<string, string> = { loading: 'Loading part, probe and machine', planning: 'Planning touch points', posting: 'Writing the program', verifying: 'Verifying the text', storing: 'Storing the revision' };

export function GenerateButton({ programId, label, auto = false, onDone }: { programId: string; label: string; auto?: boolean; onDone: (g: Generated) => void }) {
  const [stage, setStage] = useState<string | null>(null);
  const [warnings, setWarnings] = useState<Generated['warnings']>([]);
  const started = useRef(false);

  const run = async () => {
    setStage('loading'); setWarnings([]);
    try {
      const res = await fetch(`/api/programs/${programId}/generate`, { method: 'POST', headers: { Accept: 'application/x-ndjson', 'Content-Type': 'application/json' }, body: JSON.stringify({ message: 'regenerated' }) });
      if (!res.ok || !res.body) {
        const body = (await res.json().catch(() => null)) as { error?: { message?: string } } | null;
        throw new Error(body?.error?.message ?? `The server answered ${res.status}.`);
      }
      const reader = res.body.getReader();
      const decoder = new TextDecoder();
      let buffer = '';
      for (;;) {
        const { value, done } = await reader.read();
        if (done) break;
        buffer += decoder.decode(value, { stream: true });
        let nl: number;
        while ((nl = buffer.indexOf('\n')) >= 0) {
          const line = JSON.parse(buffer.slice(0, nl)) as Line;
          buffer = buffer.slice(nl + 1);
          if (line.stage === 'error') throw new Error(line.error?.message ?? 'Generation failed.');
          if (line.stage === 'done' && line.revision) {
            setWarnings(line.revision.warnings);
            toast.success(`Revision ${line.revision.number} generated: ${line.revision.touchPoints} touch points`);
            onDone(line.revision);
          } else setStage(line.detail ? `${stageWords[line.stage] ?? line.stage} (${line.detail})` : stageWords[line.stage] ?? line.stage);
        }
      }
    } catch (e) {
      toast.error(e instanceof Error ? e.message : 'Generation failed.');
    } finally { setStage(null); }
  };

  useEffect(() => {
    if (auto && !started.current) { started.current = true; void run(); }
    // run once on mount when asked
  });

  return (
    <div className="space-y-2">
      <button type="button" className="btn-primary" disabled={stage !== null} onClick={() => void run()}>{stage ? 'Working…' : label}</button>
      {stage ? <p role="status" aria-live="polite" className="text-small text-ink-muted"><span className="mr-2 inline-block h-3 w-3 animate-spin rounded-full border-2 border-brand border-t-transparent align-middle" />{stage}…</p> : null}
      {warnings.length > 0 ? (
        <div role="alert" className="rounded border border-status-marginal bg-status-marginal/10 p-2 text-small">
          <p className="font-semibold">▲ Plan warnings</p>
          <ul>{warnings.map((w, i) => <li key={i}>Feature {w.label ?? '?'}: {w.message}</li>)}</ul>
        </div>
      ) : null}
    </div>
  );
}
