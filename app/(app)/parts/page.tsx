import type { Metadata } from 'next';
import { PageHeader } from '@/components/ui/page-header';
import { PartsList } from '@/components/parts/parts-list';
import { listParts } from '@/db/queries/parts';
import { can } from '@/lib/auth/permissions';
import { requirePageCtx } from '@/lib/server/session';

export const metadata: Metadata = { title: 'Parts' };

export default async function PartsPage() {
  const ctx = await requirePageCtx('parts.read');
  const rows = await listParts(ctx);
  return (
    <>
      <PageHeader title="Parts" description="Parts with their features, tolerances and datums — where every probing program starts." />
      <PartsList rows={rows} canEdit={can(ctx.user, 'parts.edit')} />
    </>
  );
}
