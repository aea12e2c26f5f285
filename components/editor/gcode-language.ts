/**
 * A Monaco language for G-code probing programs as our posts write them: G and M
 * words, axis and feed words, other address words, `#` parameters (`#5061`,
 * `#<name>`), `( … )` and `;` comments, `O` words and operators in expressions.
 * Pure data, so it can be unit-checked without a browser.
 */
import type { languages } from 'monaco-editor/editor';

export const gcodeLanguageId = 'probity-gcode';

export const gcodeMonarch: languages.IMonarchLanguage = {
  ignoreCase: true,
  defaultToken: '',
  tokenizer: {
    root: [
      [/\(/, { token: 'comment', next: '@paren' }],
      [/;.*$/, 'comment'],
      [/^\s*%.*$/, 'keyword.control'],
      [/^\s*N\d+/, 'number.line'],
      [/#<[^>]*>/, 'variable.parameter'],
      [/#\d+/, 'variable.parameter'],
      [/G\s*\d+(\.\d+)?/, 'keyword.gcode'],
      [/M\s*\d+/, 'keyword.mcode'],
      [/O\s*(\d+|<[^>]*>)/, 'keyword.control'],
      [/\b(IF|THEN|GOTO|WHILE|DO|END|ENDIF|ELSE|EQ|NE|GT|GE|LT|LE|AND|OR|XOR|MOD|ABS|SQRT|SIN|COS|TAN|ATAN|FIX|FUP|ROUND|ABORT|PRINT|DEBUG|LOG|LOGOPEN|LOGCLOSE|SUB|ENDSUB|CALL|RETURN)\b/, 'keyword.control'],
      [/[XYZABCUVW]\s*[-+]?(\d+\.?\d*|\.\d+)/, 'number.axis'],
      [/[XYZABCUVW](?=\s*[#[])/, 'number.axis'],
      [/[FS]\s*[-+]?(\d+\.?\d*|\.\d+)/, 'number.feed'],
      [/[HDTPQRLIJKE]\s*[-+]?(\d+\.?\d*|\.\d+)/, 'number.word'],
      [/[-+]?(\d+\.?\d*|\.\d+)/, 'number'],
      [/[[\]=*/+-]/, 'operator'],
    ],
    paren: [
      [/[^)]+/, 'comment'],
      [/\)/, { token: 'comment', next: '@pop' }],
    ],
  },
};

export const gcodeConfiguration: languages.LanguageConfiguration = {
  comments: { lineComment: ';', blockComment: ['(', ')'] },
  brackets: [['[', ']']],
  autoClosingPairs: [{ open: '[', close: ']' }, { open: '(', close: ')' }],
};

/** One theme for every editor and diff editor (Monaco's theme is global). */
export const editorThemeName = 'probity-light';
export const editorTheme = {
  base: 'vs' as const,
  inherit: true,
  rules: [
    { token: 'comment', foreground: '6b7280', fontStyle: 'italic' },
    { token: 'keyword.gcode', foreground: '0050a0', fontStyle: 'bold' },
    { token: 'keyword.mcode', foreground: '8a3ea8', fontStyle: 'bold' },
    { token: 'keyword.control', foreground: 'a14a00' },
    { token: 'number.axis', foreground: '006b4f' },
    { token: 'number.feed', foreground: '8a5a00' },
    { token: 'number.word', foreground: '2f4f6f' },
    { token: 'number.line', foreground: '9ca3af' },
    { token: 'variable.parameter', foreground: 'b00040' },
    { token: 'operator', foreground: '374151' },
  ],
  colors: {},
};
