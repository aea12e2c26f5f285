'use client';
/**
 * The program editor: Monaco with the G-code language, read-only unless told
 * otherwise, verifier findings shown as markers. Load it through
 * `lazy-editors.tsx` (client only; Monaco never renders on the server).
 */
import { useEffect, useRef } from 'react';
import Editor, { type OnMount } from '@monaco-editor/react';
import type { Finding } from '@/lib/validation/programs';
import { setUpMonaco } from './monaco-setup';
import { editorThemeName, gcodeLanguageId } from './gcode-language';
import { findingsToMarkers } from './markers';

const monaco = setUpMonaco();
type StandaloneEditor = Parameters<OnMount>[0];

export type CodeEditorProps = {
  value: string;
  readOnly?: boolean;
  findings?: readonly Finding[];
  onChange?: (value: string) => void;
  height?: string;
  /** Accessible name of the editor region. */
  label?: string;
  /** A line to reveal and select (e.g. when a finding in the list is clicked). */
  revealLine?: number | null;
};

export default function CodeEditor({ value, readOnly = true, findings = [], onChange, height = '32rem', label = 'Program text', revealLine = null }: CodeEditorProps) {
  const editorRef = useRef<StandaloneEditor | null>(null);

  const applyMarkers = (editor: StandaloneEditor) => {
    const model = editor.getModel();
    if (!model) return;
    const lengths = Array.from({ length: model.getLineCount() }, (_, i) => model.getLineLength(i + 1));
    monaco.editor.setModelMarkers(model, 'verifier', findingsToMarkers(findings, lengths));
  };

  useEffect(() => {
    if (editorRef.current) applyMarkers(editorRef.current);
  }, [findings]);

  useEffect(() => {
    const editor = editorRef.current;
    if (editor && revealLine && revealLine > 0) {
      editor.revealLineInCenter(revealLine);
      editor.setSelection({ startLineNumber: revealLine, startColumn: 1, endLineNumber: revealLine, endColumn: 1 + (editor.getModel()?.getLineLength(revealLine) ?? 0) });
      editor.focus();
    }
  }, [revealLine]);

  return (
    <div className="overflow-hidden rounded border border-slate-300" data-testid="code-editor" data-readonly={readOnly ? 'true' : 'false'} aria-label={label} role="region">
      <Editor
        height={height}
        language={gcodeLanguageId}
        theme={editorThemeName}
        value={value}
        onChange={(v) => onChange?.(v ?? '')}
        onMount={(editor) => { editorRef.current = editor; applyMarkers(editor); }}
        options={{
          readOnly,
          renderValidationDecorations: 'on', // Monaco hides markers in read-only editors by default ('editable')
          domReadOnly: readOnly,
          minimap: { enabled: false },
          fontSize: 13,
          fontFamily: 'var(--font-mono, ui-monospace), monospace',
          scrollBeyondLastLine: false,
          renderWhitespace: 'selection',
          lineNumbersMinChars: 5,
          automaticLayout: true,
          ariaLabel: label,
        }}
      />
    </div>
  );
}
