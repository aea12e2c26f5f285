/**
 * Reads a posted program back line by line with the post's own grammar: blocks of words,
 * comments, trip records, the checks after probe moves, and the statements the
 * definition and templates write verbatim. Anything else is an unknown line.
 *
 * Built for 100,000-line programs: a line is scanned in place in the program text into a
 * reusable slot (word values by index with a presence mask, codes as small numbers);
 * strings are cut only for what a finding or a further test needs.
 */
import type { PostDefinition } from './postprocessor-schema';
import type { PostGrammar } from './render';

/** Line kinds (`ReadSlot.t`). */
export const BLANK = 0;
export const COMMENT = 1;
export const RECORD = 2;
export const FIXED = 3;
export const PROTECTED_CHECK = 4;
export const TOUCH_CHECK = 5;
export const BLOCK = 6;
export const UNKNOWN = 7;

/** What a motion code makes a block (`Reader.codeKind`); SKIP is told apart by the line after it. */
export const NO_MOTION = 0;
export const RAPID = 1;
export const FEED = 2;
export const PROTECTED = 3;
export const TOUCH = 4;
export const SKIP = 5;

/** One read line. `src.slice(start, end)` is the line as read: trimmed, tabs as spaces, block number removed. */
export class ReadSlot {
  t = BLANK;
  src = '';
  start = 0;
  end = 0;
  /** Record: where its uuid starts in src. */
  uuidAt = 0;
  /** Block: code indices into `Reader.codes`, in line order (first `nCodes`). */
  codes: number[] = [];
  nCodes = 0;
  /** Block: word values by index into `Reader.words`; bit i of `mask` set when word i is present. */
  values: Float64Array;
  mask = 0;
  /** Block: the words not understood. */
  unknown: string[] = [];
  constructor(words: number) { this.values = new Float64Array(words); }
  text(): string { return this.src.slice(this.start, this.end); }
}

/** A record's uuid, lower case (slot.t === RECORD). */
export const recordUuid = (slot: ReadSlot): string => slot.src.slice(slot.uuidAt, slot.uuidAt + 36).toLowerCase();

/** Whether a record's uuid is `key` (lower case), without cutting it out. */
export function recordUuidIs(slot: ReadSlot, key: string): boolean {
  if (key.length !== 36) return false;
  if (slot.src.startsWith(key, slot.uuidAt)) return true;
  for (let j = 0; j < 36; j++) {
    const c = slot.src.charCodeAt(slot.uuidAt + j);
    if ((c >= 65 && c <= 70 ? c + 32 : c) !== key.charCodeAt(j)) return false;
  }
  return true;
}

const isDigit = (c: number) => c >= 48 && c <= 57;
/** Exact powers of ten (10^22 is the largest exact double power of ten). */
const POW10 = Array.from({ length: 23 }, (_, i) => Number(`1e${i}`));
const TWO_53 = 2 ** 53;

/** Neither white space nor a line end (so trim() leaves it). */
const TRIM_SAFE = (c: number) => c > 32 && c < 127;
/** Whether src[a, b) spells c (startsWith compares long texts faster than a loop). */
function spells(c: string, src: string, a: number, b: number): boolean {
  if (c.length !== b - a) return false;
  if (c.length > 12) return src.startsWith(c, a);
  for (let j = 0; j < c.length; j++) if (c.charCodeAt(j) !== src.charCodeAt(a + j)) return false;
  return true;
}

/** A scanned word: letter, sign (0, or 45 for -, 43 for +), digits, their value as an integer, digits after the point (-1: no point). */
class Word {
  letter = 0;
  sign = 0;
  m = 0;
  digits = 0;
  frac = -1;
  /** m is exact (below 2^53) and the point at most 22 digits in. */
  exact = false;
  /** The word's number, NaN when the text is not a word. */
  value = NaN;
}

/**
 * Scans the token at src[a, …) up to a space or e into w; returns where it ends. A word is a
 * letter A–Z then an optionally signed decimal; its value equals Number() of the text: an
 * integer below 2^53 over an exact power of ten is one correctly rounded division, as Number()
 * rounds (IEEE 754 §5.4.2); longer texts go to Number().
 */
