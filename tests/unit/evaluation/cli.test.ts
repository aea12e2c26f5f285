/**
 * The `fit`, `evaluate` and `simulate` commands through the CLI runner: batch mode,
 * error objects and exit status (spec/engine-cli.md).
 */
import { describe, expect, it } from 'vitest';
import { runCli } from '@/lib/cli/run';
import { planInputSchema } from '@/lib/features/plan-input';
import { planProgram } from '@/lib/features/plan';
import { demoBracket, demoProbe } from '@/lib/examples/demo-parts';
import { machinePreset } from '@/lib/kinematics/presets';

const machine = machinePreset('3-axis');
const plan = planProgram(planInputSchema.parse({ part: demoBracket, probe: demoProbe, machine }));

describe('engine CLI: fit, evaluate, simulate', () => {
  it('fit in batch: a result, a degenerate fit and a validation error; exit 2', () => {
    const out = runCli('fit', JSON.stringify([
      { shape: 'plane', points: [[0, 0, 0], [1, 0, 0], [0, 1, 0], [1, 1, 0.001]], method: 'minimum-zone' },
      { shape: 'circle', points: [[0, 0, 0], [1, 1, 1], [2, 2, 2]] },
      { shape: 'torus', points: [] },
    ]));
    expect(out.exitCode).toBe(2);
    const [a, b, c] = JSON.parse(out.stdout) as Array<Record<string, unknown>>;
    expect(a?.shape).toBe('plane');
    expect(a?.form as number).toBeGreaterThan(0);
    expect(b).toEqual({ error: { code: 'COLLINEAR_POINTS', message: 'the points lie on one line: no circle is defined', path: '[1].points' } });
    expect((c?.error as { code: string }).code).toBe('VALIDATION');
  });
  it('simulate then evaluate: every tolerance gets a status; exit 0', () => {
    const sim = runCli('simulate', JSON.stringify({ part: demoBracket, probe: demoProbe, plan, machine, errors: { formNoise: 0.001 }, seed: 4 }));
    expect(sim.exitCode).toBe(0);
    const { measurements } = JSON.parse(sim.stdout) as { measurements: unknown[] };
    expect(measurements).toHaveLength(plan.touchPoints.length);
    const ev = runCli('evaluate', JSON.stringify({ part: demoBracket, probe: demoProbe, plan, measurements }));
    expect(ev.exitCode).toBe(0);
    const out = JSON.parse(ev.stdout) as { results: Array<{ status: string; decisionRule: unknown }> };
    expect(out.results).toHaveLength(demoBracket.tolerances.length);
    for (const r of out.results) expect(['conforming', 'marginal', 'nonconforming', 'not-evaluated']).toContain(r.status);
  });
  it('evaluate with a bad measurement: a validation error naming where', () => {
    const ev = runCli('evaluate', JSON.stringify({ part: demoBracket, probe: demoProbe, plan, measurements: [{ uuid: plan.touchPoints[0]!.uuid, point: [0, 'x', 0] }] }));
    expect(ev.exitCode).toBe(2);
    const e = JSON.parse(ev.stdout) as { error: { path: string } };
    expect(e.error.path).toBe('measurements[0].point[1]');
  });
  it('simulate: rotary offsets without a machine is a validation error', () => {
    const s = runCli('simulate', JSON.stringify({ part: demoBracket, probe: demoProbe, plan, errors: { rotaryOffsets: { C: 0.1 } } }));
    expect(s.exitCode).toBe(2);
    expect(s.stdout).toMatch(/rotary offsets need the machine/);
  });
});
