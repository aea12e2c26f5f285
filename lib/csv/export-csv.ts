/**
 * Writes a part's features and tolerances in the layout of columns.ts, so an
 * exported file imports again unchanged (uuids aside: a new import gets new ones).
 */
import Papa from 'papaparse';
import type { Feature, Tolerance } from '../features/schema';
import { csvColumns, type CsvColumn } from './columns';

type Row = Partial<Record<CsvColumn, string | number>>;

const put = (row: Row, cols: readonly [CsvColumn, CsvColumn, CsvColumn], v: readonly number[]) => {
  cols.forEach((c, i) => { row[c] = v[i]; });
};

function featureRow(f: Feature, datum: string | undefined): Row {
  const row: Row = { record: 'feature', label: f.label, type: f.type, points: f.points, datum };
  switch (f.type) {
    case 'plane':
      put(row, ['x', 'y', 'z'], f.origin); put(row, ['axis_x', 'axis_y', 'axis_z'], f.normal);
      put(row, ['ref_x', 'ref_y', 'ref_z'], f.uDir); row.size_u = f.size[0]; row.size_v = f.size[1];
      break;
    case 'bore': case 'boss': case 'sphere':
      put(row, ['x', 'y', 'z'], f.center); put(row, ['axis_x', 'axis_y', 'axis_z'], f.axis); row.diameter = f.diameter;
      if (f.type === 'bore') row.depth = f.depth;
      if (f.type === 'boss') row.height = f.height;
      break;
    case 'slot': case 'web':
      put(row, ['x', 'y', 'z'], f.center); put(row, ['axis_x', 'axis_y', 'axis_z'], f.axis);
      put(row, ['ref_x', 'ref_y', 'ref_z'], f.widthDir);
      row.width = f.width; row.length = f.length; row.depth = f.depth;
      break;
  }
  return row;
}

function toleranceRow(t: Tolerance, label: string): Row {
  return {
    record: 'tolerance', label, characteristic: t.characteristic, value: t.value, upper: t.upper,
    lower: t.lower, fit: t.fit, material: t.material, datums: t.datums?.join(' '),
  };
}

export function exportFeaturesCsv(features: readonly Feature[], tolerances: readonly Tolerance[], datums: Readonly<Record<string, string>>): string {
  const letterOf = new Map(Object.entries(datums).map(([letter, uuid]) => [uuid, letter] as const));
  const labelOf = new Map(features.map((f) => [f.uuid, f.label] as const));
  const rows: Row[] = [];
  for (const f of features) {
    rows.push(featureRow(f, letterOf.get(f.uuid)));
    for (const t of tolerances) if (t.featureUuid === f.uuid) rows.push(toleranceRow(t, f.label));
  }
  const orphans = tolerances.filter((t) => !labelOf.has(t.featureUuid));
  if (orphans.length > 0) throw new Error(`${orphans.length} tolerance(s) refer to a feature not in the list`);
  const data = rows.map((r) => csvColumns.map((c) => (r[c] === undefined ? '' : String(r[c]))));
  return Papa.unparse({ fields: [...csvColumns], data }, { newline: '\n' }) + '\n';
}
