/**
 * Nominal contacts per feature: where the stylus ball touches the nominal surface and
 * the surface normal there (out of the material), in the part frame P, mm. The order
 * returned is the order measured inside the feature.
 *
 * Defaults (see lib/README.md, "plan"): planes keep 2 mm from their edges, depth levels
 * keep 1 mm plus the ball radius from the top edge and the floor, spheres are touched on
 * a cap of 60° about their access axis, circles start at `startAngle` (default 0°) from
 * the feature's reference direction and each further level is staggered by a fraction
 * of the spacing, so the levels do not line up.
 */
import { addScaled, type Vec3 } from '../geometry/vec3';
import { toRad } from '../geometry/rotation';
import type { Feature } from './schema';
import { featureFrame, type FeatureFrame } from './feature-geometry';
import { footprintsOnPlane, type FootprintSources } from './footprints';
import { capPoints, circleAngles, levelDepths, nearestNeighbourOrder, pairPositions, spreadOverRectangle } from './patterns';
import { decideCount, defaultLevelCount } from './counts';
import type { Characteristic } from './schema';

export interface Contact { surface: Vec3; normal: Vec3 }

export interface ContactResult {
  contacts: Contact[];
  /** Problems that stop the feature being planned (it is then left out with a warning). */
  fault?: { code: string; message: string };
  /** Notes that do not stop it (a count raised to the minimum…). */
  notes: { code: string; message: string }[];
}

export const PLANE_MARGIN_MM = 2;
export const LEVEL_MARGIN_MM = 1;
export const CAP_POLAR_DEG = 60;

interface Ctx { sources: FootprintSources; r: number; approach: number; characteristics: Set<Characteristic> }

const fault = (code: string, message: string): ContactResult => ({ contacts: [], fault: { code, message }, notes: [] });

export function planContacts(f: Feature, ctx: Ctx): ContactResult {
  const fr = featureFrame(f);
  switch (f.type) {
    case 'plane': return planeContacts(f, fr, ctx);
    case 'bore':
    case 'boss': return circleContacts(f, fr, ctx);
    case 'slot':
    case 'web': return pairContacts(f, fr, ctx);
    case 'sphere': return sphereContacts(f, fr, ctx);
  }
}

function countNote(f: Feature, count: number, raisedFrom: number | undefined) {
  return raisedFrom === undefined ? [] : [{ code: 'POINTS_RAISED', message: `${f.label}: ${raisedFrom} point(s) requested, planned ${count} (the minimum for a ${f.type}, or whole opposing pairs)` }];
}

function planeContacts(f: Extract<Feature, { type: 'plane' }>, fr: FeatureFrame, ctx: Ctx): ContactResult {
  const margin = f.margin ?? PLANE_MARGIN_MM;
  const hu = f.size[0] / 2 - margin;
  const hv = f.size[1] / 2 - margin;
  if (hu < 0 || hv < 0) return fault('PLANE_TOO_SMALL', `${f.label}: the face is smaller than twice its margin of ${margin} mm`);
  const { count, raisedFrom } = decideCount(f, 1);
  const prints = footprintsOnPlane(f, ctx.sources, ctx.r);
  const pts = spreadOverRectangle(count, hu, hv, (u, v) => {
    for (const fp of prints) if (fp.contains(u, v)) return true;
    return false;
  });
  if (pts.length < 3) return fault('PLANE_NO_ROOM', `${f.label}: only ${pts.length} free place(s) for touch points inside the margin, away from the features on the face`);
  const ordered = nearestNeighbourOrder(pts, (p) => p);
  const { origin: o } = f;
  const { e1, e2 } = fr;
  const notes = countNote(f, count, raisedFrom);
  if (pts.length < count) notes.push({ code: 'POINTS_REDUCED', message: `${f.label}: room for ${pts.length} of ${count} points` });
  return {
    // addScaled(addScaled(origin, e1, u), e2, v), written out (a surface outlives the plan: see plan.ts, `starts`)
    contacts: ordered.map(([u, v]) => ({ surface: [o[0] + e1[0] * u + e2[0] * v, o[1] + e1[1] * u + e2[1] * v, o[2] + e1[2] * u + e2[2] * v], normal: fr.n })),
    notes,
  };
}

function depthLevels(f: Feature & { levels?: number[] }, full: number, ctx: Ctx): number[] | ContactResult {
  const keep = ctx.r + LEVEL_MARGIN_MM;
  if (f.levels) {
    const bad = f.levels.find((d) => d < ctx.r || d > full - ctx.r);
    if (bad !== undefined) return fault('LEVEL_OUTSIDE', `${f.label}: level ${bad} mm puts the stylus ball past the top edge or the floor (allowed ${ctx.r} to ${+(full - ctx.r).toFixed(4)} mm)`);
    return f.levels;
  }
  if (full < 2 * ctx.r) return fault('TOO_SHALLOW', `${f.label}: ${full} mm deep is less than the stylus ball (${2 * ctx.r} mm)`);
  return levelDepths(defaultLevelCount(ctx.characteristics), Math.min(keep, full / 2), Math.max(full - keep, full / 2));
}

