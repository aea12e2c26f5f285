'use client';
/** Create or edit a part's header (number, revision, name, material, notes). */
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { toast } from 'sonner';
import { partHeaderSchema, type PartHeader, type PartHeaderInput } from '@/lib/validation/parts';
import { api, errorMessage, fieldOfError } from '@/components/programs/client/api';

type Props = { partId?: string; initial?: PartHeaderInput; onSaved: (id: string) => void; submitLabel?: string };

const fields: { name: keyof PartHeaderInput; label: string; hint?: string }[] = [
  { name: 'number', label: 'Part number' },
  { name: 'revision', label: 'Drawing revision' },
  { name: 'name', label: 'Name' },
  { name: 'material', label: 'Material', hint: 'for temperature correction, e.g. aluminium 6061' },
];

export function PartHeaderForm({ partId, initial, onSaved, submitLabel = 'Save part' }: Props) {
  const form = useForm<PartHeaderInput, unknown, PartHeader>({
    resolver: zodResolver(partHeaderSchema),
    defaultValues: initial ?? { number: '', revision: '', name: '', material: '', notes: '' },
  });
  const { register, handleSubmit, formState: { errors, isSubmitting } } = form;
  const submit = handleSubmit(async (values) => {
    try {
      const res = partId
        ? (await api(`/api/parts/${partId}`, { method: 'PUT', body: values }), { id: partId })
        : await api<{ id: string }>('/api/parts', { body: values });
      toast.success(partId ? 'Part saved' : `Part ${values.number} created`);
      onSaved(res.id);
    } catch (e) {
      const field = fieldOfError(e);
      if (field && field in values) form.setError(field as keyof PartHeaderInput, { message: errorMessage(e) });
      toast.error(errorMessage(e));
    }
  });
  return (
    <form onSubmit={submit} className="grid gap-3 sm:grid-cols-2" aria-label={partId ? 'Edit part' : 'New part'} noValidate>
      {fields.map((f) => (
        <div key={f.name}>
          <label className="field-label" htmlFor={`part-${f.name}`}>{f.label}</label>
          <input id={`part-${f.name}`} className="field-input" aria-invalid={errors[f.name] ? 'true' : 'false'} {...register(f.name)} />
          {f.hint ? <p className="mt-1 text-caption text-ink-faint">{f.hint}</p> : null}
          {errors[f.name] ? <p className="field-error" role="alert">{errors[f.name]?.message}</p> : null}
        </div>
      ))}
      <div className="sm:col-span-2">
        <label className="field-label" htmlFor="part-notes">Notes</label>
        <textarea id="part-notes" rows={2} className="field-input" {...register('notes')} />
      </div>
      <div className="sm:col-span-2"><button type="submit" className="btn-primary" disabled={isSubmitting}>{isSubmitting ? 'Saving…' : submitLabel}</button></div>
    </form>
  );
}
