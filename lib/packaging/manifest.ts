/**
 * The package manifest (`manifest.json`): which part, program, revision, machine version,
 * probe and touch points the package is for, who approved it and when, and the SHA-256 of
 * every other file in the zip. The manifest cannot carry its own hash; `sha256sums.txt`
 * (the `sha256sum -c` format) lists every file including the manifest.
 */
import { z } from 'zod';
import type { PackageInput } from './package-input';

export const MANIFEST_PATH = 'manifest.json';
export const SUMS_PATH = 'sha256sums.txt';
export const MANIFEST_FORMAT = 'probity-package';
export const MANIFEST_FORMAT_VERSION = 1;

const uuid = z.string().uuid();
const sha = z.string().regex(/^[0-9a-f]{64}$/, 'must be 64 lower-case hex digits');

export const manifestFileSchema = z.object({
  path: z.string().min(1),
  role: z.enum(['program', 'setup-sheet', 'touch-points']),
  bytes: z.number().int().nonnegative(),
  sha256: sha,
});
export type ManifestFile = z.infer<typeof manifestFileSchema>;

export const manifestSchema = z.object({
  format: z.literal(MANIFEST_FORMAT),
  formatVersion: z.literal(MANIFEST_FORMAT_VERSION),
  generatedAt: z.string(),
  part: z.object({ uuid, number: z.string(), revision: z.string().optional() }),
  program: z.object({ uuid, name: z.string(), postprocessor: z.string(), workOffset: z.string() }),
  revision: z.object({ uuid, number: z.number().int().positive() }),
  machine: z.object({ uuid, name: z.string(), versionUuid: uuid, versionNumber: z.number().int().positive() }),
  probe: z.object({ uuid, name: z.string(), calibration: z.enum(['current', 'stale', 'none']) }),
  approval: z.object({ approverUuid: uuid, approverName: z.string(), approvedAt: z.string() }),
  touchPoints: z.array(z.object({ uuid, featureUuid: uuid, label: z.string(), seq: z.number().int().nonnegative() })),
  files: z.array(manifestFileSchema),
});
export type Manifest = z.infer<typeof manifestSchema>;

export function buildManifest(input: PackageInput, files: ManifestFile[]): Manifest {
  const labelOf = new Map(input.part.features.map((f) => [f.uuid, f.label]));
  return {
    format: MANIFEST_FORMAT,
    formatVersion: MANIFEST_FORMAT_VERSION,
    generatedAt: input.generatedAt,
    part: { uuid: input.part.uuid, number: input.part.number, revision: input.part.revision },
    program: {
      uuid: input.program.uuid,
      name: input.program.name,
      postprocessor: input.program.postprocessorId,
      workOffset: input.program.workOffset,
    },
    revision: { uuid: input.revision.uuid, number: input.revision.number },
    machine: {
      uuid: input.machine.uuid,
      name: input.machine.name,
      versionUuid: input.machine.versionUuid,
      versionNumber: input.machine.versionNumber,
    },
    probe: { uuid: input.probe.uuid, name: input.probe.name, calibration: input.probe.calibration.state },
    approval: { ...input.approval },
    touchPoints: input.plan.touchPoints.map((tp) => ({
      uuid: tp.uuid,
      featureUuid: tp.featureUuid,
      label: labelOf.get(tp.featureUuid) ?? '?',
      seq: tp.seq,
    })),
    files,
  };
}
