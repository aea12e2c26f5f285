'use client';
/**
 * Client-only entry points for the 3D views (three.js loads only on the screens
 * that show one). Import these from pages and screens, never the views directly.
 */
import dynamic from 'next/dynamic';

function ViewLoading() {
  return <div className="flex h-64 items-center justify-center rounded border border-dashed border-slate-300 text-sm text-slate-500" role="status">Loading the 3D view…</div>;
}

export const MachineView3D = dynamic(() => import('./machine-view'), { ssr: false, loading: ViewLoading });
export const PartView3D = dynamic(() => import('./part-view'), { ssr: false, loading: ViewLoading });
export type { MachineViewProps } from './machine-view';
export type { PartViewProps } from './part-view';
