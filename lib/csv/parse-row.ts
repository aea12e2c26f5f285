/**
 * One CSV row → a feature or a tolerance candidate, with every problem found in
 * it named by column. Cross-row checks (labels, datums) live in import-csv.ts.
 */
import type { z } from 'zod';
import { featureInputSchema, toleranceInputSchema, type FeatureInput, type ToleranceInput } from '../validation/parts';
import { columnForPath } from './columns';

export type RowIssue = { line: number; field: string; message: string };
export type Cells = Partial<Record<string, string>>;

export type RowResult =
  | { kind: 'feature'; feature: FeatureInput; datum: string | undefined }
  | { kind: 'tolerance'; featureLabel: string; tolerance: ToleranceInput }
  | { kind: 'invalid' };

class CellErrors {
  readonly issues: RowIssue[] = [];
  constructor(private readonly line: number) {}
  add(field: string, message: string) { this.issues.push({ line: this.line, field, message }); }
}

const cell = (cells: Cells, name: string) => {
  const v = cells[name]?.trim();
  return v === undefined || v === '' ? undefined : v;
};

function num(cells: Cells, name: string, errs: CellErrors): number | undefined {
  const raw = cell(cells, name);
  if (raw === undefined) return undefined;
  if (/^-?\d+,\d+$/.test(raw)) { errs.add(name, `"${raw}": use a point as the decimal separator`); return undefined; }
  const n = Number(raw);
  if (!Number.isFinite(n)) { errs.add(name, `"${raw}" is not a number`); return undefined; }
  return n;
}

function vec(cells: Cells, names: readonly [string, string, string], errs: CellErrors): [number, number, number] | undefined {
  const given = names.filter((n) => cell(cells, n) !== undefined);
  if (given.length === 0) return undefined;
  if (given.length < 3) { errs.add(names.join('/'), `give all three of ${names.join(', ')}`); return undefined; }
  const [a, b, c] = names.map((n) => num(cells, n, errs));
  return a === undefined || b === undefined || c === undefined ? undefined : [a, b, c];
}

function addZodIssues(error: z.ZodError, errs: CellErrors) {
  for (const issue of error.issues) {
    const column = columnForPath(issue.path);
    if (issue.path[0] === 'type') errs.add('type', 'the type must be plane, bore, boss, slot, web or sphere');
    else if (issue.path[0] === 'characteristic') errs.add(column, 'the characteristic must be diameter, width, position, flatness, circularity, cylindricity, perpendicularity, parallelism or profile');
    else if (issue.path[0] === 'material') errs.add(column, 'the material condition must be MMC, LMC or RFS');
    else if (issue.code === 'invalid_type' && /received undefined/.test(issue.message)) errs.add(column, `${column} is missing`);
    else errs.add(column, issue.message);
  }
}

const xyz = ['x', 'y', 'z'] as const;
const axis = ['axis_x', 'axis_y', 'axis_z'] as const;
const ref = ['ref_x', 'ref_y', 'ref_z'] as const;

function featureCandidate(cells: Cells, errs: CellErrors): Record<string, unknown> {
  const type = cell(cells, 'type');
  const base: Record<string, unknown> = { type, label: cell(cells, 'label'), points: num(cells, 'points', errs) };
  const at = vec(cells, xyz, errs);
  const dir = vec(cells, axis, errs);
  switch (type) {
    case 'plane': {
      const u = num(cells, 'size_u', errs); const v = num(cells, 'size_v', errs);
      return { ...base, origin: at, normal: dir, uDir: vec(cells, ref, errs), size: u === undefined || v === undefined ? undefined : [u, v] };
    }
    case 'bore': return { ...base, center: at, axis: dir, diameter: num(cells, 'diameter', errs), depth: num(cells, 'depth', errs) };
    case 'boss': return { ...base, center: at, axis: dir, diameter: num(cells, 'diameter', errs), height: num(cells, 'height', errs) };
    case 'slot': case 'web':
      return { ...base, center: at, axis: dir, widthDir: vec(cells, ref, errs), width: num(cells, 'width', errs), length: num(cells, 'length', errs), depth: num(cells, 'depth', errs) };
    case 'sphere': return { ...base, center: at, axis: dir, diameter: num(cells, 'diameter', errs) };
    default: return base;
  }
}

function splitDatums(raw: string | undefined): string[] | undefined {
  if (raw === undefined) return undefined;
  const parts = raw.split(/[\s|;,]+/).filter(Boolean);
  return parts.length === 1 && /^[A-Z]{2,3}$/.test(parts[0] ?? '') ? [...(parts[0] ?? '')] : parts;
}

function toleranceCandidate(cells: Cells, errs: CellErrors): Record<string, unknown> {
  const material = cell(cells, 'material')?.toUpperCase();
  return {
    characteristic: cell(cells, 'characteristic')?.toLowerCase(),
    value: num(cells, 'value', errs),
    upper: num(cells, 'upper', errs),
    lower: num(cells, 'lower', errs),
    fit: cell(cells, 'fit'),
    material,
    datums: splitDatums(cell(cells, 'datums')),
  };
}

export function parseRow(cells: Cells, line: number): { result: RowResult; issues: RowIssue[] } {
  const errs = new CellErrors(line);
  const record = cell(cells, 'record')?.toLowerCase();
  const label = cell(cells, 'label');
  if (label === undefined) errs.add('label', 'the label (balloon number) is missing');
  if (record === 'feature') {
    const candidate = featureCandidate(cells, errs);
    if (cell(cells, 'type') === undefined) errs.add('type', 'the feature type is missing (plane, bore, boss, slot, web or sphere)');
    const datum = cell(cells, 'datum');
    if (datum !== undefined && !/^[A-Z]$/.test(datum)) errs.add('datum', `"${datum}" is not a datum letter (one capital letter)`);
    const parsed = featureInputSchema.safeParse(candidate);
    if (!parsed.success) addZodIssues(parsed.error, errs);
    const issues = dedupe(errs.issues);
    return parsed.success && issues.length === 0
      ? { result: { kind: 'feature', feature: parsed.data, datum }, issues }
      : { result: { kind: 'invalid' }, issues };
  }
  if (record === 'tolerance') {
    const parsed = toleranceInputSchema.safeParse(toleranceCandidate(cells, errs));
    if (!parsed.success) addZodIssues(parsed.error, errs);
    const issues = dedupe(errs.issues);
    return parsed.success && issues.length === 0 && label !== undefined
      ? { result: { kind: 'tolerance', featureLabel: label, tolerance: parsed.data }, issues }
      : { result: { kind: 'invalid' }, issues };
  }
  errs.add('record', record === undefined ? 'say whether the row is a feature or a tolerance' : `"${record}" is neither feature nor tolerance`);
  return { result: { kind: 'invalid' }, issues: errs.issues };
}

/** A missing number reported by the cell reader and again by the schema: keep the first. */
function dedupe(issues: RowIssue[]): RowIssue[] {
  const seen = new Set<string>();
  return issues.filter((i) => {
    const columns = i.field.split('/');
    if (columns.some((c) => seen.has(c))) return false;
    columns.forEach((c) => seen.add(c));
    return true;
  });
}
