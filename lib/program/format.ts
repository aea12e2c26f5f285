/**
 * Number and comment formatting for posted programs. Fixed decimals (no exponent, no
 * "-0"), comments in ASCII without the comment delimiters, wrapped to the post's width.
 */
import type { PostDefinition } from './postprocessor-schema';

export function fixed(v: number, decimals: number): string {
  const s = v.toFixed(decimals);
  if (s.charCodeAt(0) !== 45) return s;
  // "-0.000" → "0.000": negative only if some digit is not zero
  for (let i = 1; i < s.length; i++) {
    const c = s.charCodeAt(i);
    if (c !== 48 && c !== 46) return s;
  }
  return s.slice(1);
}

const ASCII: Record<string, string> = { '—': '-', '–': '-', '⌀': 'D', '°': ' DEG', '’': "'", '‘': "'", '“': '"', '”': '"', '×': 'X', 'µ': 'U' };

/** Comment text made safe for a control: ASCII only, no brackets or parentheses, optional upper case. */
export function cleanComment(text: string, def: PostDefinition): string {
  let s = text;
  // rebuilt from its characters, the ASCII text is also stored one byte per character
  // (a replace keeps the two-byte form of its input, and one such line makes the whole
  // program two-byte: twice the memory, slower for the verifier to scan)
  if (/[^\x20-\x7e]/.test(s)) s = s.replace(/[^\x20-\x7e]/g, (c) => ASCII[c] ?? '').split('').join('');
  s = s.replace(/[()[\]]/g, ' ').replace(/\s+/g, ' ').trim();
  return def.comments.uppercase ? s.toUpperCase() : s;
}

/** Comment lines (with delimiters) for a text, wrapped at word boundaries. */
export function commentLines(text: string, def: PostDefinition): string[] {
  const width = def.comments.maxLength - def.comments.open.length - def.comments.close.length;
  const words = cleanComment(text, def).split(' ');
  const out: string[] = [];
  let line = '';
  for (const w of words) {
    if (line && line.length + 1 + w.length > width) { out.push(line); line = ''; }
    line = line ? `${line} ${w}` : w.slice(0, width);
  }
  if (line) out.push(line);
  return out.map((l) => `${def.comments.open}${l}${def.comments.close}`);
}

/** Prefixes block numbers to every block line, leaving comments, %, program numbers, O-words and existing labels. */
export function numberLines(text: string, def: PostDefinition): string {
  const ln = def.lineNumbers;
  if (!ln.enabled) return text;
  const labels = new Set<number>();
  const labelRe = new RegExp(`^${ln.letter}(\\d+)`);
  const rows = text.split('\n');
  for (const r of rows) {
    const m = labelRe.exec(r);
    if (m) labels.add(Number(m[1]));
  }
  let n = ln.start;
  return rows.map((r) => {
    if (r === '' || r.startsWith(def.comments.open) || r.startsWith('%') || /^[Oo]/.test(r) || labelRe.test(r)) return r;
    while (labels.has(n)) n += ln.step;
    const out = `${ln.letter}${n} ${r}`;
    n += ln.step;
    return out;
  }).join('\n');
}
