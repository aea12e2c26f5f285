/**
 * The plan screens' API by role: the right role succeeds, the others get 403, bad
 * input gets 400 naming the field; a reviewer reads but cannot edit; a setup
 * technician cannot open drafts; another workspace sees none of it; concurrent
 * saves from one base get 409; API tokens work until revoked.
 */
import { expect, request as pw, test, type APIRequestContext } from '@playwright/test';
import { storageStateFor } from './support/roles';

test.setTimeout(180_000);
const asRole = async (who: Parameters<typeof storageStateFor>[0], baseURL: string) => pw.newContext({ baseURL, storageState: storageStateFor(who) });

type Fixture = { partId: string; programId: string; revisionId: string; machineId: string; probeId: string };
let f: Fixture;
let baseURL = '';

const errorOf = async (res: Awaited<ReturnType<APIRequestContext['get']>>) => ((await res.json()) as { error: { code: string; path?: string; message: string } }).error;

// eslint-disable-next-line no-empty-pattern -- Playwright needs a destructured first argument even with no fixtures
test.beforeAll(async ({}, info) => {
  test.setTimeout(180_000);
  baseURL = info.project.use.baseURL ?? 'http://127.0.0.1:3100';
  const programmer = await asRole('programmer', baseURL);
  const part = await programmer.post('/api/parts', { data: { number: `API-${Date.now()}`, revision: 'A', name: 'API check plate' } });
  expect(part.status()).toBe(201);
  const partId = ((await part.json()) as { id: string }).id;
  const face = await programmer.post(`/api/parts/${partId}/features`, { data: { type: 'plane', label: '1', origin: [0, 0, 0], normal: [0, 0, 1], uDir: [1, 0, 0], size: [60, 40] } });
  expect(face.status()).toBe(201);
  const machines = (await (await programmer.get('/api/machines')).json()) as { machines: { id: string; layout: string }[] };
  const probes = (await (await programmer.get('/api/probes')).json()) as { probes: { id: string }[] };
  const machineId = machines.machines.find((m) => m.layout === 'three-axis')?.id ?? '';
  const probeId = probes.probes[0]?.id ?? '';
  const program = await programmer.post('/api/programs', { data: { name: 'API check', partId, machineId, probeId, post: 'ngc' } });
  expect(program.status()).toBe(201);
  const programId = ((await program.json()) as { id: string }).id;
  const gen = await programmer.post(`/api/programs/${programId}/generate`, { data: {} });
  expect(gen.status(), await gen.text()).toBe(201);
  const revisionId = ((await gen.json()) as { revision: { id: string } }).revision.id;
  f = { partId, programId, revisionId, machineId, probeId };
  await programmer.dispose();
});

test('parts: programmer edits, engineer and reviewer are refused, bad input names the field', async () => {
  const programmer = await asRole('programmer', baseURL);
  const bad = await programmer.post(`/api/parts/${f.partId}/features`, { data: { type: 'bore', label: '9', center: [0, 0, 0], axis: [0, 0, 1], diameter: -3, depth: 5 } });
  expect(bad.status()).toBe(400);
  expect((await errorOf(bad)).path).toBe('body.diameter');
  for (const who of ['engineer', 'reviewer', 'setup'] as const) {
    const ctx = await asRole(who, baseURL);
    expect((await ctx.get(`/api/parts/${f.partId}`)).status()).toBe(200);
    expect((await ctx.post('/api/parts', { data: { number: 'X', revision: 'A', name: 'x' } })).status()).toBe(403);
    expect((await ctx.put(`/api/parts/${f.partId}`, { data: { number: 'X', revision: 'A', name: 'x' } })).status()).toBe(403);
    await ctx.dispose();
  }
});

test('machines and probes: engineer edits, programmer is refused', async () => {
  const engineer = await asRole('engineer', baseURL);
  const programmer = await asRole('programmer', baseURL);
  const machine = ((await (await engineer.get(`/api/machines/${f.machineId}`)).json()) as { machine: { version: number; record: Record<string, unknown> } }).machine;
  const badPivot = await engineer.post('/api/machines', { data: { ...machine.record, name: `Bad ${Date.now()}`, headPivotMm: -5 } });
  expect(badPivot.status()).toBe(400);
  expect((await errorOf(badPivot)).path).toBe('body.headPivotMm');
  expect((await programmer.post('/api/machines', { data: { ...machine.record, name: `Nope ${Date.now()}` } })).status()).toBe(403);
  expect((await programmer.put(`/api/machines/${f.machineId}`, { data: { baseVersion: machine.version, machine: machine.record } })).status()).toBe(403);
  const stale = await engineer.put(`/api/machines/${f.machineId}`, { data: { baseVersion: machine.version + 5, machine: machine.record, message: 'stale' } });
  expect(stale.status()).toBe(409);
  const probe = { name: `API probe ${Date.now()}`, stylusDiameter: 3, lengthMm: 80, repeatabilityMm: 0.001, approach: 4, overtravel: 2, clearance: 15, fastFeed: 400, measureFeed: 40 };
  expect((await programmer.post('/api/probes', { data: probe })).status()).toBe(403);
  const badProbe = await engineer.post('/api/probes', { data: { ...probe, measureFeed: 900 } });
  expect(badProbe.status()).toBe(400);
  expect((await errorOf(badProbe)).path).toBe('body.measureFeed');
  const made = await engineer.post('/api/probes', { data: probe });
  expect(made.status()).toBe(201);
  const pid = ((await made.json()) as { id: string }).id;
  const cal = await engineer.post(`/api/probes/${pid}/calibrations`, { data: { calibratedOn: new Date().toISOString().slice(0, 10), artifact: 'ring 20 mm', certificate: 'RG-20-114', measuredEffectiveDiameter: 2.9971, feedMmPerMin: 40 } });
  expect(cal.status()).toBe(201);
  const after = ((await (await engineer.get(`/api/probes/${pid}`)).json()) as { probe: { effectiveDiameter: number; status: { state: string } } }).probe;
  expect(after.effectiveDiameter).toBe(2.9971);
  expect(after.status.state).toBe('current');
  await engineer.post(`/api/probes/${pid}/events`, { data: { kind: 'collision', happenedOn: new Date().toISOString().slice(0, 10), note: 'touched the vice' } });
  const hit = ((await (await engineer.get(`/api/probes/${pid}`)).json()) as { probe: { status: { state: string; message: string } } }).probe;
  expect(hit.status.state).toBe('stale');
  expect(hit.status.message).toMatch(/collision/);
  await engineer.dispose(); await programmer.dispose();
});

