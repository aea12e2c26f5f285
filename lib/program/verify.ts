/**
 * `verify`: reads a posted program back with the post's grammar and replays it through
 * forward kinematics against the plan, part, probe and machine (spec/engine-cli.md).
 * Part frame P for geometry, machine axes in the program's work offset (= M).
 *
 * Findings (`code`, severity error unless noted): CAUTION_MISSING, UNKNOWN_WORD,
 * AXIS_LIMIT, ROTARY_BELOW_CLEARANCE, RAPID_BELOW_CLEARANCE, UNPROTECTED_MOVE,
 * UNSAFE_PATH, CHECK_MISSING, MEASURE_OFF_PLAN, MEASURE_TOO_LONG, BACKOFF_MISSING,
 * RECORD_MISSING, RETRACT_MISSING, UNKNOWN_POINT, POINT_NOT_MEASURED, and the warnings
 * POINT_MEASURED_TWICE, SAFE_START_MISSING. Tolerance on plan positions: 0.01 mm.
 */
import { distance, dot, norm, sub, type Vec3 } from '../geometry/vec3';
import { forwardKinematics, type Pose } from '../kinematics/forward';
import { linearAxesIn, rotarySetting, type RotarySetting } from '../kinematics/inverse';
import { prepareMachine, type PreparedMachine } from '../kinematics/machine';
import type { AxisValues } from '../kinematics/schema';
import { featureAxis, featureFrame, featureTop, inFreeSpace, isInterior, type FeatureFrame } from '../features/feature-geometry';
import { partClearances, probeRadius, safeHeights } from '../features/clearance';
import type { Feature, Part, Probe } from '../features/schema';
import type { Machine } from '../kinematics/schema';
import type { Plan, TouchPoint } from './plan-schema';
import type { ReadyPost } from '../../postprocessors/index';
import { BLOCK, COMMENT, FEED, makeReader, PROTECTED, PROTECTED_CHECK, RAPID, ReadSlot, RECORD, recordUuid, recordUuidIs, SKIP, TOUCH, TOUCH_CHECK, UNKNOWN, type Reader } from './verify-read';
import { CAUTION_PHRASES } from './view-model';

export interface Finding { line: number; code: string; severity: 'error' | 'warning'; message: string }
export interface VerifyResult { ok: boolean; findings: Finding[] }
export interface VerifyInput { program: string; part: Part; probe: Probe; machine: Machine; plan: Plan }

/** Plan positions: a measuring move's start or end further off than this is a finding (mm). */
export const PLAN_TOL_MM = 0.01;
const SAFE_TOL_MM = 0.01;
const Z_TOP_TOL_MM = 0.001;

/** Replay frame at one rotary setting: tip_P = o + x·X + y·Y + z·Z, tool axis, safe-plane height. */
interface Frame { o: Vec3; x: Vec3; y: Vec3; z: Vec3; axis: Vec3; safe: number }

type Kind = 'rapid' | 'feed' | 'protected' | 'touch';
type Phase = 'free' | 'afterFast' | 'afterBackoff' | 'afterSlow' | 'afterRecord';
type Add = (l: number, c: string, m: string, s?: Finding['severity']) => void;

interface Ctx {
  pm: PreparedMachine; part: Part; probe: Probe; r: number; zTop: number;
  features: Map<string, { f: Feature; frame: FeatureFrame; axis: Vec3; clearance: number; top: Vec3 }>;
  points: Points;
  /** Safe-plane height along a tool axis (safeHeight). */
  safeAlong: (t: Vec3) => number;
  /** Replay frames by rotary setting (see FrameCache). */
  frames: Map<string, Frame>;
  findings: Finding[];
}

const fmt = (p: Vec3) => `[${p.map((v) => v.toFixed(3)).join(', ')}]`;

