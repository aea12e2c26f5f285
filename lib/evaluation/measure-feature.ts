/**
 * One feature's measurement: its touch points' trip points (stylus-ball centres) fitted
 * to the feature's element, then compensated by offsetting the FITTED element by the
 * effective stylus radius r — exact for planes, circles, spheres and cylinders:
 * plane: moved −r along its normal (into the material); bore: radius + r; boss: radius − r;
 * sphere (probed from outside): radius − r. Contact points for profile follow the same
 * element normals. Points whose nominal normal lies along a bore's or boss's axis
 * (floor, top face) are not part of the wall fit.
 */
import type { Feature } from '../features/schema';
import type { TouchPoint } from '../program/plan-schema';
import { fitCircle } from '../fitting/circle';
import { fitCylinder } from '../fitting/cylinder';
import { fitPlane } from '../fitting/line-plane';
import { fitSphere } from '../fitting/sphere';
import type { CircleFit, CylinderFit, PlaneFit, SphereFit } from '../fitting/types';
import { FitError } from '../fitting/types';
import { addScaled, dot, norm, normalize, reject, sub, type Vec3 } from '../geometry/vec3';

export interface MeasuredPoint { tp: TouchPoint; centre: Vec3 }

export interface PlaneElement { kind: 'plane'; origin: Vec3; normal: Vec3; fit: PlaneFit }
export interface AxisElement {
  kind: 'axis';
  internal: boolean;
  /** Axis point nearest the feature's nominal centre, axis direction (sense of the nominal axis). */
  point: Vec3;
  axis: Vec3;
  diameter: number;
  /** Axis points at the ends of the measured length (one point for a single level). */
  ends: Vec3[];
  circles: CircleFit[];
  /** Ball centres of each circle in `circles`. */
  levelPoints: Vec3[][];
  cylinder: CylinderFit | null;
}
export interface SphereElement { kind: 'sphere'; center: Vec3; diameter: number; fit: SphereFit }
export interface SlotElement {
  kind: 'slot';
  internal: boolean;
  /** Mid-plane point on the nominal centre line, and the width direction. */
  mid: Vec3;
  widthDir: Vec3;
  width: number;
  sides: Array<{ normal: Vec3; offset: number; points: number; fit: PlaneFit | null }>;
}
export type Element = PlaneElement | AxisElement | SphereElement | SlotElement;

export interface FeatureMeasurement {
  feature: Feature;
  points: MeasuredPoint[];
  element: Element;
  /** Compensated contact points, aligned with `points`. */
  contacts: Vec3[];
  method: string;
}

const WALL_COS = 0.5;

export function effectiveRadius(probe: { stylusDiameter: number; effectiveDiameter?: number | undefined }): number {
  return (probe.effectiveDiameter ?? probe.stylusDiameter) / 2;
}

export function measureFeature(feature: Feature, points: MeasuredPoint[], r: number): FeatureMeasurement {
  switch (feature.type) {
    case 'plane': return measurePlane(feature, points, r);
    case 'bore':
    case 'boss': return measureAxis(feature, points, r);
    case 'sphere': return measureSphere(feature, points, r);
    case 'slot':
    case 'web': return measureSlot(feature, points, r);
  }
}

function measurePlane(feature: Extract<Feature, { type: 'plane' }>, points: MeasuredPoint[], r: number): FeatureMeasurement {
  const fit = fitPlane(points.map((p) => p.centre), normalize(feature.normal));
  const origin = addScaled(fit.origin, fit.normal, -r);
  return {
    feature, points, element: { kind: 'plane', origin, normal: fit.normal, fit },
    contacts: points.map((p) => addScaled(p.centre, fit.normal, -r)),
    method: `least-squares plane of ${points.length} ball centres, offset by r = ${r} mm along its normal`,
  };
}

