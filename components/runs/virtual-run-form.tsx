'use client';
/**
 * A virtual run: describe how the part (and machine) is made wrong, let the engine
 * simulate what the probe would report, and evaluate it like a real run. The result is
 * marked simulated and kept out of trends.
 */
import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useForm } from 'react-hook-form';
import { toast } from 'sonner';
import { z } from 'zod';
import { postJson } from '@/components/review/post-json';

const mm = z.number({ error: 'a number, mm' }).finite().min(-5, 'at least −5 mm').max(5, 'at most 5 mm');
const formSchema = z.object({
  seed: z.number({ error: 'a whole number' }).int().min(0).max(2 ** 31 - 1),
  featureUuid: z.string(),
  dx: mm, dy: mm, dz: mm, sizeError: mm,
  workX: mm, workY: mm, workZ: mm,
  probeRadiusError: z.number().finite().min(-0.5).max(0.5),
  formNoise: z.number().finite().min(0).max(0.5),
});
type FormValues = z.infer<typeof formSchema>;

const num = { valueAsNumber: true } as const;

export function VirtualRunForm({ revisionId, features }: { revisionId: string; features: { uuid: string; label: string; type: string }[] }) {
  const router = useRouter();
  const { register, handleSubmit, formState: { errors, isSubmitting } } = useForm<FormValues>({
    resolver: zodResolver(formSchema),
    defaultValues: { seed: 1, featureUuid: features[0]?.uuid ?? '', dx: 0, dy: 0, dz: 0, sizeError: 0, workX: 0, workY: 0, workZ: 0, probeRadiusError: 0, formNoise: 0 },
  });
  const onSubmit = handleSubmit(async (v) => {
    const feature = v.featureUuid ? { [v.featureUuid]: { offset: [v.dx, v.dy, v.dz], sizeError: v.sizeError } } : {};
    const r = await postJson<{ runId: string; misses: number }>('/api/runs/virtual', {
      revisionId, seed: v.seed,
      errors: { features: feature, formNoise: v.formNoise, probeRadiusError: v.probeRadiusError, workOffsetError: [v.workX, v.workY, v.workZ], rotaryOffsets: {}, repeatability: 0 },
    });
    if (!r.ok) { toast.error(r.message); return; }
    toast.success(`Simulated run stored${r.data.misses > 0 ? `; ${r.data.misses} touch points would miss` : ''}.`);
    router.push(`/runs/${r.data.runId}`);
  });
  const field = (name: keyof FormValues, label: string) => (
    <label className="block"><span className="field-label">{label}</span>
      <input className="field-input" inputMode="decimal" step="any" type="number" aria-invalid={errors[name] ? true : undefined} {...register(name, num)} />
      {errors[name] ? <span className="field-error">{errors[name]?.message}</span> : null}
    </label>
  );
  return (
    <form className="card space-y-3 p-4" onSubmit={onSubmit} aria-label="Virtual run">
      <p className="text-small text-ink-muted">Errors of the part as made, in the part frame, mm. The simulator intersects every probing path with the mis-made part.</p>
      <label className="block"><span className="field-label">Feature made wrong</span>
        <select className="field-input" {...register('featureUuid')}>
          {features.map((f) => <option key={f.uuid} value={f.uuid}>{f.label} ({f.type})</option>)}
        </select>
      </label>
      <div className="grid grid-cols-2 gap-2 sm:grid-cols-4">{field('dx', 'Offset X')}{field('dy', 'Offset Y')}{field('dz', 'Offset Z')}{field('sizeError', 'Size error')}</div>
      <div className="grid grid-cols-2 gap-2 sm:grid-cols-4">{field('workX', 'Part shift X')}{field('workY', 'Part shift Y')}{field('workZ', 'Part shift Z')}{field('seed', 'Seed')}</div>
      <div className="grid grid-cols-2 gap-2">{field('probeRadiusError', 'Ball radius error')}{field('formNoise', 'Form noise σ')}</div>
      <button type="submit" className="btn-secondary" disabled={isSubmitting}>{isSubmitting ? 'Simulating…' : 'Simulate and evaluate'}</button>
    </form>
  );
}
