import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { PageHeader } from '@/components/ui/page-header';
import { PartScreen } from '@/components/parts/part-screen';
import { getPart } from '@/db/queries/parts';
import { can } from '@/lib/auth/permissions';
import { isAppError } from '@/lib/server/app-error';
import { requirePageCtx } from '@/lib/server/session';

export const metadata: Metadata = { title: 'Part' };

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export default async function PartPage({ params }: { params: Promise<{ partId: string }> }) {
  const ctx = await requirePageCtx('parts.read');
  const { partId } = await params;
  if (!UUID.test(partId)) notFound();
  const part = await getPart(ctx, partId).catch((e: unknown) => {
    if (isAppError(e) && e.code === 'not-found') notFound();
    throw e;
  });
  return (
    <>
      <PageHeader title={`${part.number} rev. ${part.revision}`} description={`${part.name}${part.material ? ` · ${part.material}` : ''}`} />
      <PartScreen initial={part} canEdit={can(ctx.user, 'parts.edit')} />
    </>
  );
}
