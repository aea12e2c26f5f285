/**
 * Footprints of other features on a plane face, in the face's own (u, v) coordinates
 * (u along the plane's e1, v along e2, origin at the face centre). A plane's touch
 * points keep out of them; a feature standing on the face also raises its clearance.
 */
import { dot, sub, type Vec3 } from '../geometry/vec3';
import type { Feature, Part } from './schema';
import { featureAxis, featureFrame } from './feature-geometry';
import type { Point2 } from './patterns';

export interface Footprint {
  /** Whether a (u, v) point lies inside the footprint grown by the keep-out distance. */
  contains: (p: Point2) => boolean;
  /** How far the feature stands above the face (0 for a bore or slot). */
  height: number;
}

const ON_FACE_TOL = 0.5;
const PARALLEL = 0.9995;

type Standing = Exclude<Feature, { type: 'plane' | 'sphere' }>;

/** The features that can leave a footprint on a face (all but planes and spheres), with their axes: prepare once per part. */
export interface FootprintSources { items: { f: Standing; n: Vec3 }[] }

export function footprintSources(part: Part): FootprintSources {
  const items: { f: Standing; n: Vec3 }[] = [];
  for (const f of part.features) if (f.type !== 'plane' && f.type !== 'sphere') items.push({ f, n: featureAxis(f) });
  return { items };
}

/** Features whose opening or base lies on the plane, with keep-out of the ball radius + 1 mm. */
export function footprintsOnPlane(plane: Extract<Feature, { type: 'plane' }>, sources: FootprintSources, ballRadius: number): Footprint[] {
  const fr = featureFrame(plane);
  const keep = ballRadius + 1;
  const out: Footprint[] = [];
  for (const { f, n } of sources.items) {
    if (dot(n, fr.n) < PARALLEL) continue;
    const height = f.type === 'boss' ? f.height : f.type === 'web' ? f.depth : 0;
    const base = sub(f.center, [fr.n[0] * height, fr.n[1] * height, fr.n[2] * height]);
    const rel: Vec3 = sub(base, plane.origin);
    if (Math.abs(dot(rel, fr.n)) > ON_FACE_TOL) continue;
    const c: Point2 = [dot(rel, fr.e1), dot(rel, fr.e2)];
    // only footprints that can reach the face's rectangle
    const reach = (f.type === 'bore' || f.type === 'boss' ? f.diameter / 2 : Math.hypot(f.width, f.length) / 2) + keep;
    if (Math.abs(c[0]) > plane.size[0] / 2 + reach || Math.abs(c[1]) > plane.size[1] / 2 + reach) continue;
    if (f.type === 'bore' || f.type === 'boss') {
      const R = f.diameter / 2 + keep;
      out.push({ height, contains: (p) => (p[0] - c[0]) ** 2 + (p[1] - c[1]) ** 2 <= R * R });
    } else {
      const ff = featureFrame(f);
      const w: Point2 = [dot(ff.e1, fr.e1), dot(ff.e1, fr.e2)];
      const hw = f.width / 2 + keep;
      const hl = f.length / 2 + keep;
      out.push({
        height,
        contains: (p) => {
          const dx = p[0] - c[0];
          const dy = p[1] - c[1];
          return Math.abs(dx * w[0] + dy * w[1]) <= hw && Math.abs(-dx * w[1] + dy * w[0]) <= hl;
        },
      });
    }
  }
  return out;
}
