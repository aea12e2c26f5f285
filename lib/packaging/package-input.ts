/**
 * What the package builder needs, as plain data. The server collects it from the database;
 * the engine only formats and checksums it. Timestamps are ISO 8601 strings passed in
 * (the engine has no clock).
 */
import type { Feature, Part, Tolerance } from '../features/schema';
import type { Machine } from '../kinematics/schema';
import type { Plan } from '../program/plan-schema';

export type CalibrationState = 'current' | 'stale' | 'none';

export interface PackageInput {
  /** When the package was built (ISO 8601); also stamped on every zip entry. */
  generatedAt: string;
  part: {
    uuid: string;
    number: string;
    revision?: string;
    name?: string;
    material?: string;
    features: Feature[];
    tolerances: Tolerance[];
    datums?: Part['datums'];
  };
  machine: {
    uuid: string;
    name: string;
    versionUuid: string;
    versionNumber: number;
    model: Machine;
  };
  probe: {
    uuid: string;
    name: string;
    stylusDiameter: number;
    effectiveDiameter: number;
    calibration: {
      state: CalibrationState;
      /** Date of the latest calibration record (ISO 8601), when there is one. */
      calibratedAt?: string;
      /** Plain words: why it is stale, artifact used, etc. */
      note?: string;
    };
  };
  program: {
    uuid: string;
    name: string;
    postprocessorId: string;
    postprocessorName: string;
    /** File extension of the post, without the dot (e.g. "ngc", "nc"). */
    fileExtension: string;
    /** Work offset word the program runs in, e.g. "G54". */
    workOffset: string;
  };
  revision: {
    uuid: string;
    number: number;
    text: string;
  };
  plan: Plan;
  approval: {
    approverUuid: string;
    approverName: string;
    approvedAt: string;
  };
}
