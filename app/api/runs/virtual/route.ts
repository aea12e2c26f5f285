import { NextResponse } from 'next/server';
import { apiRoute } from '@/lib/server/route';
import { createVirtualRun, virtualRunSchema } from '@/lib/server/runs/virtual-run';

/** POST /api/runs/virtual { revisionId, seed, errors } — simulate, evaluate, store marked simulated. */
export const POST = apiRoute(
  { permission: 'programs.generate', body: virtualRunSchema },
  async (ctx, { body }) => NextResponse.json(await createVirtualRun(ctx, body), { status: 201 }),
);
