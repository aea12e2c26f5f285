/**
 * Machine presets for the six layouts Probity knows, as plain machine definitions in
 * the contract's model (spec/engine-cli.md). Invented demo geometry: pivot distances,
 * table centres and travels are plausible for a mid-size machining centre, not any
 * maker's figures. Senses follow ISO 841 for the tool relative to the part: a table
 * axis therefore has a negated direction (the table turns the other way).
 * Head axis points are relative to the tip at X = Y = Z = 0 (pivot + probe length).
 */
import type { Machine, Rotary } from './schema';

export type PresetId = '3-axis' | 'ac-trunnion' | 'bc-trunnion' | 'b-head-c-table' | 'ca-fork-head' | 'nutating-45';

const linear = { X: [-420, 420] as [number, number], Y: [-310, 310] as [number, number], Z: [-520, 0] as [number, number] };
const setup = (origin: [number, number, number]): Machine['setup'] => ({ origin, xAxis: [1, 0, 0], zAxis: [0, 0, 1] });
const rot = (r: Rotary): Rotary => r;

/** Headroom above the tip for a head pivot: pivot-to-gauge-line plus the probe's length. */
export const DEMO_HEAD_PIVOT_MM = 185;

export const presets: Record<PresetId, () => Machine> = {
  '3-axis': () => ({ name: 'Demo 3-axis vertical', rotaries: [], linear, setup: setup([0, 0, -380]) }),
  'ac-trunnion': () => ({
    name: 'Demo AC trunnion',
    rotaries: [
      rot({ name: 'A', carrier: 'table', direction: [-1, 0, 0], point: [0, 0, -420], min: -30, max: 120 }),
      rot({ name: 'C', carrier: 'table', direction: [0, 0, -1], point: [0, 0, 0], min: null, max: null }),
    ],
    linear,
    setup: setup([0, 0, -400]),
  }),
  'bc-trunnion': () => ({
    name: 'Demo BC trunnion',
    rotaries: [
      rot({ name: 'B', carrier: 'table', direction: [0, -1, 0], point: [0, 0, -410], min: -110, max: 110 }),
      rot({ name: 'C', carrier: 'table', direction: [0, 0, -1], point: [0, 0, 0], min: null, max: null }),
    ],
    linear,
    setup: setup([0, 0, -390]),
  }),
  'b-head-c-table': () => ({
    name: 'Demo B head, C table',
    rotaries: [
      rot({ name: 'C', carrier: 'table', direction: [0, 0, -1], point: [0, 0, 0], min: null, max: null }),
      rot({ name: 'B', carrier: 'head', direction: [0, 1, 0], point: [0, 0, DEMO_HEAD_PIVOT_MM], min: -100, max: 100 }),
    ],
    linear: { ...linear, X: [-700, 700], Z: [-700, 0] },
    setup: setup([0, 0, -450]),
  }),
  'ca-fork-head': () => ({
    name: 'Demo C/A fork head',
    rotaries: [
      rot({ name: 'C', carrier: 'head', direction: [0, 0, 1], point: [0, 0, DEMO_HEAD_PIVOT_MM], min: -360, max: 360 }),
      rot({ name: 'A', carrier: 'head', direction: [1, 0, 0], point: [0, 0, DEMO_HEAD_PIVOT_MM], min: -110, max: 110 }),
    ],
    linear: { X: [-900, 900], Y: [-600, 600], Z: [-750, 0] },
    setup: setup([0, 0, -500]),
  }),
  'nutating-45': () => ({
    name: 'Demo 45° nutating table',
    rotaries: [
      rot({ name: 'B', carrier: 'table', direction: [0, -Math.SQRT1_2, -Math.SQRT1_2], point: [0, 0, -150], min: null, max: null }),
      rot({ name: 'C', carrier: 'table', direction: [0, 0, -1], point: [0, 0, 0], min: null, max: null }),
    ],
    linear,
    setup: setup([0, 0, -380]),
  }),
};

export const presetIds = Object.keys(presets) as PresetId[];
export const machinePreset = (id: PresetId): Machine => presets[id]();
