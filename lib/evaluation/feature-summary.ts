/**
 * The per-feature part of the `evaluate` output: the compensated fitted element with
 * its residuals and solver report (residual lists left out: they are per point and the
 * results already name the touch points).
 */
import type { Feature } from '../features/schema';
import type { SolverReport } from '../fitting/types';
import type { Vec3 } from '../geometry/vec3';
import type { MeasurementOrError } from './context';

export interface FeatureSummary {
  featureUuid: string;
  label: string;
  type: Feature['type'];
  measured: boolean;
  pointsPlanned: number;
  pointsUsed: number;
  message?: string;
  method?: string;
  fit?: {
    shape: 'plane' | 'circle' | 'cylinder' | 'sphere' | 'slot';
    origin?: Vec3;
    center?: Vec3;
    normal?: Vec3;
    axis?: Vec3;
    diameter?: number;
    width?: number;
    form?: number;
    residuals?: { rms: number; max: number; min: number };
    solver?: SolverReport;
  };
}

const brief = (r: { rms: number; max: number; min: number }): { rms: number; max: number; min: number } => ({ rms: r.rms, max: r.max, min: r.min });

export function summariseFeature(f: Feature, m: MeasurementOrError, planned: number): FeatureSummary {
  const base = { featureUuid: f.uuid, label: f.label, type: f.type, pointsPlanned: planned };
  if (!m.ok) return { ...base, measured: false, pointsUsed: 0, message: m.reason };
  const e = m.m.element;
  const common = { ...base, measured: true, pointsUsed: m.m.points.length, method: m.m.method };
  switch (e.kind) {
    case 'plane':
      return { ...common, fit: { shape: 'plane', origin: e.origin, normal: e.normal, form: e.fit.form, residuals: brief(e.fit.residuals), solver: e.fit.solver } };
    case 'axis': {
      const src = e.cylinder ?? e.circles[0];
      return { ...common, fit: { shape: e.cylinder ? 'cylinder' : 'circle', center: e.point, axis: e.axis, diameter: e.diameter, form: src?.form, residuals: src ? brief(src.residuals) : undefined, solver: src?.solver } };
    }
    case 'sphere':
      return { ...common, fit: { shape: 'sphere', center: e.center, diameter: e.diameter, form: e.fit.form, residuals: brief(e.fit.residuals), solver: e.fit.solver } };
    case 'slot':
      return { ...common, fit: { shape: 'slot', center: e.mid, normal: e.widthDir, width: e.width } };
  }
}
