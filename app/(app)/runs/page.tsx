import type { Metadata } from 'next';
import { z } from 'zod';
import { RunsScreen } from '@/components/runs/runs-screen';
import { requirePageUser } from '@/lib/server/session';

export const metadata: Metadata = { title: 'Runs' };

export default async function RunsPage({ searchParams }: { searchParams: Promise<{ revision?: string }> }) {
  const user = await requirePageUser('results.read');
  const { revision } = await searchParams;
  return <RunsScreen ctx={{ user, ip: null }} revisionId={z.uuid().safeParse(revision).success ? revision : undefined} />;
}
