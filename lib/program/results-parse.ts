/**
 * Parses a control's result output — the `ngc` log, the `iso-skip` print-out (both are
 * TRIP records) or a plain CSV `uuid,x,y,z` in the part frame — into records with line
 * numbers, checked against the revision's touch points. Every problem is reported with its
 * line (missing points have none); deciding to accept the run only when there is none is
 * the caller's job.
 */
import type { Vec3 } from '../kinematics/schema';
import {
  csvFields, guessDelimiter, isCsvHeader, isTripLine, parseCsvLine, parseTripLine, type CsvDelimiter,
  type LineResult,
} from './results-lines';

export type ResultsFormat = 'trip-log' | 'csv';

export type ResultRecord =
  /** Axis values at the trip, machine frame M (the program's work offset), mm and degrees. */
  | { kind: 'trip'; line: number; uuid: string; axes: Record<string, number> }
  /** Stylus-ball centre at the trip, part frame P, mm. */
  | { kind: 'point'; line: number; uuid: string; point: Vec3 };

export type ResultErrorCode = 'EMPTY_FILE' | 'MALFORMED_LINE' | 'UNKNOWN_UUID' | 'DUPLICATE_UUID' | 'MISSING_POINT';

export interface ResultError {
  /** 1-based line in the uploaded file; null for a touch point that has no record at all. */
  line: number | null;
  code: ResultErrorCode;
  message: string;
  uuid?: string;
}

export interface ExpectedTouchPoint {
  uuid: string;
  /** Feature balloon label, for messages. */
  label?: string;
  seq?: number;
}

export interface ParseResultsOptions {
  touchPoints: readonly ExpectedTouchPoint[];
  /** Rotary words of the machine, e.g. ["A", "C"]; TRIP records must carry exactly these. */
  rotaries: readonly string[];
  format?: ResultsFormat | 'auto';
  /** Stop listing errors after this many (the count of the rest is still given). */
  maxErrors?: number;
}

export interface ParsedResults {
  format: ResultsFormat;
  records: ResultRecord[];
  errors: ResultError[];
  /** Errors found but not listed because of `maxErrors`. */
  moreErrors: number;
}

const SKIP_LINE = /^\s*(?:%|#.*)?\s*$/; // blank, a tape mark "%", or a "#" note

export function detectFormat(lines: readonly string[]): ResultsFormat {
  return lines.some(isTripLine) ? 'trip-log' : 'csv';
}

function pointName(tp: ExpectedTouchPoint): string {
  const where = tp.label !== undefined ? `feature ${tp.label}${tp.seq !== undefined ? `, point ${tp.seq}` : ''}` : 'touch point';
  return `${where} (${tp.uuid})`;
}

export function parseResults(text: string, options: ParseResultsOptions): ParsedResults {
  const lines = text.replace(/^\uFEFF/, '').split(/\r\n|\n|\r/);
  const format = !options.format || options.format === 'auto' ? detectFormat(lines) : options.format;
  const maxErrors = options.maxErrors ?? 200;
  const expected = new Map(options.touchPoints.map((tp) => [tp.uuid.toLowerCase(), tp]));
  const seenOn = new Map<string, number>();
  const records: ResultRecord[] = [];
  const errors: ResultError[] = [];
  let moreErrors = 0;
  const report = (e: ResultError): void => {
    if (errors.length < maxErrors) errors.push(e);
    else moreErrors += 1;
  };

  let delimiter: CsvDelimiter | null = null;
  let firstContent = true;
  for (const [i, raw] of lines.entries()) {
    const line = i + 1;
    if (SKIP_LINE.test(raw)) continue;
    let parsed: LineResult<ResultRecord>;
    if (format === 'trip-log') {
      const r = parseTripLine(raw, options.rotaries);
      parsed = r.ok ? { ok: true, value: { kind: 'trip', line, ...r.value } } : r;
    } else {
      delimiter ??= guessDelimiter(raw);
      const fields = csvFields(raw, delimiter);
      if (firstContent && isCsvHeader(fields)) {
        firstContent = false;
        continue;
      }
      const r = parseCsvLine(fields, delimiter);
      parsed = r.ok ? { ok: true, value: { kind: 'point', line, ...r.value } } : r;
    }
    firstContent = false;
    if (!parsed.ok) {
      report({ line, code: 'MALFORMED_LINE', message: `line ${line}: ${parsed.message}` });
      continue;
    }
    const { uuid } = parsed.value;
    const tp = expected.get(uuid);
    if (!tp) {
      report({ line, code: 'UNKNOWN_UUID', uuid, message: `line ${line}: ${uuid} is not a touch point of this revision` });
      continue;
    }
    const first = seenOn.get(uuid);
    if (first !== undefined) {
      report({ line, code: 'DUPLICATE_UUID', uuid, message: `line ${line}: ${pointName(tp)} was already recorded on line ${first}` });
      continue;
    }
    seenOn.set(uuid, line);
    records.push(parsed.value);
  }

  if (seenOn.size === 0 && errors.length === 0 && moreErrors === 0) {
    report({ line: null, code: 'EMPTY_FILE', message: 'the file holds no result records' });
    return { format, records, errors, moreErrors };
  }
  for (const [uuid, tp] of expected) {
    if (!seenOn.has(uuid)) report({ line: null, code: 'MISSING_POINT', uuid, message: `no record for ${pointName(tp)}` });
  }
  return { format, records, errors, moreErrors };
}
