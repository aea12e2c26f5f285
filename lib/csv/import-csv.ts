/**
 * Reads a features-and-tolerances CSV (layout in columns.ts) into features,
 * tolerances and datum letters, with a report per row: line, column, what is
 * wrong. Nothing here stores anything; the caller stores `result` only when
 * `valid`, or `validRowsOnly(result)` when the user asks for exactly that.
 */
import Papa from 'papaparse';
import type { FeatureInput, ToleranceInput } from '../validation/parts';
import { characteristicsFor } from '../validation/parts';
import { csvColumns, requiredColumns } from './columns';
import { parseRow, type Cells, type RowIssue } from './parse-row';

export type { RowIssue } from './parse-row';
export type ImportedFeature = { line: number; feature: FeatureInput; datum: string | undefined };
export type ImportedTolerance = { line: number; featureLabel: string; tolerance: ToleranceInput };
export type PreviewRow = { line: number; record: string; label: string; summary: string; ok: boolean };

export type CsvImport = {
  valid: boolean;
  /** Problems with the file itself (size, header): nothing can be imported. */
  fileIssues: RowIssue[];
  issues: RowIssue[];
  rows: PreviewRow[];
  features: ImportedFeature[];
  tolerances: ImportedTolerance[];
};

export type ExistingPart = {
  /** Labels of features already on the part, with their type. */
  features: readonly { label: string; type: FeatureInput['type'] }[];
  /** Datum letters already assigned on the part. */
  datums: readonly string[];
};

export const maxCsvBytes = 2_000_000;
export const maxCsvRows = 5_000;

type RawRow = { line: number; cells: Cells };

function readRows(text: string): { header: string[]; rows: RawRow[] } {
  const source = text.replace(/^\uFEFF/, '');
  const rows: RawRow[] = [];
  let header: string[] | null = null;
  let lineAtCursor = 1;
  let lastCursor = 0;
  Papa.parse<string[]>(source, {
    skipEmptyLines: false,
    step: (results) => {
      const line = lineAtCursor;
      const cursor = results.meta.cursor;
      for (let i = lastCursor; i < cursor; i++) if (source.charCodeAt(i) === 10) lineAtCursor++;
      lastCursor = cursor;
      const values = results.data;
      if (values.every((v) => v.trim() === '')) return;
      if (header === null) { header = values.map((h) => h.trim().toLowerCase()); return; }
      const cells: Cells = {};
      (header).forEach((h, i) => { cells[h] = values[i]; });
      rows.push({ line, cells });
    },
  });
  return { header: header ?? [], rows };
}

function headerIssues(header: string[]): RowIssue[] {
  const issues: RowIssue[] = [];
  const known = new Set<string>(csvColumns);
  for (const h of header) if (!known.has(h)) issues.push({ line: 1, field: h || '(blank)', message: `unknown column "${h}"; the columns are ${csvColumns.join(', ')}` });
  for (const r of requiredColumns) if (!header.includes(r)) issues.push({ line: 1, field: r, message: `the column "${r}" is missing` });
  const dup = header.filter((h, i) => header.indexOf(h) !== i);
  for (const d of new Set(dup)) issues.push({ line: 1, field: d, message: `the column "${d}" appears twice` });
  return issues;
}

const empty = (fileIssues: RowIssue[]): CsvImport => ({ valid: false, fileIssues, issues: [], rows: [], features: [], tolerances: [] });

export function importFeaturesCsv(text: string, existing: ExistingPart = { features: [], datums: [] }): CsvImport {
  if (text.length > maxCsvBytes) return empty([{ line: 0, field: 'file', message: `the file is larger than ${maxCsvBytes / 1e6} MB` }]);
  const { header, rows } = readRows(text);
  if (header.length === 0) return empty([{ line: 1, field: 'file', message: 'the file is empty: it needs a header line and at least one row' }]);
  const fileIssues = headerIssues(header);
  if (rows.length > maxCsvRows) fileIssues.push({ line: 0, field: 'file', message: `the file has ${rows.length} rows; at most ${maxCsvRows} are read` });
  if (fileIssues.length > 0) return empty(fileIssues);

  const issues: RowIssue[] = [];
  const features: ImportedFeature[] = [];
  const tolerances: ImportedTolerance[] = [];
  const badLines = new Set<number>();
  for (const { line, cells } of rows) {
    const { result, issues: rowIssues } = parseRow(cells, line);
    issues.push(...rowIssues);
    if (rowIssues.length > 0) badLines.add(line);
    if (result.kind === 'feature') features.push({ line, feature: result.feature, datum: result.datum });
    if (result.kind === 'tolerance') tolerances.push({ line, featureLabel: result.featureLabel, tolerance: result.tolerance });
  }
  crossCheck(rows, features, tolerances, existing, issues, badLines);
  const preview = rows.map(({ line, cells }) => previewRow(line, cells, !badLines.has(line)));
  return {
    valid: issues.length === 0,
    fileIssues: [],
    issues: issues.sort((a, b) => a.line - b.line),
    rows: preview,
    features: features.filter((f) => !badLines.has(f.line)),
    tolerances: tolerances.filter((t) => !badLines.has(t.line)),
  };
}

