import Handlebars from 'handlebars';
import { describe, expect, it } from 'vitest';
import { demoBracket, demoCoverPlate, demoManifold } from '@/lib/examples/demo-parts';
import { presetIds } from '@/lib/kinematics/presets';
import { compileDirect } from '@/lib/program/render-direct';
import { fixed } from '@/lib/program/format';
import { buildProgram } from '@/lib/program/steps';
import { buildView } from '@/lib/program/view-model';
import { builtInPosts, postIds } from '@/postprocessors/index';
import { generate } from './helpers';

/** Handlebars itself, with the options the posts render with: the oracle for the direct renderer. */
function viaHandlebars(main: string, partials: Record<string, string>, view: unknown): string {
  const hb = Handlebars.create();
  for (const [name, text] of Object.entries(partials)) hb.registerPartial(name, text);
  return hb.compile(main, { noEscape: true, strict: false, preventIndent: true })(view);
}

describe('direct rendering of the logic-free template subset', () => {
  it('gives byte for byte what Handlebars gives, for every built-in post, demo part and layout', () => {
    let compared = 0;
    for (const postId of postIds) {
      const { templates, definition } = builtInPosts[postId]!;
      const direct = compileDirect(templates.main, templates.partials);
      expect(direct, `${postId} templates stay in the subset`).not.toBeNull();
      for (const part of [demoBracket, demoManifold, demoCoverPlate]) {
        for (const preset of presetIds) {
          const g = generate(part, preset, postId);
          const view = buildView(definition, buildProgram(g.plan, g.input.part, g.input.probe, g.input.machine), g.input.part, g.input.probe, g.input.machine);
          const text = direct!(view);
          expect(text).not.toBeNull();
          expect(text).toBe(viaHandlebars(templates.main, templates.partials, view));
          compared++;
        }
      }
    }
    expect(compared).toBe(postIds.length * 3 * presetIds.length);
  });

  const partials = { a: 'A={{x}};', b: '  B{{@root.tag}}|{{this}}\n' };
  const view = { tag: 'T', list: ['p', 'q'], items: [{ kind: 'a', x: 1 }, { kind: 'a', x: null }, { kind: 'a', x: false }, { kind: 'a', x: 0 }], empty: [] };

  it('matches Handlebars on the edge values it accepts: numbers, null, false, 0, empty lists, standalone lines, comments', () => {
    const main = '{{! a comment }}{{#each items}}{{> (lookup . "kind")}}{{/each}}\n{{#each list}}\n  {{> b}}\n{{/each}}{{#each empty}}x{{/each}}{{missing}}{{#each missing}}y{{/each}}<{{tag}}>';
    const direct = compileDirect(main, partials);
    expect(direct).not.toBeNull();
    const text = direct!(view);
    expect(text).toBe(viaHandlebars(main, partials, view));
    expect(text).toContain('A=1;A=;A=false;A=0;');
  });

  it('refuses templates outside the subset, so they go to Handlebars', () => {
    for (const main of ['{{#if tag}}x{{/if}}', '{{#each list}}{{@index}}{{/each}}', '{{#each list}}{{../tag}}{{/each}}', '{{#each list}}a{{else}}b{{/each}}', '{{lookup . "tag"}}', '{{> a x=1}}', '{{> nowhere}}', '{{tag.length}}']) {
      expect(compileDirect(main, partials), main).toBeNull();
    }
  });

  it('gives up at render time where Handlebars would behave otherwise: a function value, each over an object, an unknown partial', () => {
    const direct = compileDirect('{{tag}}{{#each list}}.{{/each}}{{#each items}}{{> (lookup . "kind")}}{{/each}}', partials)!;
    expect(direct({ tag: () => 'f', list: [], items: [] })).toBeNull();
    expect(direct({ tag: '', list: { a: 1 }, items: [] })).toBeNull();
    expect(direct({ tag: '', list: [], items: [{ kind: 'nowhere' }] })).toBeNull();
    expect(direct({ tag: 'ok', list: [1], items: [] })).toBe('ok.');
  });
});

describe('fixed-decimal numbers', () => {
  it('rounds like toFixed and never writes a negative zero', () => {
    expect(fixed(-0.00004, 4)).toBe('0.0000');
    expect(fixed(-0.0004, 3)).toBe('0.000');
    expect(fixed(-0, 3)).toBe('0.000');
    expect(fixed(-0.4, 0)).toBe('0');
    expect(fixed(-0.0006, 3)).toBe('-0.001');
    expect(fixed(-12.5, 1)).toBe('-12.5');
    expect(fixed(1234.56789, 4)).toBe('1234.5679');
    expect(fixed(-1234.56789, 4)).toBe('-1234.5679');
  });
});