function scanInto(w: Word, src: string, a: number, e: number): number {
  const c = src.charCodeAt(a);
  let b = a + 1;
  let ok = c >= 65 && c <= 90;
  let sign = 0;
  let m = 0;
  let digits = 0;
  let frac = -1;
  if (b < e) {
    const d = src.charCodeAt(b);
    if (d === 45 || d === 43) { sign = d; b++; }
  }
  for (; b < e; b++) {
    const d = src.charCodeAt(b);
    if (d === 32) break;
    if (d >= 48 && d <= 57) { m = m * 10 + (d - 48); digits++; if (frac >= 0) frac++; }
    else if (d === 46 && frac < 0) frac = 0;
    else ok = false; // a second point (Number() gives NaN) or another character
  }
  w.letter = c;
  w.sign = sign;
  w.m = m;
  w.digits = digits;
  w.frac = frac;
  w.exact = m < TWO_53 && frac <= 22;
  w.value = NaN;
  if (ok && digits > 0) {
    if (w.exact) w.value = sign === 45 ? -(frac > 0 ? m / POW10[frac]! : m) : frac > 0 ? m / POW10[frac]! : m;
    else { const v = Number(src.slice(a + 1, b)); if (Number.isFinite(v)) w.value = v; }
  }
  return b;
}

/** A code of the definition scanned as a word; `exact` false when it is not a whole word. */
function scanWord(c: string, a: number, e: number): Word {
  const w = new Word();
  if (c.length === 0 || scanInto(w, c, a, e) !== e || w.value !== w.value) w.exact = false;
  return w;
}

/**
 * A reader for one post's programs. A class, so that its methods are the same functions from one
 * program to the next (the engine keeps their optimised code).
 */
export class Reader {
  /** Trip position words X, Y, Z then the rotaries (by letter), and last F. */
  readonly words: string[];
  /** Index of F in `words`. */
  readonly feed: number;
  readonly codes: string[];
  readonly codeKind: Uint8Array;
  private readonly grammar: PostGrammar;
  private readonly recPre: string;
  private readonly recPost: string;
  private readonly fixed: Set<string>;
  private readonly fixedKeys: Set<number>;
  private readonly fixedFirst = new Uint8Array(128);
  private readonly fixedNonAscii: boolean;
  /** G and M codes by number (code = letter + String(value), as a block writes it). */
  private readonly gCodes = new Map<number, number>();
  private readonly mCodes = new Map<number, number>();
  /**
   * Known codes as words: letter, sign, digits, their integer value and the digits after the
   * point (-1: no point) spell one text, so a scanned word is a known code when all five match.
   */
  private readonly spelledAs: Word[];
  private readonly wordAt = new Int8Array(128).fill(-1);
  private readonly numberLetter: number;
  private readonly open: string;
  private readonly close: string;
  private readonly labels: string[];
  /** First characters of the label prefixes (all, for an empty prefix). */
  private readonly labelFirst = new Uint8Array(128);
  private readonly checksStateless: boolean;
  private readonly scratch = new Word();
  /** The last check line and its kind: check lines repeat word for word (a stateless test gives the same again). */
  private lastCheck = '';
  private lastCheckT = BLANK;
  /** Misses in a row; past a few the check lines differ (coordinates in them) and the memory is not asked. */
  private checkMisses = 0;
  private tabFrom = 0;
  private tabAt = -1;
  private tabSrc: string | null = null;