/** The program's lines, read in place: line i is text[start(i), end(i)). */
class Lines {
  readonly count: number;
  /** Where each line starts; at count, the text's length + 1. */
  private readonly starts: Int32Array;
  constructor(readonly text: string, readonly reader: Reader) {
    let starts = new Int32Array(1024);
    let n = 1;
    for (let p = text.indexOf('\n'); ; p = text.indexOf('\n', p + 1)) {
      if (n === starts.length) { const grown = new Int32Array(2 * n); grown.set(starts); starts = grown; }
      if (p === -1) break;
      starts[n++] = p + 1;
    }
    starts[n] = text.length + 1;
    this.count = n;
    this.starts = starts;
  }
  start(i: number): number { return this.starts[i]!; }
  end(i: number): number { return this.starts[i + 1]! - 1; }
  /** Reads line i into slot (past the last line: a blank line). */
  read(i: number, slot: ReadSlot): ReadSlot {
    if (i >= this.count) this.reader.read('', 0, 0, slot);
    else this.reader.read(this.text, this.starts[i]!, this.starts[i + 1]! - 1, slot);
    return slot;
  }
}

export function verifyProgram(input: VerifyInput, post: ReadyPost): VerifyResult {
  const pm = prepareMachine(input.machine);
  const rotaryNames = pm.rotaries.map((r) => r.name).sort();
  const reader = makeReader(post.bundle.definition, post.bundle.grammar, rotaryNames, (input.part.number ?? 'program').replace(/[^A-Za-z0-9-]/g, ''));
  const lines = new Lines(input.program, reader);
  const clearances = partClearances(input.part, input.probe);
  const ctx: Ctx = {
    pm, part: input.part, probe: input.probe, r: probeRadius(input.probe), zTop: pm.machine.linear.Z[1],
    features: new Map(input.part.features.map((f) => [f.uuid, { f, frame: featureFrame(f), axis: featureAxis(f), clearance: clearances.get(f.uuid) ?? input.probe.clearance, top: featureTop(f) }])),
    points: pointsOf(input.plan.touchPoints),
    safeAlong: safeHeights(input.part, input.probe, clearances), frames: new Map(), findings: [],
  };
  const add: Add = (line, code, message, severity = 'error') => ctx.findings.push({ line, code, severity, message });
  checkHeader(lines, post, add);
  replay(lines, ctx, post, add);
  return { ok: !ctx.findings.some((f) => f.severity === 'error'), findings: ctx.findings };
}

function checkHeader(lines: Lines, post: ReadyPost, add: Add) {
  const texts: string[] = [];
  const slot = new ReadSlot(lines.reader.words.length);
  for (let i = 0; i < lines.count; i++) {
    lines.read(i, slot);
    if (slot.t === BLOCK) break;
    if (slot.t === COMMENT) texts.push(lines.reader.commentText(slot));
  }
  const head = texts.join(' ').toUpperCase().replace(/\s+/g, ' ');
  const missing = CAUTION_PHRASES.filter((p) => !head.includes(p));
  if (missing.length > 0) add(1, 'CAUTION_MISSING', `the safety caution is missing or incomplete before the first move (not found: ${missing.join(', ')})`);
  for (const s of post.bundle.definition.safeStart) if (!someLineEndsWith(lines, s)) add(1, 'SAFE_START_MISSING', `the modal set-up line "${s}" is missing`, 'warning');
}

/** Whether some line, trimmed, ends with s. */
function someLineEndsWith(lines: Lines, s: string): boolean {
  const text = lines.text;
  for (let i = 0; i < lines.count; i++) {
    const a = lines.start(i);
    const e = lines.end(i);
    const c = text.charCodeAt(e - 1);
    // a line without white space at its ends is its own trim
    if (e > a && c > 32 && c < 127 && text.charCodeAt(a) > 32 && text.charCodeAt(a) < 127) {
      if (e - s.length >= a && text.startsWith(s, e - s.length)) return true;
    } else if (text.slice(a, e).trim().endsWith(s)) return true;
  }
  return false;
}

/** The plan's touch points by lower-case uuid (the last one of a uuid), listed in first-seen order. */
interface Points { index: Map<string, number>; keys: string[]; list: TouchPoint[] }

function pointsOf(touchPoints: TouchPoint[]): Points {
  const out: Points = { index: new Map(), keys: [], list: [] };
  for (const tp of touchPoints) {
    const key = tp.uuid.toLowerCase();
    const k = out.index.get(key);
    if (k !== undefined) out.list[k] = tp;
    else { out.index.set(key, out.list.length); out.keys.push(key); out.list.push(tp); }
  }
  return out;
}

