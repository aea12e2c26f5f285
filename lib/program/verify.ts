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
import { cross, distance, dot, norm, sub, type Vec3 } from '../geometry/vec3';
import { forwardKinematics, type Pose } from '../kinematics/forward';
import { prepareMachine, type PreparedMachine } from '../kinematics/machine';
import { linearAxesFor } from '../kinematics/inverse';
import type { AxisValues } from '../kinematics/schema';
import { featureAxis, featureFrame, featureTop, inFreeSpace, isInterior, type FeatureFrame } from '../features/feature-geometry';
import { partClearances, probeRadius, safeHeight } from '../features/clearance';
import type { Feature, Part, Probe } from '../features/schema';
import type { Machine } from '../kinematics/schema';
import type { Plan, TouchPoint } from './plan-schema';
import type { ReadyPost } from '../../postprocessors/index';
import { makeReader, type ReadLine } from './verify-read';
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

interface Ctx {
  pm: PreparedMachine; part: Part; probe: Probe; r: number; zTop: number;
  features: Map<string, { f: Feature; frame: FeatureFrame; clearance: number; top: Vec3 }>;
  points: Map<string, TouchPoint>;
  safe: Map<string, number>;
  clearances: Map<string, number>;
  /** Replay frames by rotary setting (see partPose). */
  frames: Map<string, Frame>;
  findings: Finding[];
}

const fmt = (p: Vec3) => `[${p.map((v) => v.toFixed(3)).join(', ')}]`;

export function verifyProgram(input: VerifyInput, post: ReadyPost): VerifyResult {
  const pm = prepareMachine(input.machine);
  const rotaryNames = pm.rotaries.map((r) => r.name).sort();
  const reader = makeReader(post.bundle.definition, post.bundle.grammar, rotaryNames, (input.part.number ?? 'program').replace(/[^A-Za-z0-9-]/g, ''));
  const raw = input.program.split('\n');
  // parsed lazily (the current line and the next), so a 100,000-line program keeps no parse tree
  const cache = new Map<number, ReadLine>();
  const line = (i: number): ReadLine => {
    let v = cache.get(i);
    if (!v) {
      v = reader.read(raw[i] ?? '');
      cache.set(i, v);
      if (cache.size > 3) cache.delete(cache.keys().next().value as number);
    }
    return v;
  };
  const lines: Lines = { count: raw.length, at: line, recordAt: (i) => (raw[i]?.includes('TRIP') ? line(i) : null) };
  const clearances = partClearances(input.part, input.probe);
  const ctx: Ctx = {
    pm, part: input.part, probe: input.probe, r: probeRadius(input.probe), zTop: pm.machine.linear.Z[1],
    features: new Map(input.part.features.map((f) => [f.uuid, { f, frame: featureFrame(f), clearance: clearances.get(f.uuid) ?? input.probe.clearance, top: featureTop(f) }])),
    points: new Map(input.plan.touchPoints.map((tp) => [tp.uuid.toLowerCase(), tp])),
    safe: new Map(), clearances, frames: new Map(), findings: [],
  };
  const add = (line: number, code: string, message: string, severity: Finding['severity'] = 'error') => ctx.findings.push({ line, code, severity, message });
  checkHeader(lines, raw, post, add);
  replay(lines, ctx, post, add);
  return { ok: !ctx.findings.some((f) => f.severity === 'error'), findings: ctx.findings };
}

interface Lines { count: number; at: (i: number) => ReadLine; recordAt: (i: number) => ReadLine | null }

function checkHeader(lines: Lines, rawLines: string[], post: ReadyPost, add: (l: number, c: string, m: string, s?: Finding['severity']) => void) {
  const texts: string[] = [];
  for (let i = 0; i < lines.count; i++) {
    const l = lines.at(i);
    if (l.t === 'block') break;
    if (l.t === 'comment') texts.push(l.text);
  }
  const head = texts.join(' ').toUpperCase().replace(/\s+/g, ' ');
  const missing = CAUTION_PHRASES.filter((p) => !head.includes(p));
  if (missing.length > 0) add(1, 'CAUTION_MISSING', `the safety caution is missing or incomplete before the first move (not found: ${missing.join(', ')})`);
  for (const s of post.bundle.definition.safeStart) if (!rawLines.some((l) => l.trim().endsWith(s))) add(1, 'SAFE_START_MISSING', `the modal set-up line "${s}" is missing`, 'warning');
}

