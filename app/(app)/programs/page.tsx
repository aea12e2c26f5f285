import type { Metadata } from 'next';
import { PageHeader } from '@/components/ui/page-header';
import { ProgramsList } from '@/components/programs/programs-list';
import { ApiTokens } from '@/components/programs/api-tokens';
import { listTokens } from '@/db/queries/tokens';
import { listPrograms } from '@/db/queries/programs';
import { listParts } from '@/db/queries/parts';
import { listMachines } from '@/db/queries/machines';
import { listProbes } from '@/db/queries/probes';
import { postIds } from '@/postprocessors/index';
import { can } from '@/lib/auth/permissions';
import { requirePageCtx } from '@/lib/server/session';

export const metadata: Metadata = { title: 'Programs' };

export default async function ProgramsPage() {
  const ctx = await requirePageCtx('programs.read');
  const canCreate = can(ctx.user, 'programs.generate');
  const [rows, parts, machines, probes, tokens] = await Promise.all([
    listPrograms(ctx),
    canCreate ? listParts(ctx) : Promise.resolve([]),
    canCreate ? listMachines(ctx) : Promise.resolve([]),
    canCreate ? listProbes(ctx) : Promise.resolve([]),
    listTokens(ctx),
  ]);
  const choices = canCreate ? {
    parts: parts.map((p) => ({ id: p.id, label: `${p.number} rev ${p.revision} — ${p.name}` })),
    machines: machines.map((m) => ({ id: m.id, name: m.name, post: m.post })),
    probes: probes.map((p) => ({ id: p.id, name: p.name, warning: p.status.state === 'stale' ? p.status.message : null })),
    posts: postIds,
  } : null;
  return (
    <>
      <PageHeader title="Programs" description="Probing programs for a part on a machine: generated, edited and kept as revisions." />
      <ProgramsList rows={rows} canCreate={canCreate} choices={choices} />
      <div className="mt-8"><ApiTokens initial={tokens} /></div>
    </>
  );
}
