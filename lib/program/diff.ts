/**
 * Point-by-point difference of two plans, keyed by touch-point UUID (planning gives a
 * touch point the same UUID for the same feature, geometry and index, so revisions line up).
 * Per common point: moved (distance between nominal surface points, mm), direction changed
 * (angle between probing directions, degrees), approach changed (start point moved while the
 * surface point and direction did not), feeds changed, rotary positions changed, order changed (relative
 * order among the common points). Part frame P, millimetres and degrees.
 */
import { cross, distance, dot, norm, type Vec3 } from '../geometry/vec3';
import type { Plan, TouchPoint } from './plan-schema';

export interface DiffSide {
  plan: Plan;
  /**
   * Feed words (mm/min) of the moves measuring each touch point, by UUID, in program
   * order (from lib/program/diff-lines.ts); compared where both sides have a point's feeds.
   */
  feeds?: Record<string, number[]>;
}

export interface DiffTolerances {
  /** Surface or start points closer than this are the same, mm. */
  distanceMm: number;
  /** Directions closer than this are the same, degrees. */
  angleDeg: number;
  /** Rotary positions closer than this are the same, degrees. */
  rotaryDeg: number;
  /** Feeds closer than this are the same, mm/min. */
  feedMmPerMin: number;
}

/** Below what the posts print (4 decimals for mm and degrees). */
export const DEFAULT_DIFF_TOLERANCES: DiffTolerances = { distanceMm: 5e-5, angleDeg: 5e-5, rotaryDeg: 5e-5, feedMmPerMin: 0.05 };

export type PointChange =
  | { kind: 'moved'; distanceMm: number; from: Vec3; to: Vec3 }
  | { kind: 'direction'; angleDeg: number; from: Vec3; to: Vec3 }
  | { kind: 'approach'; distanceMm: number; from: Vec3; to: Vec3 }
  | { kind: 'feeds'; from: number[]; to: number[] }
  | { kind: 'rotary'; axes: { word: string; from: number | null; to: number | null }[] }
  | { kind: 'order'; from: number; to: number };

export type PointChangeKind = PointChange['kind'];

export interface PointDiffRow {
  uuid: string;
  featureUuid: string;
  status: 'added' | 'removed' | 'changed' | 'unchanged';
  /** Sequence numbers in each plan. */
  before: number | null;
  after: number | null;
  changes: PointChange[];
}

export interface PlanDiffSummary {
  total: number;
  added: number;
  removed: number;
  changed: number;
  unchanged: number;
  /** Common points with a change of each kind (a point may count under several). */
  byKind: Record<PointChangeKind, number>;
}

export interface PlanDiff {
  rows: PointDiffRow[];
  summary: PlanDiffSummary;
}

/** Angle between two directions, degrees; atan2 keeps small angles accurate. */
export function angleBetweenDeg(a: Vec3, b: Vec3): number {
  return (Math.atan2(norm(cross(a, b)), dot(a, b)) * 180) / Math.PI;
}

function rotaryChanges(a: TouchPoint, b: TouchPoint, tol: number): { word: string; from: number | null; to: number | null }[] {
  const words = new Set([...Object.keys(a.axes), ...Object.keys(b.axes)].filter((w) => !'XYZ'.includes(w)));
  const out: { word: string; from: number | null; to: number | null }[] = [];
  for (const word of [...words].sort()) {
    const from = a.axes[word] ?? null;
    const to = b.axes[word] ?? null;
    if (from === null || to === null || Math.abs(from - to) > tol) out.push({ word, from, to });
  }
  return out;
}

function feedsDiffer(a: number[], b: number[], tol: number): boolean {
  return a.length !== b.length || a.some((f, i) => !(Math.abs(f - (b[i] ?? NaN)) <= tol));
}

