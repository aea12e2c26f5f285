/**
 * A result state shown three ways at once: Okabe–Ito colour, an icon shape and the word.
 * Never colour alone.
 */
import type { ComponentType, SVGProps } from 'react';
import { CheckCircleIcon, DashCircleIcon, OctagonCrossIcon, TriangleIcon } from './icons';

export const RESULT_STATES = ['conforming', 'marginal', 'nonconforming', 'not-evaluated'] as const;
export type ResultState = (typeof RESULT_STATES)[number];

const STYLE: Record<ResultState, { word: string; Icon: ComponentType<SVGProps<SVGSVGElement>>; icon: string; box: string }> = {
  conforming: { word: 'Conforming', Icon: CheckCircleIcon, icon: 'text-status-conforming', box: 'border-status-conforming/50 bg-status-conforming/10' },
  marginal: { word: 'Marginal', Icon: TriangleIcon, icon: 'text-status-marginal', box: 'border-status-marginal/60 bg-status-marginal/10' },
  nonconforming: { word: 'Nonconforming', Icon: OctagonCrossIcon, icon: 'text-status-nonconforming', box: 'border-status-nonconforming/60 bg-status-nonconforming/10' },
  'not-evaluated': { word: 'Not evaluated', Icon: DashCircleIcon, icon: 'text-status-not-evaluated', box: 'border-status-not-evaluated/60 bg-status-not-evaluated/10' },
};

export function StatusBadge({ state, className = '' }: { state: ResultState; className?: string }) {
  const s = STYLE[state];
  return (
    <span data-state={state}
      className={`inline-flex items-center gap-1.5 rounded-full border px-2 py-0.5 text-caption font-semibold text-ink ${s.box} ${className}`}>
      <s.Icon className={s.icon} width={15} height={15} strokeWidth={2.2} />
      {s.word}
    </span>
  );
}
