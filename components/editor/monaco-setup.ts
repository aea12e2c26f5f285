'use client';
/**
 * Monaco from the local package, never a CDN (STACK.md "Monaco without a CDN"):
 * a trimmed import of the editor core with its features, our G-code language and
 * the one shared theme. Imported only by the client-only editor modules.
 */
import * as monaco from 'monaco-editor/editor';
import 'monaco-editor/features/register.all';
import { loader } from '@monaco-editor/react';
import { editorTheme, editorThemeName, gcodeConfiguration, gcodeLanguageId, gcodeMonarch } from './gcode-language';

declare global {
  interface Window { MonacoEnvironment?: { getWorker: (workerId: string, label: string) => Worker } }
}

let configured = false;

export function setUpMonaco(): typeof monaco {
  if (configured) return monaco;
  configured = true;
  self.MonacoEnvironment = {
    getWorker: () => new Worker(new URL('monaco-editor/editor/editor.worker.js', import.meta.url), { type: 'module' }),
  };
  loader.config({ monaco: monaco as unknown as Parameters<typeof loader.config>[0]['monaco'] });
  monaco.languages.register({ id: gcodeLanguageId, extensions: ['.ngc', '.nc', '.tap'] });
  monaco.languages.setMonarchTokensProvider(gcodeLanguageId, gcodeMonarch);
  monaco.languages.setLanguageConfiguration(gcodeLanguageId, gcodeConfiguration);
  monaco.editor.defineTheme(editorThemeName, editorTheme);
  return monaco;
}