/** For each line, the uuid of the next record (what it works toward) and of the last one (what it leaves). */
function contextUuids(lines: Lines): { next: (string | null)[]; prev: (string | null)[] } {
  const records: (string | null)[] = new Array(lines.count).fill(null);
  for (let i = 0; i < lines.count; i++) {
    const l = lines.recordAt(i);
    if (l?.t === 'record') records[i] = l.uuid;
  }
  const next: (string | null)[] = new Array(lines.count).fill(null);
  const prev: (string | null)[] = new Array(lines.count).fill(null);
  let n: string | null = null;
  for (let i = lines.count - 1; i >= 0; i--) {
    n = records[i] ?? n;
    next[i] = n;
  }
  let p: string | null = null;
  for (let i = 0; i < lines.count; i++) {
    prev[i] = p;
    p = records[i] ?? p;
  }
  return { next, prev };
}

function classify(l: Extract<ReadLine, { t: 'block' }>, nextLine: ReadLine | undefined, post: ReadyPost): Kind | null {
  const g = post.bundle.grammar;
  for (const c of l.codes) {
    if (c === 'G0') return 'rapid';
    if (c === 'G1') return 'feed';
    if (g.protectedCodes.includes(c)) return 'protected';
    if (g.touchCodes.includes(c)) return 'touch';
    if (g.skipCodes.includes(c)) return nextLine?.t === 'touchCheck' ? 'touch' : 'protected';
  }
  return null;
}

function replay(lines: Lines, ctx: Ctx, post: ReadyPost, add: (l: number, c: string, m: string, s?: Finding['severity']) => void) {
  const ctxUuid = contextUuids(lines);
  const measured = new Set<string>();
  const pos: AxisValues = {};
  let incremental = false;
  let modal: Kind | null = null;
  let phase: Phase = 'free';
  let lastTouch: TouchPoint | null = null;
  const needsCheck = post.bundle.grammar.touchCheck !== null;
  let frame: Frame | null = null;
  let lastPose: Pose | null = null;
  for (let i = 0; i < lines.count; i++) {
    const l = lines.at(i);
    const ln = i + 1;
    if (l.t === 'unknown') { add(ln, 'UNKNOWN_WORD', `"${l.text.slice(0, 60)}" is not a statement the ${post.bundle.definition.id} post writes`); continue; }
    if (l.t === 'record') {
      const tp = ctx.points.get(l.uuid);
      if (!tp) add(ln, 'UNKNOWN_POINT', `record for ${l.uuid}, which is not a touch point of the plan`);
      else if (measured.has(l.uuid)) add(ln, 'POINT_MEASURED_TWICE', `touch point ${l.uuid} is recorded again`, 'warning');
      if (phase !== 'afterSlow') add(ln, 'RECORD_MISSING', `record of ${l.uuid} without a measuring touch just before it`);
      measured.add(l.uuid);
      phase = 'afterRecord';
      continue;
    }
    if (l.t !== 'block') continue;
    if (l.unknown.length > 0) add(ln, 'UNKNOWN_WORD', `unknown word(s) ${l.unknown.join(' ')} for the ${post.bundle.definition.id} post`);
    if (l.codes.includes('G91')) incremental = true;
    if (l.codes.includes('G90')) incremental = false;
    const kind: Kind | null = classify(l, lines.at(i + 1), post) ?? modal;
    if (kind && kind !== 'touch' && kind !== 'protected') modal = kind;
    let nAxis = 0;
    let linearWord = false;
    for (const w in l.words) if (w !== 'F') { nAxis++; if (w === 'X' || w === 'Y' || w === 'Z') linearWord = true; }
    if (nAxis === 0 || kind === null) continue;
    const hasRot = rotaryWords(l.words, ctx);
    const fromZ = pos.Z;
    const from: AxisValues | null = hasRot || !lastPose ? { ...pos } : null;
    const known = 'X' in pos && 'Y' in pos && 'Z' in pos;
    for (const w in l.words) if (w !== 'F') pos[w] = incremental ? (pos[w] ?? 0) + l.words[w]! : l.words[w]!;
    checkLimits(ctx, pos, ln, add);
    const rotaryMoved = from !== null && hasRot && ctx.pm.rotaries.some((r) => r.name in l.words && Math.abs((from[r.name] ?? 0) - pos[r.name]!) > 1e-9);
    if (rotaryMoved && ((fromZ ?? -Infinity) < ctx.zTop - Z_TOP_TOL_MM || linearWord)) {
      add(ln, 'ROTARY_BELOW_CLEARANCE', `rotary move with Z at ${(fromZ ?? NaN).toFixed(3)} or together with a linear move; rotaries may move only alone with Z at the top of its travel (${ctx.zTop})`);
    }
    if ((kind === 'protected' || kind === 'touch') && !checkFollows(lines.at(i + 1), kind, needsCheck, post)) {
      add(ln, 'CHECK_MISSING', kind === 'protected' ? 'protected move without the unexpected-trigger check after it' : 'touch without the no-trigger check after it');
    }
    if (!known) continue;
    if (!frame || hasRot) frame = frameAt(ctx, pos);
    const a = lastPose && !rotaryMoved ? lastPose : poseIn(frameAt(ctx, from ?? pos), from ?? pos);
    const b = poseIn(frame, pos);
    lastPose = b;
    const tp = ctx.points.get(ctxUuid.next[i] ?? '') ?? null;
    const left = ctx.points.get(ctxUuid.prev[i] ?? '') ?? null;
    if (kind === 'touch') {
      phase = measureMove(ctx, phase, tp, a.tip, b.tip, ln, add);
      lastTouch = tp;
      // replay the trip at nominal contact (the stylus stops at the surface, not at `end`)
      if (tp && onProbingLine(tp, b.tip, tp.end)) {
        Object.assign(pos, linearAxesFor(ctx.pm, tp.target, pos));
        lastPose = null;
      }
      continue;
    }
    if (phase !== 'free') {
      phase = afterTouch(ctx, phase, lastTouch, kind, incremental, b.tip, ln, add);
      if (phase === 'free' || phase === 'afterBackoff') continue;
    }
    checkPath(ctx, kind, fromZ, pos.Z, a, b, frame.safe, [tp, left], ln, add);
  }
  for (const tp of ctx.points.values()) {
    if (!measured.has(tp.uuid.toLowerCase())) add(lines.count, 'POINT_NOT_MEASURED', `touch point ${tp.seq} (${tp.uuid}) of the plan is never measured`);
  }
}

