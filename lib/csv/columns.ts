/**
 * The CSV layout for features and tolerances: one file, one record a row. A
 * `feature` row carries the geometry (and optionally the datum letter it is); a
 * `tolerance` row names its feature by label. Columns may come in any order;
 * unknown columns are refused so a typo never drops data silently.
 */
export const csvColumns = [
  'record', 'label', 'type',
  'x', 'y', 'z', 'axis_x', 'axis_y', 'axis_z', 'ref_x', 'ref_y', 'ref_z',
  'diameter', 'depth', 'height', 'width', 'length', 'size_u', 'size_v', 'points',
  'datum',
  'characteristic', 'value', 'upper', 'lower', 'fit', 'material', 'datums',
] as const;
export type CsvColumn = (typeof csvColumns)[number];

export const requiredColumns: readonly CsvColumn[] = ['record', 'label'];

const vecColumns: Record<string, readonly [CsvColumn, CsvColumn, CsvColumn]> = {
  origin: ['x', 'y', 'z'],
  center: ['x', 'y', 'z'],
  normal: ['axis_x', 'axis_y', 'axis_z'],
  axis: ['axis_x', 'axis_y', 'axis_z'],
  uDir: ['ref_x', 'ref_y', 'ref_z'],
  widthDir: ['ref_x', 'ref_y', 'ref_z'],
};

const scalarColumns: Record<string, CsvColumn> = {
  label: 'label', type: 'type', diameter: 'diameter', depth: 'depth', height: 'height',
  width: 'width', length: 'length', points: 'points', characteristic: 'characteristic',
  value: 'value', upper: 'upper', lower: 'lower', fit: 'fit', material: 'material', datums: 'datums',
};

/** The CSV column (or columns) a schema issue path points at. */
export function columnForPath(path: readonly PropertyKey[]): string {
  const [head, index] = path;
  if (typeof head !== 'string') return 'row';
  const vec = vecColumns[head];
  if (vec) return typeof index === 'number' ? (vec[index] ?? vec.join('/')) : vec.join('/');
  if (head === 'size') return index === 1 ? 'size_v' : index === 0 ? 'size_u' : 'size_u/size_v';
  return scalarColumns[head] ?? head;
}
