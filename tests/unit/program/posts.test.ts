import { describe, expect, it } from 'vitest';
import { demoBracket, demoCoverPlate, demoManifold } from '@/lib/examples/demo-parts';
import { presetIds, type PresetId } from '@/lib/kinematics/presets';
import { postIds } from '@/postprocessors/index';
import { postDefinitionSchema } from '@/lib/program/postprocessor-schema';
import { builtInPosts } from '@/postprocessors/index';
import { generate } from './helpers';

const cases: [string, typeof demoBracket, PresetId][] = [
  ['bracket-ac-trunnion', demoBracket, 'ac-trunnion'],
  ['manifold-b-head-c-table', demoManifold, 'b-head-c-table'],
  ['cover-plate-3-axis', demoCoverPlate, '3-axis'],
];

describe('whole programs (golden files, reviewed by eye)', () => {
  for (const postId of postIds) {
    for (const [name, part, preset] of cases) {
      it(`${postId}: ${name}`, async () => {
        const g = generate(part, preset, postId);
        await expect(g.program).toMatchFileSnapshot(`__snapshots__/${name}.${builtInPosts[postId]!.definition.fileExtension}`);
      });
    }
  }
});

describe('every program', () => {
  for (const postId of postIds) {
    it(`${postId}: is byte-identical when regenerated, carries the caution, one TRIP record per touch point`, () => {
      const a = generate(demoManifold, 'ca-fork-head', postId);
      expect(generate(demoManifold, 'ca-fork-head', postId).program).toBe(a.program);
      expect(a.program).toMatch(/single block/i);
      expect(a.program).toMatch(/machine builder's instructions/i);
      expect(a.program).not.toMatch(/20\d\d-\d\d-\d\d/);
      const records = a.program.split('\n').filter((l) => /TRIP[ *][0-9A-Fa-f-]{36}[ *]X#5061/.test(l));
      expect(records).toHaveLength(a.plan.touchPoints.length);
      for (const tp of a.plan.touchPoints) expect(a.program.toLowerCase()).toContain(tp.uuid);
      expect(a.program).toMatch(/G21 G90 G40/);
    });
  }
  it('built-in definitions pass their schema', () => {
    for (const b of Object.values(builtInPosts)) expect(postDefinitionSchema.safeParse(b.definition).success).toBe(true);
  });
  it('the verifier accepts every program the posts produce (3 parts × 6 layouts × 2 posts)', () => {
    let n = 0;
    for (const part of [demoBracket, demoManifold, demoCoverPlate]) {
      for (const preset of presetIds) {
        for (const postId of postIds) {
          const g = generate(part, preset, postId);
          const res = g.verify(g.program);
          expect(res.findings, `${part.number} ${preset} ${postId}`).toEqual([]);
          expect(res.ok).toBe(true);
          n++;
        }
      }
    }
    expect(n).toBe(36);
  });
});

describe('verifier findings on hand edits', () => {
  const g = generate(demoBracket, 'ac-trunnion', 'ngc');
  const lines = g.program.split('\n');
  const codes = (text: string) => g.verify(text).findings.map((f) => f.code);
  it('missing caution, unknown word, never measured point', () => {
    expect(codes(lines.filter((l) => !/single block/i.test(l)).join('\n'))).toContain('CAUTION_MISSING');
    const i = lines.findIndex((l) => l.startsWith('G38.2'));
    expect(codes([...lines.slice(0, i), 'G43 H1', ...lines.slice(i)].join('\n'))).toContain('UNKNOWN_WORD');
    const r = lines.findIndex((l) => l.startsWith('(LOG,TRIP'));
    const withoutRecord = codes([...lines.slice(0, r), ...lines.slice(r + 1)].join('\n'));
    expect(withoutRecord).toContain('POINT_NOT_MEASURED');
  });
  it('rotary moved below the top of Z', () => {
    const i = lines.findLastIndex((l) => /^G0 A/.test(l));
    expect(lines[i]).not.toBe('G0 A0.0000 C0.0000');
    const edited = [...lines];
    edited[i - 1] = 'G0 Z-100.0000';
    expect(codes(edited.join('\n'))).toContain('ROTARY_BELOW_CLEARANCE');
  });
  it('a protected move without its check', () => {
    const i = lines.findIndex((l) => l === 'o9001 call');
    expect(codes([...lines.slice(0, i), ...lines.slice(i + 1)].join('\n'))).toContain('CHECK_MISSING');
  });
});