/**
 * The trip records that give lines their context (lines holding TRIP that read as records):
 * line numbers in order, uuids and touch points (index into Points, -1 for none). A line
 * works toward the next record (at or after it) and leaves the last one before it.
 */
class Records {
  readonly at: number[] = [];
  readonly uuid: string[] = [];
  readonly point: number[] = [];
  /** Where reading in order has got to (see read). */
  private readAt = 0;
  constructor(private readonly points: Points) {}
  /** The touch point of record r, or null. */
  tp(r: number): TouchPoint | null { const k = this.point[r]!; return k >= 0 ? this.points.list[k]! : null; }
  /** Reads line j (lines in order) into slot; a record is already read. */
  read(lines: Lines, j: number, slot: ReadSlot) {
    while (this.readAt < this.at.length && this.at[this.readAt]! < j) this.readAt++;
    if (this.readAt < this.at.length && this.at[this.readAt] === j) slot.t = RECORD;
    else lines.read(j, slot);
  }
}

function contextRecords(lines: Lines, points: Points): Records {
  const out = new Records(points);
  const slot = new ReadSlot(lines.reader.words.length);
  const text = lines.text;
  let i = 0;
  let last = -1;
  for (let p = text.indexOf('TRIP'); p !== -1 && i < lines.count; p = text.indexOf('TRIP', lines.start(i))) {
    while (lines.end(i) < p + 4) i++;
    if (lines.read(i, slot).t === RECORD) {
      // records usually follow the plan's order: try the point after the last one first
      const guess = last + 1;
      if (guess < points.keys.length && recordUuidIs(slot, points.keys[guess]!)) last = guess;
      else { const key = recordUuid(slot); last = points.index.get(key) ?? -1; }
      out.at.push(i);
      out.uuid.push(last >= 0 ? points.keys[last]! : recordUuid(slot));
      out.point.push(last);
    }
    i++;
  }
  return out;
}

const G90 = 1;
const G91 = 2;

/** The move kind a block's codes give (the first motion code decides), or null. */
function classify(l: ReadSlot, next: ReadSlot, reader: Reader): Kind | null {
  for (let k = 0; k < l.nCodes; k++) {
    const c = reader.codeKind[l.codes[k]!];
    if (c === RAPID) return 'rapid';
    if (c === FEED) return 'feed';
    if (c === PROTECTED) return 'protected';
    if (c === TOUCH) return 'touch';
    if (c === SKIP) return next.t === TOUCH_CHECK ? 'touch' : 'protected';
  }
  return null;
}

/**
 * Machine axis state during replay, by word index (X, Y, Z, then the rotaries as the reader
 * orders them); `has` bit i set once word i has a value. `obj` gives it as AxisValues.
 */
class Axes {
  readonly v: Float64Array;
  has = 0;
  constructor(readonly names: string[]) { this.v = new Float64Array(names.length); }
  copyFrom(o: Axes) { this.v.set(o.v); this.has = o.has; }
  obj(): AxisValues {
    const out: AxisValues = {};
    for (let k = 0; k < this.names.length; k++) if (this.has & (1 << k)) out[this.names[k]!] = this.v[k]!;
    return out;
  }
}

