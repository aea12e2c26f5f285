/**
 * The closed loop in the browser: submit → e-mail to the reviewer → diff → the author is
 * refused approving her own revision → a reviewer approves → the setup technician downloads
 * the zip (every checksum verified) → uploads a TRIP log the engine simulated for a
 * deliberately mis-made part → statuses, bonus and corrections match the engine's own
 * evaluation → a log with a wrong UUID is refused whole with its line named → trends after
 * several runs → the trace view links all the way → the machine's live page.
 */
import { readFile, writeFile } from 'node:fs/promises';
import { expect as baseExpect, test, type Page } from '@playwright/test';
import { v4 as uuidv4 } from 'uuid';
import { closeDb } from '@/db/client';
import { evaluateRun } from '@/lib/evaluation/evaluate';
import { evaluateInputSchema } from '@/lib/evaluation/input';
import { simulateRun } from '@/lib/evaluation/simulate';
import { simulateInputSchema } from '@/lib/evaluation/simulate-input';
import { forwardKinematics } from '@/lib/kinematics/forward';
import { verifyPackage } from '@/lib/packaging/verify-package';
import { toPartFrame } from '@/lib/program/results-frame';
import { parseResults } from '@/lib/program/results-parse';
import { firstLink, waitForMail } from './support/mailbox';
import { MULTI_ROLE_PERSON, PASSWORD, ROLE_PEOPLE, storageStateFor } from './support/roles';
import { signInByApi } from './support/sign-in';
import { createFixtureProgram, tripLog, type Fixture } from './run-fixtures';

// Pages compile on first use under `next dev` and the machine is shared: be patient.
const expect = baseExpect.configure({ timeout: 60_000 });
test.describe.configure({ mode: 'serial', timeout: 240_000 });

let fx: Fixture;
const tag = () => fx.name.slice(-6);
const shot = (page: Page, name: string) => page.screenshot({ path: `test-results/e2e/run-loop-${name}.png`, fullPage: true });

test.beforeAll(async () => { fx = await createFixtureProgram(); });
test.afterAll(async () => { await closeDb(); });

function simulatedLog(seed: number, b2Offset: number, partShift: [number, number, number] = [0, 0, 0]): string {
  const b2 = fx.part.features.find((f) => f.label === 'B2');
  if (!b2) throw new Error('fixture part lacks B2');
  const sim = simulateRun(simulateInputSchema.parse({
    part: fx.part, probe: fx.probe, plan: fx.plan, machine: fx.machine, seed,
    errors: { features: { [b2.uuid]: { offset: [b2Offset, 0, 0], sizeError: 0.01 } }, formNoise: 0.0005, workOffsetError: partShift },
  }));
  return tripLog(fx.plan, fx.machine, sim.measurements.map((m) => ({ uuid: m.uuid, point: 'point' in m ? m.point : undefined })));
}

/** What the engine says about a log, computed here the way the server does. */
function engineVerdict(log: string) {
  const parsed = parseResults(log, { touchPoints: fx.plan.touchPoints, rotaries: fx.machine.rotaries.map((r) => r.name) });
  expect(parsed.errors).toEqual([]);
  const { measurements } = toPartFrame(parsed.records, fx.plan, (axes) => forwardKinematics(fx.machine, axes).tip);
  return evaluateRun(evaluateInputSchema.parse({
    part: fx.part, probe: fx.probe, plan: fx.plan, measurements: measurements.map((m) => ({ uuid: m.uuid, point: m.point })),
    conditions: { probeRepeatability2Sigma: fx.repeatability2Sigma },
    options: { formMethod: 'minimum-zone', methods: {}, warningShare: 0.8, minTur: 4 },
    corrections: { dialect: 'iso-skip', workOffset: { register: 1, current: [0, 0, 0], xAxis: fx.machine.setup.xAxis, zAxis: fx.machine.setup.zAxis }, wear: [] },
  }));
}

