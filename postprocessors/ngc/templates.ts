/** Handlebars templates of the `ngc` post (kept as TS strings so they bundle in the app). */
import type { PostTemplates } from '../../lib/program/render';

export const ngcTemplates: PostTemplates = {
  main: `{{#each programStart}}{{this}}
{{/each}}{{#each header}}{{this}}
{{/each}}o9001 sub
o9002 if [#5070 EQ 1]
{{#each stopHit}}{{this}}
{{/each}}o9002 endif
o9001 endsub
{{#each safeStart}}{{this}}
{{/each}}{{#each probeOn}}{{this}}
{{/each}}{{#each tripOpen}}{{this}}
{{/each}}{{#each blocks}}{{> (lookup . "kind")}}{{/each}}{{#each tripClose}}{{this}}
{{/each}}{{#each probeOff}}{{this}}
{{/each}}{{#each programEnd}}{{this}}
{{/each}}`,
  partials: {
    feature: `{{comment}}
`,
    rapid: `G0 {{words}}
`,
    rotary: `G0 {{words}}
`,
    protected: `G38.3 {{words}}{{feed}}
o9001 call
`,
    touch: `G38.2 {{words}}{{feed}}
`,
    backoff: `G91 G1 {{words}}{{feed}}
G90
`,
    record: `{{record}}
`,
    retract: `G1 {{words}}{{feed}}
`,
  },
};
