import 'server-only';
/**
 * The one place the app calls the engine's verifier, so generated and edited
 * texts are checked the same way: the text is read back with the post's own
 * grammar and replayed against the plan.
 */
import { verifyProgram } from '@/lib/program/verify';
import { requirePost } from '@/lib/program/post';
import type { Plan } from '@/lib/program/plan-schema';
import type { Finding } from '@/lib/validation/programs';
import type { EngineInputs } from './build-revision';

export function verifyText(text: string, inputs: EngineInputs, plan: Plan): Finding[] {
  const result = verifyProgram({ program: text, part: inputs.part, probe: inputs.probe, machine: inputs.machine, plan }, requirePost(inputs.post));
  return result.findings;
}
