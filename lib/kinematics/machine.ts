/**
 * A machine definition prepared for the kinematics (spec/engine-cli.md, "Machine model").
 *
 * Frames: machine frame M, right-handed, fixed to the bed; part frame P placed in M by
 * `setup` (S: P → M) with every rotary at 0. Each rotary is a line (unit `w` through
 * `p`, as at all-rotaries-zero) and a positive sense by the right-hand rule about `w`.
 * Table axes turn the part, head axes turn the tool; `p` of a head axis is relative to
 * the tip at X = Y = Z = 0. Chain order is bed outward (`tables[0]` carries `tables[1]`).
 * Angles in degrees at this boundary, radians inside.
 */
import { cross, GeometryError, normalize, norm, reject, type Vec3 } from '../geometry/vec3';
import { fromColumns, type Mat3 } from '../geometry/rotation';
import type { AxisValues, Machine, RotaryName } from './schema';

export interface PreparedRotary {
  name: RotaryName;
  carrier: 'table' | 'head';
  w: Vec3;
  p: Vec3;
  /** Travel in degrees; null for a continuous axis. */
  min: number | null;
  max: number | null;
}

export interface PreparedMachine {
  readonly prepared: true;
  machine: Machine;
  /** Rotaries in the machine's chain order. */
  rotaries: PreparedRotary[];
  tables: PreparedRotary[];
  heads: PreparedRotary[];
  /** S: part → machine at all rotaries zero: x_M = origin + R·x_P. */
  setupR: Mat3;
  setupOrigin: Vec3;
}

export function prepareMachine(machine: Machine | PreparedMachine): PreparedMachine {
  if ('prepared' in machine) return machine;
  const rotaries = machine.rotaries.map((r): PreparedRotary => ({
    name: r.name,
    carrier: r.carrier,
    w: normalize(r.direction),
    p: [...r.point],
    min: r.min,
    max: r.max,
  }));
  if (rotaries.length === 2) {
    const [a, b] = rotaries as [PreparedRotary, PreparedRotary];
    if (norm(cross(a.w, b.w)) < 1e-9) {
      throw new GeometryError('VALIDATION', `rotary axes ${a.name} and ${b.name} are parallel: two parallel rotaries cannot set a tool orientation`, 'machine.rotaries');
    }
  }
  const z = normalize(machine.setup.zAxis);
  const xRaw = reject(machine.setup.xAxis, z);
  if (norm(xRaw) < 1e-9) {
    throw new GeometryError('VALIDATION', 'setup.xAxis must not be parallel to setup.zAxis', 'machine.setup.xAxis');
  }
  const x = normalize(xRaw);
  const y = cross(z, x);
  return {
    prepared: true,
    machine,
    rotaries,
    tables: rotaries.filter((r) => r.carrier === 'table'),
    heads: rotaries.filter((r) => r.carrier === 'head'),
    setupR: fromColumns(x, y, z),
    setupOrigin: [...machine.setup.origin],
  };
}

/** Only the rotary values of a set of axis values (0 for a rotary not given), keyed by letter. */
export function rotaryValues(pm: PreparedMachine, axes: AxisValues): AxisValues {
  const out: AxisValues = {};
  for (const r of pm.rotaries) out[r.name] = axes[r.name] ?? 0;
  return out;
}

/** The axis words of a machine in output order: X, Y, Z, then rotaries alphabetically (A, B, C). */
export function axisWords(machine: Machine | PreparedMachine): string[] {
  const m = 'prepared' in machine ? machine.machine : machine;
  return ['X', 'Y', 'Z', ...m.rotaries.map((r) => r.name).sort()];
}
