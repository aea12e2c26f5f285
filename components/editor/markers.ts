/**
 * Verifier findings → Monaco marker data. Line numbers are 1-based as the
 * verifier reports them; a finding on line 0 (a whole-program finding) is shown
 * on line 1; lines past the end are clamped so a stale finding is still seen.
 */
import type { Finding } from '@/lib/validation/programs';

export type MarkerLike = {
  severity: number;
  message: string;
  code: string;
  startLineNumber: number;
  startColumn: number;
  endLineNumber: number;
  endColumn: number;
  source: string;
};

/** Monaco's MarkerSeverity values (Hint 1, Info 2, Warning 4, Error 8). */
export const markerSeverity = { info: 2, warning: 4, error: 8 } as const;

export function findingsToMarkers(findings: readonly Finding[], lineLengths: readonly number[]): MarkerLike[] {
  const lastLine = Math.max(1, lineLengths.length);
  return findings.map((f) => {
    const line = Math.min(Math.max(1, f.line), lastLine);
    return {
      severity: markerSeverity[f.severity],
      message: `${f.message} [${f.code}]`,
      code: f.code,
      startLineNumber: line,
      startColumn: 1,
      endLineNumber: line,
      endColumn: Math.max(2, (lineLengths[line - 1] ?? 0) + 1),
      source: 'verifier',
    };
  });
}
