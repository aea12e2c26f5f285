/**
 * `touch-points.csv`: one row per planned touch point, part frame P, millimetres, so the
 * shop can check a point by hand or feed it to its own tools. Columns: uuid, feature label,
 * feature uuid, sequence, nominal surface point, surface normal, start point, and one
 * column per machine axis word (mm / degrees) of the chosen solution.
 */
import Papa from 'papaparse';
import type { Feature } from '../features/schema';
import type { Plan } from '../program/plan-schema';

const MM_DECIMALS = 4;
const UNIT_DECIMALS = 6;

function fmt(v: number, decimals: number): string {
  const s = v.toFixed(decimals);
  return s === `-${(0).toFixed(decimals)}` ? (0).toFixed(decimals) : s;
}

/** Axis words in the program's order: X Y Z first, then rotaries alphabetically. */
export function axisWords(plan: Plan): string[] {
  const words = new Set<string>();
  for (const tp of plan.touchPoints) for (const k of Object.keys(tp.axes)) words.add(k);
  const linear = ['X', 'Y', 'Z'].filter((w) => words.has(w));
  const rest = [...words].filter((w) => !linear.includes(w)).sort();
  return [...linear, ...rest];
}

export function touchPointsCsv(plan: Plan, features: Pick<Feature, 'uuid' | 'label'>[]): string {
  const labelOf = new Map(features.map((f) => [f.uuid, f.label]));
  const words = axisWords(plan);
  const header = [
    'uuid', 'feature_label', 'feature_uuid', 'seq',
    'surface_x', 'surface_y', 'surface_z', 'normal_x', 'normal_y', 'normal_z',
    'start_x', 'start_y', 'start_z', ...words.map((w) => `axis_${w}`),
  ];
  const rows = plan.touchPoints.map((tp) => [
    tp.uuid, labelOf.get(tp.featureUuid) ?? '', tp.featureUuid, String(tp.seq),
    ...tp.surface.map((v) => fmt(v, MM_DECIMALS)),
    ...tp.normal.map((v) => fmt(v, UNIT_DECIMALS)),
    ...tp.start.map((v) => fmt(v, MM_DECIMALS)),
    ...words.map((w) => {
      const v = tp.axes[w];
      return v === undefined ? '' : fmt(v, MM_DECIMALS);
    }),
  ]);
  return Papa.unparse({ fields: header, data: rows }, { newline: '\n' }) + '\n';
}
