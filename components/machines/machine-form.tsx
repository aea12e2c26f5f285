'use client';
/**
 * Every parameter of a machine model (spec/engine-cli.md): each rotary's letter,
 * carrier, direction (its positive sense), point, limits or continuous; linear
 * travel; the part set-up; the head pivot distance; the post-processor. Checked
 * with the same zod schema the server uses.
 */
import { useFieldArray, useForm, type FieldErrors, type FieldPath } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { machineRecordSchema, type MachineRecord, type MachineRecordInput } from '@/lib/validation/machines';

type Props = { initial: MachineRecordInput; posts: string[]; submitLabel: string; onSubmit: (m: MachineRecord) => Promise<void>; readOnly?: boolean };

function errorAt(errors: FieldErrors<MachineRecordInput>, path: string): string | undefined {
  let node: unknown = errors;
  for (const key of path.split('.')) node = node && typeof node === 'object' ? (node as Record<string, unknown>)[key] : undefined;
  const msg = node && typeof node === 'object' ? (node as { message?: unknown; root?: { message?: unknown } }).message ?? (node as { root?: { message?: unknown } }).root?.message : undefined;
  return typeof msg === 'string' ? msg : undefined;
}

export function MachineForm({ initial, posts, submitLabel, onSubmit, readOnly = false }: Props) {
  const form = useForm<MachineRecordInput, unknown, MachineRecord>({ resolver: zodResolver(machineRecordSchema), defaultValues: initial });
  const { register, handleSubmit, control, watch, setValue, formState: { errors, isSubmitting } } = form;
  const rotaries = useFieldArray({ control, name: 'rotaries' });
  const num = (path: FieldPath<MachineRecordInput>, label: string) => {
    const msg = errorAt(errors, path);
    const id = `m-${path.replace(/\./g, '-')}`;
    return (
      <div className="min-w-0">
        <label className="text-caption text-ink-muted" htmlFor={id}>{label}</label>
        <input id={id} type="number" step="any" disabled={readOnly} className="field-input" aria-invalid={msg ? 'true' : 'false'} {...register(path, { valueAsNumber: true })} />
        {msg ? <p className="field-error" role="alert">{msg}</p> : null}
      </div>
    );
  };
  const vec = (path: string, label: string) => (
    <fieldset><legend className="field-label">{label}</legend>
      <div className="grid grid-cols-3 gap-2">{['X', 'Y', 'Z'].map((a, i) => <div key={a}>{num(`${path}.${i}` as FieldPath<MachineRecordInput>, a)}</div>)}</div>
      {errorAt(errors, path) ? <p className="field-error" role="alert">{errorAt(errors, path)}</p> : null}
    </fieldset>
  );
  return (
    <form onSubmit={handleSubmit(onSubmit)} className="space-y-5" aria-label="Machine model" noValidate>
      <div className="grid gap-3 sm:grid-cols-3">
        <div><label className="field-label" htmlFor="m-name">Name</label><input id="m-name" disabled={readOnly} className="field-input" aria-invalid={errors.name ? 'true' : 'false'} {...register('name')} />{errors.name ? <p className="field-error" role="alert">{errors.name.message}</p> : null}</div>
        <div><label className="field-label" htmlFor="m-post">Controller dialect (post)</label><select id="m-post" disabled={readOnly} className="field-input" {...register('post')}>{posts.map((p) => <option key={p}>{p}</option>)}</select>{errors.post ? <p className="field-error" role="alert">{errors.post.message}</p> : null}</div>
        {num('headPivotMm', 'Head pivot above the gauge line (mm)')}
      </div>
      <section aria-label="Rotary axes" className="space-y-3">
        <h3 className="text-title">Rotary axes (bed outward)</h3>
        {errorAt(errors, 'rotaries') ? <p className="field-error" role="alert">{errorAt(errors, 'rotaries')}</p> : null}
        {rotaries.fields.map((field, i) => {
          const continuous = watch(`rotaries.${i}.min`) === null;
          return (
            <fieldset key={field.id} className="rounded border border-line p-3" aria-label={`Rotary ${i + 1}`}>
              <div className="grid gap-3 sm:grid-cols-4">
                <div><label className="field-label" htmlFor={`m-r${i}-name`}>Letter</label><select id={`m-r${i}-name`} disabled={readOnly} className="field-input" {...register(`rotaries.${i}.name`)}><option>A</option><option>B</option><option>C</option></select></div>
                <div><label className="field-label" htmlFor={`m-r${i}-carrier`}>Carried by</label><select id={`m-r${i}-carrier`} disabled={readOnly} className="field-input" {...register(`rotaries.${i}.carrier`)}><option value="table">table</option><option value="head">head</option></select></div>
                <label className="flex items-end gap-2 text-small"><input type="checkbox" disabled={readOnly} checked={continuous} onChange={(e) => { setValue(`rotaries.${i}.min`, e.target.checked ? null : -180); setValue(`rotaries.${i}.max`, e.target.checked ? null : 180); }} /> continuous</label>
                {!readOnly ? <button type="button" className="btn-danger self-end" onClick={() => rotaries.remove(i)}>Remove axis</button> : null}
              </div>
              <div className="mt-2 grid gap-3 sm:grid-cols-2">
                {vec(`rotaries.${i}.direction`, 'Direction (positive turn by the right-hand rule)')}
                {vec(`rotaries.${i}.point`, 'Point on the axis (mm; head axes from the pivot)')}
              </div>
              {!continuous ? <div className="mt-2 grid max-w-md grid-cols-2 gap-3">{num(`rotaries.${i}.min`, 'Min (°)')}{num(`rotaries.${i}.max`, 'Max (°)')}</div> : null}
              {!readOnly ? <button type="button" className="mt-2 text-small text-brand hover:underline" onClick={() => { const d = watch(`rotaries.${i}.direction`); setValue(`rotaries.${i}.direction`, [-d[0], -d[1], -d[2]], { shouldDirty: true }); }}>Reverse the sense</button> : null}
            </fieldset>
          );
        })}
        {!readOnly && rotaries.fields.length < 2 ? <button type="button" className="btn-secondary" onClick={() => rotaries.append({ name: 'C', carrier: 'table', direction: [0, 0, 1], point: [0, 0, 0], min: null, max: null })}>Add a rotary axis</button> : null}
      </section>
      <section aria-label="Linear travel"><h3 className="mb-2 text-title">Linear travel of the tip (mm)</h3>
        <div className="grid gap-3 sm:grid-cols-3">{(['X', 'Y', 'Z'] as const).map((a) => <div key={a} className="grid grid-cols-2 gap-2">{num(`linear.${a}.0`, `${a} min`)}{num(`linear.${a}.1`, `${a} max`)}</div>)}</div>
      </section>
      <section aria-label="Part set-up" className="grid gap-3 sm:grid-cols-3">
        {vec('setup.origin', 'Part origin in the machine (mm)')}{vec('setup.xAxis', 'Part X axis')}{vec('setup.zAxis', 'Part Z axis')}
      </section>
      <div><label className="field-label" htmlFor="m-notes">Notes</label><textarea id="m-notes" rows={2} disabled={readOnly} className="field-input" {...register('notes')} /></div>
      {!readOnly ? <button type="submit" className="btn-primary" disabled={isSubmitting}>{isSubmitting ? 'Saving…' : submitLabel}</button> : null}
    </form>
  );
}
