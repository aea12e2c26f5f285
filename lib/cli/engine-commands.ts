/** The engine-generate commands of the CLI: fk, ik, plan, post, verify (spec/engine-cli.md). */
import { z } from 'zod';
import { directionSchema, machineSchema, vec3Schema } from '../kinematics/schema';
import { forwardKinematics } from '../kinematics/forward';
import { inverseKinematics } from '../kinematics/inverse';
import { planInputSchema } from '../features/plan-input';
import { planProgram } from '../features/plan';
import { partSchema, probeSchema } from '../features/schema';
import { planSchema } from '../program/plan-schema';
import { postProgram, requirePost } from '../program/post';
import { verifyProgram } from '../program/verify';
import { CommandError, errorObject, parseOrThrow } from './errors';

const axesSchema = z.record(z.string(), z.number().finite());

export function fkCommand(input: unknown): unknown {
  const { machine, axes } = parseOrThrow(z.object({ machine: machineSchema, axes: axesSchema }), input);
  for (const w of ['X', 'Y', 'Z', ...machine.rotaries.map((r) => r.name)]) {
    if (!(w in axes)) throw new CommandError(errorObject('VALIDATION', `axes.${w}: missing (one value per linear axis and per rotary)`, `axes.${w}`));
  }
  return forwardKinematics(machine, axes);
}

export function ikCommand(input: unknown): unknown {
  const req = parseOrThrow(z.object({ machine: machineSchema, tip: vec3Schema, axis: directionSchema, previous: axesSchema.optional() }), input);
  return inverseKinematics(req.machine, req.tip, req.axis, req.previous ?? {});
}

export function planCommand(input: unknown): unknown {
  return planProgram(parseOrThrow(planInputSchema, input));
}

const postInputSchema = z.object({ plan: planSchema, part: partSchema, probe: probeSchema, machine: machineSchema, postprocessor: z.string() });

export function postCommand(input: unknown): string {
  const req = parseOrThrow(postInputSchema, input);
  const known = new Set(req.part.features.map((f) => f.uuid));
  const i = req.plan.touchPoints.findIndex((tp) => !known.has(tp.featureUuid));
  if (i >= 0) throw new CommandError(errorObject('VALIDATION', `plan.touchPoints[${i}].featureUuid: names no feature of the part`, `plan.touchPoints[${i}].featureUuid`));
  return postProgram(req);
}

const verifyInputSchema = z.object({
  program: z.string(), postprocessor: z.string(), part: partSchema, probe: probeSchema, machine: machineSchema, plan: planSchema.optional(),
});

export function verifyCommand(input: unknown): unknown {
  const req = parseOrThrow(verifyInputSchema, input);
  const post = requirePost(req.postprocessor);
  const plan = req.plan ?? planProgram(parseOrThrow(planInputSchema, { part: req.part, probe: req.probe, machine: req.machine }));
  return verifyProgram({ program: req.program, part: req.part, probe: req.probe, machine: req.machine, plan }, post);
}
