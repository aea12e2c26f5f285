'use client';
/**
 * Side-by-side (or inline) diff of two program texts with the same language and
 * theme as the program editor. Read-only: the review screens compare, never edit.
 */
import { DiffEditor } from '@monaco-editor/react';
import { setUpMonaco } from './monaco-setup';
import { editorThemeName, gcodeLanguageId } from './gcode-language';

setUpMonaco();

export type ProgramDiffProps = {
  original: string;
  modified: string;
  height?: string;
  inline?: boolean;
  label?: string;
};

export default function ProgramDiff({ original, modified, height = '32rem', inline = false, label = 'Program changes' }: ProgramDiffProps) {
  return (
    <div className="overflow-hidden rounded border border-slate-300" data-testid="program-diff" role="region" aria-label={label}>
      <DiffEditor
        height={height}
        language={gcodeLanguageId}
        theme={editorThemeName}
        original={original}
        modified={modified}
        options={{
          readOnly: true,
          originalEditable: false,
          renderSideBySide: !inline,
          minimap: { enabled: false },
          fontSize: 13,
          scrollBeyondLastLine: false,
          automaticLayout: true,
        }}
      />
    </div>
  );
}