const rotaryWords = (w: Record<string, number>, ctx: Ctx): boolean => ctx.pm.rotaries.some((r) => r.name in w);

function checkFollows(next: ReadLine | undefined, kind: 'protected' | 'touch', needsTouchCheck: boolean, post: ReadyPost): boolean {
  if (kind === 'protected') return next?.t === 'protectedCheck';
  if (!needsTouchCheck) return true;
  return next?.t === 'touchCheck' || post.bundle.grammar.touchCheck === null;
}

function checkLimits(ctx: Ctx, pos: AxisValues, ln: number, add: (l: number, c: string, m: string) => void) {
  for (const w of ['X', 'Y', 'Z'] as const) {
    const v = pos[w];
    const [lo, hi] = ctx.pm.machine.linear[w];
    if (v !== undefined && (v < lo - 1e-6 || v > hi + 1e-6)) add(ln, 'AXIS_LIMIT', `${w}${v.toFixed(3)} is outside its travel ${lo} to ${hi} mm`);
  }
  for (const r of ctx.pm.rotaries) {
    const v = pos[r.name];
    if (v !== undefined && r.min !== null && r.max !== null && (v < r.min - 1e-6 || v > r.max + 1e-6)) add(ln, 'AXIS_LIMIT', `${r.name}${v.toFixed(3)} is outside its travel ${r.min} to ${r.max}°`);
  }
}

/**
 * Forward kinematics for replay: at fixed rotary angles fk is affine in X, Y, Z, so the
 * map is built once per rotary setting (from fk itself) and applied per line.
 */
function frameAt(ctx: Ctx, axes: AxisValues): Frame {
  let key = '';
  for (const r of ctx.pm.rotaries) key += `${axes[r.name] ?? 0},`;
  let m = ctx.frames.get(key);
  if (!m) {
    const base = forwardKinematics(ctx.pm, { ...axes, X: 0, Y: 0, Z: 0 });
    const col = (k: 'X' | 'Y' | 'Z') => sub(forwardKinematics(ctx.pm, { ...axes, X: 0, Y: 0, Z: 0, [k]: 1 }).tip, base.tip);
    m = { o: base.tip, x: col('X'), y: col('Y'), z: col('Z'), axis: base.axis, safe: safeHeight(ctx.part, ctx.probe, base.axis, ctx.clearances) };
    ctx.frames.set(key, m);
  }
  return m;
}

function poseIn(m: Frame, axes: AxisValues): Pose {
  const X = axes.X ?? 0;
  const Y = axes.Y ?? 0;
  const Z = axes.Z ?? 0;
  return {
    tip: [m.o[0] + m.x[0] * X + m.y[0] * Y + m.z[0] * Z, m.o[1] + m.x[1] * X + m.y[1] * Y + m.z[1] * Z, m.o[2] + m.x[2] * X + m.y[2] * Y + m.z[2] * Z],
    axis: m.axis,
  };
}

