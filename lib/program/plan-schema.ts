/**
 * Plan output contract (spec/engine-cli.md, "plan"): touch points with deterministic
 * UUIDs, in the part frame P, millimetres; `axes` are machine axis values (mm, degrees).
 */
import { z } from 'zod';
import { vec3Schema } from '../kinematics/schema';

export const touchPointSchema = z.object({
  uuid: z.string().uuid(),
  featureUuid: z.string().uuid(),
  seq: z.number().int().nonnegative(),
  surface: vec3Schema,
  normal: vec3Schema,
  direction: vec3Schema,
  target: vec3Schema,
  start: vec3Schema,
  end: vec3Schema,
  toolAxis: vec3Schema,
  axes: z.record(z.string(), z.number()),
});
export type TouchPoint = z.infer<typeof touchPointSchema>;

export const planWarningSchema = z.object({
  featureUuid: z.string().optional(),
  label: z.string().optional(),
  code: z.string(),
  message: z.string(),
});
export type PlanWarning = z.infer<typeof planWarningSchema>;

export const planSchema = z.object({
  touchPoints: z.array(touchPointSchema),
  warnings: z.array(planWarningSchema).default([]),
});
export type Plan = z.infer<typeof planSchema>;
