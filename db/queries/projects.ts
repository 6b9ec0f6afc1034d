import "server-only";
import { and, desc, eq, inArray } from "drizzle-orm";
import { alias } from "drizzle-orm/mysql-core";
import { db } from "@/db";
import {
  machines,
  materials,
  organisations,
  projectMembers,
  projects,
  stockSheets,
  users,
  type ProjectStatus,
} from "@/db/schema";
import type { ProjectSiteInput } from "@/lib/validation/projects";
import { audit } from "./audit";
import type { CurrentUser } from "./current-user";
import { Refusal } from "./refusal";
import { STATUS_LABEL } from "@/lib/project-status";
import { writeLogEntry } from "./build-log";
import { clientOrganisationId } from "./organisations";

export interface ProjectSummary {
  id: number;
  name: string;
  clientOrganisation: string | null;
  site: string;
  status: ProjectStatus;
  updatedAt: string;
}

const clientOrg = alias(organisations, "client_org");

function summaryQuery() {
  return db
    .select({
      id: projects.id,
      name: projects.name,
      clientOrganisation: clientOrg.name,
      site: projects.site,
      status: projects.status,
      updatedAt: projects.updatedAt,
    })
    .from(projects)
    .leftJoin(clientOrg, eq(clientOrg.id, projects.clientOrganisationId));
}

const toSummary = (row: Awaited<ReturnType<typeof summaryQuery>>[number]): ProjectSummary => ({
  ...row,
  updatedAt: row.updatedAt.toISOString(),
});

/** Projects the user belongs to; every project for an admin. Newest change first. */
export async function listVisibleProjects(user: CurrentUser): Promise<ProjectSummary[]> {
  if (user.role === "admin")
    return (await summaryQuery().orderBy(desc(projects.updatedAt), desc(projects.id))).map(toSummary);
  const memberOf = db
    .select({ id: projectMembers.projectId })
    .from(projectMembers)
    .where(eq(projectMembers.userId, user.id));
  return (
    await summaryQuery().where(inArray(projects.id, memberOf)).orderBy(desc(projects.updatedAt), desc(projects.id))
  ).map(toSummary);
}

export async function getProjectSummary(projectId: number): Promise<ProjectSummary | null> {
  const [row] = await summaryQuery().where(eq(projects.id, projectId)).limit(1);
  return row ? toSummary(row) : null;
}

/** A new project; a fabricator who creates it becomes its fabricator member. */
export async function createProject(
  actor: CurrentUser,
  input: { name: string; site: string; clientOrganisation: string },
): Promise<number> {
  return db.transaction(async (tx) => {
    const orgId = await clientOrganisationId(tx, input.clientOrganisation);
    const [res] = await tx
      .insert(projects)
      .values({ name: input.name, site: input.site, clientOrganisationId: orgId, createdById: actor.id });
    const projectId = res.insertId;
    if (actor.role === "fabricator")
      await tx.insert(projectMembers).values({ projectId, userId: actor.id, role: "fabricator", addedById: actor.id });
    await audit(tx, {
      actorId: actor.id,
      action: "create",
      entity: "projects",
      entityId: projectId,
      projectId,
      detail: { name: input.name },
    });
    return projectId;
  });
}

export async function updateProject(
  actor: CurrentUser,
  projectId: number,
  input: { name?: string; site?: string; clientOrganisation?: string; status?: ProjectStatus },
): Promise<void> {
  await db.transaction(async (tx) => {
    const { clientOrganisation, ...rest } = input;
    const changes: Partial<typeof projects.$inferInsert> = { ...rest };
    if (clientOrganisation !== undefined)
      changes.clientOrganisationId = await clientOrganisationId(tx, clientOrganisation);
    const [before] = await tx
      .select({ status: projects.status })
      .from(projects)
      .where(eq(projects.id, projectId))
      .limit(1);
    await tx.update(projects).set(changes).where(eq(projects.id, projectId));
    await audit(tx, {
      actorId: actor.id,
      action: "update",
      entity: "projects",
      entityId: projectId,
      projectId,
      detail: input,
    });
    // A change of stage goes into the build log too.
    if (input.status && before && input.status !== before.status)
      await writeLogEntry(tx, actor.id, projectId, {
        kind: "status",
        text: `Status changed from ${STATUS_LABEL[before.status]} to ${STATUS_LABEL[input.status]}.`,
        detail: { from: before.status, to: input.status },
      });
  });
}

