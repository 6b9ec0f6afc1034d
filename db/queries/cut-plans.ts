import "server-only";
// Cut plans: the settings and the checked nest of one revision. A plan is written in one insert
// (with its audit entry, in one transaction), so a refused or failed plan leaves nothing behind.
import { desc, eq } from "drizzle-orm";
import { db } from "@/db";
import { cutPlans, designs, revisions, users } from "@/db/schema";
import { audit } from "@/lib/server/audit";
import { writeLogEntry } from "./build-log";
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
    const sum = plan.summary as { copies?: number; sheets?: number; sheet?: string; purpose?: string; unapprovedReason?: string | null };
    await writeLogEntry(tx, actor.id, target.projectId, {
      kind: "cut-plan",
      text: `Cut plan ${res.insertId} stored for ${sum.purpose ?? "review"}: ${sum.copies ?? "?"} parts on ${sum.sheets ?? "?"} × ${sum.sheet ?? "sheet"}.${sum.unapprovedReason ? ` Without the client's approval: ${sum.unapprovedReason}` : ""}`,
      cutPlanId: res.insertId,
      detail: { revisionId: target.revisionId },
    });
    await audit(tx, { actorId: actor.id, action: "create", entity: "cut_plans", entityId: res.insertId, projectId: target.projectId, detail: { revisionId: target.revisionId, summary: plan.summary } });
    return res.insertId;
  });
}

/** The current cut plan (the newest) of every revision in a project that has one, newest first. */
export async function listProjectCutPlans(projectId: number): Promise<{ id: number; revisionId: number; revisionNumber: number; designName: string; createdAt: string; summary: Record<string, unknown> }[]> {
  const rows = await db
    .select({ id: cutPlans.id, revisionId: cutPlans.revisionId, revisionNumber: revisions.number, designName: designs.name, createdAt: cutPlans.createdAt, summary: cutPlans.summary })
    .from(cutPlans)
    .innerJoin(revisions, eq(revisions.id, cutPlans.revisionId))
    .innerJoin(designs, eq(designs.id, revisions.designId))
    .where(eq(designs.projectId, projectId))
    .orderBy(desc(cutPlans.id));
  const seen = new Set<number>();
  return rows.filter((r) => !seen.has(r.revisionId) && seen.add(r.revisionId)).map((r) => ({ ...r, createdAt: r.createdAt.toISOString() }));
}
