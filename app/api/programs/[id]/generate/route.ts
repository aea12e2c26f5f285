import { z } from 'zod';
import { apiRoute } from '@/lib/server/route';
import { generateRevision } from '@/lib/server/programs/generate-revision';
import { toAppError } from '@/lib/server/errors';
import { recordIdSchema } from '@/lib/validation/parts';
import { regenerateSchema } from '@/lib/validation/programs';

const params = z.object({ id: recordIdSchema });

/**
 * Plans, posts and verifies on the server and stores the next revision. With
 * `Accept: application/x-ndjson` the answer streams one JSON line per stage
 * (progress for large parts) and ends with `{"stage":"done","revision":…}` or
 * `{"stage":"error","error":…}`; otherwise it answers once, as JSON.
 */
export const POST = apiRoute({ permission: 'programs.generate', params, body: regenerateSchema }, async (ctx, { params: p, body, req }) => {
  if (!req.headers.get('accept')?.includes('application/x-ndjson')) {
    return Response.json({ revision: await generateRevision(ctx, p.id, body.message) }, { status: 201 });
  }
  const encoder = new TextEncoder();
  const stream = new ReadableStream<Uint8Array>({
    async start(controller) {
      const send = (v: unknown) => controller.enqueue(encoder.encode(`${JSON.stringify(v)}\n`));
      try {
        const revision = await generateRevision(ctx, p.id, body.message, (stage, detail) => { if (stage !== 'done') send({ stage, detail }); });
        send({ stage: 'done', revision });
      } catch (error) {
        send({ stage: 'error', ...toAppError(error, `generate ${p.id}`).toBody() });
      } finally { controller.close(); }
    },
  });
  return new Response(stream, { headers: { 'Content-Type': 'application/x-ndjson; charset=utf-8', 'Cache-Control': 'no-store' } });
});