/** What a project records of its site and stock; a library row comes with its name and whether it is still in use. */
export interface ProjectSite {
  runLengthMm: number | null;
  trackLines: number | null;
  stockSheet: { id: number; name: string; active: boolean } | null;
  machine: { id: number; name: string; active: boolean } | null;
}

export async function getProjectSite(projectId: number): Promise<ProjectSite | null> {
  const [row] = await db
    .select({
      runLengthMm: projects.siteRunLengthMm,
      trackLines: projects.trackLines,
      sheetId: stockSheets.id,
      sheetName: stockSheets.name,
      sheetActive: stockSheets.active,
      materialActive: materials.active,
      machineId: machines.id,
      machineName: machines.name,
      machineActive: machines.active,
    })
    .from(projects)
    .leftJoin(stockSheets, eq(stockSheets.id, projects.stockSheetId))
    .leftJoin(materials, eq(materials.id, stockSheets.materialId))
    .leftJoin(machines, eq(machines.id, projects.machineId))
    .where(eq(projects.id, projectId))
    .limit(1);
  if (!row) return null;
  return {
    runLengthMm: row.runLengthMm,
    trackLines: row.trackLines,
    stockSheet:
      row.sheetId !== null
        ? // A sheet is usable while it and its material are both in the library.
          { id: row.sheetId, name: row.sheetName ?? "", active: Boolean(row.sheetActive && row.materialActive) }
        : null,
    machine:
      row.machineId !== null
        ? { id: row.machineId, name: row.machineName ?? "", active: Boolean(row.machineActive) }
        : null,
  };
}

/**
 * Sets the project's site and stock (null: not set). A sheet or machine must be a row the shop
 * library still offers (a sheet's material too); the check, the change and its audit entry are one
 * transaction, so a row retired meanwhile cannot slip in.
 */
export async function setProjectSite(actor: CurrentUser, projectId: number, input: ProjectSiteInput): Promise<void> {
  await db.transaction(async (tx) => {
    if (input.stockSheetId !== null) {
      const [sheet] = await tx
        .select({ id: stockSheets.id })
        .from(stockSheets)
        .innerJoin(materials, eq(materials.id, stockSheets.materialId))
        .where(and(eq(stockSheets.id, input.stockSheetId), eq(stockSheets.active, true), eq(materials.active, true)))
        .limit(1);
      if (!sheet)
        throw new Refusal("bad_request", "Some fields need attention.", {
          stockSheetId: ["That sheet is not in the shop library now: choose one from the list."],
        });
    }
    if (input.machineId !== null) {
      const [machine] = await tx
        .select({ id: machines.id })
        .from(machines)
        .where(and(eq(machines.id, input.machineId), eq(machines.active, true)))
        .limit(1);
      if (!machine)
        throw new Refusal("bad_request", "Some fields need attention.", {
          machineId: ["That machine is not in the shop library now: choose one from the list."],
        });
    }
    const [res] = await tx
      .update(projects)
      .set({
        siteRunLengthMm: input.siteRunLengthMm,
        trackLines: input.trackLines,
        stockSheetId: input.stockSheetId,
        machineId: input.machineId,
      })
      .where(eq(projects.id, projectId));
    if (res.affectedRows === 0) throw new Refusal("not_found", "No such project.");
    await audit(tx, {
      actorId: actor.id,
      action: "update",
      entity: "projects",
      entityId: projectId,
      projectId,
      detail: { site: input },
    });
  });
}

/** The shop on a project: its fabricator members and their organisation, for the contact on printed sheets. */
export async function projectShop(projectId: number): Promise<{ name: string; contact: string }> {
  const rows = await db
    .select({ name: users.name, email: users.email, organisation: organisations.name })
    .from(projectMembers)
    .innerJoin(users, eq(users.id, projectMembers.userId))
    .leftJoin(organisations, eq(organisations.id, users.organisationId))
    .where(and(eq(projectMembers.projectId, projectId), eq(projectMembers.role, "fabricator"), eq(users.active, true)));
  return {
    name: rows.find((r) => r.organisation)?.organisation ?? "The shop",
    contact: rows.length ? rows.map((r) => `${r.name} <${r.email}>`).join(", ") : "the project's fabricator",
  };
}
