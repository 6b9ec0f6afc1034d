import "server-only";
// Designs and their immutable revisions, as rows. The engine's part (checking a spec, solving it,
// the summary figures) is done before these are called, by lib/server/designs.ts.
import { and, desc, eq, max, sql } from "drizzle-orm";
import type { LoadsSettings } from "@/lib/validation/loads";
import { db } from "@/db";
import { designs, projects, revisions, users, type DesignMode } from "@/db/schema";
import type { RevisionSummary } from "@/lib/revision-summary";
import type { DesignSpec } from "@/lib/track";
import { audit } from "./audit";
import type { CurrentUser } from "./current-user";

export type { RevisionSummary };

export interface DesignRow {
  id: number;
  projectId: number;
  name: string;
  mode: DesignMode;
  updatedAt: string;
  latestRevision: number | null;
}

export interface RevisionRow {
  id: number;
  designId: number;
  number: number;
  specHash: string;
  engineVersion: string;
  note: string;
  createdBy: string | null;
  createdAt: string;
  summary: RevisionSummary;
}

export async function listDesigns(projectId: number): Promise<DesignRow[]> {
  const rows = await db
    .select({
      id: designs.id,
      projectId: designs.projectId,
      name: designs.name,
      mode: designs.mode,
      updatedAt: designs.updatedAt,
      latestRevision: max(revisions.number),
    })
    .from(designs)
    .leftJoin(revisions, eq(revisions.designId, designs.id))
    .where(eq(designs.projectId, projectId))
    .groupBy(designs.id)
    .orderBy(desc(designs.updatedAt), desc(designs.id));
  return rows.map((r) => ({ ...r, updatedAt: r.updatedAt.toISOString(), latestRevision: r.latestRevision ?? null }));
}

/** The design with this id, and the project it belongs to (for the access check). */
export async function findDesign(designId: number) {
  const [row] = await db.select().from(designs).where(eq(designs.id, designId)).limit(1);
  return row ?? null;
}

export async function findRevision(revisionId: number) {
  const [row] = await db
    .select({ revision: revisions, projectId: designs.projectId, designName: designs.name })
    .from(revisions)
    .innerJoin(designs, eq(designs.id, revisions.designId))
    .where(eq(revisions.id, revisionId))
    .limit(1);
  return row ?? null;
}

export async function listRevisions(designId: number): Promise<RevisionRow[]> {
  const rows = await db
    .select({
      id: revisions.id,
      designId: revisions.designId,
      number: revisions.number,
      specHash: revisions.specHash,
      engineVersion: revisions.engineVersion,
      note: revisions.note,
      createdBy: users.name,
      createdAt: revisions.createdAt,
      summary: revisions.summary,
    })
    .from(revisions)
    .leftJoin(users, eq(users.id, revisions.createdById))
    .where(eq(revisions.designId, designId))
    .orderBy(desc(revisions.number));
  return rows.map((r) => ({
    ...r,
    createdAt: r.createdAt.toISOString(),
    summary: r.summary as unknown as RevisionSummary,
  }));
}

export async function insertDesign(
  actor: CurrentUser,
  projectId: number,
  input: { name: string; spec: DesignSpec },
): Promise<number> {
  const { name, spec } = input;
  return db.transaction(async (tx) => {
    const [res] = await tx.insert(designs).values({
      projectId,
      name,
      mode: spec.mode,
      draft: spec as unknown as Record<string, unknown>,
      createdById: actor.id,
    });
    await tx.update(projects).set({ updatedAt: new Date() }).where(eq(projects.id, projectId));
    await audit(tx, {
      actorId: actor.id,
      action: "create",
      entity: "designs",
      entityId: res.insertId,
      projectId,
      detail: { name, mode: spec.mode },
    });
    return res.insertId;
  });
}