function replay(lines: Lines, ctx: Ctx, post: ReadyPost, add: Add) {
  const reader = lines.reader;
  const names = reader.words.filter((_, k) => k !== reader.feed);
  const nW = names.length;
  const XYZ = 0b111;
  const rot = ctx.pm.rotaries.map((r) => names.indexOf(r.name));
  let rotMask = 0;
  for (const k of rot) if (k >= 0) rotMask |= 1 << k;
  const axisMask = (1 << nW) - 1;
  const modeOf = new Uint8Array(reader.codes.map((c) => (c === 'G90' ? G90 : c === 'G91' ? G91 : 0)));
  const limits = linearLimits(ctx);
  const records = contextRecords(lines, ctx.points);
  const nRec = records.at.length;
  let rec = 0;
  const measured = new Uint8Array(ctx.points.list.length);
  const pos = new Axes(names);
  const from = new Axes(names);
  const frames = new FrameCache(ctx, rot);
  const trips = new TripCache(ctx, pos, rot);
  const probing = new ProbingLines();
  let incremental = false;
  let modal: Kind | null = null;
  let phase: Phase = 'free';
  let lastTouch: TouchPoint | null = null;
  const needsCheck = post.bundle.grammar.touchCheck !== null;
  let frame: Frame | null = null;
  let lastPose: Pose | null = null;
  const poses: Pose[] = Array.from({ length: 3 }, () => ({ tip: [0, 0, 0], axis: [0, 0, 1] }));
  let l = new ReadSlot(reader.words.length);
  let next = new ReadSlot(reader.words.length);
  records.read(lines, 0, next);
  for (let i = 0; i < lines.count; i++) {
    const t = l;
    l = next;
    next = t;
    records.read(lines, i + 1, next);
    const ln = i + 1;
    while (rec < nRec && records.at[rec]! < i) rec++;
    if (l.t === UNKNOWN) { add(ln, 'UNKNOWN_WORD', `"${l.text().slice(0, 60)}" is not a statement the ${post.bundle.definition.id} post writes`); continue; }
    if (l.t === RECORD) {
      const context = rec < nRec && records.at[rec] === i;
      const uuid = context ? records.uuid[rec]! : recordUuid(l);
      const point = context ? records.point[rec]! : ctx.points.index.get(uuid) ?? -1;
      if (point < 0) add(ln, 'UNKNOWN_POINT', `record for ${uuid}, which is not a touch point of the plan`);
      else if (measured[point]) add(ln, 'POINT_MEASURED_TWICE', `touch point ${uuid} is recorded again`, 'warning');
      if (phase !== 'afterSlow') add(ln, 'RECORD_MISSING', `record of ${uuid} without a measuring touch just before it`);
      if (point >= 0) measured[point] = 1;
      phase = 'afterRecord';
      continue;
    }
    if (l.t !== BLOCK) continue;
    if (l.unknown.length > 0) add(ln, 'UNKNOWN_WORD', `unknown word(s) ${l.unknown.join(' ')} for the ${post.bundle.definition.id} post`);
    let modes = 0;
    for (let k = 0; k < l.nCodes; k++) modes |= modeOf[l.codes[k]!]!;
    if (modes & G91) incremental = true;
    if (modes & G90) incremental = false;
    const kind: Kind | null = classify(l, next, reader) ?? modal;
    if (kind && kind !== 'touch' && kind !== 'protected') modal = kind;
    const words = l.mask & axisMask;
    if (words === 0 || kind === null) continue;
    const linearWord = (words & XYZ) !== 0;
    const hasRot = (words & rotMask) !== 0;
    const hasZ = (pos.has & 4) !== 0;
    const fromZ = hasZ ? pos.v[2]! : -Infinity;
    const fromCopied = hasRot || !lastPose;
    if (fromCopied) from.copyFrom(pos);
    const known = (pos.has & XYZ) === XYZ;
    for (let k = 0; k < nW; k++) {
      if (words & (1 << k)) pos.v[k] = incremental ? pos.v[k]! + l.values[k]! : l.values[k]!;
    }
    pos.has |= words;
    checkLimits(ctx, pos, limits, rot, ln, add);
    let rotaryMoved = false;
    if (fromCopied && hasRot) {
      for (const k of rot) if (k >= 0 && words & (1 << k) && Math.abs(from.v[k]! - pos.v[k]!) > 1e-9) { rotaryMoved = true; break; }
    }
    if (rotaryMoved && (fromZ < ctx.zTop - Z_TOP_TOL_MM || linearWord)) {
      add(ln, 'ROTARY_BELOW_CLEARANCE', `rotary move with Z at ${(hasZ ? fromZ : NaN).toFixed(3)} or together with a linear move; rotaries may move only alone with Z at the top of its travel (${ctx.zTop})`);
    }
    if ((kind === 'protected' || kind === 'touch') && !checkFollows(next, kind, needsCheck, post)) {
      add(ln, 'CHECK_MISSING', kind === 'protected' ? 'protected move without the unexpected-trigger check after it' : 'touch without the no-trigger check after it');
    }
    if (!known) continue;
    if (!frame || hasRot) frame = frames.at(pos);
    // three pose buffers: b never overwrites a or the last pose
    const a = lastPose && !rotaryMoved ? lastPose : poseIn(frames.at(from), from.v, poses[0] === lastPose ? poses[1]! : poses[0]!);
    const b = poseIn(frame, pos.v, poses[0] !== a && poses[0] !== lastPose ? poses[0]! : poses[1] !== a && poses[1] !== lastPose ? poses[1]! : poses[2]!);
    lastPose = b;
    const tp = rec < nRec ? records.tp(rec) : null;
    const left = rec > 0 ? records.tp(rec - 1) : null;
    if (kind === 'touch') {
      phase = measureMove(ctx, phase, tp, a.tip, b.tip, ln, add);
      lastTouch = tp;
      // replay the trip at nominal contact (the stylus stops at the surface, not at `end`)
      if (tp && probing.holds(tp, b.tip, true)) {
        trips.moveTo(tp);
        lastPose = null;
      }
      continue;
    }
    if (phase !== 'free') {
      phase = afterTouch(phase, kind, incremental, lastTouch !== null && probing.holds(lastTouch, b.tip, false), ln, add);
      if (phase === 'free' || phase === 'afterBackoff') continue;
    }
    // high: at or above the safe plane along the tool axis, or Z at the top of its travel
    const H = frame.safe - SAFE_TOL_MM;
    const zHigh = ctx.zTop - Z_TOP_TOL_MM;
    const ax = b.axis;
    const aHigh = a.tip[0] * ax[0] + a.tip[1] * ax[1] + a.tip[2] * ax[2] >= H || fromZ >= zHigh; // dot(a.tip, ax)
    const bHigh = b.tip[0] * ax[0] + b.tip[1] * ax[1] + b.tip[2] * ax[2] >= H || pos.v[2]! >= zHigh;
    if (!(aHigh && bHigh)) checkPath(ctx, kind, aHigh, bHigh, a, b, frame, tp, left, ln, add);
  }
  for (let k = 0; k < ctx.points.list.length; k++) {
    const tp = ctx.points.list[k]!;
    if (!measured[k]) add(lines.count, 'POINT_NOT_MEASURED', `touch point ${tp.seq} (${tp.uuid}) of the plan is never measured`);
  }
}