function pointChanges(a: TouchPoint, b: TouchPoint, before: DiffSide, after: DiffSide, tol: DiffTolerances): PointChange[] {
  const changes: PointChange[] = [];
  const moved = distance(a.surface, b.surface);
  if (moved > tol.distanceMm) changes.push({ kind: 'moved', distanceMm: moved, from: a.surface, to: b.surface });
  const angle = angleBetweenDeg(a.direction, b.direction);
  if (angle > tol.angleDeg) changes.push({ kind: 'direction', angleDeg: angle, from: a.direction, to: b.direction });
  const startMoved = distance(a.start, b.start);
  if (moved <= tol.distanceMm && angle <= tol.angleDeg && startMoved > tol.distanceMm) {
    changes.push({ kind: 'approach', distanceMm: startMoved, from: a.start, to: b.start });
  }
  const feedsA = before.feeds?.[a.uuid];
  const feedsB = after.feeds?.[b.uuid];
  if (feedsA && feedsB && feedsDiffer(feedsA, feedsB, tol.feedMmPerMin)) changes.push({ kind: 'feeds', from: feedsA, to: feedsB });
  const rot = rotaryChanges(a, b, tol.rotaryDeg);
  if (rot.length > 0) changes.push({ kind: 'rotary', axes: rot });
  return changes;
}

/** Rank of each common point within its plan's order, so an insertion elsewhere is not a reorder. */
function commonRanks(points: TouchPoint[], common: Set<string>): Map<string, number> {
  const ranks = new Map<string, number>();
  for (const tp of [...points].sort((p, q) => p.seq - q.seq)) if (common.has(tp.uuid)) ranks.set(tp.uuid, ranks.size);
  return ranks;
}

export function diffPlans(before: DiffSide, after: DiffSide, tolerances: Partial<DiffTolerances> = {}): PlanDiff {
  const tol = { ...DEFAULT_DIFF_TOLERANCES, ...tolerances };
  const old = new Map(before.plan.touchPoints.map((tp) => [tp.uuid, tp]));
  const neu = new Map(after.plan.touchPoints.map((tp) => [tp.uuid, tp]));
  const common = new Set([...neu.keys()].filter((u) => old.has(u)));
  const rankBefore = commonRanks(before.plan.touchPoints, common);
  const rankAfter = commonRanks(after.plan.touchPoints, common);

  const rows: PointDiffRow[] = [];
  for (const b of [...neu.values()].sort((p, q) => p.seq - q.seq)) {
    const a = old.get(b.uuid);
    if (!a) {
      rows.push({ uuid: b.uuid, featureUuid: b.featureUuid, status: 'added', before: null, after: b.seq, changes: [] });
      continue;
    }
    const changes = pointChanges(a, b, before, after, tol);
    const ra = rankBefore.get(b.uuid);
    const rb = rankAfter.get(b.uuid);
    if (ra !== undefined && rb !== undefined && ra !== rb) changes.push({ kind: 'order', from: a.seq, to: b.seq });
    rows.push({ uuid: b.uuid, featureUuid: b.featureUuid, status: changes.length > 0 ? 'changed' : 'unchanged', before: a.seq, after: b.seq, changes });
  }
  for (const a of [...old.values()].sort((p, q) => p.seq - q.seq)) {
    if (!neu.has(a.uuid)) rows.push({ uuid: a.uuid, featureUuid: a.featureUuid, status: 'removed', before: a.seq, after: null, changes: [] });
  }
  return { rows, summary: summarise(rows) };
}

function summarise(rows: PointDiffRow[]): PlanDiffSummary {
  const byKind: Record<PointChangeKind, number> = { moved: 0, direction: 0, approach: 0, feeds: 0, rotary: 0, order: 0 };
  const count = (s: PointDiffRow['status']): number => rows.filter((r) => r.status === s).length;
  for (const r of rows) for (const c of r.changes) byKind[c.kind] += 1;
  return { total: rows.length, added: count('added'), removed: count('removed'), changed: count('changed'), unchanged: count('unchanged'), byKind };
}
