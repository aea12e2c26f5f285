import { createHash } from 'node:crypto';
import JSZip from 'jszip';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { buildPackage, programFileName } from '@/lib/packaging/build-package';
import { manifestSchema } from '@/lib/packaging/manifest';
import { verifyPackage } from '@/lib/packaging/verify-package';
import { SAFETY_CAUTIONS } from '@/lib/packaging/cautions';
import { id, packageInput, plan } from './fixture';

// Checksums are re-computed here with node:crypto, independently of the Web Crypto path
// the package builder uses.
const nodeSha = (bytes: Uint8Array): string => createHash('sha256').update(bytes).digest('hex');

async function unzip(bytes: Uint8Array): Promise<JSZip> {
  return JSZip.loadAsync(bytes);
}

describe('buildPackage', () => {
  it('holds the program, setup sheet, touch points, manifest and sums, with every checksum right', async () => {
    const input = packageInput();
    const built = await buildPackage(input);
    const zip = await unzip(built.bytes);
    const names = Object.keys(zip.files).sort();
    const programPath = programFileName(input);
    expect(programPath).toBe('KT-0417-bracket-Op20-check-rev4.ngc');
    expect(names).toEqual([programPath, 'manifest.json', 'setup-sheet.html', 'sha256sums.txt', 'touch-points.csv'].sort());

    const manifest = manifestSchema.parse(JSON.parse(await zip.file('manifest.json')!.async('string')));
    expect(manifest.files.map((f) => f.path).sort()).toEqual([programPath, 'setup-sheet.html', 'touch-points.csv'].sort());
    for (const f of manifest.files) {
      const content = await zip.file(f.path)!.async('uint8array');
      expect(nodeSha(content), f.path).toBe(f.sha256);
      expect(content.byteLength).toBe(f.bytes);
    }
    const manifestBytes = await zip.file('manifest.json')!.async('uint8array');
    expect(nodeSha(manifestBytes)).toBe(built.manifestSha256);
    const sums = await zip.file('sha256sums.txt')!.async('string');
    expect(sums).toContain(`${built.manifestSha256}  manifest.json`);
    expect(sums.trim().split('\n')).toHaveLength(4);
  });

  it('keeps the program text byte for byte', async () => {
    const input = packageInput();
    const zip = await unzip((await buildPackage(input)).bytes);
    expect(await zip.file(programFileName(input))!.async('string')).toBe(input.revision.text);
  });

  it('records every UUID, the approver and the time in the manifest', async () => {
    const input = packageInput();
    const zip = await unzip((await buildPackage(input)).bytes);
    const m = manifestSchema.parse(JSON.parse(await zip.file('manifest.json')!.async('string')));
    expect(m.part.uuid).toBe(id('part'));
    expect(m.program.uuid).toBe(id('program'));
    expect(m.revision).toEqual({ uuid: id('revision-4'), number: 4 });
    expect(m.machine.versionUuid).toBe(id('machine-v3'));
    expect(m.probe.uuid).toBe(id('probe'));
    expect(m.approval).toEqual({ approverUuid: id('reviewer'), approverName: 'Dana Reviewer', approvedAt: '2026-11-30T08:50:00.000Z' });
    expect(m.touchPoints.map((t) => t.uuid)).toEqual(plan.touchPoints.map((t) => t.uuid));
    expect(m.touchPoints[3]?.label).toBe('10');
  });

  it('is reproducible: the same input gives the same bytes', async () => {
    const a = await buildPackage(packageInput());
    const b = await buildPackage(packageInput());
    expect(nodeSha(a.bytes)).toBe(nodeSha(b.bytes));
  });

  it('writes a setup sheet with the cautions, work offset, probe state and features by balloon, escaped', async () => {
    const input = packageInput({
      probe: { ...packageInput().probe, calibration: { state: 'stale', calibratedAt: '2026-11-01T07:00:00.000Z' } },
    });
    const zip = await unzip((await buildPackage(input)).bytes);
    const html = await zip.file('setup-sheet.html')!.async('string');
    for (const c of SAFETY_CAUTIONS) expect(html).toContain(c.replace(/'/g, '&#x27;'));
    expect(html).toContain('single block');
    expect(html).toContain('Work offset G54');
    expect(html).toContain('(10, -20, 55)');
    expect(html).toContain('Trunnion cell 2, version 3');
    expect(html).toContain('calibration out of date, last 2026-11-01 07:00 UTC');
    expect(html).toMatch(/class="warn">The probe is calibration out of date/);
    // "2" sorts before "10" (drawing order); the part number's angle brackets are escaped.
    expect(html.indexOf('<td>2</td>')).toBeLessThan(html.indexOf('<td>10</td>'));
    expect(html).toContain('KT-0417 &lt;bracket&gt;');
    expect(html).not.toContain('<bracket>');
    expect(html).toContain('diameter 12H7 +0.018/0');
    expect(html).toContain('position ⌀0.05 MMC | A');
  });

  it('writes touch-points.csv with one row per point and the axis words', async () => {
    const zip = await unzip((await buildPackage(packageInput())).bytes);
    const rows = Papa.parse<Record<string, string>>(await zip.file('touch-points.csv')!.async('string'), { header: true, skipEmptyLines: true });
    expect(rows.errors).toEqual([]);
    expect(rows.meta.fields).toContain('axis_A');
    expect(rows.meta.fields).toContain('axis_C');
    expect(rows.data).toHaveLength(plan.touchPoints.length);
    expect(rows.data[3]).toMatchObject({ uuid: plan.touchPoints[3]!.uuid, feature_label: '10', surface_x: '56.0000', normal_x: '-1.000000', axis_C: '90.0000' });
  });

  it('refuses a generatedAt that is not a time', async () => {
    await expect(buildPackage(packageInput({ generatedAt: 'yesterday' }))).rejects.toThrow(/ISO 8601/);
  });
});

describe('verifyPackage', () => {
  it('accepts an untouched package', async () => {
    const check = await verifyPackage((await buildPackage(packageInput())).bytes);
    expect(check.problems).toEqual([]);
    expect(check.ok).toBe(true);
    expect(check.files).toHaveLength(3);
    expect(check.files.every((f) => f.ok)).toBe(true);
  });

  it('catches an edited program, a removed file and an added file, all at once', async () => {
    const input = packageInput();
    const zip = await unzip((await buildPackage(input)).bytes);
    zip.file(programFileName(input), input.revision.text.replace('G54', 'G55'));
    zip.remove('touch-points.csv');
    zip.file('extra.txt', 'hello');
    const check = await verifyPackage(await zip.generateAsync({ type: 'uint8array' }));
    expect(check.ok).toBe(false);
    expect(check.problems).toContain(`${programFileName(input)}: SHA-256 does not match the manifest`);
    expect(check.problems).toContain('touch-points.csv is listed in the manifest but missing');
    expect(check.problems).toContain('extra.txt is in the zip but not in the manifest');
  });

  it('catches an edited manifest through sha256sums.txt', async () => {
    const zip = await unzip((await buildPackage(packageInput())).bytes);
    const text = await zip.file('manifest.json')!.async('string');
    zip.file('manifest.json', text.replace('Dana Reviewer', 'Someone Else'));
    const check = await verifyPackage(await zip.generateAsync({ type: 'uint8array' }));
    expect(check.ok).toBe(false);
    expect(check.problems).toEqual(["sha256sums.txt: the manifest's SHA-256 does not match"]);
  });

  it('reports a missing or malformed manifest and a non-zip', async () => {
    const zip = await unzip((await buildPackage(packageInput())).bytes);
    zip.file('manifest.json', '{"format":"something-else"}');
    const bad = await verifyPackage(await zip.generateAsync({ type: 'uint8array' }));
    expect(bad.problems[0]).toMatch(/manifest.json is malformed at format/);
    zip.remove('manifest.json');
    const missing = await verifyPackage(await zip.generateAsync({ type: 'uint8array' }));
    expect(missing.problems).toContain('manifest.json is missing');
    const notZip = await verifyPackage(new TextEncoder().encode('not a zip'));
    expect(notZip).toMatchObject({ ok: false, problems: ['not a readable zip file'] });
  });
});
