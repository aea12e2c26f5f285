import { describe, expect, it } from 'vitest';
import { validate as uuidValidate, version as uuidVersion } from 'uuid';
import { planInputSchema } from '@/lib/features/plan-input';
import { planProgram } from '@/lib/features/plan';
import { demoBracket, demoCoverPlate, demoManifold, demoProbe } from '@/lib/examples/demo-parts';
import { machinePreset, presetIds } from '@/lib/kinematics/presets';
import { forwardKinematics } from '@/lib/kinematics/forward';
import { cross, distance, dot, norm, sub } from '@/lib/geometry/vec3';
import type { Part } from '@/lib/features/schema';
import type { TouchPoint } from '@/lib/program/plan-schema';

const plan = (part: Part, machine = machinePreset('ac-trunnion'), probe = demoProbe) =>
  planProgram(planInputSchema.parse({ part, probe, machine }));
const of = (pts: TouchPoint[], uuid: string) => pts.filter((p) => p.featureUuid === uuid);
const r = demoProbe.effectiveDiameter! / 2;

describe('touch points follow the contract', () => {
  const p = plan(demoManifold);
  it('target, start, end, direction and axes', () => {
    expect(p.touchPoints.length).toBeGreaterThan(50);
    p.touchPoints.forEach((tp, i) => {
      expect(tp.seq).toBe(i);
      for (let k = 0; k < 3; k++) {
        expect(tp.target[k]).toBeCloseTo(tp.surface[k]! + r * tp.normal[k]!, 12);
        expect(tp.start[k]).toBeCloseTo(tp.target[k]! + demoProbe.approach * tp.normal[k]!, 12);
        expect(tp.end[k]).toBeCloseTo(tp.target[k]! - demoProbe.overtravel * tp.normal[k]!, 12);
        expect(tp.direction[k]).toBeCloseTo(-tp.normal[k]!, 15);
      }
      const pose = forwardKinematics(machinePreset('ac-trunnion'), tp.axes);
      expect(distance(pose.tip, tp.start)).toBeLessThan(1e-9);
      expect(distance(pose.axis, tp.toolAxis)).toBeLessThan(1e-12);
    });
  });
  it('uuids are version 5, unique, stable under relabelling, new when geometry changes', () => {
    const ids = p.touchPoints.map((t) => t.uuid);
    expect(new Set(ids).size).toBe(ids.length);
    for (const id of ids) { expect(uuidValidate(id)).toBe(true); expect(uuidVersion(id)).toBe(5); }
    const relabelled = plan({ ...demoManifold, features: demoManifold.features.map((f) => ({ ...f, label: `X${f.label}` })) });
    expect(relabelled.touchPoints.map((t) => t.uuid).sort()).toEqual([...ids].sort());
    const moved = plan({ ...demoManifold, features: demoManifold.features.map((f) => (f.type === 'sphere' ? { ...f, diameter: 25.4 } : f)) });
    const sphere = demoManifold.features.find((f) => f.type === 'sphere')!;
    const before = new Set(of(p.touchPoints, sphere.uuid).map((t) => t.uuid));
    expect(of(moved.touchPoints, sphere.uuid).some((t) => before.has(t.uuid))).toBe(false);
  });
  it('uuids agree with an independent RFC 9562 v5 implementation', () => {
    // Source: Python 3 standard library uuid.uuid5 (a general-purpose reference implementation),
    // run on the documented name: v5(ns, "<feature uuid>|" + v5(ns, canonical geometry) + "|<index>").
    const face = of(plan(demoBracket).touchPoints, demoBracket.features[0]!.uuid);
    expect(face[0]!.uuid).toBe('231c29a4-11cc-56cd-8586-8797b8d2f998');
    expect(face[8]!.uuid).toBe('c7dd59d6-852c-5e9c-8de1-8548320e6fe0');
  });
  it('features are grouped by tool axis: each axis appears in one run', () => {
    const runs: string[] = [];
    for (const tp of p.touchPoints) {
      const k = tp.toolAxis.map((v) => v.toFixed(6)).join();
      if (runs[runs.length - 1] !== k) runs.push(k);
    }
    expect(new Set(runs).size).toBe(runs.length);
  });
  it('every preset machine plans the bracket deterministically', () => {
    for (const id of presetIds) {
      const a = plan(demoBracket, machinePreset(id));
      expect(plan(demoBracket, machinePreset(id))).toEqual(a);
    }
  });
});

