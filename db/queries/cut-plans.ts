import "server-only";
// Cut plans: the settings and the checked nest of one revision. A plan is written in one insert
// (with its audit entry, in one transaction), so a refused or failed plan leaves nothing behind.
import { desc, eq } from "drizzle-orm";
import { db } from "@/db";
import { cutPlans, users } from "@/db/schema";
import { audit } from "@/lib/server/audit";
import type { CurrentUser } from "@/lib/server/dal";

export interface CutPlanRow {
  id: number;
  revisionId: number;
  settings: Record<string, unknown>;
  nest: Record<string, unknown>;
  summary: Record<string, unknown>;
  createdBy: string | null;
  createdAt: string;
}

const columns = {
  id: cutPlans.id,
  revisionId: cutPlans.revisionId,
  settings: cutPlans.settings,
  nest: cutPlans.nest,
  summary: cutPlans.summary,
  createdBy: users.name,
  createdAt: cutPlans.createdAt,
};

const toRow = (r: Omit<CutPlanRow, "createdAt"> & { createdAt: Date }): CutPlanRow => ({ ...r, createdAt: r.createdAt.toISOString() });

/** The revision's current plan: its newest. */
export async function latestCutPlan(revisionId: number): Promise<CutPlanRow | null> {
  const [row] = await db.select(columns).from(cutPlans).leftJoin(users, eq(users.id, cutPlans.createdById)).where(eq(cutPlans.revisionId, revisionId)).orderBy(desc(cutPlans.id)).limit(1);
  return row ? toRow(row) : null;
}

export async function findCutPlan(id: number): Promise<CutPlanRow | null> {
  const [row] = await db.select(columns).from(cutPlans).leftJoin(users, eq(users.id, cutPlans.createdById)).where(eq(cutPlans.id, id)).limit(1);
  return row ? toRow(row) : null;
}

export async function insertCutPlan(
  actor: CurrentUser,
  target: { revisionId: number; projectId: number },
  plan: { settings: Record<string, unknown>; nest: Record<string, unknown>; summary: Record<string, unknown> },
): Promise<number> {
  return db.transaction(async (tx) => {
    const [res] = await tx.insert(cutPlans).values({ revisionId: target.revisionId, ...plan, createdById: actor.id });
    await audit(tx, { actorId: actor.id, action: "create", entity: "cut_plans", entityId: res.insertId, projectId: target.projectId, detail: { revisionId: target.revisionId, summary: plan.summary } });
    return res.insertId;
  });
}
