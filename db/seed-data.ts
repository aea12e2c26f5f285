/**
 * The demo shop — invented for Probity: no real company, person or part. Two
 * workspaces so isolation can be shown and tested. All demo accounts share one
 * password (README lists them).
 */
import type { Role } from '@/lib/auth/roles';
import type { Feature, Tolerance } from '@/lib/features/schema';
import type { MachineLayout } from './tables/machines';

export const DEMO_PASSWORD = 'probity-demo';

type DistOmit<T, K extends PropertyKey> = T extends unknown ? Omit<T, K> : never;

export interface SeedPerson { key: string; name: string; email: string; roles: Role[] }
export interface SeedPart {
  key: string; number: string; revision: string; name: string; material: string; notes: string;
  features: DistOmit<Feature, 'uuid'>[]; tolerances: (Omit<Tolerance, 'uuid' | 'featureUuid'> & { feature: string; reference: string })[];
  datums: Record<string, string>;
}
export interface SeedMachine { key: string; name: string; preset: string; layout: MachineLayout; controller: string; postId: string; headPivot: boolean }
export interface SeedWorkspace {
  slug: string; name: string; people: SeedPerson[]; parts: SeedPart[]; machines: SeedMachine[];
  probes: { key: string; name: string; stylus: number; effective: number; length: number; repeat2s: number }[];
}

/** Post-processor ids the demo machines use (folders under postprocessors/ once they exist). */
export const DEMO_POSTS = { iso: 'iso-skip', conversational: 'ngc' } as const;

export const FERNHOLLOW: SeedWorkspace = {
  slug: 'fernhollow',
  name: 'Fernhollow Precision (demo)',
  people: [
    { key: 'admin', name: 'Ada Quint', email: 'ada.quint@fernhollow.example', roles: ['admin'] },
    { key: 'programmer', name: 'Piet Marlowe', email: 'piet.marlowe@fernhollow.example', roles: ['programmer'] },
    { key: 'engineer', name: 'Elena Voss', email: 'elena.voss@fernhollow.example', roles: ['engineer'] },
    { key: 'reviewer', name: 'Rafael Okoro', email: 'rafael.okoro@fernhollow.example', roles: ['reviewer'] },
    { key: 'setup', name: 'Sam Tierney', email: 'sam.tierney@fernhollow.example', roles: ['setup'] },
    { key: 'multi', name: 'Mira Lund', email: 'mira.lund@fernhollow.example', roles: ['programmer', 'reviewer'] },
  ],
  machines: [
    { key: 'vmc', name: 'VMC-2 three-axis vertical', preset: '3-axis', layout: 'three-axis', controller: 'ISO G-code with macro variables', postId: DEMO_POSTS.iso, headPivot: false },
    { key: 'trunnion', name: 'T5-1 AC trunnion', preset: 'ac-trunnion', layout: 'table-table', controller: 'ISO G-code with macro variables', postId: DEMO_POSTS.iso, headPivot: false },
    { key: 'bhead', name: 'MX-4 B-head with C table', preset: 'b-head-c-table', layout: 'head-table', controller: 'Conversational-style cycles', postId: DEMO_POSTS.conversational, headPivot: true },
    { key: 'gantry', name: 'G-7 gantry with fork head', preset: 'ca-fork-head', layout: 'head-head', controller: 'ISO G-code with macro variables', postId: DEMO_POSTS.iso, headPivot: true },
  ],
  probes: [
    { key: 'p1', name: 'TP-1 Ø4 ruby, 50 mm', stylus: 4, effective: 3.9962, length: 50, repeat2s: 0.001 },
    { key: 'p2', name: 'TP-2 Ø2 ruby, 75 mm', stylus: 2, effective: 1.9971, length: 75, repeat2s: 0.0015 },
  ],
  parts: [
    {
      key: 'manifold', number: 'FH-1042', revision: 'B', name: 'Valve manifold block', material: 'Aluminium 6061-T6',
      notes: 'Demo part. Top face is datum A; main bore datum B.',
      features: [
        { type: 'plane', label: 'TOP', origin: [60, 40, 0], normal: [0, 0, 1], uDir: [1, 0, 0], size: [100, 60], points: 5 },
        { type: 'bore', label: 'B1', center: [30, 40, 0], axis: [0, 0, 1], diameter: 12, depth: 20, points: 6, levels: [3, 15] },
        { type: 'bore', label: 'B2', center: [90, 40, 0], axis: [0, 0, 1], diameter: 20, depth: 25, points: 8, levels: [5] },
        { type: 'slot', label: 'S1', center: [60, 15, 0], axis: [0, 0, 1], widthDir: [0, 1, 0], width: 8, length: 40, depth: 6 },
      ],
      tolerances: [
        { feature: 'TOP', characteristic: 'flatness', value: 0.02, reference: '1' },
        { feature: 'B1', characteristic: 'diameter', fit: '12H7', reference: '2' },
        { feature: 'B1', characteristic: 'perpendicularity', value: 0.02, datums: ['A'], reference: '3' },
        { feature: 'B2', characteristic: 'diameter', upper: 0.03, lower: 0, reference: '4' },
        { feature: 'B2', characteristic: 'position', value: 0.05, material: 'MMC', datums: ['A', 'B'], reference: '5' },
        { feature: 'S1', characteristic: 'width', upper: 0.05, lower: 0, reference: '6' },
      ],
      datums: { A: 'TOP', B: 'B1' },
    },
    {
      key: 'housing', number: 'FH-2210', revision: 'A', name: 'Bearing housing', material: 'Steel 42CrMo4',
      notes: 'Demo part. Bearing seat measured at two levels.',
      features: [
        { type: 'plane', label: 'FACE', origin: [0, 0, 0], normal: [0, 0, 1], uDir: [1, 0, 0], size: [90, 90], points: 8 },
        { type: 'bore', label: 'SEAT', center: [0, 0, 0], axis: [0, 0, 1], diameter: 62, depth: 30, points: 8, levels: [5, 25] },
        { type: 'boss', label: 'SPIGOT', center: [0, 0, -40], axis: [0, 0, -1], diameter: 110, height: 12, points: 8 },
      ],
      tolerances: [
        { feature: 'FACE', characteristic: 'flatness', value: 0.01, reference: '1' },
        { feature: 'SEAT', characteristic: 'diameter', fit: '62H7', reference: '2' },
        { feature: 'SEAT', characteristic: 'cylindricity', value: 0.008, reference: '3' },
        { feature: 'SPIGOT', characteristic: 'diameter', fit: '110g6', reference: '4' },
      ],
      datums: { A: 'FACE' },
    },
  ],
};

