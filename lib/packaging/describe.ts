/**
 * Plain-words descriptions of features and tolerances for printed sheets, and small
 * formatting helpers shared by the package files. Millimetres, 4 decimals at most.
 */
import type { Feature, Tolerance } from '../features/schema';

export function mm(v: number): string {
  const s = (Math.round(v * 1e4) / 1e4).toFixed(4).replace(/\.?0+$/, '');
  return s === '-0' ? '0' : s;
}

function signed(v: number): string {
  return v > 0 ? `+${mm(v)}` : mm(v);
}

export function vec(v: readonly number[]): string {
  return `(${v.map(mm).join(', ')})`;
}

/** "2026-12-01T20:41:09.000Z" → "2026-12-01 20:41 UTC"; anything else is shown as given. */
export function isoToText(iso: string): string {
  const m = /^(\d{4}-\d\d-\d\d)T(\d\d:\d\d)(?::\d\d(?:\.\d+)?)?Z$/.exec(iso);
  return m ? `${m[1]} ${m[2]} UTC` : iso;
}

export function describeFeature(f: Feature): string {
  switch (f.type) {
    case 'plane': return `plane ${mm(f.size[0])} × ${mm(f.size[1])}`;
    case 'bore': return `bore ⌀${mm(f.diameter)}, depth ${mm(f.depth)}`;
    case 'boss': return `boss ⌀${mm(f.diameter)}, height ${mm(f.height)}`;
    case 'slot': return `slot ${mm(f.width)} wide × ${mm(f.length)} long, depth ${mm(f.depth)}`;
    case 'web': return `web ${mm(f.width)} wide × ${mm(f.length)} long, depth ${mm(f.depth)}`;
    case 'sphere': return `sphere ⌀${mm(f.diameter)}`;
  }
}

export function describeTolerance(t: Tolerance): string {
  const parts: string[] = [t.characteristic];
  if (t.characteristic === 'diameter' || t.characteristic === 'width') {
    if (t.fit) parts.push(t.fit);
    if (t.value !== undefined) parts.push(mm(t.value));
    if (t.upper !== undefined || t.lower !== undefined) parts.push(`${signed(t.upper ?? 0)}/${signed(t.lower ?? 0)}`);
  } else if (t.upper !== undefined || t.lower !== undefined) {
    parts.push(`zone ${signed(t.upper ?? 0)}/${signed(t.lower ?? 0)}`);
  } else if (t.value !== undefined) {
    parts.push(t.characteristic === 'position' ? `⌀${mm(t.value)}` : mm(t.value));
  }
  if (t.material && t.material !== 'RFS') parts.push(t.material);
  if (t.datums && t.datums.length > 0) parts.push(`| ${t.datums.join(' | ')}`);
  return parts.join(' ');
}

/** Balloon labels sorted the way a drawing reads them: 2 before 10. */
export function byLabel<T extends { label: string }>(items: T[]): T[] {
  return [...items].sort((a, b) => a.label.localeCompare(b.label, 'en', { numeric: true }));
}