test('programs and revisions: reviewer reads, cannot save; second save from one base is 409', async () => {
  const programmer = await asRole('programmer', baseURL);
  const reviewer = await asRole('reviewer', baseURL);
  const rev = ((await (await reviewer.get(`/api/revisions/${f.revisionId}`)).json()) as { revision: { number: number; text: string } }).revision;
  expect(rev.text).toContain('G38');
  const save = (ctx: APIRequestContext, text: string) => ctx.post(`/api/programs/${f.programId}/revisions`, { data: { baseRevision: rev.number, text, message: 'edit' } });
  expect((await save(reviewer, `${rev.text}\n`)).status()).toBe(403);
  expect((await reviewer.post(`/api/programs/${f.programId}/generate`, { data: {} })).status()).toBe(403);
  const noMessage = await programmer.post(`/api/programs/${f.programId}/revisions`, { data: { baseRevision: rev.number, text: rev.text, message: '' } });
  expect(noMessage.status()).toBe(400);
  expect((await errorOf(noMessage)).path).toBe('body.message');
  expect((await save(programmer, `${rev.text}(first)\n`)).status()).toBe(201);
  const second = await save(programmer, `${rev.text}(second)\n`);
  expect(second.status()).toBe(409);
  expect((await errorOf(second)).message).toMatch(/Someone saved revision/);
  const badProgram = await programmer.post('/api/programs', { data: { name: 'x', partId: f.partId, machineId: f.machineId, probeId: f.probeId, post: 'NO SUCH' } });
  expect(badProgram.status()).toBe(400);
  expect((await errorOf(badProgram)).path).toBe('body.post');
  await programmer.dispose(); await reviewer.dispose();
});

test('setup cannot open drafts; another workspace sees none of it', async ({ browser }) => {
  const setup = await asRole('setup', baseURL);
  expect((await setup.get(`/api/revisions/${f.revisionId}`)).status()).toBe(403);
  const list = ((await (await setup.get(`/api/programs/${f.programId}`)).json()) as { program: { revisions: unknown[] } }).program;
  expect(list.revisions).toHaveLength(0);
  const page = await browser.newPage({ storageState: storageStateFor('setup') });
  // The revision route checks in its layout, before any loading boundary: a real 403.
  const res = await page.goto(`${baseURL}/revisions/${f.revisionId}`);
  expect(res?.status()).toBe(403);
  await expect(page.getByRole('heading', { name: 'Your roles do not include this page' })).toBeVisible();
  await page.close();
  const other = await asRole('other-admin', baseURL);
  for (const url of [`/api/parts/${f.partId}`, `/api/programs/${f.programId}`, `/api/revisions/${f.revisionId}`, `/api/machines/${f.machineId}`, `/api/probes/${f.probeId}`]) {
    expect((await other.get(url)).status(), url).toBe(404);
  }
  const parts = ((await (await other.get('/api/parts')).json()) as { parts: { id: string }[] }).parts;
  expect(parts.map((p) => p.id)).not.toContain(f.partId);
  await setup.dispose(); await other.dispose();
});

test('an API token acts as its owner until revoked', async () => {
  const programmer = await asRole('programmer', baseURL);
  const made = await programmer.post('/api/tokens', { data: { name: 'e2e script' } });
  expect(made.status()).toBe(201);
  const { id, token } = (await made.json()) as { id: string; token: string };
  const script = await pw.newContext({ baseURL, extraHTTPHeaders: { Authorization: `Bearer ${token}` } });
  expect((await script.get(`/api/parts/${f.partId}`)).status()).toBe(200);
  expect((await script.post('/api/parts', { data: { number: `TOK-${Date.now()}`, revision: 'A', name: 'made by a script' } })).status()).toBe(201);
  expect((await programmer.delete(`/api/tokens/${id}`)).status()).toBe(200);
  expect((await script.get(`/api/parts/${f.partId}`)).status()).toBe(401);
  const anonymous = await pw.newContext({ baseURL });
  expect((await anonymous.get('/api/parts')).status()).toBe(401);
  await script.dispose(); await programmer.dispose(); await anonymous.dispose();
});
