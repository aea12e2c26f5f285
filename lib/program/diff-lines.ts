/**
 * Which program lines measure which touch point, read from the program text itself: each
 * touch point's record statement carries its UUID, and the lines after the previous
 * record up to this one are the moves that measure it (approach, touches, record). Works
 * for every post, since it relies only on the UUID in the record line. Also reads the
 * feeds (F words, outside comments) of those lines, in order, for the plan diff.
 */

export interface TouchPointLines {
  /** 1-based first and last line of the block that measures the point. */
  from: number;
  to: number;
  /** The line that records the trip (carries the UUID). */
  recordLine: number;
}

const COMMENT = /\([^)]*\)|;.*$/g;
const FEED = /F\s*([+-]?(?:\d+\.?\d*|\.\d+))/gi;

export function touchPointLines(programText: string, uuids: readonly string[]): Map<string, TouchPointLines> {
  const wanted = new Set(uuids.map((u) => u.toLowerCase()));
  const lines = programText.split(/\r\n|\n|\r/);
  const out = new Map<string, TouchPointLines>();
  let blockStart = 1;
  const uuidRe = /[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}/gi;
  lines.forEach((line, i) => {
    const found = (line.match(uuidRe) ?? []).map((u) => u.toLowerCase()).filter((u) => wanted.has(u));
    for (const u of found) if (!out.has(u)) out.set(u, { from: blockStart, to: i + 1, recordLine: i + 1 });
    if (found.length > 0) blockStart = i + 2;
  });
  return out;
}

/** Feed words (mm/min) on the lines that measure each touch point, in program order. */
export function feedsPerTouchPoint(programText: string, uuids: readonly string[]): Record<string, number[]> {
  const lines = programText.split(/\r\n|\n|\r/);
  const out: Record<string, number[]> = {};
  for (const [uuid, block] of touchPointLines(programText, uuids)) {
    const feeds: number[] = [];
    for (const line of lines.slice(block.from - 1, block.to)) {
      for (const m of line.replace(COMMENT, '').matchAll(FEED)) feeds.push(Number(m[1]));
    }
    out[uuid] = feeds;
  }
  return out;
}
