/**
 * Line parsers for the control's result output. A trip record is
 *   TRIP <touch-point-uuid> X<x> Y<y> Z<z> [A<a>] [B<b>] [C<c>]
 * — axis values at the trip in the program's work offset (the machine model's frame M),
 * millimetres and degrees. Output statements may pad, so a word may have spaces between
 * its letter and its value ("X   -12.5"). A CSV row is `uuid,x,y,z` in the part frame P.
 */
import Papa from 'papaparse';
import type { Vec3 } from '../kinematics/schema';

export const UUID_RE = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const NUMBER_RE = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;
/** Any coordinate beyond 100 m is a garbled line, not a measurement. */
export const MAX_ABS_VALUE = 100_000;

export type LineResult<T> = { ok: true; value: T } | { ok: false; message: string };

function fail<T>(message: string): LineResult<T> {
  return { ok: false, message };
}

export function parseNumber(text: string, decimalComma = false): number | null {
  const t = decimalComma ? text.trim().replace(',', '.') : text.trim();
  if (!NUMBER_RE.test(t)) return null;
  const v = Number(t);
  return Number.isFinite(v) && Math.abs(v) <= MAX_ABS_VALUE ? v : null;
}

export function isTripLine(line: string): boolean {
  return /^\s*TRIP\b/i.test(line);
}

export interface TripLine {
  uuid: string;
  axes: Record<string, number>;
}

/**
 * Parses one TRIP line. `rotaries` are the rotary words the machine has (e.g. ["A", "C"]);
 * each of X, Y, Z and every rotary must appear exactly once, no other word may.
 */
export function parseTripLine(line: string, rotaries: readonly string[]): LineResult<TripLine> {
  const m = /^\s*TRIP\s+(\S+)(.*)$/i.exec(line);
  if (!m?.[1]) return fail('expected "TRIP <uuid> X… Y… Z…" but the touch-point UUID is missing');
  const uuid = m[1];
  if (!UUID_RE.test(uuid)) return fail(`"${uuid.slice(0, 40)}" is not a UUID`);
  const words = (m[2] ?? '').replace(/\s+/g, '');
  const axes: Record<string, number> = {};
  const wordRe = /([A-Za-z])([+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)/y;
  let pos = 0;
  while (pos < words.length) {
    wordRe.lastIndex = pos;
    const w = wordRe.exec(words);
    if (!w?.[1] || w[2] === undefined) return fail(`cannot read "${words.slice(pos, pos + 12)}" as an axis word`);
    const letter = w[1].toUpperCase();
    const value = parseNumber(w[2]);
    if (value === null) return fail(`${letter}${w[2]} is not a usable number`);
    if (letter in axes) return fail(`${letter} appears twice`);
    axes[letter] = value;
    pos = wordRe.lastIndex;
  }
  const expected = ['X', 'Y', 'Z', ...rotaries];
  const missing = expected.filter((l) => !(l in axes));
  if (missing.length > 0) return fail(`missing ${missing.join(', ')} (a record needs ${expected.join(' ')})`);
  const extra = Object.keys(axes).filter((l) => !expected.includes(l));
  if (extra.length > 0) return fail(`${extra.join(', ')} is not an axis of this machine (it has ${expected.join(' ')})`);
  return { ok: true, value: { uuid: uuid.toLowerCase(), axes } };
}

export type CsvDelimiter = ',' | ';' | '\t';

/** Shops on a decimal-comma locale export semicolon- or tab-separated files. */
export function guessDelimiter(firstLine: string): CsvDelimiter {
  if (firstLine.includes(';')) return ';';
  if (firstLine.includes('\t')) return '\t';
  return ',';
}

export function csvFields(line: string, delimiter: CsvDelimiter): string[] {
  const parsed = Papa.parse<string[]>(line, { delimiter, header: false });
  return (parsed.data[0] ?? []).map((f) => f.trim());
}

export function isCsvHeader(fields: string[]): boolean {
  const first = fields[0] ?? '';
  return !UUID_RE.test(first) && /^[A-Za-z_][A-Za-z0-9_ -]*$/.test(first) && fields.slice(1).every((f) => parseNumber(f) === null);
}

export interface CsvLine {
  uuid: string;
  point: Vec3;
}

export function parseCsvLine(fields: string[], delimiter: CsvDelimiter): LineResult<CsvLine> {
  if (fields.length !== 4) return fail(`expected 4 fields (uuid,x,y,z), found ${fields.length}`);
  const [uuid = '', ...coords] = fields;
  if (!UUID_RE.test(uuid)) return fail(`"${uuid.slice(0, 40)}" is not a UUID`);
  const values: number[] = [];
  for (const [i, c] of coords.entries()) {
    const v = parseNumber(c, delimiter !== ',');
    if (v === null) return fail(`${'xyz'[i]} "${c.slice(0, 20)}" is not a usable number`);
    values.push(v);
  }
  const [x = 0, y = 0, z = 0] = values;
  return { ok: true, value: { uuid: uuid.toLowerCase(), point: [x, y, z] } };
}
