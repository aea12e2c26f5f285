/**
 * Checks a package zip: the manifest is present and well-formed, every file it lists is
 * present with the recorded size and SHA-256, `sha256sums.txt` agrees (manifest included),
 * and nothing unlisted is in the zip. Every problem is reported, not only the first.
 */
import JSZip from 'jszip';
import { MANIFEST_PATH, manifestSchema, SUMS_PATH, type Manifest } from './manifest';
import { sha256Hex } from './sha256';

export interface FileCheck {
  path: string;
  expected: string;
  actual: string | null;
  ok: boolean;
}

export interface PackageCheck {
  ok: boolean;
  manifest: Manifest | null;
  files: FileCheck[];
  problems: string[];
}

function parseSums(text: string): Map<string, string> {
  const sums = new Map<string, string>();
  for (const line of text.split(/\r?\n/)) {
    const m = /^([0-9a-f]{64}) [ *](.+)$/.exec(line);
    if (m?.[1] && m[2]) sums.set(m[2], m[1]);
  }
  return sums;
}

async function readManifest(zip: JSZip, problems: string[]): Promise<{ manifest: Manifest | null; bytes: Uint8Array | null }> {
  const entry = zip.file(MANIFEST_PATH);
  if (!entry) {
    problems.push(`${MANIFEST_PATH} is missing`);
    return { manifest: null, bytes: null };
  }
  const bytes = await entry.async('uint8array');
  let json: unknown;
  try {
    json = JSON.parse(new TextDecoder().decode(bytes));
  } catch {
    problems.push(`${MANIFEST_PATH} is not valid JSON`);
    return { manifest: null, bytes };
  }
  const parsed = manifestSchema.safeParse(json);
  if (!parsed.success) {
    const first = parsed.error.issues[0];
    problems.push(`${MANIFEST_PATH} is malformed at ${first?.path.join('.') || '(top)'}: ${first?.message ?? 'invalid'}`);
    return { manifest: null, bytes };
  }
  return { manifest: parsed.data, bytes };
}

export async function verifyPackage(data: Uint8Array | ArrayBuffer): Promise<PackageCheck> {
  const problems: string[] = [];
  let zip: JSZip;
  try {
    zip = await JSZip.loadAsync(data);
  } catch {
    return { ok: false, manifest: null, files: [], problems: ['not a readable zip file'] };
  }
  const { manifest, bytes: manifestBytes } = await readManifest(zip, problems);
  const files: FileCheck[] = [];
  for (const f of manifest?.files ?? []) {
    const entry = zip.file(f.path);
    const content = entry ? await entry.async('uint8array') : null;
    const actual = content ? await sha256Hex(content) : null;
    if (!content) problems.push(`${f.path} is listed in the manifest but missing`);
    else if (actual !== f.sha256) problems.push(`${f.path}: SHA-256 does not match the manifest`);
    else if (content.byteLength !== f.bytes) problems.push(`${f.path}: size ${content.byteLength} bytes, manifest says ${f.bytes}`);
    files.push({ path: f.path, expected: f.sha256, actual, ok: actual === f.sha256 && content?.byteLength === f.bytes });
  }

  const sumsEntry = zip.file(SUMS_PATH);
  if (!sumsEntry) problems.push(`${SUMS_PATH} is missing`);
  else if (manifest && manifestBytes) {
    const sums = parseSums(await sumsEntry.async('string'));
    const manifestSha = await sha256Hex(manifestBytes);
    if (sums.get(MANIFEST_PATH) !== manifestSha) problems.push(`${SUMS_PATH}: the manifest's SHA-256 does not match`);
    for (const f of manifest.files) {
      if (sums.get(f.path) !== f.sha256) problems.push(`${SUMS_PATH} disagrees with the manifest for ${f.path}`);
    }
  }

  const listed = new Set([MANIFEST_PATH, SUMS_PATH, ...(manifest?.files.map((f) => f.path) ?? [])]);
  zip.forEach((path, entry) => {
    if (!entry.dir && !listed.has(path)) problems.push(`${path} is in the zip but not in the manifest`);
  });
  return { ok: problems.length === 0, manifest, files, problems };
}