function crossCheck(
  rows: RawRow[], features: ImportedFeature[], tolerances: ImportedTolerance[],
  existing: ExistingPart, issues: RowIssue[], badLines: Set<number>,
) {
  const flag = (line: number, field: string, message: string) => { issues.push({ line, field, message }); badLines.add(line); };
  const typeByLabel = new Map(existing.features.map((f) => [f.label, f.type] as const));
  const existingLabels = new Set(typeByLabel.keys());
  const lineByLabel = new Map<string, number>();
  for (const f of features) {
    const label = f.feature.label;
    if (existingLabels.has(label)) flag(f.line, 'label', `the part already has a feature labelled "${label}"`);
    else if (lineByLabel.has(label)) flag(f.line, 'label', `the label "${label}" is used on line ${lineByLabel.get(label)} too`);
    else { lineByLabel.set(label, f.line); typeByLabel.set(label, f.feature.type); }
  }
  const datumLine = new Map<string, number>(existing.datums.map((d) => [d, 0] as const));
  for (const f of features) {
    if (f.datum === undefined || badLines.has(f.line)) continue;
    const at = datumLine.get(f.datum);
    if (at !== undefined) flag(f.line, 'datum', at === 0 ? `datum ${f.datum} is already assigned on the part` : `datum ${f.datum} is assigned on line ${at} too`);
    else datumLine.set(f.datum, f.line);
  }
  // Labels of feature rows that failed: their tolerances are reported against that line.
  const badFeatureLine = new Map<string, number>();
  for (const { line, cells } of rows) {
    const label = cells.label?.trim();
    if (badLines.has(line) && cells.record?.trim().toLowerCase() === 'feature' && label) badFeatureLine.set(label, line);
  }
  for (const t of tolerances) {
    const type = typeByLabel.get(t.featureLabel);
    const badAt = badFeatureLine.get(t.featureLabel);
    if (badAt !== undefined && type === undefined) { flag(t.line, 'label', `its feature "${t.featureLabel}" (line ${badAt}) has errors`); continue; }
    if (type === undefined) { flag(t.line, 'label', `no feature labelled "${t.featureLabel}" in the file or on the part`); continue; }
    if (!characteristicsFor(type).includes(t.tolerance.characteristic)) {
      flag(t.line, 'characteristic', `${t.tolerance.characteristic} does not apply to a ${type} (use ${characteristicsFor(type).join(', ')})`);
    }
    for (const d of t.tolerance.datums ?? []) if (!datumLine.has(d)) flag(t.line, 'datums', `datum ${d} is not assigned to any feature`);
  }
}

function previewRow(line: number, cells: Cells, ok: boolean): PreviewRow {
  const v = (k: string) => cells[k]?.trim() ?? '';
  const record = v('record').toLowerCase();
  const summary = record === 'tolerance'
    ? [v('characteristic'), v('fit') || (v('upper') || v('lower') ? `+${v('upper')}/${v('lower')}` : v('value')), v('material'), v('datums')].filter(Boolean).join(' ')
    : [v('type'), v('diameter') && `⌀${v('diameter')}`, v('datum') && `datum ${v('datum')}`].filter(Boolean).join(' ');
  return { line, record, label: v('label'), summary, ok };
}

/** The rows that passed every check, for an explicit "import valid rows only". */
export function validRowsOnly(result: CsvImport): Pick<CsvImport, 'features' | 'tolerances'> {
  return { features: result.features, tolerances: result.tolerances };
}
