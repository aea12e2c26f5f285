/**
 * Form (`flatness`, `circularity`, `cylindricity`), orientation (`perpendicularity`,
 * `parallelism` of a plane or an axis to the primary datum) and `profile` of a surface.
 * Flatness and circularity: minimum zone by default, least squares on request, the
 * method reported. Cylindricity: least-squares cylinder form (max − min radial
 * distance; never below the minimum zone, so conservative). Orientation zones [from
 * memory, ASME Y14.5 / ISO 1101]: a plane's zone is two parallel planes oriented to
 * the datum, its value the spread of the compensated points across them; an axis's
 * zone perpendicular to a datum plane is a cylinder, its value the sideways travel of
 * the axis over the measured height (REFERENCES.md §1: ⌀0.027766 for fit-cylinder-24).
 * Profile: signed deviations along the nominal normal (+ out of the material) of the
 * compensated contact points in the datum reference frame; bilateral value 2·max|d|,
 * an unequal zone from `lower`…`upper`.
 */
import type { Tolerance } from '../features/schema';
import { fitShape } from '../fitting/fit-shape';
import { minimumZoneCircle } from '../fitting/minimum-zone';
import { dot, norm, normalize, reject, sub, type Vec3 } from '../geometry/vec3';
import { datumAlignment, notEvaluated, type EvalContext, type RawResult } from './context';
import type { FeatureMeasurement } from './measure-feature';

function formMethod(ctx: EvalContext, tol: Tolerance): 'minimum-zone' | 'least-squares' {
  return ctx.input.options.methods[tol.uuid] ?? ctx.input.options.formMethod;
}

const geometric = (tol: Tolerance, value: number, method: string, lengthMm: number, message?: string): RawResult => ({
  value, lower: null, upper: tol.value ?? null, method, lengthMm, ...(message ? { message } : {}),
});

function extent(m: FeatureMeasurement): number {
  const f = m.feature;
  if (f.type === 'plane') return Math.hypot(f.size[0], f.size[1]);
  if (f.type === 'slot' || f.type === 'web') return f.length;
  return f.diameter;
}

export function evaluateForm(ctx: EvalContext, tol: Tolerance, m: FeatureMeasurement): RawResult {
  if (tol.value === undefined || !(tol.value > 0)) return notEvaluated(`${tol.characteristic} needs its zone size in \`value\``);
  const e = m.element;
  const method = formMethod(ctx, tol);
  if (tol.characteristic === 'flatness') {
    if (e.kind !== 'plane') return notEvaluated(`flatness applies to a plane, not a ${m.feature.type}`);
    if (m.contacts.length < 4) return notEvaluated(`flatness needs at least 4 points; ${m.contacts.length} measured`);
    const fit = fitShape({ shape: 'plane', points: m.contacts, method, hint: { normal: e.normal } });
    return geometric(tol, fit.form, `${method} flatness of ${m.contacts.length} compensated points`, extent(m));
  }
  if (tol.characteristic === 'circularity') {
    if (e.kind !== 'axis') return notEvaluated(`circularity applies to a bore or boss, not a ${m.feature.type}`);
    const levels = e.circles.map((c, k) => ({ c, pts: e.levelPoints[k] as Vec3[] })).filter((l) => l.pts.length >= 4);
    if (levels.length === 0) return notEvaluated('circularity needs at least 4 points on one level');
    // Radial compensation does not change a circle's form: evaluate the centres' circles.
    const values = levels.map(({ c, pts }) => (method === 'least-squares' ? c.form : minimumZoneCircle(pts, c).form));
    return geometric(tol, Math.max(...values), `${method} roundness, worst of ${levels.length} level(s)`, extent(m));
  }
  if (e.kind !== 'axis' || !e.cylinder) return notEvaluated('cylindricity needs a bore or boss measured on at least two levels');
  return geometric(tol, e.cylinder.form, 'least-squares cylinder form (max − min radial distance); minimum zone not computed, LS is conservative', extent(m),
    method === 'minimum-zone' ? 'minimum-zone cylindricity is not implemented: least-squares value reported' : undefined);
}