test('submit, e-mail, diff, four-eyes refusal, approval', async ({ browser }) => {
  const [, rev2] = fx.revisionIds;
  const author = await browser.newContext();
  expect((await signInByApi(author.request, MULTI_ROLE_PERSON.email, PASSWORD)).status()).toBe(200);
  const page = await author.newPage();
  await page.goto('/reviews');
  const row = page.locator('tr', { has: page.locator(`a[href="/reviews/${rev2}"]`) });
  await row.getByRole('button', { name: 'Submit for review' }).click();
  await expect(page.getByText(/Sent for review/)).toBeVisible();

  const mail = await waitForMail(ROLE_PEOPLE.reviewer.email, `Review requested: FH-1042 · ${fx.name} revision 2`);
  const link = firstLink(mail);
  expect(link).toContain(`/reviews/${rev2}`);

  // The author (also a reviewer) opens the review and is refused approving it.
  await page.goto(`/reviews/${rev2}`);
  await expect(page.getByText('You wrote this revision: another reviewer must approve it.')).toBeVisible();
  await page.getByRole('button', { name: 'Approve' }).click();
  await expect(page.getByText('You wrote this revision; another reviewer must approve it.')).toBeVisible({ timeout: 30_000 });
  await author.close();

  const reviewer = await browser.newContext({ storageState: storageStateFor('reviewer') });
  const rp = await reviewer.newPage();
  await rp.goto(new URL(link).pathname);
  await expect(rp.getByTestId('program-diff')).toBeVisible();
  await expect(rp.getByTestId('point-diff-summary')).toContainText(`approach ${fx.plan.touchPoints.length}`);
  await expect(rp.getByTestId('point-diff-table').locator('tr[data-status="changed"]')).toHaveCount(fx.plan.touchPoints.length);
  await rp.waitForTimeout(1500); // let Monaco paint for the screenshot
  await shot(rp, 'review-diff');
  await rp.getByLabel('Comment').fill('Checked the slower last touch against the drawing.');
  await rp.getByRole('button', { name: 'Approve' }).click();
  await expect(rp.getByText(/Approved\. The revision is locked/)).toBeVisible({ timeout: 30_000 });
  await expect(rp.locator('[data-status="approved"]').first()).toBeVisible();
  await waitForMail(MULTI_ROLE_PERSON.email, `Approved: FH-1042 · ${fx.name} revision 2`);
  await reviewer.close();
});

test('setup technician downloads the package and every checksum holds', async ({ browser }) => {
  const ctx = await browser.newContext({ storageState: storageStateFor('setup'), acceptDownloads: true });
  const page = await ctx.newPage();
  await page.goto('/runs');
  const [download] = await Promise.all([page.waitForEvent('download'), page.locator(`a[href="/api/packages/${fx.revisionIds[1]}"]`).click()]);
  const bytes = await readFile(await download.path());
  const check = await verifyPackage(new Uint8Array(bytes));
  expect(check.problems).toEqual([]);
  expect(check.ok).toBe(true);
  expect(check.manifest?.revision.uuid).toBe(fx.revisionIds[1]);
  expect(check.manifest?.touchPoints).toHaveLength(fx.plan.touchPoints.length);
  await shot(page, 'runs-ready');
  await ctx.close();
});

