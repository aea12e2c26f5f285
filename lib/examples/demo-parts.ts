/**
 * Demo engine inputs for Probity's invented shop scenario, for the command line, the
 * golden programs and the engine tests: three parts, one probe. (The app's demo
 * workspaces are seeded from their own parts in db/seed-data.ts.) Part numbers, sizes and tolerances are made up for the demo;
 * they follow ordinary drawing practice (ISO 286 fits, GD&T frames) but describe no real part.
 * Part frame: origin at the top face centre, +Z out of the top face, mm.
 */
import type { Part, Probe } from '../features/schema';

const COS30 = Math.sqrt(3) / 2;

/** A touch probe with a ⌀4 ruby ball (effective ⌀3.9 after calibration). */
export const demoProbe: Probe = {
  stylusDiameter: 4, effectiveDiameter: 3.9, approach: 3, overtravel: 3, clearance: 5, fastFeed: 1000, measureFeed: 120,
};

/** DP-101, a 120 × 80 × 30 bracket: datum face, two dowel bores, a boss, a slot, one side face. */
export const demoBracket: Part = {
  uuid: '3d6fb4c3-80af-4fab-a101-77c033f77914',
  number: 'DP-101',
  revision: 'B',
  material: '6082-T6 aluminium',
  features: [
    { uuid: '26d06d7b-cd0b-418d-86a7-19f8dc9ff4d1', label: '1', type: 'plane', origin: [0, 0, 0], normal: [0, 0, 1], uDir: [1, 0, 0], size: [120, 80] },
    { uuid: '3289b9fd-5e6f-47d3-91c2-072f5541788b', label: '2', type: 'bore', center: [-40, 0, 0], axis: [0, 0, 1], diameter: 12, depth: 20 },
    { uuid: '4b6d329d-7dee-43e9-b629-cfa8bc75c41b', label: '3', type: 'bore', center: [40, 0, 0], axis: [0, 0, 1], diameter: 12, depth: 20 },
    { uuid: '6375ee47-4ad1-45a9-9dff-7d15bbff86d9', label: '4', type: 'boss', center: [0, 20, 8], axis: [0, 0, 1], diameter: 24, height: 8 },
    { uuid: '59ceda22-7b99-4eae-b0cb-049617841e77', label: '5', type: 'slot', center: [0, -24, 0], axis: [0, 0, 1], widthDir: [0, 1, 0], width: 10, length: 40, depth: 6 },
    { uuid: '5fecea47-a87c-4651-8a1e-6dfd870f42ff', label: '6', type: 'plane', origin: [60, 0, -15], normal: [1, 0, 0], uDir: [0, 1, 0], size: [80, 30] },
  ],
  tolerances: [
    { uuid: '0145c96e-10df-4a2c-b12e-2deed636abac', featureUuid: '26d06d7b-cd0b-418d-86a7-19f8dc9ff4d1', characteristic: 'flatness', value: 0.02 },
    { uuid: 'c9ee656d-02ae-4bb1-92b2-9ddd33d43fc0', featureUuid: '3289b9fd-5e6f-47d3-91c2-072f5541788b', characteristic: 'diameter', upper: 0.018, lower: 0, fit: '12H7' },
    { uuid: 'e15014c2-b0aa-46e6-b0bc-bed11f8ecf1c', featureUuid: '3289b9fd-5e6f-47d3-91c2-072f5541788b', characteristic: 'perpendicularity', value: 0.03, datums: ['A'] },
    { uuid: '6e0d1184-6a60-4ca8-a9b1-90c70cf29d79', featureUuid: '4b6d329d-7dee-43e9-b629-cfa8bc75c41b', characteristic: 'position', value: 0.05, material: 'MMC', datums: ['A', 'B'] },
    { uuid: '01c39f63-8c35-4759-8153-f0d162c87920', featureUuid: '6375ee47-4ad1-45a9-9dff-7d15bbff86d9', characteristic: 'diameter', upper: -0.007, lower: -0.02, fit: '24g6' },
    { uuid: '916560a1-1a60-495c-9f23-9cf800f18a5a', featureUuid: '59ceda22-7b99-4eae-b0cb-049617841e77', characteristic: 'width', upper: 0.05, lower: 0 },
    { uuid: 'd676c0b6-1a17-40ca-8c9e-7c831d56b43c', featureUuid: '5fecea47-a87c-4651-8a1e-6dfd870f42ff', characteristic: 'perpendicularity', value: 0.05, datums: ['A'] },
  ],
  datums: { A: '26d06d7b-cd0b-418d-86a7-19f8dc9ff4d1', B: '3289b9fd-5e6f-47d3-91c2-072f5541788b' },
};