export function evaluateOrientation(ctx: EvalContext, tol: Tolerance, m: FeatureMeasurement): RawResult {
  if (tol.value === undefined || !(tol.value > 0)) return notEvaluated(`${tol.characteristic} needs its zone size in \`value\``);
  const letter = tol.datums?.[0];
  if (!letter) return notEvaluated(`${tol.characteristic} needs a datum`);
  const uuid = ctx.part.datums[letter];
  const d = uuid ? ctx.byFeature.get(uuid) : undefined;
  if (!uuid || !d) return notEvaluated(`datum ${letter} is not assigned to a measured feature of the part`);
  if (!d.ok) return notEvaluated(`datum ${letter} (${d.feature.label}) was not measured: ${d.reason}`);
  const de = d.m.element;
  const datumDir: Vec3 | null = de.kind === 'plane' ? de.normal : de.kind === 'axis' ? de.axis : null;
  if (!datumDir) return notEvaluated(`datum ${letter} must be a plane or an axis for ${tol.characteristic}`);
  const datumIsPlane = de.kind === 'plane';
  const e = m.element;
  const perp = tol.characteristic === 'perpendicularity';
  const ref = `${datumIsPlane ? 'plane' : 'axis'} ${letter}`;
  if (e.kind === 'plane') {
    // Zone planes: parallel to the datum plane (‖) or containing the datum normal (⟂).
    let across: Vec3;
    if (perp === datumIsPlane) {
      const r = reject(e.normal, datumDir);
      if (norm(r) < 1e-9) return notEvaluated(`the face lies parallel to datum ${letter}: ${tol.characteristic} is not defined`);
      across = normalize(r);
    } else {
      across = datumDir;
    }
    const proj = m.contacts.map((p) => dot(p, across));
    return geometric(tol, Math.max(...proj) - Math.min(...proj), `spread of ${m.contacts.length} compensated points across a zone oriented to ${ref}`, extent(m));
  }
  if (e.kind === 'axis') {
    if (e.ends.length < 2) return notEvaluated(`${tol.characteristic} of an axis needs at least two levels`);
    const [a, b] = e.ends as [Vec3, Vec3];
    const seg = sub(b, a);
    if (perp === datumIsPlane) {
      // Axis ⟂ datum plane or ∥ datum axis: cylindrical zone along the datum direction,
      // over the measured height along it.
      const h = dot(seg, datumDir);
      const lateral = norm(reject(seg, datumDir));
      if (!datumIsPlane) return geometric(tol, lateral, `sideways travel of the axis over its measured length, zone along ${ref}`, extent(m));
      const heights = m.points.map((p) => dot(p.centre, datumDir));
      const span = Math.max(...heights) - Math.min(...heights);
      const value = Math.abs(h) > 0 ? (lateral / Math.abs(h)) * span : lateral;
      return geometric(tol, value, `sideways travel of the axis over the measured height ${span.toFixed(3)} mm along ${ref}`, extent(m));
    }
    // Axis ∥ datum plane or ⟂ datum axis: two planes across the datum direction.
    return geometric(tol, Math.abs(dot(seg, datumDir)), `travel of the axis across ${ref} over its measured length`, extent(m));
  }
  return notEvaluated(`${tol.characteristic} is evaluated for planes and axes, not a ${m.feature.type}`);
}

export function evaluateProfile(ctx: EvalContext, tol: Tolerance, m: FeatureMeasurement): RawResult {
  const unequal = tol.upper !== undefined && tol.lower !== undefined;
  if (!unequal && (tol.value === undefined || !(tol.value > 0))) return notEvaluated('profile needs `value` (bilateral zone) or `upper` and `lower` (unequal zone)');
  const drf = datumAlignment(ctx, tol);
  if ('error' in drf) return notEvaluated(drf.error);
  const devs = m.points.map((p, i) => dot(sub(drf.alignment.point(m.contacts[i] as Vec3), p.tp.surface), normalize(p.tp.normal)));
  const min = Math.min(...devs);
  const max = Math.max(...devs);
  const frameText = drf.letters.length ? `datums ${drf.letters.join('|')}` : 'part frame (no datums)';
  const method = `deviations of ${devs.length} compensated points along the nominal normal, in the ${frameText}`;
  if (unequal) {
    const lo = tol.lower as number;
    const hi = tol.upper as number;
    if (lo > hi) return notEvaluated(`profile lower ${lo} is above upper ${hi}`);
    // Report the extreme that uses more of its side of the zone.
    const useHi = hi !== 0 ? max / hi : max > 0 ? Infinity : 0;
    const useLo = lo !== 0 ? min / lo : min < 0 ? Infinity : 0;
    const value = useHi >= useLo ? max : min;
    return { value, lower: lo, upper: hi, method: `${method}; unequal zone ${lo}…+${hi}`, deviations: { min, max }, lengthMm: extent(m) };
  }
  return { value: 2 * Math.max(Math.abs(min), Math.abs(max)), lower: null, upper: tol.value ?? null, method: `${method}; bilateral zone 2·max|d|`, deviations: { min, max }, lengthMm: extent(m) };
}