/**
 * The trip replayed at nominal contact: the linear axes that put the tip on tp's target at the
 * current rotaries, as linearAxesFor gives them (the rotary setting kept while the rotaries
 * stay, the axes for the last point, as its two touches share them).
 */
class TripCache {
  private setting: RotarySetting | null = null;
  private tp: TouchPoint | null = null;
  private readonly xyz: Vec3 = [0, 0, 0];
  private readonly at: Float64Array;
  constructor(private readonly ctx: Ctx, private readonly pos: Axes, private readonly rot: number[]) { this.at = new Float64Array(rot.length); }
  moveTo(tp: TouchPoint) {
    const { pos, rot, at } = this;
    const pm = this.ctx.pm;
    let same = this.setting !== null;
    for (let j = 0; j < rot.length && same; j++) same = sameValue(rotaryAngle(pos, rot[j]!), at[j]!);
    if (!same) {
      this.setting = rotarySetting(pm, pos.obj());
      this.tp = null;
      for (let j = 0; j < rot.length; j++) at[j] = rotaryAngle(pos, rot[j]!);
    }
    if (this.tp !== tp) {
      linearAxesIn(pm, this.setting!, tp.target, this.xyz);
      this.tp = tp;
    }
    pos.v[0] = this.xyz[0];
    pos.v[1] = this.xyz[1];
    pos.v[2] = this.xyz[2];
  }
}

/** Object.is for numbers (0 and -0 differ, NaN is NaN). */
const sameValue = (x: number, y: number): boolean => (x === y ? x !== 0 || 1 / x === 1 / y : x !== x && y !== y);

/** A rotary's value in axes (missing = 0). */
const rotaryAngle = (axes: Axes, k: number): number => (k >= 0 && axes.has & (1 << k) ? axes.v[k]! : 0);

