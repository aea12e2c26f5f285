import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { z } from 'zod';
import { RunDetail } from '@/components/runs/run-detail';
import { isAppError } from '@/lib/server/app-error';
import { loadRunDetail } from '@/lib/server/runs/run-detail';
import { requirePageUser } from '@/lib/server/session';

export const metadata: Metadata = { title: 'Run' };

export default async function RunPage({ params }: { params: Promise<{ runId: string }> }) {
  const user = await requirePageUser('results.read');
  const { runId } = await params;
  if (!z.uuid().safeParse(runId).success) notFound();
  try {
    return <RunDetail user={user} detail={await loadRunDetail({ user, ip: null }, runId)} />;
  } catch (error) {
    if (isAppError(error) && error.code === 'not-found') notFound();
    throw error;
  }
}
