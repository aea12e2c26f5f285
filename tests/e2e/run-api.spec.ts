/**
 * API checks for every review, package, run, trend, trace and live route: the right role
 * succeeds, the others get 403, bad input 400 with the field named, a wrong state 409,
 * another workspace 404, no session 401.
 */
import { expect, request as pwRequest, test, type APIRequestContext } from '@playwright/test';
import { eq } from 'drizzle-orm';
import { closeDb, getDb } from '@/db/client';
import { revisions, users } from '@/db/schema';
import { ROLE_PEOPLE, storageStateFor } from './support/roles';
import { createFixtureProgram, type Fixture } from './run-fixtures';

test.describe.configure({ mode: 'serial', timeout: 120_000 });

let fx: Fixture;
let draft: string;
let approved: string;
const as: Record<string, APIRequestContext> = {};
const MISSING = '00000000-0000-4000-8000-000000000000';

test.beforeAll(async () => {
  fx = await createFixtureProgram();
  [draft, approved] = fx.revisionIds;
  // Set-up only: the approval flow itself is covered in run-loop.spec.ts.
  const [reviewer] = await getDb().select({ id: users.id }).from(users).where(eq(users.email, ROLE_PEOPLE.reviewer.email)).limit(1);
  await getDb().update(revisions).set({ status: 'approved', approvedAt: new Date(), approverId: reviewer?.id ?? null }).where(eq(revisions.id, approved));
  const base = process.env.E2E_BASE_URL ?? 'http://127.0.0.1:3100';
  for (const who of ['programmer', 'engineer', 'reviewer', 'setup', 'admin', 'other-admin'] as const) {
    as[who] = await pwRequest.newContext({ baseURL: base, storageState: storageStateFor(who) });
  }
  as.anonymous = await pwRequest.newContext({ baseURL: base });
});
test.afterAll(async () => { await Promise.all(Object.values(as).map((c) => c.dispose())); await closeDb(); });

const ctx = (who: string): APIRequestContext => {
  const c = as[who];
  if (!c) throw new Error(`no context for ${who}`);
  return c;
};

async function errorOf(res: Awaited<ReturnType<APIRequestContext['get']>>) {
  return ((await res.json()) as { error: { code: string; message: string; path?: string } }).error;
}

test('reviews: list, submit, decide, diff by role', async () => {
  expect((await ctx('setup').get('/api/reviews')).status()).toBe(403);
  expect((await ctx('reviewer').get('/api/reviews')).status()).toBe(200);
  expect((await ctx('anonymous').get('/api/reviews')).status()).toBe(401);

  expect((await ctx('setup').post(`/api/reviews/${draft}/submit`)).status()).toBe(403);
  expect((await ctx('reviewer').post(`/api/reviews/${draft}/submit`)).status()).toBe(403);
  const bad = await ctx('programmer').post('/api/reviews/not-a-uuid/submit');
  expect(bad.status()).toBe(400);
  expect((await errorOf(bad)).path).toBe('params.revisionId');
  expect((await ctx('programmer').post(`/api/reviews/${MISSING}/submit`)).status()).toBe(404);
  expect((await ctx('other-admin').post(`/api/reviews/${draft}/submit`)).status()).toBe(403);

  expect((await ctx('programmer').post(`/api/reviews/${draft}/decision`, { data: { decision: 'approve' } })).status()).toBe(403);
  const noComment = await ctx('reviewer').post(`/api/reviews/${draft}/decision`, { data: { decision: 'send-back', comment: '' } });
  expect(noComment.status()).toBe(400);
  expect((await errorOf(noComment)).path).toBe('body.comment');
  const notInReview = await ctx('reviewer').post(`/api/reviews/${draft}/decision`, { data: { decision: 'approve' } });
  expect(notInReview.status()).toBe(409);
  expect((await errorOf(notInReview)).message).toContain('not waiting for review');

  expect((await ctx('setup').get(`/api/reviews/${approved}/diff?against=${draft}`)).status()).toBe(403);
  const noAgainst = await ctx('reviewer').get(`/api/reviews/${approved}/diff`);
  expect(noAgainst.status()).toBe(400);
  expect((await errorOf(noAgainst)).path).toBe('query.against');
  const diff = await ctx('reviewer').get(`/api/reviews/${approved}/diff?against=${draft}`);
  expect(diff.status()).toBe(200);
  const body = (await diff.json()) as { diff: { summary: { total: number; byKind: { approach: number } } } };
  expect(body.diff.summary.byKind.approach).toBe(fx.plan.touchPoints.length);
});

test('packages: approved only, by role, workspace-scoped', async () => {
  expect((await ctx('engineer').get(`/api/packages/${approved}`)).status()).toBe(403);
  const notApproved = await ctx('setup').get(`/api/packages/${draft}`);
  expect(notApproved.status()).toBe(409);
  expect((await errorOf(notApproved)).message).toContain('only approved revisions can be downloaded');
  expect((await ctx('setup').get(`/api/packages/${MISSING}`)).status()).toBe(404);
  const ok = await ctx('reviewer').get(`/api/packages/${approved}`);
  expect(ok.status()).toBe(200);
  expect(ok.headers()['content-type']).toBe('application/zip');
});

