/**
 * Renders a view model through a post's handlebars templates on an isolated
 * `Handlebars.create()` instance (no global helpers or partials). Templates only loop
 * and interpolate; escaping is off because G-code is not HTML. Templates that stay in the
 * logic-free subset are rendered directly (render-direct.ts), with the same output.
 */
import Handlebars from 'handlebars';
import { numberLines } from './format';
import { compileDirect } from './render-direct';
import type { PostDefinition } from './postprocessor-schema';
import type { ProgramView } from './view-model';

export interface PostTemplates {
  main: string;
  partials: Record<string, string>;
}

/** How the verifier reads a post's programs back: its motion codes and fixed statements. */
export interface PostGrammar {
  /** Codes of protected positioning moves, touches, and skip moves told apart by the check after them. */
  protectedCodes: string[];
  touchCodes: string[];
  skipCodes: string[];
  /** Whole lines the templates write verbatim (besides the definition's own statements). */
  fixedLines: string[];
  /** The line that must follow a protected move (unexpected trigger → stop). */
  protectedCheck: RegExp;
  /** The line that must follow a touch (no trigger → stop), or null when the control stops by itself. */
  touchCheck: RegExp | null;
  /** Lines that start with these are statement labels at the end (e.g. N9001 …). */
  labelPrefixes: string[];
}

export interface PostBundle {
  definition: PostDefinition;
  templates: PostTemplates;
  grammar: PostGrammar;
}

export type Renderer = (view: ProgramView) => string;

export function createRenderer(bundle: PostBundle): Renderer {
  const hb = Handlebars.create();
  for (const [name, text] of Object.entries(bundle.templates.partials)) hb.registerPartial(name, text);
  const main = hb.compile<ProgramView>(bundle.templates.main, { noEscape: true, strict: false, preventIndent: true });
  // the same templates rendered by plain concatenation when they stay in the logic-free subset
  const direct = compileDirect(bundle.templates.main, bundle.templates.partials);
  return (view) => numberLines((direct && direct(view)) ?? main(view), bundle.definition);
}
