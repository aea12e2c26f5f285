/** Shared set-up for the program tests: plan + post + verify of a demo part on a preset machine. */
import { planInputSchema } from '@/lib/features/plan-input';
import { planProgram } from '@/lib/features/plan';
import { postProgram, requirePost } from '@/lib/program/post';
import { verifyProgram } from '@/lib/program/verify';
import { demoProbe } from '@/lib/examples/demo-parts';
import { machinePreset, type PresetId } from '@/lib/kinematics/presets';
import type { Part } from '@/lib/features/schema';

export function generate(part: Part, preset: PresetId, postId: string) {
  const input = planInputSchema.parse({ part, probe: demoProbe, machine: machinePreset(preset) });
  const plan = planProgram(input);
  const post = requirePost(postId);
  const program = postProgram({ ...input, plan, postprocessor: postId }, post);
  const verify = (text: string) => verifyProgram({ ...input, plan, program: text }, post);
  return { input, plan, post, program, verify };
}

/** Seeded PRNG (mulberry32) so the mutation placements are reproducible. */
export function rng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
