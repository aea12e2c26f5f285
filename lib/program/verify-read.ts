/**
 * Reads a posted program back line by line with the post's own grammar: blocks of words,
 * comments, trip records, the checks after probe moves, and the statements the
 * definition and templates write verbatim. Anything else is an unknown line.
 */
import type { PostDefinition } from './postprocessor-schema';
import type { PostGrammar } from './render';

export type ReadLine =
  | { t: 'blank' }
  | { t: 'comment'; text: string }
  | { t: 'record'; uuid: string }
  | { t: 'fixed'; text: string }
  | { t: 'protectedCheck'; xyz: number[] }
  | { t: 'touchCheck'; xyz: number[] }
  | { t: 'block'; codes: string[]; words: Record<string, number>; unknown: string[] }
  | { t: 'unknown'; text: string };

const escapeRe = (s: string) => s.replace(/[.*+?^${}()|[\]\\#]/g, '\\$&');
/** The number after a word's letter (A–Z then an optionally signed decimal), or null. */
function numberOf(tok: string): number | null {
  const c = tok.charCodeAt(0);
  if (c < 65 || c > 90 || tok.length < 2) return null;
  let digits = 0;
  for (let i = 1; i < tok.length; i++) {
    const d = tok.charCodeAt(i);
    if (d >= 48 && d <= 57) digits++;
    else if (!(d === 46 || ((d === 45 || d === 43) && i === 1))) return null;
  }
  if (digits === 0) return null;
  const v = Number(tok.slice(1));
  return Number.isFinite(v) ? v : null;
}

export interface Reader { read: (line: string) => ReadLine }

export function makeReader(def: PostDefinition, grammar: PostGrammar, rotaryNames: string[], program: string): Reader {
  const words = ['X', 'Y', 'Z', ...rotaryNames];
  const values = words.map((w) => def.trip.value.replace('{word}', w).replace('{var}', def.trip.variables[w] ?? '#0')).join(def.trip.separator);
  const [pre, post] = def.trip.record.split('{uuid}') as [string, string];
  const recordRe = new RegExp(`^${escapeRe(pre)}([0-9A-Fa-f-]{36})${escapeRe(post.replace('{values}', values))}$`);
  const fill = (l: string) => l.replace('{program}', program);
  const fixed = new Set([
    ...grammar.fixedLines, ...def.programStart.map(fill), ...def.programEnd, ...def.probeOn, ...def.probeOff,
    ...def.trip.open.map(fill), ...def.trip.close, ...def.stops.miss, ...def.stops.hit,
  ]);
  const known = new Set(def.knownCodes);
  const axisWords = new Set(words);
  const numberRe = def.lineNumbers.enabled ? new RegExp(`^${def.lineNumbers.letter}\\d+ `) : null;
  const { open, close } = def.comments;
  return {
    read(raw: string): ReadLine {
      let line = raw.includes('\t') ? raw.replace(/\t/g, ' ').trim() : raw.trim();
      if (line === '') return { t: 'blank' };
      if (grammar.labelPrefixes.some((p) => line.startsWith(p))) return { t: 'fixed', text: line };
      if (numberRe) line = line.replace(numberRe, '');
      if (fixed.has(line)) return { t: 'fixed', text: line };
      const c0 = line.charCodeAt(0);
      if (c0 === 71 /* G */ || c0 === 77 /* M */) return block(line);
      const rec = recordRe.exec(line);
      if (rec) return { t: 'record', uuid: (rec[1] as string).toLowerCase() };
      if (grammar.protectedCheck.test(line)) return { t: 'protectedCheck', xyz: (grammar.protectedCheck.exec(line) ?? []).slice(1).map(Number) };
      if (grammar.touchCheck?.test(line)) return { t: 'touchCheck', xyz: (grammar.touchCheck.exec(line) ?? []).slice(1).map(Number) };
      if (line.startsWith(open) && line.endsWith(close)) {
        const inner = line.slice(open.length, line.length - close.length);
        if (!inner.includes(open) && !inner.includes(close)) return { t: 'comment', text: inner };
      }
      return block(line);
    },
  };

  function block(line: string): ReadLine {
      const codes: string[] = [];
      const w: Record<string, number> = {};
      const unknown: string[] = [];
      for (const tok of line.split(' ')) {
        if (tok === '') continue;
        const letter = tok[0] as string;
        const value = numberOf(tok);
        if (value === null) { unknown.push(tok); continue; }
        if (letter === 'G' || letter === 'M') {
          const code = `${letter}${value}`;
          if (known.has(code) || known.has(tok)) codes.push(known.has(tok) ? tok : code);
          else unknown.push(tok);
        } else if (axisWords.has(letter) || letter === 'F') {
          w[letter] = value;
        } else if (known.has(tok)) {
          codes.push(tok);
        } else {
          unknown.push(tok);
        }
      }
      if (codes.length === 0 && Object.keys(w).length === 0) return { t: 'unknown', text: line };
      return { t: 'block', codes, words: w, unknown };
  }
}