function measureAxis(feature: Extract<Feature, { type: 'bore' | 'boss' }>, all: MeasuredPoint[], r: number): FeatureMeasurement {
  const nomAxis = normalize(feature.axis);
  const points = all.filter((p) => Math.abs(dot(normalize(p.tp.normal), nomAxis)) < WALL_COS);
  const internal = feature.type === 'bore';
  const sign = internal ? 1 : -1;
  const levels = groupLevels(points, feature.center, nomAxis);
  const levelPoints = levels.filter((l) => l.length >= 3).map((l) => l.map((p) => p.centre));
  const circles = levelPoints.map((l) => fitCircle(l, nomAxis));
  if (circles.length === 0) throw new FitError('TOO_FEW_POINTS', `${feature.label}: a circle needs at least 3 wall points on one level; got ${points.length} in all`);
  let cylinder: CylinderFit | null = null;
  let axis: Vec3;
  let point: Vec3;
  let radiusCentres: number;
  let ends: Vec3[];
  let method: string;
  if (levels.length >= 2 && points.length >= 5) {
    cylinder = fitCylinder(points.map((p) => p.centre), nomAxis);
    axis = dot(cylinder.axis, nomAxis) < 0 ? [-cylinder.axis[0], -cylinder.axis[1], -cylinder.axis[2]] : cylinder.axis;
    point = addScaled(cylinder.origin, axis, dot(sub(feature.center, cylinder.origin), axis));
    radiusCentres = cylinder.radius;
    ends = cylinder.axisEnds;
    method = `least-squares cylinder of ${points.length} ball centres on ${levels.length} levels, radius ${internal ? '+' : '−'} r (r = ${r} mm)`;
  } else {
    const c = circles[0] as CircleFit;
    axis = dot(c.normal, nomAxis) < 0 ? [-c.normal[0], -c.normal[1], -c.normal[2]] : c.normal;
    point = c.center;
    radiusCentres = c.radius;
    ends = [c.center];
    method = `least-squares circle of ${points.length} ball centres in their best plane, radius ${internal ? '+' : '−'} r (r = ${r} mm)`;
  }
  const contacts = points.map((p) => {
    const radial = reject(sub(p.centre, point), axis);
    const n = norm(radial);
    return n > 0 ? addScaled(p.centre, radial, (sign * r) / n) : p.centre;
  });
  return {
    feature, points, contacts, method,
    element: { kind: 'axis', internal, point, axis, diameter: 2 * (radiusCentres + sign * r), ends, circles, levelPoints, cylinder },
  };
}

function groupLevels(points: MeasuredPoint[], center: Vec3, axis: Vec3): MeasuredPoint[][] {
  const groups = new Map<string, MeasuredPoint[]>();
  for (const p of points) {
    const key = dot(sub(p.tp.surface, center), axis).toFixed(4);
    const g = groups.get(key);
    if (g) g.push(p); else groups.set(key, [p]);
  }
  return [...groups.values()];
}

function measureSphere(feature: Extract<Feature, { type: 'sphere' }>, points: MeasuredPoint[], r: number): FeatureMeasurement {
  const fit = fitSphere(points.map((p) => p.centre));
  return {
    feature, points,
    element: { kind: 'sphere', center: fit.center, diameter: 2 * (fit.radius - r), fit },
    contacts: points.map((p) => {
      const d = sub(p.centre, fit.center);
      return addScaled(p.centre, d, -r / norm(d));
    }),
    method: `least-squares sphere of ${points.length} ball centres, radius − r (r = ${r} mm)`,
  };
}

function measureSlot(feature: Extract<Feature, { type: 'slot' | 'web' }>, all: MeasuredPoint[], r: number): FeatureMeasurement {
  const w = normalize(feature.widthDir);
  const internal = feature.type === 'slot';
  const points = all.filter((p) => Math.abs(dot(normalize(p.tp.normal), w)) > WALL_COS);
  const contacts = new Map<MeasuredPoint, Vec3>();
  const sides = [1, -1].map((s) => {
    const own = points.filter((p) => dot(p.tp.normal, w) * s > 0);
    if (own.length === 0) throw new FitError('TOO_FEW_POINTS', `${feature.label}: no point on the ${s > 0 ? '+' : '−'}width side`);
    const nominalNormal = normalize(own[0]?.tp.normal as Vec3);
    let normal = nominalNormal;
    let fit: PlaneFit | null = null;
    if (own.length >= 3) {
      try {
        fit = fitPlane(own.map((p) => p.centre), nominalNormal);
        normal = fit.normal;
      } catch (e) {
        if (!(e instanceof FitError)) throw e; // points in a row: fall back to point-to-point
      }
    }
    own.forEach((p) => contacts.set(p, addScaled(p.centre, normal, -r)));
    const offset = own.reduce((acc, p) => acc + dot(sub(contacts.get(p) as Vec3, feature.center), w), 0) / own.length;
    return { normal, offset, points: own.length, fit };
  });
  const [a, b] = sides as [typeof sides[0], typeof sides[0]];
  const mid = addScaled(feature.center, w, (a.offset + b.offset) / 2);
  return {
    feature, points,
    element: { kind: 'slot', internal, mid, widthDir: w, width: Math.abs(a.offset - b.offset), sides },
    contacts: points.map((p) => contacts.get(p) as Vec3),
    method: `side positions along the width direction from compensated points (planes where a side has 3 or more), r = ${r} mm`,
  };
}
