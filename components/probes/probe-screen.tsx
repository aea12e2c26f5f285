'use client';
/** One probe: its parameters, calibration records (the latest sets the effective diameter) and logged events. */
import { useRouter } from 'next/navigation';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { toast } from 'sonner';
import type { z } from 'zod';
import type { ProbeDetail } from '@/db/queries/probes';
import { api, errorMessage } from '@/components/programs/client/api';
import { calibrationSchema, probeEventSchema, type Calibration, type CalibrationInput, type ProbeEvent } from '@/lib/validation/probes';
import { ProbeForm } from './probe-form';
import { CalibrationBadge } from './calibration-badge';

type Props = { probe: ProbeDetail; canEdit: boolean; canCalibrate: boolean; today: string };

function CalibrationForm({ probeId, today, onSaved }: { probeId: string; today: string; onSaved: () => void }) {
  const { register, handleSubmit, formState: { errors, isSubmitting } } = useForm<CalibrationInput, unknown, Calibration>({ resolver: zodResolver(calibrationSchema), defaultValues: { calibratedOn: today, artifact: '', certificate: '', notes: '' } });
  const field = (name: keyof CalibrationInput, label: string, num = false) => (
    <div><label className="field-label" htmlFor={`cal-${name}`}>{label}</label>
      <input id={`cal-${name}`} type={num ? 'number' : name === 'calibratedOn' ? 'date' : 'text'} step="any" className="field-input" aria-invalid={errors[name] ? 'true' : 'false'} {...register(name, num ? { valueAsNumber: true } : {})} />
      {errors[name] ? <p className="field-error" role="alert">{errors[name]?.message}</p> : null}</div>
  );
  return (
    <form aria-label="Record a calibration" className="grid gap-3 sm:grid-cols-3" noValidate onSubmit={handleSubmit(async (c) => {
      try { await api(`/api/probes/${probeId}/calibrations`, { body: c }); toast.success('Calibration recorded'); onSaved(); } catch (e) { toast.error(errorMessage(e)); }
    })}>
      {field('calibratedOn', 'Date')}{field('artifact', 'Artifact (ring or sphere)')}{field('certificate', 'Certificate number')}
      {field('measuredEffectiveDiameter', 'Measured effective ⌀ (mm)', true)}{field('feedMmPerMin', 'Feed (mm/min)', true)}{field('notes', 'Notes')}
      <div className="sm:col-span-3"><button type="submit" className="btn-primary" disabled={isSubmitting}>Record calibration</button></div>
    </form>
  );
}

function EventForm({ probeId, today, onSaved }: { probeId: string; today: string; onSaved: () => void }) {
  const { register, handleSubmit, formState: { errors } } = useForm<z.input<typeof probeEventSchema>, unknown, ProbeEvent>({ resolver: zodResolver(probeEventSchema), defaultValues: { kind: 'stylus-change', happenedOn: today, note: '' } });
  return (
    <form aria-label="Log an event" className="flex flex-wrap items-end gap-2" noValidate onSubmit={handleSubmit(async (ev) => {
      try { await api(`/api/probes/${probeId}/events`, { body: ev }); toast.success('Event logged: calibrate again before use'); onSaved(); } catch (e) { toast.error(errorMessage(e)); }
    })}>
      <div><label className="field-label" htmlFor="ev-kind">Event</label><select id="ev-kind" className="field-input" {...register('kind')}><option value="stylus-change">stylus change</option><option value="collision">collision</option></select></div>
      <div><label className="field-label" htmlFor="ev-on">Date</label><input id="ev-on" type="date" className="field-input" {...register('happenedOn')} />{errors.happenedOn ? <p className="field-error">{errors.happenedOn.message}</p> : null}</div>
      <div><label className="field-label" htmlFor="ev-note">Note</label><input id="ev-note" className="field-input" {...register('note')} /></div>
      <button type="submit" className="btn-secondary">Log event</button>
    </form>
  );
}

export function ProbeScreen({ probe, canEdit, canCalibrate, today }: Props) {
  const router = useRouter();
  const refresh = () => router.refresh();
  return (
    <div className="space-y-6">
      <p><CalibrationBadge status={probe.status} /> · effective ⌀ in use: <strong>{probe.effectiveDiameter ?? 'none (uncalibrated)'}</strong> mm · workspace limit {probe.limitDays} days</p>
      {canCalibrate ? (
        <section className="card space-y-4 p-4" aria-label="Calibration">
          <h2 className="text-title">Record a calibration</h2>
          <CalibrationForm probeId={probe.id} today={today} onSaved={refresh} />
          <EventForm probeId={probe.id} today={today} onSaved={refresh} />
        </section>
      ) : null}
      <section className="card overflow-x-auto" aria-label="Calibration history">
        <h2 className="px-3 pt-3 text-title">History</h2>
        <table className="data-table mt-2">
          <thead><tr><th>Date</th><th>Record</th><th>Artifact</th><th>Certificate</th><th>Effective ⌀</th><th>Feed</th><th>By</th><th>Note</th></tr></thead>
          <tbody>{probe.history.length === 0 ? <tr><td colSpan={8} className="text-ink-muted">No records yet.</td></tr> : probe.history.map((h) => (
            <tr key={h.id}><td>{h.on}</td><td>{h.kind}</td><td>{h.artifact || '—'}</td><td>{h.certificate || '—'}</td><td className="tabular-nums">{h.effectiveDiameter ?? '—'}</td><td>{h.feedMmPerMin ?? '—'}</td><td>{h.by ?? '—'}</td><td>{h.note}</td></tr>
          ))}</tbody>
        </table>
      </section>
      {canEdit ? (
        <section className="card p-4" aria-label="Probe parameters"><h2 className="mb-3 text-title">Parameters</h2>
          <ProbeForm initial={{ ...probe, effectiveDiameter: undefined }} submitLabel="Save probe" onSubmit={async (p) => {
            try { await api(`/api/probes/${probe.id}`, { method: 'PUT', body: p }); toast.success('Probe saved'); refresh(); } catch (e) { toast.error(errorMessage(e)); }
          }} /></section>
      ) : null}
    </div>
  );
}
