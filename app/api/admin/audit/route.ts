import { listAuditEvents } from '@/db/queries/audit';
import { apiRoute } from '@/lib/server/route';
import { auditFilterSchema } from '@/lib/validation/audit';

export const GET = apiRoute({ permission: 'audit.read', query: auditFilterSchema }, async (ctx, { query }) => ({
  events: await listAuditEvents(ctx, query),
}));