  constructor(def: PostDefinition, grammar: PostGrammar, rotaryNames: string[], program: string) {
    this.grammar = grammar;
    this.words = [...new Set(['X', 'Y', 'Z', ...rotaryNames, 'F'])];
    this.feed = this.words.indexOf('F');
    const values = ['X', 'Y', 'Z', ...rotaryNames].map((w) => def.trip.value.replace('{word}', w).replace('{var}', def.trip.variables[w] ?? '#0')).join(def.trip.separator);
    const [recPre, recPostRaw] = def.trip.record.split('{uuid}') as [string, string];
    this.recPre = recPre;
    this.recPost = recPostRaw.replace('{values}', values);
    const fill = (l: string) => l.replace('{program}', program);
    this.fixed = new Set([
      ...grammar.fixedLines, ...def.programStart.map(fill), ...def.programEnd, ...def.probeOn, ...def.probeOff,
      ...def.trip.open.map(fill), ...def.trip.close, ...def.stops.miss, ...def.stops.hit,
    ]);
    // a line can equal a fixed statement only if it has its length and first and last characters
    this.fixedKeys = new Set([...this.fixed].filter((l) => l !== '').map((l) => fixedKey(l, 0, l.length)));
    let nonAscii = false;
    for (const l of this.fixed) if (l !== '') { if (l.charCodeAt(0) < 128) this.fixedFirst[l.charCodeAt(0)] = 1; else nonAscii = true; }
    this.fixedNonAscii = nonAscii;
    this.codes = [...new Set(def.knownCodes)];
    this.codeKind = new Uint8Array(this.codes.map((c) => (c === 'G0' ? RAPID : c === 'G1' ? FEED : grammar.protectedCodes.includes(c) ? PROTECTED
      : grammar.touchCodes.includes(c) ? TOUCH : grammar.skipCodes.includes(c) ? SKIP : NO_MOTION)));
    this.codes.forEach((c, i) => {
      const m = c[0] === 'G' ? this.gCodes : c[0] === 'M' ? this.mCodes : null;
      if (m && `${c[0]}${Number(c.slice(1))}` === c) m.set(Number(c.slice(1)), i);
    });
    this.spelledAs = this.codes.map((c) => scanWord(c, 0, c.length));
    this.words.forEach((w, i) => { if (w.length === 1 && w.charCodeAt(0) < 128 && this.wordAt[w.charCodeAt(0)] === -1) this.wordAt[w.charCodeAt(0)] = i; });
    this.numberLetter = def.lineNumbers.enabled ? def.lineNumbers.letter.charCodeAt(0) : -1;
    this.open = def.comments.open;
    this.close = def.comments.close;
    this.labels = grammar.labelPrefixes;
    this.labelFirst.fill(this.labels.includes('') ? 1 : 0);
    for (const p of this.labels) if (p !== '' && p.charCodeAt(0) < 128) this.labelFirst[p.charCodeAt(0)] = 1;
    const stateless = (re: RegExp | null) => re === null || (!re.global && !re.sticky);
    this.checksStateless = stateless(grammar.protectedCheck) && stateless(grammar.touchCheck);
  }

  /** A comment's text (slot.t === COMMENT). */
  commentText(slot: ReadSlot): string { return slot.src.slice(slot.start + this.open.length, slot.end - this.close.length); }

  /** Reads src[s, e) (one line, without its newline) into `slot`. */
  read(src: string, s: number, e: number, slot: ReadSlot): void {
    if (s < e && !(TRIM_SAFE(src.charCodeAt(s)) && TRIM_SAFE(src.charCodeAt(e - 1)) && !this.hasTab(src, s, e))) {
      const raw = src.slice(s, e);
      src = raw.includes('\t') ? raw.replace(/\t/g, ' ').trim() : raw.trim();
      s = 0;
      e = src.length;
    }
    slot.src = src;
    slot.end = e;
    slot.start = s;
    if (s === e) { slot.t = BLANK; return; }
    const c0 = src.charCodeAt(s);
    if (c0 >= 128 || this.labelFirst[c0] === 1) for (const p of this.labels) if (p.length <= e - s && src.startsWith(p, s)) { slot.t = FIXED; return; }
    if (c0 === this.numberLetter) {
      let i = s + 1;
      while (i < e && isDigit(src.charCodeAt(i))) i++;
      if (i > s + 1 && i < e && src.charCodeAt(i) === 32) slot.start = s = i + 1;
    }
    const c = src.charCodeAt(s);
    if ((c < 128 ? this.fixedFirst[c] === 1 : this.fixedNonAscii) && this.fixedKeys.has(fixedKey(src, s, e)) && this.fixed.has(src.slice(s, e))) { slot.t = FIXED; return; }
    if (c === 71 /* G */ || c === 77 /* M */) { this.block(src, s, e, slot); return; }
    if (this.isRecord(src, s, e)) { slot.t = RECORD; slot.uuidAt = s + this.recPre.length; return; }
    if (this.lastCheck !== '' && this.checkMisses < 8) {
      if (spells(this.lastCheck, src, s, e)) { slot.t = this.lastCheckT; this.checkMisses = 0; return; }
      this.checkMisses++;
    }
    const line = src.slice(s, e);
    if (this.grammar.protectedCheck.test(line)) { slot.t = PROTECTED_CHECK; this.remember(line, PROTECTED_CHECK); return; }
    if (this.grammar.touchCheck?.test(line)) { slot.t = TOUCH_CHECK; this.remember(line, TOUCH_CHECK); return; }
    const { open, close } = this;
    if (line.startsWith(open) && line.endsWith(close)) {
      const inner = line.slice(open.length, line.length - close.length);
      if (!inner.includes(open) && !inner.includes(close)) { slot.t = COMMENT; return; }
    }
    this.block(src, s, e, slot);
  }

