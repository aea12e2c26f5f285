'use client';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { toast } from 'sonner';
import { postJson } from './post-json';

/** Sends a draft or sent-back revision for review. */
export function SubmitForReviewButton({ revisionId, label = 'Submit for review' }: { revisionId: string; label?: string }) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  async function submit() {
    setBusy(true);
    const r = await postJson<{ notified: number }>(`/api/reviews/${revisionId}/submit`);
    setBusy(false);
    if (!r.ok) {
      toast.error(r.message);
      return;
    }
    toast.success(r.data.notified > 0 ? `Sent for review; ${r.data.notified} reviewer${r.data.notified === 1 ? '' : 's'} notified by e-mail.` : 'Sent for review. No other reviewer is in this workspace to notify.');
    router.refresh();
  }
  return <button type="button" className="btn-primary" onClick={submit} disabled={busy}>{busy ? 'Submitting…' : label}</button>;
}
