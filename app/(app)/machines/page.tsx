import type { Metadata } from 'next';
import { PageHeader } from '@/components/ui/page-header';
import { MachinesList } from '@/components/machines/machines-list';
import { listMachines } from '@/db/queries/machines';
import { DEMO_HEAD_PIVOT_MM, machinePreset, presetIds } from '@/lib/kinematics/presets';
import { modelToRecordParts } from '@/lib/validation/machines';
import { postIds } from '@/postprocessors/index';
import { can } from '@/lib/auth/permissions';
import { requirePageCtx } from '@/lib/server/session';

export const metadata: Metadata = { title: 'Machines' };

/** Presets as editable records: head points measured from the pivot, pivot as the preset's headroom. */
function presetChoices(posts: string[]) {
  return presetIds.map((id) => {
    const model = machinePreset(id);
    const pivot = model.rotaries.some((r) => r.carrier === 'head') ? DEMO_HEAD_PIVOT_MM : 0;
    return { id, label: model.name.replace(/^Demo /, ''), record: { ...modelToRecordParts(model, pivot), name: model.name.replace(/^Demo /, 'New '), post: posts[0] ?? 'ngc', headPivotMm: pivot, notes: '' } };
  });
}

export default async function MachinesPage() {
  const ctx = await requirePageCtx('machines.read');
  const rows = await listMachines(ctx);
  const canEdit = can(ctx.user, 'machines.edit');
  return (
    <>
      <PageHeader title="Machines" description="Axis layout, pivot offsets, travel limits and controller dialect of each machine, kept as numbered versions." />
      <MachinesList rows={rows} canEdit={canEdit} presets={canEdit ? presetChoices(postIds) : []} posts={postIds} />
    </>
  );
}
