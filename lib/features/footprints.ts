/**
 * Footprints of other features on a plane face, in the face's own (u, v) coordinates
 * (u along the plane's e1, v along e2, origin at the face centre). A plane's touch
 * points keep out of them; a feature standing on the face also raises its clearance.
 */
import { dot, type Vec3 } from '../geometry/vec3';
import type { Feature, Part } from './schema';
import { featureAxis, featureFrame } from './feature-geometry';
import type { Point2 } from './patterns';

export interface Footprint {
  /** Whether the point (u, v) lies inside the footprint grown by the keep-out distance. */
  contains: (u: number, v: number) => boolean;
  /** How far the feature stands above the face (0 for a bore or slot). */
  height: number;
}

const ON_FACE_TOL = 0.5;
const PARALLEL = 0.9995;

type Standing = Exclude<Feature, { type: 'plane' | 'sphere' }>;

/**
 * The features that can leave a footprint on a face (all but planes and spheres), with
 * their axes, and their positions in `items` grouped by axis (the very same numbers),
 * so a face tests each distinct axis once: prepare once per part.
 */
export interface FootprintSources {
  items: { f: Standing; n: Vec3 }[];
  byAxis: { n: Vec3; at: number[] }[];
  /** Footprints found so far, by plane and ball radius (`footprintsOnPlane` fills it). */
  found: Map<Feature, Map<number, Footprint[]>>;
}

export function footprintSources(part: Part): FootprintSources {
  const items: { f: Standing; n: Vec3 }[] = [];
  const groups = new Map<string, { n: Vec3; at: number[] }>();
  for (const f of part.features) {
    if (f.type === 'plane' || f.type === 'sphere') continue;
    const n = featureAxis(f);
    const key = `${n[0]},${n[1]},${n[2]}`;
    const g = groups.get(key) ?? { n, at: [] };
    g.at.push(items.length);
    groups.set(key, g);
    items.push({ f, n });
  }
  return { items, byAxis: [...groups.values()], found: new Map() };
}

/** Features whose opening or base lies on the plane, with keep-out of the ball radius + 1 mm. */
export function footprintsOnPlane(plane: Extract<Feature, { type: 'plane' }>, sources: FootprintSources, ballRadius: number): Footprint[] {
  let byRadius = sources.found.get(plane);
  if (!byRadius) sources.found.set(plane, (byRadius = new Map()));
  const known = byRadius.get(ballRadius);
  if (known) return known;
  const out = footprintsFor(plane, sources, ballRadius);
  byRadius.set(ballRadius, out);
  return out;
}

function footprintsFor(plane: Extract<Feature, { type: 'plane' }>, sources: FootprintSources, ballRadius: number): Footprint[] {
  const fr = featureFrame(plane);
  const keep = ballRadius + 1;
  const out: Footprint[] = [];
  // the sources about parallel axes, in their order in `items`
  const parallel = sources.byAxis.filter((g) => !(dot(g.n, fr.n) < PARALLEL));
  const at = parallel.length === 1 ? parallel[0]!.at : parallel.flatMap((g) => g.at).sort((a, b) => a - b);
  const [nx, ny, nz] = fr.n;
  const [ox, oy, oz] = plane.origin;
  for (const i of at) {
    const { f } = sources.items[i]!;
    const height = f.type === 'boss' ? f.height : f.type === 'web' ? f.depth : 0;
    // rel = centre − height·n − plane origin, as scalars
    const rx = f.center[0] - nx * height - ox;
    const ry = f.center[1] - ny * height - oy;
    const rz = f.center[2] - nz * height - oz;
    if (Math.abs(rx * nx + ry * ny + rz * nz) > ON_FACE_TOL) continue;
    const cu = rx * fr.e1[0] + ry * fr.e1[1] + rz * fr.e1[2];
    const cv = rx * fr.e2[0] + ry * fr.e2[1] + rz * fr.e2[2];
    // only footprints that can reach the face's rectangle
    const reach = (f.type === 'bore' || f.type === 'boss' ? f.diameter / 2 : Math.hypot(f.width, f.length) / 2) + keep;
    if (Math.abs(cu) > plane.size[0] / 2 + reach || Math.abs(cv) > plane.size[1] / 2 + reach) continue;
    if (f.type === 'bore' || f.type === 'boss') {
      const R = f.diameter / 2 + keep;
      out.push({ height, contains: (u, v) => (u - cu) ** 2 + (v - cv) ** 2 <= R * R });
    } else {
      const ff = featureFrame(f);
      const w: Point2 = [dot(ff.e1, fr.e1), dot(ff.e1, fr.e2)];
      const hw = f.width / 2 + keep;
      const hl = f.length / 2 + keep;
      out.push({
        height,
        contains: (u, v) => {
          const dx = u - cu;
          const dy = v - cv;
          return Math.abs(dx * w[0] + dy * w[1]) <= hw && Math.abs(-dx * w[1] + dy * w[0]) <= hl;
        },
      });
    }
  }
  return out;
}