function circleContacts(f: Extract<Feature, { type: 'bore' | 'boss' }>, fr: FeatureFrame, ctx: Ctx): ContactResult {
  const R = f.diameter / 2;
  const inside = f.type === 'bore';
  if (inside && R <= ctx.r) return fault('STYLUS_TOO_LARGE', `${f.label}: the stylus ball (⌀${2 * ctx.r}) does not fit the bore (⌀${f.diameter})`);
  if (inside && ctx.approach > 2 * (R - ctx.r)) return fault('BORE_TOO_SMALL', `${f.label}: approach ${ctx.approach} mm does not fit inside the bore (at most ${+(2 * (R - ctx.r)).toFixed(4)} mm)`);
  const levels = depthLevels(f, inside ? f.depth : f.height, ctx);
  if (!Array.isArray(levels)) return levels;
  const { count, raisedFrom } = decideCount(f, levels.length);
  const start = toRad(f.startAngle ?? 0);
  const contacts: Contact[] = [];
  const { e1, e2 } = fr;
  levels.forEach((d, k) => {
    const stagger = (k * 2 * Math.PI) / count / levels.length;
    const level = addScaled(f.center, fr.n, -d);
    for (const a of circleAngles(count, start + stagger)) {
      const c = Math.cos(a);
      const s = Math.sin(a);
      // radial = [0, 0, 0] + e1·cos a + e2·sin a, surface = level + radial·R, as scalars
      const rx = 0 + e1[0] * c + e2[0] * s;
      const ry = 0 + e1[1] * c + e2[1] * s;
      const rz = 0 + e1[2] * c + e2[2] * s;
      const surface: Vec3 = [level[0] + rx * R, level[1] + ry * R, level[2] + rz * R];
      contacts.push({ surface, normal: inside ? [-rx, -ry, -rz] : [rx, ry, rz] });
    }
  });
  return { contacts, notes: countNote(f, count, raisedFrom) };
}

function pairContacts(f: Extract<Feature, { type: 'slot' | 'web' }>, fr: FeatureFrame, ctx: Ctx): ContactResult {
  const inside = f.type === 'slot';
  const half = f.width / 2;
  if (inside && half <= ctx.r) return fault('STYLUS_TOO_LARGE', `${f.label}: the stylus ball (⌀${2 * ctx.r}) does not fit the slot (width ${f.width})`);
  if (inside && ctx.approach > f.width - 2 * ctx.r) return fault('SLOT_TOO_NARROW', `${f.label}: approach ${ctx.approach} mm does not fit across the slot (at most ${+(f.width - 2 * ctx.r).toFixed(4)} mm)`);
  const levels = depthLevels(f, f.depth, ctx);
  if (!Array.isArray(levels)) return levels;
  const { count, raisedFrom } = decideCount(f, 1);
  const along = pairPositions(count / 2, (f.length - f.width) / 2 - (f.margin ?? 0));
  const contacts: Contact[] = [];
  for (const d of levels) {
    for (const s of along) {
      const mid = addScaled(addScaled(f.center, fr.n, -d), fr.e2, s);
      for (const side of [1, -1]) {
        const out: Vec3 = [fr.e1[0] * side, fr.e1[1] * side, fr.e1[2] * side];
        contacts.push({ surface: [mid[0] + out[0] * half, mid[1] + out[1] * half, mid[2] + out[2] * half], normal: inside ? [-out[0], -out[1], -out[2]] : out });
      }
    }
  }
  return { contacts, notes: countNote(f, count, raisedFrom) };
}

function sphereContacts(f: Extract<Feature, { type: 'sphere' }>, fr: FeatureFrame, ctx: Ctx): ContactResult {
  void ctx;
  const { count, raisedFrom } = decideCount(f, 1);
  const R = f.diameter / 2;
  const contacts = capPoints(count, toRad(CAP_POLAR_DEG), toRad(f.startAngle ?? 0)).map(([polar, az]): Contact => {
    const side = addScaled(addScaled([0, 0, 0], fr.e1, Math.cos(az)), fr.e2, Math.sin(az));
    const normal = addScaled(addScaled([0, 0, 0], fr.n, Math.cos(polar)), side, Math.sin(polar));
    return { surface: addScaled(f.center, normal, R), normal };
  });
  return { contacts, notes: countNote(f, count, raisedFrom) };
}
