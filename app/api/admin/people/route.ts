import { listPeople } from '@/db/queries/people';
import { apiRoute } from '@/lib/server/route';

export const GET = apiRoute({ permission: 'users.manage' }, async (ctx) => ({ people: await listPeople(ctx) }));