test('runs: upload, virtual, read, corrections by role and input', async () => {
  const file = (text: string) => ({ name: 'trips.txt', mimeType: 'text/plain', buffer: Buffer.from(text) });
  expect((await ctx('programmer').post('/api/runs', { multipart: { revisionId: approved, serial: 'X1', file: file('x') } })).status()).toBe(403);
  const noFile = await ctx('setup').post('/api/runs', { multipart: { revisionId: approved, serial: 'X1' } });
  expect(noFile.status()).toBe(400);
  expect((await errorOf(noFile)).path).toBe('file');
  const noSerial = await ctx('setup').post('/api/runs', { multipart: { revisionId: approved, serial: '', file: file('x') } });
  expect(noSerial.status()).toBe(400);
  expect((await errorOf(noSerial)).path).toBe('body.serial');
  const big = await ctx('setup').post('/api/runs', { multipart: { revisionId: approved, serial: 'X1', file: file('TRIP '.repeat(500_000)) } });
  expect(big.status()).toBe(400);
  expect((await errorOf(big)).message).toContain('larger than 2 MiB');
  const onDraft = await ctx('setup').post('/api/runs', { multipart: { revisionId: draft, serial: 'X1', file: file('x') } });
  expect(onDraft.status()).toBe(409);
  const garbage = await ctx('setup').post('/api/runs', { multipart: { revisionId: approved, serial: 'X1', file: file('hello\nTRIP nope X1') } });
  expect(garbage.status()).toBe(400);
  const g = (await garbage.json()) as { problems: { line: number | null; code: string }[] };
  expect(g.problems.slice(0, 2).map((p) => [p.line, p.code])).toEqual([[1, 'MALFORMED_LINE'], [2, 'MALFORMED_LINE']]);

  expect((await ctx('setup').post('/api/runs/virtual', { data: { revisionId: approved, errors: {} } })).status()).toBe(403);
  const badVirtual = await ctx('programmer').post('/api/runs/virtual', { data: { revisionId: approved, errors: { formNoise: -1 } } });
  expect(badVirtual.status()).toBe(400);
  expect((await errorOf(badVirtual)).path).toBe('body.errors.formNoise');
  const virtual = await ctx('programmer').post('/api/runs/virtual', { data: { revisionId: approved, seed: 3, errors: { probeRadiusError: 0.002 } } });
  expect(virtual.status(), await virtual.text()).toBe(201);
  const { runId } = (await virtual.json()) as { runId: string };

  for (const who of ['programmer', 'engineer', 'reviewer', 'setup', 'admin']) expect((await ctx(who).get(`/api/runs/${runId}`)).status(), who).toBe(200);
  expect((await ctx('other-admin').get(`/api/runs/${runId}`)).status()).toBe(404);
  expect((await ctx('anonymous').get('/api/runs')).status()).toBe(401);

  expect((await ctx('reviewer').post(`/api/runs/${runId}/corrections`, { data: { group: 0, applied: true } })).status()).toBe(403);
  expect((await ctx('setup').post(`/api/runs/${runId}/corrections`, { data: { group: -1, applied: true } })).status()).toBe(400);
  const simulated = await ctx('setup').post(`/api/runs/${runId}/corrections`, { data: { group: 0, applied: true } });
  expect([404, 409]).toContain(simulated.status()); // no proposal (404) or a simulated run (409): never applied
});

test('trends, trace and live: read for every role of the workspace only', async () => {
  const trends = await ctx('reviewer').get(`/api/trends/${fx.partId}`);
  expect(trends.status()).toBe(200);
  const t = (await trends.json()) as { trends: { toleranceId: string; label: string; characteristic: string }[] };
  const pos = t.trends.find((x) => x.label === 'B2' && x.characteristic === 'position');
  expect(pos).toBeTruthy();
  const csvNoTol = await ctx('reviewer').get(`/api/trends/${fx.partId}?format=csv`);
  expect(csvNoTol.status()).toBe(400);
  expect((await errorOf(csvNoTol)).path).toBe('query.tolerance');
  const csv = await ctx('setup').get(`/api/trends/${fx.partId}?format=csv&tolerance=${pos?.toleranceId}`);
  expect(csv.status()).toBe(200);
  expect(await csv.text()).toContain('index,measured_at,serial,run_uuid,value,status');
  expect((await ctx('other-admin').get(`/api/trends/${fx.partId}`)).status()).toBe(404);

  expect((await ctx('setup').get(`/api/trace/${pos?.toleranceId}`)).status()).toBe(200);
  expect((await ctx('other-admin').get(`/api/trace/${pos?.toleranceId}`)).status()).toBe(404);
  expect((await ctx('anonymous').get(`/api/trace/${pos?.toleranceId}`)).status()).toBe(401);

  expect((await ctx('engineer').get(`/api/live/${fx.machineId}`)).status()).toBe(200);
  expect((await ctx('other-admin').get(`/api/live/${fx.machineId}`)).status()).toBe(404);
  expect((await ctx('setup').get('/api/live/nope')).status()).toBe(400);
});
