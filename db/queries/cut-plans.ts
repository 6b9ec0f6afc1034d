import "server-only";
// Cut plans: the settings and the checked nest of one revision. A plan is written in one insert
// (with its audit entry, in one transaction), so a refused or failed plan leaves nothing behind.
// Plans are numbered within their revision (1, 2, …): people see "cut plan 2 of R3", URLs and
// JSON keep the id.
import { desc, eq, max, sql } from "drizzle-orm";
import { db } from "@/db";
import { cutPlans, designs, revisions, users } from "@/db/schema";
import { cutPlanName } from "@/lib/cut-plan/name";
import { audit } from "./audit";
import { writeLogEntry } from "./build-log";
import type { CurrentUser } from "./current-user";

export interface CutPlanRow {
  id: number;
  revisionId: number;
  /** 1, 2, … within the revision. */
  number: number;
  settings: Record<string, unknown>;
  nest: Record<string, unknown>;
  summary: Record<string, unknown>;
  createdBy: string | null;
  createdAt: string;
}

const columns = {
  id: cutPlans.id,
  revisionId: cutPlans.revisionId,
  number: cutPlans.number,
  settings: cutPlans.settings,
  nest: cutPlans.nest,
  summary: cutPlans.summary,
  createdBy: users.name,
  createdAt: cutPlans.createdAt,
};

const toRow = (r: Omit<CutPlanRow, "createdAt"> & { createdAt: Date }): CutPlanRow => ({
  ...r,
  createdAt: r.createdAt.toISOString(),
});

/** The revision's current plan: its newest. */
export async function latestCutPlan(revisionId: number): Promise<CutPlanRow | null> {
  const [row] = await db
    .select(columns)
    .from(cutPlans)
    .leftJoin(users, eq(users.id, cutPlans.createdById))
    .where(eq(cutPlans.revisionId, revisionId))
    .orderBy(desc(cutPlans.id))
    .limit(1);
  return row ? toRow(row) : null;
}

export async function findCutPlan(id: number): Promise<CutPlanRow | null> {
  const [row] = await db
    .select(columns)
    .from(cutPlans)
    .leftJoin(users, eq(users.id, cutPlans.createdById))
    .where(eq(cutPlans.id, id))
    .limit(1);
  return row ? toRow(row) : null;
}

/**
 * Saves a plan as its revision's next one. The number is taken under a row lock on the revision
 * (as a revision's number is under a lock on its design), so two saves at once get 1 and 2; the
 * unique index (revision_id, number) backs it up.
 */
export async function insertCutPlan(
  actor: CurrentUser,
  target: { revisionId: number; revisionNumber: number; projectId: number },
  plan: { settings: Record<string, unknown>; nest: Record<string, unknown>; summary: Record<string, unknown> },
): Promise<{ id: number; number: number }> {
  return db.transaction(async (tx) => {
    await tx.execute(sql`select id from ${revisions} where ${revisions.id} = ${target.revisionId} for update`);
    const [{ last }] = await tx
      .select({ last: max(cutPlans.number) })
      .from(cutPlans)
      .where(eq(cutPlans.revisionId, target.revisionId));
    const number = (last ?? 0) + 1;
    const [res] = await tx
      .insert(cutPlans)
      .values({ revisionId: target.revisionId, number, ...plan, createdById: actor.id });
    const sum = plan.summary as {
      copies?: number;
      sheets?: number;
      sheet?: string;
      purpose?: string;
      unapprovedReason?: string | null;
    };
    await writeLogEntry(tx, actor.id, target.projectId, {
      kind: "cut-plan",
      text: `${cutPlanName(number, target.revisionNumber)} saved for ${sum.purpose ?? "review"}: ${sum.copies ?? "?"} parts on ${sum.sheets ?? "?"} × ${sum.sheet ?? "sheet"}.${sum.unapprovedReason ? ` Without the client's approval: ${sum.unapprovedReason}` : ""}`,
      cutPlanId: res.insertId,
      detail: { revisionId: target.revisionId, number },
    });
    await audit(tx, {
      actorId: actor.id,
      action: "create",
      entity: "cut_plans",
      entityId: res.insertId,
      projectId: target.projectId,
      detail: { revisionId: target.revisionId, number, summary: plan.summary },
    });
    return { id: res.insertId, number };
  });
}

/** The current cut plan (the newest) of every revision in a project that has one, newest first. */
export async function listProjectCutPlans(projectId: number): Promise<
  {
    id: number;
    number: number;
    revisionId: number;
    revisionNumber: number;
    designId: number;
    designName: string;
    createdAt: string;
    summary: Record<string, unknown>;
  }[]
> {
  const rows = await db
    .select({
      id: cutPlans.id,
      number: cutPlans.number,
      revisionId: cutPlans.revisionId,
      revisionNumber: revisions.number,
      designId: designs.id,
      designName: designs.name,
      createdAt: cutPlans.createdAt,
      summary: cutPlans.summary,
    })
    .from(cutPlans)
    .innerJoin(revisions, eq(revisions.id, cutPlans.revisionId))
    .innerJoin(designs, eq(designs.id, revisions.designId))
    .where(eq(designs.projectId, projectId))
    .orderBy(desc(cutPlans.id));
  const seen = new Set<number>();
  return rows
    .filter((r) => !seen.has(r.revisionId) && seen.add(r.revisionId))
    .map((r) => ({ ...r, createdAt: r.createdAt.toISOString() }));
}
