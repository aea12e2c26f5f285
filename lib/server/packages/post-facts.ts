import 'server-only';
/**
 * What the package needs to know about a post: its display name, file extension and the
 * work offset its programs run in. Read from the post's definition when it is there.
 */
export interface PostFacts { name: string; extension: string; workOffset: string }

const KNOWN: Record<string, PostFacts> = {
  ngc: { name: 'RS274/NGC', extension: 'ngc', workOffset: 'G54' },
  'iso-skip': { name: 'ISO skip (G31)', extension: 'nc', workOffset: 'G54' },
};

export function postFacts(postId: string): PostFacts {
  return KNOWN[postId] ?? { name: postId, extension: 'nc', workOffset: 'G54' };
}
