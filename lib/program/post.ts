/**
 * `post`: plan + part + probe + machine → program text in a post's dialect
 * (spec/engine-cli.md). Date-free: the same input always gives byte-identical text.
 */
import { GeometryError } from '../geometry/vec3';
import type { Part, Probe } from '../features/schema';
import type { Machine } from '../kinematics/schema';
import { getPost, postIds, type ReadyPost } from '../../postprocessors/index';
import type { Plan } from './plan-schema';
import { buildProgram } from './steps';
import { buildView } from './view-model';

export interface PostInput { plan: Plan; part: Part; probe: Probe; machine: Machine; postprocessor: string }

export function requirePost(id: string): ReadyPost {
  const post = getPost(id);
  if (!post) throw new GeometryError('UNKNOWN_POSTPROCESSOR', `no post-processor "${id}"; known: ${postIds.join(', ')}`, 'postprocessor');
  return post;
}

export function postProgram(input: PostInput, post: ReadyPost = requirePost(input.postprocessor)): string {
  const prog = buildProgram(input.plan, input.part, input.probe, input.machine);
  return post.render(buildView(post.bundle.definition, prog, input.part, input.probe, input.machine));
}