function checkFollows(next: ReadSlot, kind: 'protected' | 'touch', needsTouchCheck: boolean, post: ReadyPost): boolean {
  if (kind === 'protected') return next.t === PROTECTED_CHECK;
  if (!needsTouchCheck) return true;
  return next.t === TOUCH_CHECK || post.bundle.grammar.touchCheck === null;
}

interface Limits { lo: number[]; hi: number[] }
const linearLimits = (ctx: Ctx): Limits => {
  const lin = ctx.pm.machine.linear;
  return { lo: [lin.X[0], lin.Y[0], lin.Z[0]], hi: [lin.X[1], lin.Y[1], lin.Z[1]] };
};

function checkLimits(ctx: Ctx, pos: Axes, lim: Limits, rot: number[], ln: number, add: Add) {
  for (let k = 0; k < 3; k++) {
    const v = pos.v[k]!;
    if (pos.has & (1 << k) && (v < lim.lo[k]! - 1e-6 || v > lim.hi[k]! + 1e-6)) add(ln, 'AXIS_LIMIT', `${pos.names[k]}${v.toFixed(3)} is outside its travel ${lim.lo[k]} to ${lim.hi[k]} mm`);
  }
  for (let j = 0; j < rot.length; j++) {
    const r = ctx.pm.rotaries[j]!;
    const k = rot[j]!;
    const v = pos.v[k]!;
    if (k >= 0 && pos.has & (1 << k) && r.min !== null && r.max !== null && (v < r.min - 1e-6 || v > r.max + 1e-6)) add(ln, 'AXIS_LIMIT', `${r.name}${v.toFixed(3)} is outside its travel ${r.min} to ${r.max}°`);
  }
}

/**
 * Forward kinematics for replay: at fixed rotary angles fk is affine in X, Y, Z, so the
 * map is built once per rotary setting (from fk itself) and applied per line.
 */
class FrameCache {
  private last: Frame | null = null;
  private readonly lastAt: Float64Array;
  constructor(private readonly ctx: Ctx, private readonly rot: number[]) { this.lastAt = new Float64Array(rot.length); }
  /** The frame at the axes' rotary values (a missing rotary is at 0). */
  at(axes: Axes): Frame {
    const { rot, lastAt } = this;
    let same = this.last !== null;
    for (let j = 0; j < rot.length && same; j++) {
      const v = rotaryAngle(axes, rot[j]!);
      // same key text as before: equal numbers (0 and -0 both print 0), or NaN again
      same = v === lastAt[j] || (v !== v && lastAt[j] !== lastAt[j]);
    }
    if (same) return this.last!;
    let key = '';
    for (let j = 0; j < rot.length; j++) { lastAt[j] = rotaryAngle(axes, rot[j]!); key += `${lastAt[j]},`; }
    const ctx = this.ctx;
    let m = ctx.frames.get(key);
    if (!m) {
      const at = axes.obj();
      const base = forwardKinematics(ctx.pm, { ...at, X: 0, Y: 0, Z: 0 });
      const col = (k: 'X' | 'Y' | 'Z') => sub(forwardKinematics(ctx.pm, { ...at, X: 0, Y: 0, Z: 0, [k]: 1 }).tip, base.tip);
      m = { o: base.tip, x: col('X'), y: col('Y'), z: col('Z'), axis: base.axis, safe: ctx.safeAlong(base.axis) };
      ctx.frames.set(key, m);
    }
    this.last = m;
    return m;
  }
}

/** Tip and tool axis in the part frame at axes X, Y, Z (v[0..2], missing = 0), written into out. */
function poseIn(m: Frame, v: Float64Array, out: Pose): Pose {
  const X = v[0]!;
  const Y = v[1]!;
  const Z = v[2]!;
  out.tip[0] = m.o[0] + m.x[0] * X + m.y[0] * Y + m.z[0] * Z;
  out.tip[1] = m.o[1] + m.x[1] * X + m.y[1] * Y + m.z[1] * Z;
  out.tip[2] = m.o[2] + m.x[2] * X + m.y[2] * Y + m.z[2] * Z;
  out.axis = m.axis;
  return out;
}

