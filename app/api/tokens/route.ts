import { apiRoute } from '@/lib/server/route';
import { createToken, listTokens } from '@/db/queries/tokens';
import { createTokenSchema } from '@/lib/validation/tokens';

// Tokens are the caller's own; every role holds parts.read, so it stands for "signed in to this workspace".
export const GET = apiRoute({ permission: 'parts.read' }, async (ctx) => ({ tokens: await listTokens(ctx) }));

/** Creates a token; the answer is the only time the token itself is shown. */
export const POST = apiRoute({ permission: 'parts.read', body: createTokenSchema }, async (ctx, { body }) =>
  Response.json(await createToken(ctx, body.name), { status: 201 }));