/** DP-205, a 100 × 100 × 40 manifold block with a 30° chamfer face, a side port and a tooling ball. */
export const demoManifold: Part = {
  uuid: 'e0f2192e-ad78-4101-a7ad-3486df66418b',
  number: 'DP-205',
  revision: 'A',
  material: '1.4404 stainless steel',
  features: [
    { uuid: '792df595-e54c-477e-807e-9ca722ac1b72', label: '10', type: 'plane', origin: [-10, 0, 0], normal: [0, 0, 1], uDir: [1, 0, 0], size: [80, 100] },
    { uuid: 'f83ead29-d359-45bd-8d0c-74350a672596', label: '11', type: 'plane', origin: [40, 0, -6], normal: [0.5, 0, COS30], uDir: [0, 1, 0], size: [90, 20] },
    { uuid: '19b907a8-a25c-46d5-be75-2bd54e2ba0f7', label: '12', type: 'bore', center: [40, 0, -6], axis: [0.5, 0, COS30], diameter: 10, depth: 12 },
    { uuid: '90d1651a-ea1e-42e1-b1eb-d4f1e5463502', label: '13', type: 'plane', origin: [0, -50, -20], normal: [0, -1, 0], uDir: [1, 0, 0], size: [100, 40] },
    { uuid: '23d5f611-4c9e-4a07-a1ca-7b434dcbbe47', label: '14', type: 'bore', center: [15, -50, -20], axis: [0, -1, 0], diameter: 16, depth: 18 },
    { uuid: '53adc0f0-5d85-4d48-aeed-1b43e0a96911', label: '15', type: 'sphere', center: [-30, 30, 32.5], diameter: 25, axis: [0, 0, 1] },
    { uuid: 'e3be6a79-e31e-41ab-be80-803c419548fe', label: '16', type: 'web', center: [-10, -20, 6], axis: [0, 0, 1], widthDir: [1, 0, 0], width: 8, length: 36, depth: 6 },
  ],
  tolerances: [
    { uuid: '2e6a2b03-5d61-41cd-af26-84405200ddae', featureUuid: '19b907a8-a25c-46d5-be75-2bd54e2ba0f7', characteristic: 'position', value: 0.1, datums: ['A'] },
    { uuid: '24e5e93f-06a9-4b8a-b42a-24092944c4cb', featureUuid: '23d5f611-4c9e-4a07-a1ca-7b434dcbbe47', characteristic: 'cylindricity', value: 0.02 },
    { uuid: 'a1f3c0de-5b7e-4c21-9d3a-6e8f0b2c4d51', featureUuid: '792df595-e54c-477e-807e-9ca722ac1b72', characteristic: 'flatness', value: 0.03 },
  ],
  datums: { A: '792df595-e54c-477e-807e-9ca722ac1b72' },
};

/** DP-310, a 3-axis cover plate: face, four bolt bores, a locating web. */
export const demoCoverPlate: Part = {
  uuid: '0c5a7e21-93d4-4b8f-a6e2-1f0d3c9b8a74',
  number: 'DP-310',
  revision: 'C',
  material: 'S355 steel',
  features: [
    { uuid: '7b2e9d10-4c3a-4f5e-8a1b-2c3d4e5f6a70', label: '1', type: 'plane', origin: [0, 0, 0], normal: [0, 0, 1], uDir: [1, 0, 0], size: [150, 90], points: 12 },
    ...([[-60, -30], [60, -30], [60, 30], [-60, 30]] as const).map(([x, y], i) => ({
      uuid: `7b2e9d10-4c3a-4f5e-8a1b-2c3d4e5f6a7${i + 1}`, label: `${i + 2}`, type: 'bore' as const,
      center: [x, y, 0] as [number, number, number], axis: [0, 0, 1] as [number, number, number], diameter: 9, depth: 12,
    })),
    { uuid: '7b2e9d10-4c3a-4f5e-8a1b-2c3d4e5f6a80', label: '6', type: 'web', center: [0, 0, 10], axis: [0, 0, 1], widthDir: [0, 1, 0], width: 12, length: 50, depth: 10 },
  ],
  tolerances: [
    { uuid: '7b2e9d10-4c3a-4f5e-8a1b-2c3d4e5f6a90', featureUuid: '7b2e9d10-4c3a-4f5e-8a1b-2c3d4e5f6a80', characteristic: 'width', upper: 0, lower: -0.05 },
  ],
  datums: {},
};

export const demoParts = { bracket: demoBracket, manifold: demoManifold, coverPlate: demoCoverPlate } as const;
