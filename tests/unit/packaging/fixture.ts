// Invented demo data (our own shop scenario) for packaging tests.
import { v5 as uuidv5 } from 'uuid';
import type { PackageInput } from '@/lib/packaging/package-input';
import type { Plan, TouchPoint } from '@/lib/program/plan-schema';

const NS = '6f1c2d3e-4b5a-4c6d-8e7f-102938475601';
export const id = (name: string): string => uuidv5(name, NS);

function tp(featureName: string, seq: number, surface: [number, number, number], normal: [number, number, number], axes: Record<string, number>): TouchPoint {
  const target: [number, number, number] = [surface[0] + normal[0], surface[1] + normal[1], surface[2] + normal[2]];
  return {
    uuid: id(`${featureName}-tp-${seq}`),
    featureUuid: id(featureName),
    seq,
    surface,
    normal,
    direction: [-normal[0], -normal[1], -normal[2]],
    target,
    start: [target[0] + 3 * normal[0], target[1] + 3 * normal[1], target[2] + 3 * normal[2]],
    end: [target[0] - 2 * normal[0], target[1] - 2 * normal[1], target[2] - 2 * normal[2]],
    toolAxis: [0, 0, 1],
    axes,
  };
}

export const plan: Plan = {
  touchPoints: [
    tp('face', 0, [10, 10, 0], [0, 0, 1], { X: 10, Y: 10, Z: 4, A: 0, C: 0 }),
    tp('face', 1, [40, 12, 0], [0, 0, 1], { X: 40, Y: 12, Z: 4, A: 0, C: 0 }),
    tp('face', 2, [25, 30, 0], [0, 0, 1], { X: 25, Y: 30, Z: 4, A: 0, C: 0 }),
    tp('bore', 3, [56, 20, -5], [-1, 0, 0], { X: 52, Y: 20, Z: -5, A: 0, C: 90 }),
    tp('bore', 4, [44, 20, -5], [1, 0, 0], { X: 48, Y: 20, Z: -5, A: 0, C: 90 }),
  ],
  warnings: [],
};

export function packageInput(overrides: Partial<PackageInput> = {}): PackageInput {
  return {
    generatedAt: '2026-11-30T09:15:00.000Z',
    part: {
      uuid: id('part'),
      number: 'KT-0417 <bracket>',
      revision: 'C',
      name: 'Hinge bracket',
      material: 'aluminium 6082',
      features: [
        { uuid: id('bore'), label: '10', type: 'bore', center: [50, 20, 0], axis: [0, 0, 1], diameter: 12, depth: 10 },
        { uuid: id('face'), label: '2', type: 'plane', origin: [25, 20, 0], normal: [0, 0, 1], uDir: [1, 0, 0], size: [50, 40] },
      ],
      tolerances: [
        { uuid: id('t-flat'), featureUuid: id('face'), characteristic: 'flatness', value: 0.02 },
        { uuid: id('t-dia'), featureUuid: id('bore'), characteristic: 'diameter', fit: '12H7', upper: 0.018, lower: 0 },
        { uuid: id('t-pos'), featureUuid: id('bore'), characteristic: 'position', value: 0.05, material: 'MMC', datums: ['A'] },
      ],
      datums: { A: id('face') },
    },
    machine: {
      uuid: id('machine'),
      name: 'Trunnion cell 2',
      versionUuid: id('machine-v3'),
      versionNumber: 3,
      model: {
        name: 'Trunnion cell 2',
        rotaries: [
          { name: 'A', carrier: 'table', direction: [1, 0, 0], point: [0, 0, 0], min: -30, max: 120 },
          { name: 'C', carrier: 'table', direction: [0, 0, 1], point: [0, 0, 0], min: null, max: null },
        ],
        linear: { X: [-400, 400], Y: [-300, 300], Z: [-500, 0] },
        setup: { origin: [10, -20, 55], xAxis: [1, 0, 0], zAxis: [0, 0, 1] },
      },
    },
    probe: {
      uuid: id('probe'),
      name: 'Probe P2, 40 mm stylus',
      stylusDiameter: 2,
      effectiveDiameter: 1.994,
      calibration: { state: 'current', calibratedAt: '2026-11-29T07:00:00.000Z' },
    },
    program: {
      uuid: id('program'),
      name: 'Op20 check',
      postprocessorId: 'ngc',
      postprocessorName: 'RS274/NGC',
      fileExtension: 'ngc',
      workOffset: 'G54',
    },
    revision: {
      uuid: id('revision-4'),
      number: 4,
      text: '%\n(CAUTION: prove out single block at reduced override)\nG21 G90 G54\nM2\n%\n',
    },
    plan,
    approval: { approverUuid: id('reviewer'), approverName: 'Dana Reviewer', approvedAt: '2026-11-30T08:50:00.000Z' },
    ...overrides,
  };
}
