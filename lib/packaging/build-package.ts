/**
 * Builds the shop-floor package of an approved revision as a zip (jszip):
 *   <program file>.<ext>  the revision's program text, byte for byte
 *   setup-sheet.html      printable setup sheet with the cautions
 *   touch-points.csv      the plan's touch points
 *   manifest.json         UUIDs, approval, SHA-256 of the three files above
 *   sha256sums.txt        `sha256sum -c` list of all four files
 * Every entry is stamped with `generatedAt`, so the same input gives the same bytes.
 */
import JSZip from 'jszip';
import { buildManifest, MANIFEST_PATH, SUMS_PATH, type ManifestFile } from './manifest';
import type { PackageInput } from './package-input';
import { renderSetupSheet, setupSheetView } from './setup-sheet';
import { sha256Hex, utf8 } from './sha256';
import { touchPointsCsv } from './touch-points-csv';

export const SETUP_SHEET_PATH = 'setup-sheet.html';
export const TOUCH_POINTS_PATH = 'touch-points.csv';

/** A file-name-safe slug: letters, digits, dot, dash and underscore only. */
export function slug(text: string): string {
  const s = text.trim().replace(/[^A-Za-z0-9._-]+/g, '-').replace(/^[-.]+|[-.]+$/g, '');
  return s.slice(0, 60) || 'part';
}

export function programFileName(input: PackageInput): string {
  const ext = input.program.fileExtension.replace(/^\./, '') || 'nc';
  return `${slug(input.part.number)}-${slug(input.program.name)}-rev${input.revision.number}.${slug(ext)}`;
}

/** Name for the zip download itself. */
export function packageFileName(input: PackageInput): string {
  return `${slug(input.part.number)}-${slug(input.program.name)}-rev${input.revision.number}-package.zip`;
}

async function entry(path: string, role: ManifestFile['role'], text: string): Promise<{ file: ManifestFile; bytes: Uint8Array }> {
  const bytes = utf8(text);
  return { file: { path, role, bytes: bytes.byteLength, sha256: await sha256Hex(bytes) }, bytes };
}

export interface BuiltPackage {
  fileName: string;
  bytes: Uint8Array;
  manifestSha256: string;
}

export async function buildPackage(input: PackageInput): Promise<BuiltPackage> {
  const programPath = programFileName(input);
  const program = await entry(programPath, 'program', input.revision.text);
  const sheet = await entry(
    SETUP_SHEET_PATH,
    'setup-sheet',
    renderSetupSheet(setupSheetView(input, programPath, program.file.sha256)),
  );
  const csv = await entry(TOUCH_POINTS_PATH, 'touch-points', touchPointsCsv(input.plan, input.part.features));
  const files = [program, sheet, csv];
  const manifestText = `${JSON.stringify(buildManifest(input, files.map((f) => f.file)), null, 2)}\n`;
  const manifestBytes = utf8(manifestText);
  const manifestSha256 = await sha256Hex(manifestBytes);
  const sums = [...files.map((f) => `${f.file.sha256}  ${f.file.path}`), `${manifestSha256}  ${MANIFEST_PATH}`].join('\n') + '\n';

  const zip = new JSZip();
  // JSZip stores local time in the zip header; parse the ISO stamp explicitly (no clock read).
  const date = parseIso(input.generatedAt);
  const options = { date, createFolders: false } as const;
  for (const f of files) zip.file(f.file.path, f.bytes, options);
  zip.file(MANIFEST_PATH, manifestBytes, options);
  zip.file(SUMS_PATH, sums, options);
  const bytes = await zip.generateAsync({ type: 'uint8array', compression: 'DEFLATE', compressionOptions: { level: 6 } });
  return { fileName: packageFileName(input), bytes, manifestSha256 };
}

/** The engine never reads the clock; turning a given ISO stamp into a Date value is allowed here. */
function parseIso(iso: string): globalThis.Date {
  const ms = globalThis.Date.parse(iso);
  if (!Number.isFinite(ms)) throw new RangeError(`generatedAt is not an ISO 8601 time: "${iso}"`);
  return new globalThis.Date(ms);
}
