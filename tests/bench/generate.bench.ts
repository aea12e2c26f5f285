/**
 * Generate benchmark: a generated part of 1,000 features / ~10,000 touch points on five
 * faces (top, two sides, two 30° chamfers) of an AC-trunnion layout, timed for
 * plan + IK + post + verify (median of several runs), beside a floor measured in the
 * same run: a loop that only formats and joins the same number of G-code lines.
 * Targets on the 2-core machine: ≤ 250 ms and ≤ 5× the floor.
 */
import { planInputSchema, type PlanInput } from '../../lib/features/plan-input';
import { planProgram } from '../../lib/features/plan';
import { postProgram, requirePost } from '../../lib/program/post';
import { verifyProgram } from '../../lib/program/verify';
import { machinePreset } from '../../lib/kinematics/presets';
import { demoProbe } from '../../lib/examples/demo-parts';
import { addScaled, cross, normalize, type Vec3 } from '../../lib/geometry/vec3';
import type { Feature } from '../../lib/features/schema';

const RUNS = 7;
/** Untimed runs first, as in the evaluation benchmark (the engine optimises the code on the first calls). */
const WARM_UPS = 2;

function uuidFor(i: number): string {
  const h = i.toString(16).padStart(12, '0');
  return `00000000-0000-4000-8000-${h}`;
}

/** 1,000 features on a 1000 × 1000 block: per face a grid of cells, each a bore, boss, slot or pad. */
export function generatedInput(): PlanInput {
  const s = 0.5;
  const c = Math.sqrt(3) / 2;
  const faces: { n: Vec3; o: Vec3; u: Vec3 }[] = [
    { n: [0, 0, 1], o: [0, 0, 0], u: [1, 0, 0] },
    { n: [1, 0, 0], o: [520, 0, -300], u: [0, 1, 0] },
    { n: [0, -1, 0], o: [0, -520, -300], u: [1, 0, 0] },
    { n: [s, 0, c], o: [480, 0, -40], u: [0, 1, 0] },
    { n: [0, -s, c], o: [0, -480, -40], u: [1, 0, 0] },
  ];
  const features: Feature[] = [];
  for (let i = 0; i < 1000; i++) {
    const f = faces[i % faces.length]!;
    const k = Math.floor(i / faces.length);
    const v = normalize(cross(f.n, f.u));
    const p = addScaled(addScaled(f.o, f.u, -380 + (k % 15) * 55), v, -380 + Math.floor(k / 15) * 55);
    const common = { uuid: uuidFor(i), label: `G${i + 1}` };
    const kind = i % 20;
    if (kind < 10) features.push({ ...common, type: 'bore', center: p, axis: f.n, diameter: 14, depth: 20, points: 11 });
    else if (kind < 15) features.push({ ...common, type: 'plane', origin: p, normal: f.n, uDir: f.u, size: [40, 40], points: 10 });
    else if (kind < 18) features.push({ ...common, type: 'boss', center: addScaled(p, f.n, 6), axis: f.n, diameter: 16, height: 6, points: 9 });
    else features.push({ ...common, type: 'slot', center: p, axis: f.n, widthDir: v, width: 12, length: 40, depth: 8, points: 6 });
  }
  const m = machinePreset('ac-trunnion');
  const rotaries = m.rotaries.map((r) => ({ ...r, point: [0, 0, r.name === 'A' ? -1400 : 0] as Vec3, min: null, max: null }));
  const machine = { ...m, rotaries, setup: { ...m.setup, origin: [0, 0, -1400] as Vec3 }, linear: { X: [-3000, 3000] as [number, number], Y: [-3000, 3000] as [number, number], Z: [-3000, 0] as [number, number] } };
  return planInputSchema.parse({ part: { number: 'BENCH-1000', features }, probe: demoProbe, machine });
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;

/** CPU time of this process in ms (less disturbed than wall time when other work shares the cores). */
const cpuMs = () => { const u = process.cpuUsage(); return (u.user + u.system) / 1000; };

function floor(lines: number): [number, number] {
  const c0 = cpuMs();
  const t0 = performance.now();
  const out: string[] = new Array(lines);
  for (let i = 0; i < lines; i++) {
    const x = i * 0.37;
    out[i] = `G38.3 X${x.toFixed(4)} Y${(x * 1.3).toFixed(4)} Z${(-x * 0.7).toFixed(4)} F1000`;
  }
  const text = out.join('\n');
  const ms = performance.now() - t0;
  if (text.length === 0) throw new Error('empty');
  return [ms, cpuMs() - c0];
}

export default async function bench(): Promise<void> {
  const input = generatedInput();
  const post = requirePost('ngc');
  let points = 0;
  let lines = 0;
  const times: number[] = [];
  const cpu: number[] = [];
  const parts = { plan: [] as number[], post: [] as number[], verify: [] as number[] };
  let ok = true;
  for (let r = 0; r < WARM_UPS; r++) {
    const plan = planProgram(input);
    verifyProgram({ ...input, plan, program: postProgram({ ...input, plan, postprocessor: 'ngc' }, post) }, post);
  }
  for (let r = 0; r < RUNS; r++) {
    const c0 = cpuMs();
    const t0 = performance.now();
    const plan = planProgram(input);
    const t1 = performance.now();
    const program = postProgram({ ...input, plan, postprocessor: 'ngc' }, post);
    const t2 = performance.now();
    const res = verifyProgram({ ...input, plan, program }, post);
    const t3 = performance.now();
    times.push(t3 - t0);
    cpu.push(cpuMs() - c0);
    parts.plan.push(t1 - t0);
    parts.post.push(t2 - t1);
    parts.verify.push(t3 - t2);
    points = plan.touchPoints.length;
    lines = program.split('\n').length;
    ok &&= res.ok && plan.warnings.length === 0;
  }
  for (let r = 0; r < WARM_UPS; r++) floor(lines);
  const floors = Array.from({ length: RUNS }, () => floor(lines));
  const total = median(times);
  const fl = median(floors.map((f) => f[0]));
  const flCpu = median(floors.map((f) => f[1]));
  console.log(`features 1000, touch points ${points}, program lines ${lines}, verified ok: ${ok}`);
  console.log(`plan+IK ${median(parts.plan).toFixed(1)} ms, post ${median(parts.post).toFixed(1)} ms, verify ${median(parts.verify).toFixed(1)} ms`);
  console.log(`generate (plan + IK + post + verify), median of ${RUNS} after ${WARM_UPS} untimed: ${total.toFixed(1)} ms (target ≤ 250 ms)`);
  console.log(`floor (format + join ${lines} G-code lines), median of ${RUNS} after ${WARM_UPS} untimed: ${fl.toFixed(1)} ms`);
  console.log(`ratio ${(total / fl).toFixed(2)}× the floor (target ≤ 5×)`);
  console.log(`CPU time of this process: generate ${median(cpu).toFixed(1)} ms, floor ${flCpu.toFixed(1)} ms, ratio ${(median(cpu) / flCpu).toFixed(2)}×; load average ${(await import('node:os')).loadavg()[0]!.toFixed(1)} on ${(await import('node:os')).cpus().length} cores`);
}