test('an upload of a simulated mis-made part shows the engine\'s verdict; a wrong UUID is refused whole', async ({ browser }, info) => {
  const ctx = await browser.newContext({ storageState: storageStateFor('setup') });
  const page = await ctx.newPage();
  // B2 made 0.05 mm off in X and 0.01 mm large; the whole part clamped 0.03 mm off in Y.
  const log = simulatedLog(7, 0.05, [0, 0.03, 0]);
  const expected = engineVerdict(log);

  // A wrong UUID on line 3: nothing stored, the line named.
  const bad = log.split('\n');
  bad[2] = (bad[2] ?? '').replace(/TRIP \S+/, `TRIP ${uuidv4()}`);
  const badPath = info.outputPath('bad-trips.txt');
  await writeFile(badPath, bad.join('\n'));
  await page.goto(`/runs?revision=${fx.revisionIds[1]}`);
  await page.getByLabel('Part serial or lot').fill(`${tag()}-0001`);
  await page.getByTestId('results-file').setInputFiles(badPath);
  await page.getByRole('button', { name: 'Upload and evaluate' }).click();
  await expect(page.getByTestId('upload-message')).toContainText('Nothing was stored');
  await expect(page.getByTestId('upload-problems')).toContainText('line 3:');
  await shot(page, 'upload-refused');

  const goodPath = info.outputPath('trips.txt');
  await writeFile(goodPath, log);
  await page.getByTestId('results-file').setInputFiles(goodPath);
  await page.getByLabel('Part temperature (°C, optional)').fill('');
  await page.getByRole('button', { name: 'Upload and evaluate' }).click();
  await page.waitForURL(/\/runs\/[0-9a-f-]{36}$/);
  const table = page.getByTestId('results-table');
  await expect(table).toBeVisible();
  for (const r of expected.results) {
    const cells = table.locator(`tr[data-characteristic="${r.characteristic}"]`).filter({ hasText: r.label });
    await expect(cells, `${r.label} ${r.characteristic}`).toHaveAttribute('data-status', r.status);
    if (r.value !== null) await expect(cells.getByTestId('result-value')).toHaveText(r.value.toFixed(4));
    if (r.bonus !== undefined) await expect(cells.getByTestId('result-bonus')).toHaveText(r.bonus.toFixed(4));
  }
  expect(expected.results.some((r) => r.status === 'nonconforming')).toBe(true);
  const proposals = expected.corrections?.proposals ?? [];
  const shown = page.getByTestId('corrections').locator(':scope > li');
  await expect(shown).toHaveCount(proposals.length);
  for (const [i, p] of proposals.entries()) {
    await expect(shown.nth(i)).toHaveAttribute('data-state', p.state);
    if (p.line) await expect(shown.nth(i).getByTestId('correction-code')).toHaveText(p.line);
  }
  expect(proposals.some((p) => p.kind === 'work-offset' && p.state === 'apply' && p.line)).toBe(true);
  await expect(page.getByTestId('deviation-view')).toHaveAttribute('data-points', String(fx.plan.touchPoints.length));
  await page.waitForTimeout(1500);
  await shot(page, 'run-page');
  await waitForMail(ROLE_PEOPLE.engineer.email, `${fx.name} revision 2, serial ${tag()}-0001`);
  await ctx.close();
});

test('trends after several runs, the trace view and the live page', async ({ browser }) => {
  const ctx = await browser.newContext({ storageState: storageStateFor('setup') });
  for (let i = 0; i < 10; i += 1) {
    const res = await ctx.request.post('/api/runs', {
      multipart: { revisionId: fx.revisionIds[1], serial: `${tag()}-${String(100 + i)}`, file: { name: 'trips.txt', mimeType: 'text/plain', buffer: Buffer.from(simulatedLog(100 + i, 0.002 * (i % 3))) } },
    });
    expect(res.status(), await res.text()).toBe(201);
  }
  const page = await ctx.newPage();
  await page.goto(`/trends/${fx.partId}`);
  const card = page.getByTestId('trend-card').filter({ hasText: 'B2 · diameter' });
  await expect(card.getByTestId('run-chart')).toBeVisible({ timeout: 60_000 });
  await expect(card.getByTestId('cpk')).not.toHaveText('—');
  await expect(card.locator('.recharts-line-dots circle').first()).toBeVisible();
  await shot(page, 'trends');

  await page.goto('/runs');
  await page.getByRole('link', { name: `${tag()}-109` }).click();
  await page.getByTestId('results-table').locator('tr').filter({ hasText: 'B2' }).getByRole('link', { name: 'position' }).click();
  await expect(page.getByRole('heading', { name: /Trace — FH-1042, balloon B2 position/ })).toBeVisible({ timeout: 60_000 });
  await expect(page.getByTestId('trace-revision').first()).toContainText('touch points on B2');
  await expect(page.getByTestId('trace-runs')).toContainText('program line');
  await shot(page, 'trace');
  await page.getByTestId('trace-runs').getByRole('link', { name: `${tag()}-109` }).click();
  await expect(page).toHaveURL(/\/runs\//);

  await page.setViewportSize({ width: 390, height: 844 });
  await page.goto(`/runs/live/${fx.machineId}`);
  await expect(page.getByTestId('machine-live')).toContainText(`${tag()}-109`);
  await expect(page.getByTestId('auto-refresh')).toBeVisible();
  await shot(page, 'live-phone');
  await ctx.close();
});