/**
 * Math.hypot(x, y, z) against a limit, decided from the sum of squares where that is far from
 * the limit (1e-9 relative, against a rounding error of a few 1e-16): -1 below, 1 above, 0 when
 * only the hypot itself can tell.
 */
function hypotSide(x: number, y: number, z: number, limit: number): number {
  const l2 = limit * limit;
  if (!(l2 > 1e-290 && l2 < Infinity && limit > 0)) return 0;
  const q = x * x + y * y + z * z;
  return q < l2 * (1 - 1e-9) ? -1 : q > l2 * (1 + 1e-9) ? 1 : 0;
}

/** distance(a, b) > limit. */
function farther(a: Vec3, b: Vec3, limit: number): boolean {
  const side = hypotSide(a[0] - b[0], a[1] - b[1], a[2] - b[2], limit);
  return side === 0 ? distance(a, b) > limit : side > 0;
}

function measureMove(ctx: Ctx, phase: Phase, tp: TouchPoint | null, a: Vec3, b: Vec3, ln: number, add: Add): Phase {
  if (!tp) { add(ln, 'UNKNOWN_POINT', 'a touch with no touch-point record after it'); return 'afterFast'; }
  const limit = ctx.probe.approach + ctx.probe.overtravel + PLAN_TOL_MM;
  if (farther(b, tp.end, PLAN_TOL_MM)) add(ln, 'MEASURE_OFF_PLAN', `touch ends at ${fmt(b)}, ${distance(b, tp.end).toFixed(3)} mm from the plan's end ${fmt(tp.end)} of touch point ${tp.seq}`);
  if (farther(a, b, limit)) add(ln, 'MEASURE_TOO_LONG', `touch is ${distance(a, b).toFixed(3)} mm long, more than approach + overtravel (${(limit - PLAN_TOL_MM).toFixed(3)} mm)`);
  if (phase === 'free') {
    if (farther(a, tp.start, PLAN_TOL_MM)) add(ln, 'MEASURE_OFF_PLAN', `touch starts at ${fmt(a)}, ${distance(a, tp.start).toFixed(3)} mm from the plan's start ${fmt(tp.start)} of touch point ${tp.seq}`);
    return 'afterFast';
  }
  if (phase === 'afterBackoff') return 'afterSlow';
  add(ln, 'BACKOFF_MISSING', `touch of point ${tp.seq} while the stylus may still be in contact (no back-off before it)`);
  return 'afterSlow';
}

/**
 * Whether a point lies on the probing line of a touch point, between `from` (its end, or its
 * target) and its start. The line of the last point asked about is kept, per `from`.
 */
class ProbingLines {
  private readonly tp: (TouchPoint | null)[] = [null, null];
  private readonly d: Vec3[] = [[0, 0, 0], [0, 0, 0]];
  private readonly len = [0, 0];
  holds(tp: TouchPoint, p: Vec3, fromEnd: boolean): boolean {
    const k = fromEnd ? 1 : 0;
    const from = fromEnd ? tp.end : tp.target;
    if (this.tp[k] !== tp) {
      this.tp[k] = tp;
      this.d[k] = sub(tp.start, from);
      this.len[k] = norm(this.d[k]!);
    }
    const d = this.d[k]!;
    const len = this.len[k]!;
    // q = p - from; along the line s = q·d / len², off it |q × d| / len (as dot, cross and norm give them)
    const q0 = p[0] - from[0];
    const q1 = p[1] - from[1];
    const q2 = p[2] - from[2];
    const s = (q0 * d[0] + q1 * d[1] + q2 * d[2]) / (len * len);
    if (!(s >= -PLAN_TOL_MM / len && s <= 1 + PLAN_TOL_MM / len)) return false;
    const c0 = q1 * d[2] - q2 * d[1];
    const c1 = q2 * d[0] - q0 * d[2];
    const c2 = q0 * d[1] - q1 * d[0];
    const side = len > 0 && len < Infinity ? hypotSide(c0, c1, c2, PLAN_TOL_MM * len) : 0;
    return side === 0 ? norm([c0, c1, c2]) / len <= PLAN_TOL_MM : side < 0;
  }
}

