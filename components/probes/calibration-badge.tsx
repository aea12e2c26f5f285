/** A probe's calibration state: icon shape, word and reason — never colour alone. */
import type { CalibrationStatus } from '@/lib/validation/probes';

export function CalibrationBadge({ status }: { status: CalibrationStatus }) {
  return status.state === 'current'
    ? <span className="inline-flex items-center gap-1 text-small"><span aria-hidden className="text-status-conforming">●</span> Calibrated {status.ageDays} day{status.ageDays === 1 ? '' : 's'} ago</span>
    : <span className="inline-flex items-center gap-1 text-small font-semibold" title={status.message}><span aria-hidden className="text-status-marginal">▲</span> Calibration needed: {status.message}</span>;
}
