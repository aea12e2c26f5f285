'use client';
import dynamic from 'next/dynamic';

export const DeviationView3D = dynamic(() => import('./deviation-view'), {
  ssr: false,
  loading: () => <div className="flex h-64 items-center justify-center rounded-card border border-dashed border-line-strong text-small text-ink-muted" role="status">Loading the 3D view…</div>,
});
