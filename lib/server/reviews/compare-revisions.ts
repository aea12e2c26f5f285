import 'server-only';
/**
 * Compares two revisions: the program texts (for Monaco's diff editor) and the plans
 * point by point (lib/program/diff.ts), with feature labels for the table.
 */
import { and, eq, inArray } from 'drizzle-orm';
import { getDb } from '@/db/client';
import { getRevisionContentOrThrow } from '@/db/queries/reviews';
import { features } from '@/db/schema';
import { diffPlans, type PlanDiff } from '@/lib/program/diff';
import { feedsPerTouchPoint } from '@/lib/program/diff-lines';
import { planSchema, type Plan } from '@/lib/program/plan-schema';
import type { Ctx } from '@/lib/server/context';

export interface RevisionComparison {
  base: { id: string; number: number; text: string };
  head: { id: string; number: number; text: string };
  diff: PlanDiff;
  /** Feature UUID → balloon label. */
  labels: Record<string, string>;
  /** A stored plan that could not be read (should not happen; shown rather than hidden). */
  planProblems: string[];
}

function readPlan(value: unknown, number: number, problems: string[]): Plan {
  const parsed = planSchema.safeParse(value);
  if (parsed.success) return parsed.data;
  problems.push(`The stored plan of revision ${number} could not be read; its points are left out of the table.`);
  return { touchPoints: [], warnings: [] };
}

export async function compareRevisions(ctx: Ctx, baseId: string, headId: string): Promise<RevisionComparison> {
  const [base, head] = await Promise.all([getRevisionContentOrThrow(ctx, baseId), getRevisionContentOrThrow(ctx, headId)]);
  const planProblems: string[] = [];
  const basePlan = readPlan(base.plan, base.number, planProblems);
  const headPlan = readPlan(head.plan, head.number, planProblems);
  const uuidsOf = (p: Plan) => p.touchPoints.map((t) => t.uuid);
  const diff = diffPlans(
    { plan: basePlan, feeds: feedsPerTouchPoint(base.programText, uuidsOf(basePlan)) },
    { plan: headPlan, feeds: feedsPerTouchPoint(head.programText, uuidsOf(headPlan)) },
  );
  const featureIds = [...new Set(diff.rows.map((r) => r.featureUuid))];
  const rows = featureIds.length === 0 ? [] : await getDb()
    .select({ id: features.id, label: features.label })
    .from(features)
    .where(and(eq(features.workspaceId, ctx.user.workspaceId), inArray(features.id, featureIds)));
  return {
    base: { id: base.id, number: base.number, text: base.programText },
    head: { id: head.id, number: head.number, text: head.programText },
    diff,
    labels: Object.fromEntries(rows.map((r) => [r.id, r.label])),
    planProblems,
  };
}
