/**
 * Mutation test of the verifier: posted programs for several parts, layouts and both
 * posts, each fault kind injected at seeded random places; at least 95 % must be caught
 * (verify → ok false). The figure is printed.
 */
import { describe, expect, it } from 'vitest';
import { demoBracket, demoCoverPlate, demoManifold } from '@/lib/examples/demo-parts';
import { machinePreset, type PresetId } from '@/lib/kinematics/presets';
import { linearAxesFor } from '@/lib/kinematics/inverse';
import { fixed } from '@/lib/program/format';
import { generate, rng } from './helpers';

type Kind = 'deeper' | 'retract-deleted' | 'rotary-changed' | 'beyond-limit' | 'rapid-into-part';
const KINDS: Kind[] = ['deeper', 'retract-deleted', 'rotary-changed', 'beyond-limit', 'rapid-into-part'];
const PER_KIND = 6;

const wordsOf = (line: string) => Object.fromEntries([...line.matchAll(/([XYZABC])(-?\d+\.\d+)/g)].map((m) => [m[1]!, Number(m[2])]));
const setWords = (line: string, w: Record<string, number>, d: number) =>
  line.replace(/([XYZABC])(-?\d+\.\d+)/g, (m, k: string) => (k in w ? `${k}${fixed(w[k]!, d)}` : m));
const isProtected = (l: string, next: string | undefined) => l.startsWith('G38.3') || (l.startsWith('G31') && /GT[\d.]+\]GOTO/.test(next ?? ''));
const isTouch = (l: string, next: string | undefined) => l.startsWith('G38.2') || (l.startsWith('G31') && /LT[\d.]+\]GOTO/.test(next ?? ''));
const isRecord = (l: string) => /^(\(LOG,TRIP|DPRNT\[TRIP)/.test(l);

function mutate(kind: Kind, lines: string[], g: ReturnType<typeof generate>, preset: PresetId, rand: () => number): string[] | null {
  const d = g.post.bundle.definition.decimals.linear;
  const pick = (idx: number[]) => (idx.length ? idx[Math.floor(rand() * idx.length)]! : -1);
  const out = [...lines];
  const indices = (pred: (l: string, i: number) => boolean) => lines.map((l, i) => (pred(l, i) ? i : -1)).filter((i) => i >= 0);
  switch (kind) {
    case 'deeper': {
      const i = pick(indices((l, k) => isTouch(l, lines[k + 1])));
      let s = i - 1;
      while (s > 0 && !isProtected(lines[s]!, lines[s + 1])) s--;
      const a = wordsOf(lines[s]!);
      const b = wordsOf(lines[i]!);
      const len = Math.hypot(b.X! - a.X!, b.Y! - a.Y!, b.Z! - a.Z!);
      const push = 0.05 + rand() * 3;
      const w = Object.fromEntries(['X', 'Y', 'Z'].map((k) => [k, b[k]! + ((b[k]! - a[k]!) / len) * push]));
      out[i] = setWords(lines[i]!, w, d);
      return out;
    }
    case 'retract-deleted': {
      const retracts = indices((l, k) => l.startsWith('G1 ') && isRecord(lines[k - 1] ?? ''));
      const lifts = indices((l, k) => isProtected(l, lines[k + 1]) && (lines[k - 1] ?? '').startsWith('G1 '));
      const i = pick([...retracts, ...lifts]);
      out.splice(i, lifts.includes(i) ? 2 : 1);
      return out;
    }
    case 'rotary-changed': {
      const i = pick(indices((l) => /^G0 [ABC]-?\d/.test(l)));
      if (i < 0) return null;
      const w = wordsOf(lines[i]!);
      const k = Object.keys(w)[Math.floor(rand() * Object.keys(w).length)]!;
      const step = (2 + rand() * 38) * (rand() < 0.5 ? -1 : 1);
      const m = machinePreset(preset).rotaries.find((r) => r.name === k)!;
      let v = w[k]! + step;
      if (m.min !== null && m.max !== null && (v < m.min || v > m.max)) v = w[k]! - step;
      out[i] = setWords(lines[i]!, { [k]: v }, g.post.bundle.definition.decimals.angular);
      return out;
    }
    case 'beyond-limit': {
      const i = pick(indices((l) => /^G(0|1|38\.[23]|31) .*X/.test(l)));
      const lin = machinePreset(preset).linear;
      const k = (['X', 'Y', 'Z'] as const)[Math.floor(rand() * 3)]!;
      const [lo, hi] = lin[k];
      out[i] = setWords(lines[i]!, { [k]: rand() < 0.5 ? hi + 1 + rand() * 50 : lo - 1 - rand() * 50 }, d);
      return out;
    }
    case 'rapid-into-part': {
      const tp = g.plan.touchPoints[Math.floor(rand() * g.plan.touchPoints.length)]!;
      const rec = lines.findIndex((l) => l.toLowerCase().includes(tp.uuid));
      const rot = Object.fromEntries(Object.entries(tp.axes).filter(([k]) => !'XYZ'.includes(k)));
      const at = linearAxesFor(machinePreset(preset), rand() < 0.5 ? tp.target : tp.surface, rot);
      out.splice(rec + 1, 0, `G0 X${fixed(at.X, d)} Y${fixed(at.Y, d)} Z${fixed(at.Z, d)}`);
      return out;
    }
  }
}

describe('verifier mutation test', () => {
  it('catches at least 95 % of injected faults', () => {
    const rand = rng(20261201);
    const tally = new Map<Kind, { tried: number; caught: number }>(KINDS.map((k) => [k, { tried: 0, caught: 0 }]));
    const missed: string[] = [];
    const configs: [typeof demoBracket, PresetId][] = [
      [demoBracket, 'ac-trunnion'], [demoManifold, 'b-head-c-table'], [demoManifold, 'ca-fork-head'],
      [demoManifold, 'nutating-45'], [demoCoverPlate, '3-axis'], [demoBracket, 'bc-trunnion'],
    ];
    for (const [part, preset] of configs) {
      for (const postId of ['ngc', 'iso-skip']) {
        const g = generate(part, preset, postId);
        const lines = g.program.split('\n');
        expect(g.verify(g.program).ok).toBe(true);
        for (const kind of KINDS) {
          for (let n = 0; n < PER_KIND; n++) {
            const edited = mutate(kind, lines, g, preset, rand);
            if (!edited) continue;
            const t = tally.get(kind)!;
            t.tried++;
            if (!g.verify(edited.join('\n')).ok) t.caught++;
            else missed.push(`${kind} ${part.number} ${preset} ${postId}`);
          }
        }
      }
    }
    const tried = [...tally.values()].reduce((s, t) => s + t.tried, 0);
    const caught = [...tally.values()].reduce((s, t) => s + t.caught, 0);
    const lines = [...tally].map(([k, t]) => `  ${k}: ${t.caught}/${t.tried}`).join('\n');
    console.log(`verifier mutation test: ${caught}/${tried} caught = ${((100 * caught) / tried).toFixed(1)} %\n${lines}${missed.length ? `\n  missed: ${missed.join('; ')}` : ''}`);
    expect(tried).toBeGreaterThan(300);
    expect(caught / tried).toBeGreaterThanOrEqual(0.95);
  });
});