export const STONEBRIDGE: SeedWorkspace = {
  slug: 'stonebridge',
  name: 'Stonebridge Test Cell (demo)',
  people: [
    { key: 'admin', name: 'Jonas Hale', email: 'jonas.hale@stonebridge.example', roles: ['admin'] },
    { key: 'programmer', name: 'Kit Arden', email: 'kit.arden@stonebridge.example', roles: ['programmer', 'engineer'] },
  ],
  machines: [
    { key: 'bc', name: 'Cell 1 BC trunnion', preset: 'bc-trunnion', layout: 'table-table', controller: 'ISO G-code with macro variables', postId: DEMO_POSTS.iso, headPivot: false },
  ],
  probes: [{ key: 'p1', name: 'Cell probe Ø3', stylus: 3, effective: 2.9968, length: 60, repeat2s: 0.001 }],
  parts: [
    {
      key: 'bracket', number: 'SB-0007', revision: 'A', name: 'Sensor bracket', material: 'Stainless 1.4404',
      notes: 'Demo part of the second workspace.',
      features: [
        { type: 'plane', label: 'BASE', origin: [0, 0, 0], normal: [0, 0, 1], uDir: [1, 0, 0], size: [40, 30], points: 4 },
        { type: 'bore', label: 'H1', center: [10, 10, 0], axis: [0, 0, 1], diameter: 6, depth: 8, points: 4 },
      ],
      tolerances: [{ feature: 'H1', characteristic: 'diameter', fit: '6H8', reference: '1' }],
      datums: { A: 'BASE' },
    },
  ],
};
