'use client';
/** Add a tolerance to a feature; fit codes (12H7) are accepted for sizes. */
import { useForm, type Resolver } from 'react-hook-form';
import { toast } from 'sonner';
import type { Feature } from '@/lib/features/schema';
import { parseRow } from '@/lib/csv/parse-row';
import { characteristicsFor, type ToleranceInput } from '@/lib/validation/parts';
import { api, errorMessage } from '@/components/programs/client/api';

type Values = { featureId: string; characteristic: string; value: string; upper: string; lower: string; fit: string; material: string; datums: string };

const resolver: Resolver<Values, unknown, ToleranceInput & { featureId: string }> = async (values) => {
  const { result, issues } = parseRow({ ...values, record: 'tolerance', label: values.featureId }, 0);
  if (result.kind === 'tolerance' && issues.length === 0) return { values: { ...result.tolerance, featureId: values.featureId }, errors: {} };
  const errors: Record<string, { type: string; message: string }> = {};
  for (const i of issues) errors[i.field === 'label' ? 'featureId' : i.field] ??= { type: 'validate', message: i.field === 'label' ? 'choose a feature' : i.message };
  return { values: {}, errors };
};

export function ToleranceForm({ partId, features, datumLetters, onSaved }: { partId: string; features: Feature[]; datumLetters: string[]; onSaved: () => void }) {
  const form = useForm<Values, unknown, ToleranceInput & { featureId: string }>({
    resolver,
    defaultValues: { featureId: features[0]?.uuid ?? '', characteristic: '', value: '', upper: '', lower: '', fit: '', material: '', datums: '' },
  });
  const { register, handleSubmit, watch, formState: { errors, isSubmitting } } = form;
  const feature = features.find((f) => f.uuid === watch('featureId'));
  const choices = feature ? characteristicsFor(feature.type) : [];
  const submit = handleSubmit(async ({ featureId, ...tolerance }) => {
    try {
      await api(`/api/parts/${partId}/features/${featureId}/tolerances`, { body: tolerance });
      toast.success(`Tolerance added to feature ${feature?.label ?? ''}`);
      form.reset({ ...form.getValues(), value: '', upper: '', lower: '', fit: '' });
      onSaved();
    } catch (e) { toast.error(errorMessage(e)); }
  });
  const text = (name: keyof Values, label: string, hint?: string) => (
    <div>
      <label className="field-label" htmlFor={`tol-${name}`}>{label}</label>
      <input id={`tol-${name}`} className="field-input" aria-invalid={errors[name] ? 'true' : 'false'} {...register(name)} />
      {hint ? <p className="mt-1 text-caption text-ink-faint">{hint}</p> : null}
      {errors[name] ? <p className="field-error" role="alert">{errors[name]?.message}</p> : null}
    </div>
  );
  if (features.length === 0) return <p className="text-small text-ink-muted">Add a feature first.</p>;
  return (
    <form onSubmit={submit} aria-label="Add a tolerance" className="grid gap-3 sm:grid-cols-4" noValidate>
      <div>
        <label className="field-label" htmlFor="tol-featureId">Feature</label>
        <select id="tol-featureId" className="field-input" {...register('featureId')}>{features.map((f) => <option key={f.uuid} value={f.uuid}>{f.label} ({f.type})</option>)}</select>
      </div>
      <div>
        <label className="field-label" htmlFor="tol-characteristic">Characteristic</label>
        <select id="tol-characteristic" className="field-input" aria-invalid={errors.characteristic ? 'true' : 'false'} {...register('characteristic')}>
          <option value="">choose…</option>{choices.map((c) => <option key={c} value={c}>{c}</option>)}
        </select>
        {errors.characteristic ? <p className="field-error" role="alert">{errors.characteristic.message}</p> : null}
      </div>
      {text('fit', 'Fit code', 'sizes only, e.g. 12H7')}
      {text('value', 'Zone (mm)', 'geometric tolerances')}
      {text('upper', 'Upper deviation (mm)')}
      {text('lower', 'Lower deviation (mm)')}
      <div>
        <label className="field-label" htmlFor="tol-material">Material condition</label>
        <select id="tol-material" className="field-input" {...register('material')}><option value="">—</option><option>MMC</option><option>LMC</option><option>RFS</option></select>
        {errors.material ? <p className="field-error" role="alert">{errors.material.message}</p> : null}
      </div>
      {text('datums', 'Datums', datumLetters.length > 0 ? `assigned: ${datumLetters.join(', ')}` : 'no datums assigned yet')}
      <div className="sm:col-span-4"><button type="submit" className="btn-primary" disabled={isSubmitting}>{isSubmitting ? 'Adding…' : 'Add tolerance'}</button></div>
    </form>
  );
}
