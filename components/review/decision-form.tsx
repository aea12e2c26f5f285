'use client';
/** Approve or send back, with a comment (required to send back). The server decides who may. */
import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useForm } from 'react-hook-form';
import { toast } from 'sonner';
import { z } from 'zod';
import { postJson } from './post-json';

const formSchema = z.object({ comment: z.string().trim().max(2000, 'at most 2000 characters') });
type FormValues = z.infer<typeof formSchema>;

export function DecisionForm({ revisionId, approveBlocked }: { revisionId: string; approveBlocked: string | null }) {
  const router = useRouter();
  const { register, handleSubmit, setError, formState: { errors, isSubmitting } } = useForm<FormValues>({ resolver: zodResolver(formSchema), defaultValues: { comment: '' } });

  const decide = (decision: 'approve' | 'send-back') => handleSubmit(async ({ comment }) => {
    if (decision === 'send-back' && comment.length < 3) {
      setError('comment', { message: 'Say what needs to change before sending it back.' });
      return;
    }
    const r = await postJson<{ status: string }>(`/api/reviews/${revisionId}/decision`, { decision, comment: comment || undefined });
    if (!r.ok) {
      if (r.path?.endsWith('comment')) setError('comment', { message: r.message });
      toast.error(r.message);
      return;
    }
    toast.success(decision === 'approve' ? 'Approved. The revision is locked and the author was told.' : 'Sent back to the author with your comment.');
    router.refresh();
  });

  return (
    <form className="card space-y-3 p-4" onSubmit={(e) => e.preventDefault()} aria-label="Review decision">
      <div>
        <label htmlFor="review-comment" className="field-label">Comment</label>
        <textarea id="review-comment" rows={3} className="field-input" aria-invalid={errors.comment ? true : undefined}
          placeholder="What you checked, or what must change" {...register('comment')} />
        {errors.comment ? <p className="field-error" role="alert">{errors.comment.message}</p> : null}
      </div>
      {approveBlocked ? <p className="text-small text-danger" role="note">{approveBlocked}</p> : null}
      <div className="flex flex-wrap gap-2">
        <button type="button" className="btn-primary" disabled={isSubmitting} onClick={decide('approve')}>Approve</button>
        <button type="button" className="btn-danger" disabled={isSubmitting} onClick={decide('send-back')}>Send back</button>
      </div>
    </form>
  );
}