function afterTouch(phase: Phase, kind: Kind, incremental: boolean, away: boolean, ln: number, add: Add): Phase {
  if (phase === 'afterFast') {
    if (kind === 'feed' && incremental && away) return 'afterBackoff';
    add(ln, 'BACKOFF_MISSING', 'after a touch the next move must back off along the probing line');
    return 'free';
  }
  if (phase === 'afterSlow') add(ln, 'RECORD_MISSING', 'measuring touch not followed by its record');
  if (kind === 'feed' && !incremental && away) return 'free';
  add(ln, 'RETRACT_MISSING', 'after a measuring touch the next move must retract along the probing line to the start');
  return 'free';
}

/** A move below the safe plane must be along the tool axis, inside a bore's or slot's free space, or at an exterior feature's clearance. */
function checkPath(ctx: Ctx, kind: Kind, aHigh: boolean, bHigh: boolean, a: Pose, b: Pose, frame: Frame, tp: TouchPoint | null, left: TouchPoint | null, ln: number, add: Add) {
  if (kind === 'rapid') {
    // the plane as H + SAFE_TOL_MM with H = safe - SAFE_TOL_MM, as it has always been printed
    add(ln, 'RAPID_BELOW_CLEARANCE', `rapid move to ${fmt(b.tip)} (part frame) below the safe plane ${(frame.safe - SAFE_TOL_MM + SAFE_TOL_MM).toFixed(3)} mm along the tool axis`);
    return;
  }
  if (kind === 'feed') {
    add(ln, 'UNPROTECTED_MOVE', `unprotected feed move below the safe plane to ${fmt(b.tip)} (part frame) that is not a back-off or retract`);
    return;
  }
  if (alongAxis(a.tip, b.tip, b.axis)) return;
  if (clearOfPart(ctx, tp, a.tip, b.tip, aHigh, bHigh) || clearOfPart(ctx, left, a.tip, b.tip, aHigh, bHigh)) return;
  add(ln, 'UNSAFE_PATH', `protected move from ${fmt(a.tip)} to ${fmt(b.tip)} (part frame) crosses near the part below clearance, neither along the tool axis nor inside a bore or slot`);
}

/** Whether a → b is (nearly) no move or along t: with d = b - a, norm(d) < 1e-9 or norm(d × t) <= 1e-3 norm(d). */
function alongAxis(a: Vec3, b: Vec3, t: Vec3): boolean {
  const d0 = b[0] - a[0];
  const d1 = b[1] - a[1];
  const d2 = b[2] - a[2];
  const c0 = d1 * t[2] - d2 * t[1];
  const c1 = d2 * t[0] - d0 * t[2];
  const c2 = d0 * t[1] - d1 * t[0];
  const tiny = hypotSide(d0, d1, d2, 1e-9);
  if (tiny < 0) return true;
  if (tiny > 0) {
    // 1e-3 norm(d) against norm(d × t) by their squares, when far apart (1e-6 relative)
    const qd = (d0 * d0 + d1 * d1 + d2 * d2) * 1e-6;
    const qc = c0 * c0 + c1 * c1 + c2 * c2;
    if (qd > 1e-290 && qd < 1e290 && qc < 1e290) {
      if (qc < qd * (1 - 1e-6)) return true;
      if (qc > qd * (1 + 1e-6)) return false;
    }
  }
  const len = norm([d0, d1, d2]);
  return len < 1e-9 || norm([c0, c1, c2]) <= 1e-3 * len;
}

/** Whether a move a → b stays in the free space of tp's bore or slot, or at its exterior feature's clearance. */
function clearOfPart(ctx: Ctx, tp: TouchPoint | null, a: Vec3, b: Vec3, aHigh: boolean, bHigh: boolean): boolean {
  const feat = tp ? ctx.features.get(tp.featureUuid) : undefined;
  if (!feat) return false;
  if (isInterior(feat.f)) return inFreeSpace(feat.f, feat.frame, a, ctx.r, SAFE_TOL_MM) && inFreeSpace(feat.f, feat.frame, b, ctx.r, SAFE_TOL_MM);
  const n = feat.axis;
  const hc = dot(feat.top, n) + feat.clearance - SAFE_TOL_MM;
  return (aHigh || dot(a, n) >= hc) && (bHigh || dot(b, n) >= hc);
}
