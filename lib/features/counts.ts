/**
 * Default and minimum touch-point counts per feature.
 *
 * From memory: BS 7172:1989 as reproduced in NPL Good Practice Guide 41 (Flack 2001),
 * REFERENCES.md §5 — mathematical minimum / recommended: plane 3 / 9, circle 3 / 7,
 * sphere 4 / 9, cylinder 5 / 12 on at least 2 levels. Prime counts per circle (7) avoid
 * hiding lobing whose order is a multiple of the count (REFERENCES.md §5, computed
 * reasoning). Slots and webs: opposing pairs; 2 pairs by default, 1 at least
 * (common practice: a width needs one opposing pair, two show taper along the length).
 */
import type { Characteristic, Feature, Part } from './schema';

export const POINT_COUNTS = {
  plane: { minimum: 3, recommended: 9 },
  circle: { minimum: 3, recommended: 7 },
  sphere: { minimum: 4, recommended: 9 },
  cylinder: { minimum: 5, recommended: 12, minimumLevels: 2 },
  pairs: { minimum: 1, recommended: 2 },
} as const;

/** Levels by default for a bore or boss: cylindricity wants 3, perpendicularity 2, else 1. */
export function defaultLevelCount(characteristics: Set<Characteristic>): number {
  if (characteristics.has('cylindricity')) return 3;
  if (characteristics.has('perpendicularity')) return 2;
  return 1;
}

/** The characteristics toleranced on each feature, by feature uuid. */
export function characteristicsByFeature(part: Part): Map<string, Set<Characteristic>> {
  const out = new Map<string, Set<Characteristic>>();
  for (const t of part.tolerances) {
    const set = out.get(t.featureUuid) ?? new Set<Characteristic>();
    set.add(t.characteristic);
    out.set(t.featureUuid, set);
  }
  return out;
}

export interface CountDecision {
  /** Points per level (bores, bosses), pairs × 2 (slots, webs), or total (planes, spheres). */
  count: number;
  /** Set when a requested count was below the mathematical minimum and was raised. */
  raisedFrom?: number;
}

/** The count to plan for a feature: the user's request, never below the minimum; else the recommendation. */
export function decideCount(f: Feature, levels: number): CountDecision {
  const req = f.points;
  switch (f.type) {
    case 'plane':
      return clampCount(req, POINT_COUNTS.plane.minimum, POINT_COUNTS.plane.recommended);
    case 'sphere':
      return clampCount(req, POINT_COUNTS.sphere.minimum, POINT_COUNTS.sphere.recommended);
    case 'bore':
    case 'boss': {
      // a cylinder (≥ 2 levels) needs 5 in all, each circle at least 3
      const perLevelMin = levels >= 2 ? Math.max(POINT_COUNTS.circle.minimum, Math.ceil(POINT_COUNTS.cylinder.minimum / levels)) : POINT_COUNTS.circle.minimum;
      return clampCount(req, perLevelMin, POINT_COUNTS.circle.recommended);
    }
    case 'slot':
    case 'web': {
      // requested points are rounded up to whole opposing pairs
      const pairs = req === undefined ? undefined : Math.ceil(req / 2);
      const d = clampCount(pairs, POINT_COUNTS.pairs.minimum, POINT_COUNTS.pairs.recommended);
      return { count: d.count * 2, ...(d.raisedFrom !== undefined || (req !== undefined && req % 2 === 1) ? { raisedFrom: req } : {}) };
    }
  }
}

function clampCount(req: number | undefined, minimum: number, recommended: number): CountDecision {
  if (req === undefined) return { count: recommended };
  if (req < minimum) return { count: minimum, raisedFrom: req };
  return { count: req };
}
