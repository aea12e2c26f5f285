'use client';
/** Create a program: part, machine, probe (stale calibrations flagged) and post. */
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { toast } from 'sonner';
import { createProgramSchema, type CreateProgram } from '@/lib/validation/programs';
import { api, errorMessage, fieldOfError } from './client/api';

export type ProgramChoices = {
  parts: { id: string; label: string }[];
  machines: { id: string; name: string; post: string }[];
  probes: { id: string; name: string; warning: string | null }[];
  posts: string[];
};

export function NewProgramForm({ choices }: { choices: ProgramChoices }) {
  const router = useRouter();
  const form = useForm<CreateProgram>({
    resolver: zodResolver(createProgramSchema),
    defaultValues: { name: '', partId: choices.parts[0]?.id ?? '', machineId: choices.machines[0]?.id ?? '', probeId: choices.probes[0]?.id ?? '', post: choices.machines[0]?.post ?? choices.posts[0] ?? '' },
  });
  const { register, handleSubmit, watch, setValue, formState: { errors, isSubmitting } } = form;
  const probe = choices.probes.find((p) => p.id === watch('probeId'));
  const submit = handleSubmit(async (values) => {
    try {
      const { id } = await api<{ id: string }>('/api/programs', { body: values });
      toast.success('Program created: generating revision 1');
      router.push(`/programs/${id}?generate=1`);
    } catch (e) {
      const f = fieldOfError(e);
      if (f && f in values) form.setError(f as keyof CreateProgram, { message: errorMessage(e) });
      toast.error(errorMessage(e));
    }
  });
  const err = (k: keyof CreateProgram) => (errors[k] ? <p className="field-error" role="alert">{errors[k]?.message}</p> : null);
  return (
    <form onSubmit={submit} className="grid gap-3 sm:grid-cols-2" aria-label="New program" noValidate>
      <div className="sm:col-span-2">
        <label className="field-label" htmlFor="prog-name">Program name</label>
        <input id="prog-name" className="field-input" {...register('name')} aria-invalid={errors.name ? 'true' : 'false'} />{err('name')}
      </div>
      <div>
        <label className="field-label" htmlFor="prog-part">Part</label>
        <select id="prog-part" className="field-input" {...register('partId')}>{choices.parts.map((p) => <option key={p.id} value={p.id}>{p.label}</option>)}</select>{err('partId')}
      </div>
      <div>
        <label className="field-label" htmlFor="prog-machine">Machine</label>
        <select id="prog-machine" className="field-input" {...register('machineId', { onChange: (e) => { const m = choices.machines.find((x) => x.id === e.target.value); if (m) setValue('post', m.post); } })}>
          {choices.machines.map((m) => <option key={m.id} value={m.id}>{m.name}</option>)}
        </select>{err('machineId')}
      </div>
      <div>
        <label className="field-label" htmlFor="prog-probe">Probe</label>
        <select id="prog-probe" className="field-input" {...register('probeId')}>{choices.probes.map((p) => <option key={p.id} value={p.id}>{p.name}{p.warning ? ' ⚠ calibration' : ''}</option>)}</select>{err('probeId')}
        {probe?.warning ? <p className="mt-1 text-small text-ink" role="status"><span aria-hidden className="text-status-marginal">▲</span> Calibration warning: {probe.warning}</p> : null}
      </div>
      <div>
        <label className="field-label" htmlFor="prog-post">Post-processor</label>
        <select id="prog-post" className="field-input" {...register('post')}>{choices.posts.map((p) => <option key={p} value={p}>{p}</option>)}</select>{err('post')}
      </div>
      <div className="sm:col-span-2"><button type="submit" className="btn-primary" disabled={isSubmitting}>{isSubmitting ? 'Creating…' : 'Create and generate'}</button></div>
    </form>
  );
}