function measureMove(ctx: Ctx, phase: Phase, tp: TouchPoint | null, a: Vec3, b: Vec3, ln: number, add: (l: number, c: string, m: string) => void): Phase {
  if (!tp) { add(ln, 'UNKNOWN_POINT', 'a touch with no touch-point record after it'); return 'afterFast'; }
  const limit = ctx.probe.approach + ctx.probe.overtravel + PLAN_TOL_MM;
  if (distance(b, tp.end) > PLAN_TOL_MM) add(ln, 'MEASURE_OFF_PLAN', `touch ends at ${fmt(b)}, ${distance(b, tp.end).toFixed(3)} mm from the plan's end ${fmt(tp.end)} of touch point ${tp.seq}`);
  if (distance(a, b) > limit) add(ln, 'MEASURE_TOO_LONG', `touch is ${distance(a, b).toFixed(3)} mm long, more than approach + overtravel (${(limit - PLAN_TOL_MM).toFixed(3)} mm)`);
  if (phase === 'free') {
    if (distance(a, tp.start) > PLAN_TOL_MM) add(ln, 'MEASURE_OFF_PLAN', `touch starts at ${fmt(a)}, ${distance(a, tp.start).toFixed(3)} mm from the plan's start ${fmt(tp.start)} of touch point ${tp.seq}`);
    return 'afterFast';
  }
  if (phase === 'afterBackoff') return 'afterSlow';
  add(ln, 'BACKOFF_MISSING', `touch of point ${tp.seq} while the stylus may still be in contact (no back-off before it)`);
  return 'afterSlow';
}

/** Whether p lies on the probing line of a touch point, between `from` (default its target) and its start. */
function onProbingLine(tp: TouchPoint, p: Vec3, from: Vec3 = tp.target): boolean {
  const d = sub(tp.start, from);
  const len = norm(d);
  const s = dot(sub(p, from), d) / (len * len);
  const off = norm(cross(sub(p, from), d)) / len;
  return off <= PLAN_TOL_MM && s >= -PLAN_TOL_MM / len && s <= 1 + PLAN_TOL_MM / len;
}

function afterTouch(ctx: Ctx, phase: Phase, tp: TouchPoint | null, kind: Kind, incremental: boolean, b: Vec3, ln: number, add: (l: number, c: string, m: string) => void): Phase {
  void ctx;
  const away = tp !== null && onProbingLine(tp, b);
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
function checkPath(ctx: Ctx, kind: Kind, fromZ: number | undefined, toZ: number | undefined, a: Pose, b: Pose, safe: number, near: (TouchPoint | null)[], ln: number, add: (l: number, c: string, m: string) => void) {
  const t = b.axis;
  const H = safe - SAFE_TOL_MM;
  const high = (p: Vec3, z: number | undefined) => dot(p, t) >= H || (z ?? -Infinity) >= ctx.zTop - Z_TOP_TOL_MM;
  const aHigh = high(a.tip, fromZ);
  const bHigh = high(b.tip, toZ);
  if (aHigh && bHigh) return;
  if (kind === 'rapid') {
    add(ln, 'RAPID_BELOW_CLEARANCE', `rapid move to ${fmt(b.tip)} (part frame) below the safe plane ${(H + SAFE_TOL_MM).toFixed(3)} mm along the tool axis`);
    return;
  }
  if (kind === 'feed') {
    add(ln, 'UNPROTECTED_MOVE', `unprotected feed move below the safe plane to ${fmt(b.tip)} (part frame) that is not a back-off or retract`);
    return;
  }
  const d = sub(b.tip, a.tip);
  const len = norm(d);
  if (len < 1e-9 || norm(cross(d, t)) <= 1e-3 * len) return;
  for (const tp of near) {
    const feat = tp ? ctx.features.get(tp.featureUuid) : undefined;
    if (!feat) continue;
    if (isInterior(feat.f)) {
      if (inFreeSpace(feat.f, feat.frame, a.tip, ctx.r, SAFE_TOL_MM) && inFreeSpace(feat.f, feat.frame, b.tip, ctx.r, SAFE_TOL_MM)) return;
    } else {
      const n = featureAxis(feat.f);
      const hc = dot(feat.top, n) + feat.clearance - SAFE_TOL_MM;
      if ((aHigh || dot(a.tip, n) >= hc) && (bHigh || dot(b.tip, n) >= hc)) return;
    }
  }
  add(ln, 'UNSAFE_PATH', `protected move from ${fmt(a.tip)} to ${fmt(b.tip)} (part frame) crosses near the part below clearance, neither along the tool axis nor inside a bore or slot`);
}
