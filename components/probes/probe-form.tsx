'use client';
/** A probe's parameters, checked with the server's schema. */
import { useForm, type FieldPath } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { probeRecordSchema, type ProbeRecord, type ProbeRecordInput } from '@/lib/validation/probes';

const numeric: { name: FieldPath<ProbeRecordInput>; label: string }[] = [
  { name: 'stylusDiameter', label: 'Stylus ball diameter (mm)' }, { name: 'lengthMm', label: 'Length, gauge line to ball centre (mm)' },
  { name: 'repeatabilityMm', label: 'Repeatability 2σ (mm)' }, { name: 'approach', label: 'Approach distance (mm)' },
  { name: 'overtravel', label: 'Overtravel (mm)' }, { name: 'clearance', label: 'Clearance (mm)' },
  { name: 'fastFeed', label: 'Fast touch feed (mm/min)' }, { name: 'measureFeed', label: 'Measuring feed (mm/min)' },
];

export const blankProbe: ProbeRecordInput = { name: '', stylusDiameter: 4, lengthMm: 100, repeatabilityMm: 0.001, approach: 5, overtravel: 3, clearance: 20, fastFeed: 500, measureFeed: 50, notes: '' };

export function ProbeForm({ initial, submitLabel, onSubmit }: { initial: ProbeRecordInput; submitLabel: string; onSubmit: (p: ProbeRecord) => Promise<void> }) {
  const { register, handleSubmit, formState: { errors, isSubmitting } } = useForm<ProbeRecordInput, unknown, ProbeRecord>({ resolver: zodResolver(probeRecordSchema), defaultValues: initial });
  return (
    <form onSubmit={handleSubmit(onSubmit)} className="grid gap-3 sm:grid-cols-4" aria-label="Probe" noValidate>
      <div className="sm:col-span-4"><label className="field-label" htmlFor="probe-name">Name</label><input id="probe-name" className="field-input" aria-invalid={errors.name ? 'true' : 'false'} {...register('name')} />{errors.name ? <p className="field-error" role="alert">{errors.name.message}</p> : null}</div>
      {numeric.map((f) => {
        const msg = errors[f.name as keyof typeof errors]?.message;
        return (
          <div key={f.name}><label className="field-label" htmlFor={`probe-${f.name}`}>{f.label}</label>
            <input id={`probe-${f.name}`} type="number" step="any" className="field-input" aria-invalid={msg ? 'true' : 'false'} {...register(f.name, { valueAsNumber: true })} />
            {msg ? <p className="field-error" role="alert">{String(msg)}</p> : null}</div>
        );
      })}
      <div className="sm:col-span-4"><button type="submit" className="btn-primary" disabled={isSubmitting}>{isSubmitting ? 'Saving…' : submitLabel}</button></div>
    </form>
  );
}
