import 'server-only';
/**
 * What the package needs to know about a post: its display name and file extension (from
 * the post's own definition) and the work offset its programs run in (every built-in
 * post's safe-start block sets G54; spec/engine-cli.md: the work offset is the model's M origin).
 */
import { getPost } from '@/postprocessors/index';

export interface PostFacts { name: string; extension: string; workOffset: string }

export function postFacts(postId: string): PostFacts {
  const definition = getPost(postId)?.bundle.definition;
  const start = definition?.safeStart.join(' ') ?? '';
  const workOffset = /\bG5[4-9](?:\.1 P\d+)?\b/.exec(start)?.[0] ?? 'G54';
  return { name: definition?.name ?? postId, extension: definition?.fileExtension ?? 'nc', workOffset };
}
