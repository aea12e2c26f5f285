/** How the verifier reads `ngc` programs back (the statements its templates write). */
import type { PostGrammar } from '../../lib/program/render';

export const ngcGrammar: PostGrammar = {
  protectedCodes: ['G38.3'],
  touchCodes: ['G38.2'],
  skipCodes: [],
  fixedLines: ['o9001 sub', 'o9002 if [#5070 EQ 1]', 'o9002 endif', 'o9001 endsub'],
  protectedCheck: /^o9001 call$/,
  touchCheck: null,
  labelPrefixes: [],
};
