/**
 * How a tolerance reads in a table: size limits (a fit code resolved to its ISO
 * 286 deviations and limits of size by the evaluation engine), zones, material
 * condition and datums.
 */
import { resolveFitCode } from '@/lib/evaluation/iso286';
import type { Feature, Tolerance } from '@/lib/features/schema';

const mm = (v: number) => (v === 0 ? '0' : `${v > 0 ? '+' : '−'}${Math.abs(v).toFixed(3)}`);

function nominalOf(f: Feature | undefined): number | null {
  if (!f) return null;
  if (f.type === 'bore' || f.type === 'boss' || f.type === 'sphere') return f.diameter;
  if (f.type === 'slot' || f.type === 'web') return f.width;
  return null;
}

export type LimitsText = { text: string; limits: string; error?: string };

export function toleranceText(t: Tolerance, feature: Feature | undefined): LimitsText {
  if (t.fit) {
    try {
      const r = resolveFitCode(t.fit);
      const nominal = nominalOf(feature);
      const mismatch = nominal !== null && Math.abs(nominal - r.nominal) > 1e-9 ? ` (the feature is ${nominal} mm)` : '';
      return { text: t.fit, limits: `${mm(r.upper)} / ${mm(r.lower)} → ${r.min.toFixed(3)} to ${r.max.toFixed(3)} mm${mismatch}` };
    } catch (e) {
      return { text: t.fit, limits: '—', error: e instanceof Error ? e.message : 'cannot resolve this fit code' };
    }
  }
  if (t.upper !== undefined && t.lower !== undefined) {
    const nominal = t.value ?? nominalOf(feature);
    const range = nominal !== null && (t.characteristic === 'diameter' || t.characteristic === 'width') ? ` → ${(nominal + t.lower).toFixed(3)} to ${(nominal + t.upper).toFixed(3)} mm` : '';
    return { text: `${mm(t.upper)} / ${mm(t.lower)}`, limits: `${mm(t.upper)} / ${mm(t.lower)}${range}` };
  }
  return { text: t.value !== undefined ? `${t.value} mm` : '—', limits: t.value !== undefined ? `zone ${t.value} mm` : '—' };
}

export const frameText = (t: Tolerance) => [t.material && t.material !== 'RFS' ? t.material : '', (t.datums ?? []).join(' | ')].filter(Boolean).join(' · ') || '—';
