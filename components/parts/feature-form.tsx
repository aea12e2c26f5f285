'use client';
/**
 * Add a feature. The fields are the CSV columns (lib/csv/columns.ts), and the
 * form is checked by the same row reader the import uses, so a form and a file
 * give the same messages; the server checks again with the contract schema.
 */
import { useForm, type Resolver } from 'react-hook-form';
import { toast } from 'sonner';
import { parseRow, type Cells } from '@/lib/csv/parse-row';
import { featureTypes, type FeatureInput } from '@/lib/validation/parts';
import type { FeatureType } from '@/lib/features/schema';
import { api, errorMessage } from '@/components/programs/client/api';

type Values = Record<string, string>;
type Field = { name: string; label: string };

const at: Field[] = [{ name: 'x', label: 'X' }, { name: 'y', label: 'Y' }, { name: 'z', label: 'Z' }];
const axis: Field[] = [{ name: 'axis_x', label: 'i' }, { name: 'axis_y', label: 'j' }, { name: 'axis_z', label: 'k' }];
const ref: Field[] = [{ name: 'ref_x', label: 'i' }, { name: 'ref_y', label: 'j' }, { name: 'ref_z', label: 'k' }];

const layout: Record<FeatureType, { group: string; fields: Field[] }[]> = {
  plane: [{ group: 'Face centre (mm)', fields: at }, { group: 'Normal, out of the material', fields: axis }, { group: 'Length direction u', fields: ref }, { group: 'Size (mm)', fields: [{ name: 'size_u', label: 'along u' }, { name: 'size_v', label: 'across' }] }],
  bore: [{ group: 'Centre at the top edge (mm)', fields: at }, { group: 'Axis, out of the material', fields: axis }, { group: 'Size (mm)', fields: [{ name: 'diameter', label: 'diameter' }, { name: 'depth', label: 'depth' }] }],
  boss: [{ group: 'Centre at the top face (mm)', fields: at }, { group: 'Axis, out of the material', fields: axis }, { group: 'Size (mm)', fields: [{ name: 'diameter', label: 'diameter' }, { name: 'height', label: 'height' }] }],
  slot: [{ group: 'Centre at the top (mm)', fields: at }, { group: 'Axis, out of the material', fields: axis }, { group: 'Width direction', fields: ref }, { group: 'Size (mm)', fields: [{ name: 'width', label: 'width' }, { name: 'length', label: 'length' }, { name: 'depth', label: 'depth' }] }],
  web: [{ group: 'Centre at the top (mm)', fields: at }, { group: 'Axis, out of the material', fields: axis }, { group: 'Width direction', fields: ref }, { group: 'Size (mm)', fields: [{ name: 'width', label: 'width' }, { name: 'length', label: 'length' }, { name: 'depth', label: 'depth' }] }],
  sphere: [{ group: 'Centre (mm)', fields: at }, { group: 'Access direction', fields: axis }, { group: 'Size (mm)', fields: [{ name: 'diameter', label: 'diameter' }] }],
};

const defaults: Values = { type: 'bore', label: '', x: '0', y: '0', z: '0', axis_x: '0', axis_y: '0', axis_z: '1', ref_x: '1', ref_y: '0', ref_z: '0', points: '' };

const resolver: Resolver<Values, unknown, FeatureInput> = async (values) => {
  const cells: Cells = { ...values, record: 'feature' };
  const { result, issues } = parseRow(cells, 0);
  if (result.kind === 'feature' && issues.length === 0) return { values: result.feature, errors: {} };
  const errors: Record<string, { type: string; message: string }> = {};
  for (const i of issues) for (const f of i.field.split('/')) errors[f] ??= { type: 'validate', message: i.message };
  return { values: {}, errors };
};

export function FeatureForm({ partId, onSaved }: { partId: string; onSaved: () => void }) {
  const form = useForm<Values, unknown, FeatureInput>({ resolver, defaultValues: defaults });
  const { register, handleSubmit, watch, formState: { errors, isSubmitting } } = form;
  const type = (watch('type') || 'bore') as FeatureType;
  const submit = handleSubmit(async (feature) => {
    try {
      await api(`/api/parts/${partId}/features`, { body: feature });
      toast.success(`Feature ${feature.label} added`);
      form.reset({ ...defaults, type });
      onSaved();
    } catch (e) { toast.error(errorMessage(e)); }
  });
  const input = (f: Field) => (
    <div key={f.name} className="min-w-0">
      <label className="text-caption text-ink-muted" htmlFor={`feature-${f.name}`}>{f.label}</label>
      <input id={`feature-${f.name}`} inputMode="decimal" className="field-input" aria-invalid={errors[f.name] ? 'true' : 'false'} {...register(f.name)} />
      {errors[f.name] ? <p className="field-error" role="alert">{errors[f.name]?.message}</p> : null}
    </div>
  );
  return (
    <form onSubmit={submit} aria-label="Add a feature" className="space-y-3" noValidate>
      <div className="grid gap-3 sm:grid-cols-3">
        <div>
          <label className="field-label" htmlFor="feature-type">Type</label>
          <select id="feature-type" className="field-input" {...register('type')}>{featureTypes.map((t) => <option key={t} value={t}>{t}</option>)}</select>
        </div>
        <div>
          <label className="field-label" htmlFor="feature-label">Label (balloon number)</label>
          <input id="feature-label" className="field-input" aria-invalid={errors.label ? 'true' : 'false'} {...register('label')} />
          {errors.label ? <p className="field-error" role="alert">{errors.label.message}</p> : null}
        </div>
        {input({ name: 'points', label: 'Points (blank = recommended)' })}
      </div>
      {layout[type].map((g) => (
        <fieldset key={g.group}>
          <legend className="field-label">{g.group}</legend>
          <div className="grid grid-cols-3 gap-2">{g.fields.map(input)}</div>
        </fieldset>
      ))}
      <button type="submit" className="btn-primary" disabled={isSubmitting}>{isSubmitting ? 'Adding…' : 'Add feature'}</button>
    </form>
  );
}
