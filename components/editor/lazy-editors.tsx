'use client';
/**
 * Client-only entry points for the editors: import these from pages and screens.
 * Monaco is loaded on demand (next/dynamic, ssr: false) so it weighs only on the
 * screens that show a program.
 */
import dynamic from 'next/dynamic';

function EditorLoading() {
  return <div className="flex h-64 items-center justify-center rounded border border-dashed border-slate-300 text-sm text-slate-500" role="status">Loading the editor…</div>;
}

export const ProgramEditor = dynamic(() => import('./code-editor'), { ssr: false, loading: EditorLoading });
export const ProgramDiffView = dynamic(() => import('./diff-editor'), { ssr: false, loading: EditorLoading });
export type { CodeEditorProps } from './code-editor';
export type { ProgramDiffProps } from './diff-editor';