describe('default counts (from memory: BS 7172 via NPL GPG 41, REFERENCES.md §5)', () => {
  const p = plan(demoBracket);
  const [face, bore2, bore3, boss, slot] = demoBracket.features;
  it('plane: 9 points spread (not one row), inside the margin, clear of the bores, boss and slot', () => {
    const pts = of(p.touchPoints, face!.uuid);
    expect(pts).toHaveLength(9);
    const [a, b] = [pts[0]!.surface, pts[1]!.surface];
    const offRow = pts.some((q) => norm(cross(sub(b, a), sub(q.surface, a))) / norm(sub(b, a)) > 5);
    expect(offRow).toBe(true);
    for (const q of pts) {
      expect(Math.abs(q.surface[0])).toBeLessThanOrEqual(58 + 1e-9);
      expect(Math.abs(q.surface[1])).toBeLessThanOrEqual(38 + 1e-9);
      for (const c of [[-40, 0, 6], [40, 0, 6], [0, 20, 12]] as const) {
        expect(Math.hypot(q.surface[0] - c[0], q.surface[1] - c[1])).toBeGreaterThan(c[2] + r);
      }
      expect(Math.abs(q.surface[1] + 24) > 5 + r || Math.abs(q.surface[0]) > 20 + r).toBe(true);
    }
  });
  it('bore with perpendicularity: 2 levels × 7 (prime); plain position bore: 1 level × 7', () => {
    const levels = (uuid: string) => new Set(of(p.touchPoints, uuid).map((t) => t.surface[2].toFixed(6))).size;
    expect(of(p.touchPoints, bore2!.uuid)).toHaveLength(14);
    expect(levels(bore2!.uuid)).toBe(2);
    expect(of(p.touchPoints, bore3!.uuid)).toHaveLength(7);
    for (const t of of(p.touchPoints, bore3!.uuid)) {
      expect(Math.hypot(t.surface[0] - 40, t.surface[1])).toBeCloseTo(6, 12);
      // normal points at the axis: out of the material of a bore
      expect(dot(t.normal, [40 - t.surface[0], -t.surface[1], 0])).toBeGreaterThan(0);
    }
  });
  it('boss normals point outward; slot by two opposing pairs', () => {
    for (const t of of(p.touchPoints, boss!.uuid)) expect(dot(t.normal, [t.surface[0], t.surface[1] - 20, 0])).toBeGreaterThan(0);
    const s = of(p.touchPoints, slot!.uuid);
    expect(s).toHaveLength(4);
    expect(s[0]!.normal[1] + s[1]!.normal[1]).toBeCloseTo(0, 12);
  });
  it('cylindricity: 3 levels; sphere: 9 on the cap', () => {
    const m = plan(demoManifold);
    expect(of(m.touchPoints, demoManifold.features[4]!.uuid)).toHaveLength(21);
    const sph = of(m.touchPoints, demoManifold.features[5]!.uuid);
    expect(sph).toHaveLength(9);
    for (const t of sph) expect(t.normal[2]).toBeGreaterThanOrEqual(0.5 - 1e-12);
  });
  it('overrides: more points honoured; below the minimum raised, with a warning naming the feature', () => {
    const part = { ...demoCoverPlate, features: demoCoverPlate.features.map((f) => (f.type === 'bore' ? { ...f, points: 2 } : f)) };
    const q = plan(part, machinePreset('3-axis'));
    expect(of(q.touchPoints, demoCoverPlate.features[1]!.uuid)).toHaveLength(3);
    expect(q.warnings.some((w) => w.code === 'POINTS_RAISED' && w.label === '2')).toBe(true);
    expect(of(q.touchPoints, demoCoverPlate.features[0]!.uuid)).toHaveLength(12);
  });
});

describe('unreachable features are not dropped silently', () => {
  it('a side face on a 3-axis machine gives a warning naming its label', () => {
    const p = plan(demoBracket, machinePreset('3-axis'));
    const w = p.warnings.find((x) => x.featureUuid === demoBracket.features[5]!.uuid);
    expect(w?.code).toBe('UNREACHABLE_ORIENTATION');
    expect(w?.message).toMatch(/^6: /);
    expect(of(p.touchPoints, demoBracket.features[5]!.uuid)).toHaveLength(0);
  });
  it('a feature beyond linear travel gives OUT_OF_LIMITS naming the axis', () => {
    const m = machinePreset('3-axis');
    const p = plan(demoBracket, { ...m, linear: { ...m.linear, X: [-30, 30] } });
    const w = p.warnings.find((x) => x.label === '3');
    expect(w?.code).toBe('OUT_OF_LIMITS');
    expect(w?.message).toMatch(/X would be/);
  });
  it('a stylus too big for a bore is a warning, not a crash', () => {
    const p = plan(demoCoverPlate, machinePreset('3-axis'), { ...demoProbe, stylusDiameter: 10, effectiveDiameter: 9.9 });
    expect(p.warnings.filter((w) => w.code === 'STYLUS_TOO_LARGE')).toHaveLength(4);
  });
});

describe('validation names the field', () => {
  const issues = (part: unknown) => {
    const r = planInputSchema.safeParse({ part, probe: demoProbe, machine: machinePreset('3-axis') });
    expect(r.success).toBe(false);
    return r.success ? [] : r.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
  };
  const f = demoBracket.features;
  it('negative diameter, zero vector, slot wider than long, unknown feature in a tolerance', () => {
    expect(issues({ ...demoBracket, features: [{ ...f[1]!, diameter: -12 }] }).join()).toMatch(/part\.features\.0\.diameter/);
    expect(issues({ ...demoBracket, features: [{ ...f[1]!, axis: [0, 0, 0] }] }).join()).toMatch(/part\.features\.0\.axis: must be a non-zero direction vector/);
    expect(issues({ ...demoBracket, features: [{ ...f[4]!, width: 50 }] }).join()).toMatch(/part\.features\.0\.width: width \(50\) must be less than length/);
    expect(issues({ ...demoBracket, features: [f[0]!] }).join()).toMatch(/part\.tolerances\.1\.featureUuid: names no feature/);
    expect(issues({ ...demoBracket, features: [f[0]!, f[0]!], tolerances: [] }).join()).toMatch(/part\.features\.1\.uuid: duplicate/);
  });
});
