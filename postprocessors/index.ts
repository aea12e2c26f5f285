/**
 * The built-in post-processors: each a definition (validated here, once, when first used)
 * and its templates. Works the same from the CLI and from Next server code (no file reads).
 */
import { postDefinitionSchema } from '../lib/program/postprocessor-schema';
import { createRenderer, type PostBundle, type Renderer } from '../lib/program/render';
import { ngcDefinition } from './ngc/definition';
import { ngcTemplates } from './ngc/templates';
import { ngcGrammar } from './ngc/grammar';
import { isoSkipGrammar } from './iso-skip/grammar';
import { isoSkipDefinition } from './iso-skip/definition';
import { isoSkipTemplates } from './iso-skip/templates';

export const builtInPosts: Record<string, PostBundle> = {
  ngc: { definition: ngcDefinition, templates: ngcTemplates, grammar: ngcGrammar },
  'iso-skip': { definition: isoSkipDefinition, templates: isoSkipTemplates, grammar: isoSkipGrammar },
};

export const postIds = Object.keys(builtInPosts);

export interface ReadyPost { bundle: PostBundle; render: Renderer }

/** A post ready to render, or undefined for an unknown id. Its definition is checked by zod. */
export function getPost(id: string): ReadyPost | undefined {
  const bundle = builtInPosts[id];
  if (!bundle) return undefined;
  const definition = postDefinitionSchema.parse(bundle.definition);
  const checked = { ...bundle, definition };
  return { bundle: checked, render: createRenderer(checked) };
}
