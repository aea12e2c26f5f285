/**
 * One entry point for every shape (the `fit` command and the evaluation use it):
 * least squares always; minimum zone on request for planes and circles (its zone and
 * orientation are reported beside the least-squares parameters, which stay the fit's
 * position and size).
 */
import { fitCircle } from './circle';
import { fitCylinder } from './cylinder';
import { fitLine, fitPlane } from './line-plane';
import { minimumZoneCircle, minimumZonePlane, type MinimumZoneCircle, type MinimumZonePlane } from './minimum-zone';
import { fitSphere } from './sphere';
import { FitError, type AnyFit, type FitMethod } from './types';
import type { Vec3 } from '../geometry/vec3';

export type Shape = AnyFit['shape'];

export interface FitRequest {
  shape: Shape;
  points: readonly Vec3[];
  method?: FitMethod;
  /** Approximate normal (plane, circle) or direction (line, cylinder axis). */
  hint?: { normal?: Vec3; axis?: Vec3; direction?: Vec3 };
}

export type ShapeFit = AnyFit & { minimumZone?: MinimumZonePlane | MinimumZoneCircle };

export function fitShape(req: FitRequest): ShapeFit {
  const method = req.method ?? 'least-squares';
  const h = req.hint ?? {};
  const dirHint = h.axis ?? h.direction ?? h.normal;
  switch (req.shape) {
    case 'line':
      noMinimumZone(method, 'line');
      return fitLine(req.points, dirHint);
    case 'plane': {
      const ls = fitPlane(req.points, h.normal ?? dirHint);
      if (method !== 'minimum-zone') return ls;
      const mz = minimumZonePlane(req.points, ls);
      return { ...ls, method, form: mz.form, minimumZone: mz };
    }
    case 'circle': {
      const ls = fitCircle(req.points, h.normal ?? dirHint);
      if (method !== 'minimum-zone') return ls;
      const mz = minimumZoneCircle(req.points, ls);
      return { ...ls, method, form: mz.form, minimumZone: mz };
    }
    case 'sphere':
      noMinimumZone(method, 'sphere');
      return fitSphere(req.points);
    case 'cylinder':
      noMinimumZone(method, 'cylinder');
      return fitCylinder(req.points, dirHint);
  }
}

function noMinimumZone(method: FitMethod, shape: string): void {
  if (method === 'minimum-zone') {
    throw new FitError('UNSUPPORTED_METHOD', `minimum zone is available for planes and circles, not for a ${shape}; use least-squares`);
  }
}
