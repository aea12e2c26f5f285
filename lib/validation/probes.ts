/**
 * Probe records, calibration records and logged events, and the rule that says
 * when a probe's calibration can no longer be trusted.
 *
 * The probe fields extend the engine's probe contract (lib/features/schema.ts);
 * the effective diameter in use is the one from the latest calibration record.
 * Millimetres, mm/min, calendar days.
 */
import { z } from 'zod';
import { probeSchema } from '../features/schema';

const positiveMm = (what: string) => z.number({ error: `${what} must be a number` }).finite().positive(`${what} must be greater than zero`);

export const probeRecordSchema = probeSchema.extend({
  name: z.string().trim().min(1, 'give the probe a name').max(120),
  stylusDiameter: positiveMm('stylus diameter').max(50),
  lengthMm: positiveMm('length').max(1000),
  /** Unidirectional repeatability, 2σ, mm (from the probe maker's data sheet or a test). */
  repeatabilityMm: positiveMm('repeatability').max(1),
  approach: positiveMm('approach').max(100),
  overtravel: positiveMm('overtravel').max(100),
  clearance: positiveMm('clearance').max(500),
  fastFeed: positiveMm('fast feed').max(20000),
  measureFeed: positiveMm('measuring feed').max(5000),
  notes: z.string().max(2000).default(''),
}).refine((p) => p.measureFeed <= p.fastFeed, { path: ['measureFeed'], message: 'the measuring feed must not exceed the fast feed' });
export type ProbeRecordInput = z.input<typeof probeRecordSchema>;
export type ProbeRecord = z.output<typeof probeRecordSchema>;

const isoDate = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'a date as YYYY-MM-DD');

export const calibrationSchema = z.object({
  calibratedOn: isoDate,
  artifact: z.string().trim().min(1, 'name the artifact (e.g. ring gauge 25 mm)').max(200),
  certificate: z.string().trim().min(1, 'give the artifact certificate number').max(120),
  measuredEffectiveDiameter: positiveMm('effective diameter').max(50),
  feedMmPerMin: positiveMm('feed').max(5000),
  notes: z.string().max(1000).default(''),
});
export type CalibrationInput = z.input<typeof calibrationSchema>;
export type Calibration = z.output<typeof calibrationSchema>;

export const probeEventKinds = ['stylus-change', 'collision'] as const;
export const probeEventSchema = z.object({
  kind: z.enum(probeEventKinds, { error: 'an event is a stylus change or a collision' }),
  happenedOn: isoDate,
  note: z.string().trim().max(1000).default(''),
});
export type ProbeEvent = z.output<typeof probeEventSchema>;

export type CalibrationStatus =
  | { state: 'current'; ageDays: number }
  | { state: 'stale'; reason: 'never' | 'age' | 'event'; message: string };

const dayMs = 86_400_000;
const dayNumber = (isoDay: string) => Math.floor(Date.parse(`${isoDay}T00:00:00Z`) / dayMs);

/**
 * Is the latest calibration still good? Stale when there is none, when it is older
 * than `limitDays`, or when a stylus change or collision was logged on or after it.
 * `today` is passed in (YYYY-MM-DD) so the rule is testable.
 */
export function calibrationStatus(
  latestCalibratedOn: string | null,
  events: readonly { kind: string; happenedOn: string }[],
  limitDays: number,
  today: string,
): CalibrationStatus {
  if (latestCalibratedOn === null) {
    return { state: 'stale', reason: 'never', message: 'never calibrated: calibrate it before use' };
  }
  const ageDays = dayNumber(today) - dayNumber(latestCalibratedOn);
  const after = events.filter((e) => dayNumber(e.happenedOn) >= dayNumber(latestCalibratedOn));
  const first = after[0];
  if (first) {
    const what = first.kind === 'collision' ? 'a collision' : 'a stylus change';
    return { state: 'stale', reason: 'event', message: `${what} was logged on ${first.happenedOn}, after the last calibration (${latestCalibratedOn}): calibrate again` };
  }
  if (ageDays > limitDays) {
    return { state: 'stale', reason: 'age', message: `last calibrated ${ageDays} days ago (${latestCalibratedOn}); the workspace limit is ${limitDays} days` };
  }
  return { state: 'current', ageDays };
}