  private remember(line: string, t: number) {
    if (!this.checksStateless) return;
    this.lastCheck = line;
    this.lastCheckT = t;
  }

  /** Known code spelled exactly by the word w just scanned from src[a, b), or -1. */
  private codeSpelled(w: Word, src: string, a: number, b: number): number {
    const spelledAs = this.spelledAs;
    for (let k = 0; k < spelledAs.length; k++) {
      const c = spelledAs[k]!;
      if (w.exact ? c.exact && c.m === w.m && c.letter === w.letter && c.digits === w.digits && c.frac === w.frac && c.sign === w.sign : spells(this.codes[k]!, src, a, b)) return k;
    }
    return -1;
  }

  /** A block: words split at spaces (see scanInto), codes the post knows, the rest unknown. */
  private block(src: string, s: number, e: number, slot: ReadSlot): void {
    slot.nCodes = 0;
    slot.mask = 0;
    if (slot.unknown.length > 0) slot.unknown = [];
    const w = this.scratch;
    const wordAt = this.wordAt;
    let a = s;
    while (a < e) {
      const c = src.charCodeAt(a);
      if (c === 32) { a++; continue; }
      const b = scanInto(w, src, a, e);
      if (w.value !== w.value) slot.unknown.push(src.slice(a, b));
      else if (c === 71 || c === 77) {
        // the token as written if known, else letter + value (G01 → G1)
        const id = this.codeSpelled(w, src, a, b);
        const byValue = id >= 0 ? id : (c === 71 ? this.gCodes : this.mCodes).get(w.value);
        if (byValue !== undefined) slot.codes[slot.nCodes++] = byValue;
        else slot.unknown.push(src.slice(a, b));
      } else if (c < 128 && wordAt[c]! >= 0) {
        slot.values[wordAt[c]!] = w.value;
        slot.mask |= 1 << wordAt[c]!;
      } else {
        const id = this.codeSpelled(w, src, a, b);
        if (id >= 0) slot.codes[slot.nCodes++] = id;
        else slot.unknown.push(src.slice(a, b));
      }
      a = b;
    }
    slot.t = slot.nCodes === 0 && slot.mask === 0 ? UNKNOWN : BLOCK;
  }

  private isRecord(src: string, s: number, e: number): boolean {
    const { recPre, recPost } = this;
    if (e - s !== recPre.length + 36 + recPost.length || !spells(recPre, src, s, s + recPre.length) || !spells(recPost, src, e - recPost.length, e)) return false;
    for (let i = s + recPre.length, n = i + 36; i < n; i++) {
      const c = src.charCodeAt(i);
      if (!(isDigit(c) || (c >= 65 && c <= 70) || (c >= 97 && c <= 102) || c === 45)) return false;
    }
    return true;
  }

  /** Whether src[s, e) holds a tab (one forward search over a program read in order). */
  private hasTab(src: string, s: number, e: number): boolean {
    if (src !== this.tabSrc || s < this.tabFrom || (this.tabAt !== -1 && this.tabAt < s)) { this.tabSrc = src; this.tabFrom = s; this.tabAt = src.indexOf('\t', s); }
    return this.tabAt !== -1 && this.tabAt < e;
  }
}

/** A line's length, first and last characters, as one number. */
const fixedKey = (s: string, a: number, b: number) => (b - a) * 0x40000 + (s.charCodeAt(a) & 0x1ff) * 0x200 + (s.charCodeAt(b - 1) & 0x1ff);

export const makeReader = (def: PostDefinition, grammar: PostGrammar, rotaryNames: string[], program: string): Reader => new Reader(def, grammar, rotaryNames, program);