/** Changes a design's name, working draft (already checked by the engine) or load settings. */
export async function updateDesignRow(
  actor: CurrentUser,
  designId: number,
  projectId: number,
  input: { name?: string; draft?: DesignSpec; loads?: LoadsSettings },
): Promise<void> {
  const changes: Partial<typeof designs.$inferInsert> = {};
  if (input.name !== undefined) changes.name = input.name;
  if (input.loads !== undefined) changes.loads = input.loads as unknown as Record<string, unknown>;
  if (input.draft !== undefined) {
    changes.draft = input.draft as unknown as Record<string, unknown>;
    changes.mode = input.draft.mode;
  }
  await db.transaction(async (tx) => {
    await tx.update(designs).set(changes).where(eq(designs.id, designId));
    await audit(tx, {
      actorId: actor.id,
      action: "update",
      entity: "designs",
      entityId: designId,
      projectId,
      detail: { name: input.name, draft: input.draft !== undefined, loads: input.loads !== undefined },
    });
  });
}

interface NewRevisionRow {
  spec: DesignSpec;
  specHash: string;
  engineVersion: string;
  summary: RevisionSummary;
  /** The load settings to keep with it; absent: the design's own, as they are now. */
  loads?: LoadsSettings;
  note: string;
}

/**
 * Stores a solved spec as the design's next revision. The number is taken under a row lock on the
 * design, so two saves at once get consecutive numbers.
 */
export async function insertRevision(
  actor: CurrentUser,
  designId: number,
  projectId: number,
  input: NewRevisionRow,
): Promise<{ id: number; number: number; specHash: string }> {
  return db.transaction(async (tx) => {
    await tx.execute(sql`select id from ${designs} where ${designs.id} = ${designId} for update`);
    // The load settings go with the revision as they are now, so its cautions never change after it is saved.
    const loads =
      input.loads ??
      (await tx.select({ loads: designs.loads }).from(designs).where(eq(designs.id, designId)))[0]?.loads ??
      null;
    const [{ last }] = await tx
      .select({ last: max(revisions.number) })
      .from(revisions)
      .where(eq(revisions.designId, designId));
    const number = (last ?? 0) + 1;
    const [res] = await tx.insert(revisions).values({
      designId,
      number,
      spec: input.spec as unknown as Record<string, unknown>,
      specHash: input.specHash,
      engineVersion: input.engineVersion,
      summary: input.summary as unknown as Record<string, unknown>,
      loads: loads as Record<string, unknown> | null,
      note: input.note,
      createdById: actor.id,
    });
    await tx.update(designs).set({ updatedAt: new Date() }).where(eq(designs.id, designId));
    await tx.update(projects).set({ updatedAt: new Date() }).where(eq(projects.id, projectId));
    await audit(tx, {
      actorId: actor.id,
      action: "create",
      entity: "revisions",
      entityId: res.insertId,
      projectId,
      detail: { designId, number, specHash: input.specHash },
    });
    return { id: res.insertId, number, specHash: input.specHash };
  });
}

export async function revisionByNumber(designId: number, number: number) {
  const [row] = await db
    .select()
    .from(revisions)
    .where(and(eq(revisions.designId, designId), eq(revisions.number, number)))
    .limit(1);
  return row ?? null;
}

/** Every saved revision in a project, newest design change first, newest revision first within a design. */
export async function listProjectRevisions(
  projectId: number,
): Promise<
  { id: number; number: number; designId: number; designName: string; mode: DesignMode; createdAt: string }[]
> {
  const rows = await db
    .select({
      id: revisions.id,
      number: revisions.number,
      designId: designs.id,
      designName: designs.name,
      mode: designs.mode,
      createdAt: revisions.createdAt,
    })
    .from(revisions)
    .innerJoin(designs, eq(designs.id, revisions.designId))
    .where(eq(designs.projectId, projectId))
    .orderBy(desc(designs.updatedAt), desc(designs.id), desc(revisions.number));
  return rows.map((r) => ({ ...r, createdAt: r.createdAt.toISOString() }));
}
