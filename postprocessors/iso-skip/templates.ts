/** Handlebars templates of the `iso-skip` post (kept as TS strings so they bundle in the app). */
import type { PostTemplates } from '../../lib/program/render';

export const isoSkipTemplates: PostTemplates = {
  main: `{{#each programStart}}{{this}}
{{/each}}{{#each header}}{{this}}
{{/each}}{{#each safeStart}}{{this}}
{{/each}}{{#each probeOn}}{{this}}
{{/each}}{{#each tripOpen}}{{this}}
{{/each}}{{#each blocks}}{{> (lookup . "kind")}}{{/each}}{{#each tripClose}}{{this}}
{{/each}}{{#each probeOff}}{{this}}
{{/each}}{{#each programEnd}}{{this}}
{{/each}}N9001{{#each stopMiss}} {{this}}{{/each}}
N9002{{#each stopHit}} {{this}}{{/each}}
%
`,
  partials: {
    feature: `{{comment}}
`,
    rapid: `G0 {{words}}
`,
    rotary: `G0 {{words}}
`,
    protected: `G31 {{words}}{{feed}}
IF[[ABS[{{@root.vars.X}}-[{{x}}]]+ABS[{{@root.vars.Y}}-[{{y}}]]+ABS[{{@root.vars.Z}}-[{{z}}]]]GT{{@root.skipTol}}]GOTO9002
`,
    touch: `G31 {{words}}{{feed}}
IF[[ABS[{{@root.vars.X}}-[{{x}}]]+ABS[{{@root.vars.Y}}-[{{y}}]]+ABS[{{@root.vars.Z}}-[{{z}}]]]LT{{@root.skipTol}}]GOTO9001
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
