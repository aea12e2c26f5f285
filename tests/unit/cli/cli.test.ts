import { spawnSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { runCli } from '@/lib/cli/run';
import { zodToError } from '@/lib/cli/errors';
import { machineSchema } from '@/lib/kinematics/schema';
import { machinePreset } from '@/lib/kinematics/presets';
import { demoBracket, demoProbe } from '@/lib/examples/demo-parts';

const ac = machinePreset('ac-trunnion');
const run = (cmd: string, input: unknown) => runCli(cmd, typeof input === 'string' ? input : JSON.stringify(input));

describe('engine CLI', () => {
  it('fk and ik round trip through the command line', () => {
    const ik = run('ik', { machine: ac, tip: [10, 5, 3], axis: [1, 0, 1] });
    expect(ik.exitCode).toBe(0);
    const res = JSON.parse(ik.stdout) as { solutions: Record<string, number>[]; chosen: number; singular: boolean };
    expect(res.singular).toBe(false);
    const fk = JSON.parse(run('fk', { machine: ac, axes: res.solutions[res.chosen] }).stdout) as { tip: number[]; axis: number[] };
    expect(fk.tip[0]).toBeCloseTo(10, 9);
    expect(fk.axis[0]).toBeCloseTo(Math.SQRT1_2, 12);
  });
  it('batch: one output per element, in order; one failure gives exit 2 without stopping the others', () => {
    const r = run('fk', [{ machine: ac, axes: { X: 0, Y: 0, Z: 0, A: 0, C: 0 } }, { machine: ac, axes: { X: 0 } }]);
    expect(r.exitCode).toBe(2);
    const out = JSON.parse(r.stdout) as unknown[];
    expect(out).toHaveLength(2);
    expect(out[0]).toHaveProperty('tip');
    expect(out[1]).toEqual({ error: { code: 'VALIDATION', message: 'axes.Y: missing (one value per linear axis and per rotary)', path: '[1].axes.Y' } });
  });
  it('bad JSON, wrong shape and unknown command: error objects, exit 2, no stack trace', () => {
    for (const [cmd, text] of [['plan', '{"part":'], ['plan', '[1,'], ['nope', '{}']] as const) {
      const r = runCli(cmd, text);
      expect(r.exitCode).toBe(2);
      const e = JSON.parse(r.stdout) as { error: { code: string; message: string } };
      expect(['BAD_JSON', 'UNKNOWN_COMMAND']).toContain(e.error.code);
      expect(r.stdout).not.toMatch(/at .*\.ts:\d+/);
    }
    const wrong = JSON.parse(run('ik', { machine: { ...ac, rotaries: [{ ...ac.rotaries[0], direction: [0, 0, 0] }] }, tip: [0, 0, 0], axis: [0, 0, 1] }).stdout);
    expect(wrong.error).toEqual({ code: 'VALIDATION', message: 'machine.rotaries[0].direction: must be a non-zero direction vector', path: 'machine.rotaries[0].direction' });
  });
  it('computation errors carry the contract codes', () => {
    const r = run('ik', { machine: machinePreset('3-axis'), tip: [0, 0, 0], axis: [1, 0, 0] });
    expect(r.exitCode).toBe(2);
    expect(JSON.parse(r.stdout).error.code).toBe('UNREACHABLE_ORIENTATION');
    const o = JSON.parse(run('ik', { machine: ac, tip: [0, 0, 0], axis: [0, -1, -1] }).stdout);
    expect(o.error.code).toBe('OUT_OF_LIMITS');
    expect(o.error.message).toMatch(/A would be/);
  });
  it('plan → post (text) → verify (plans again when no plan is given)', () => {
    const input = { part: demoBracket, probe: demoProbe, machine: ac };
    const plan = JSON.parse(run('plan', input).stdout);
    const post = run('post', { ...input, plan, postprocessor: 'ngc' });
    expect(post.exitCode).toBe(0);
    expect(post.stdout.startsWith('%\n(')).toBe(true);
    const v = JSON.parse(run('verify', { ...input, program: post.stdout, postprocessor: 'ngc' }).stdout);
    expect(v).toEqual({ ok: true, findings: [] });
    const batch = JSON.parse(run('post', [{ ...input, plan, postprocessor: 'iso-skip' }, { ...input, plan, postprocessor: 'nope' }]).stdout);
    expect(typeof batch[0]).toBe('string');
    expect(batch[1].error.code).toBe('UNKNOWN_POSTPROCESSOR');
  });
  it('zodToError gives a path like machine.rotaries[0].direction', () => {
    const r = machineSchema.safeParse({ ...ac, rotaries: [{ ...ac.rotaries[0], direction: [0, 0, 0] }] });
    expect(r.success).toBe(false);
    if (!r.success) expect(zodToError(r.error, 'machine').error.path).toBe('machine.rotaries[0].direction');
  });
  it('npm run -s engine spawns and exits with the contract status', () => {
    const p = spawnSync('npx', ['tsx', 'lib/cli.ts', 'fk'], { input: '{"machine": 1}', encoding: 'utf8', cwd: process.cwd() });
    expect(p.status).toBe(2);
    expect(JSON.parse(p.stdout).error.code).toBe('VALIDATION');
    expect(p.stderr).toBe('');
  });
});
