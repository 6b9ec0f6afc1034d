// The project's site and stock (the project page's "Site and stock" form, setProjectSiteAction): the
// project's fabricator and admins save the figures a new cut plan starts from, with one audit entry in
// the same transaction; clients and installers are refused and nothing is written; bad figures and
// library rows that are no longer offered come back with the field's own message.
import { and, desc, eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { db, pool } from "@/db";
import { auditLog, machines, materials, projects, stockSheets } from "@/db/schema";
import { getProjectSite } from "@/db/queries/projects";
import { setProjectSiteAction } from "@/lib/actions/projects";
import { actAs } from "./support/session";
import { auditCount, makeProject, makeUser, runTag } from "./support/fixtures";

vi.mock("@/auth", async () => (await import("./support/session")).mockAuth);
vi.mock("next/cache", async () => (await import("./support/session")).mockCache);

const ids = { admin: 0, fabricator: 0, client: 0, installer: 0, outsider: 0 };
let projectId = 0;
let sheetId = 0;
let routerId = 0;
let laserId = 0;

const form = (values: Record<string, string | number>) => {
  const f = new FormData();
  for (const [k, v] of Object.entries(values)) f.set(k, String(v));
  return f;
};

/** The row's four figures, as stored. */
async function stored() {
  const [row] = await db
    .select({
      runLengthMm: projects.siteRunLengthMm,
      trackLines: projects.trackLines,
      stockSheetId: projects.stockSheetId,
      machineId: projects.machineId,
    })
    .from(projects)
    .where(eq(projects.id, projectId));
  return row;
}

const idByName = async (table: typeof stockSheets | typeof machines, name: string) =>
  (await db.select({ id: table.id }).from(table).where(eq(table.name, name)))[0].id;

beforeAll(async () => {
  ids.admin = (await makeUser("admin", "site-admin")).id;
  ids.fabricator = (await makeUser("fabricator", "site-fabricator")).id;
  ids.client = (await makeUser("client", "site-client")).id;
  ids.installer = (await makeUser("installer", "site-installer")).id;
  ids.outsider = (await makeUser("fabricator", "site-outsider")).id;
  projectId = await makeProject("Site project", [
    { userId: ids.fabricator, role: "fabricator" },
    { userId: ids.client, role: "client" },
    { userId: ids.installer, role: "installer" },
  ]);
  // The seeded shop library's rows (db/shop-library.json), by their names.
  sheetId = await idByName(stockSheets, "Birch plywood 18 mm, 2440 x 1220");
  routerId = await idByName(machines, "CNC router, 6 mm cutter");
  laserId = await idByName(machines, "CO2 laser");
});

afterAll(async () => {
  await pool.end();
});

// The demo trike's figures (docs/product.md): 6.0 m, two lines, 18 mm birch on 2440 × 1220, a 6 mm router.
const trike = () => ({
  projectId,
  siteRunLengthMm: "6000",
  trackLines: "2",
  stockSheetId: sheetId,
  machineId: routerId,
});

describe("the seeded demo", () => {
  it("records the trike run's site and stock", async () => {
    const [trikeProject] = await db
      .select({ id: projects.id })
      .from(projects)
      .where(eq(projects.name, "Square-wheel trike run"));
    expect(await getProjectSite(trikeProject.id)).toEqual({
      runLengthMm: 6000,
      trackLines: 2,
      stockSheet: { id: sheetId, name: "Birch plywood 18 mm, 2440 x 1220", active: true },
      machine: { id: routerId, name: "CNC router, 6 mm cutter", active: true },
    });
  });
});

describe("saving the site and stock", () => {
  it("saves the figures for the project's fabricator, with one audit entry", async () => {
    actAs(ids.fabricator);
    const before = await auditCount();
    const state = await setProjectSiteAction({}, form(trike()));
    expect(state).toMatchObject({ ok: true, message: "Site and stock saved." });
    expect(await stored()).toEqual({ runLengthMm: 6000, trackLines: 2, stockSheetId: sheetId, machineId: routerId });
    expect((await auditCount()) - before).toBe(1);
    const [entry] = await db
      .select()
      .from(auditLog)
      .where(and(eq(auditLog.entity, "projects"), eq(auditLog.entityId, String(projectId))))
      .orderBy(desc(auditLog.id))
      .limit(1);
    expect(entry).toMatchObject({ actorId: ids.fabricator, action: "update", projectId });
    expect(entry.detail).toEqual({
      site: { siteRunLengthMm: 6000, trackLines: 2, stockSheetId: sheetId, machineId: routerId },
    });
    // What the project page shows and the cut-plan page starts from.
    expect(await getProjectSite(projectId)).toEqual({
      runLengthMm: 6000,
      trackLines: 2,
      stockSheet: { id: sheetId, name: "Birch plywood 18 mm, 2440 x 1220", active: true },
      machine: { id: routerId, name: "CNC router, 6 mm cutter", active: true },
    });
  });

  it("lets an admin change them, and a blank field clears its figure", async () => {
    actAs(ids.admin);
    const state = await setProjectSiteAction(
      {},
      form({ projectId, siteRunLengthMm: "4500,5", trackLines: "", stockSheetId: sheetId, machineId: laserId }),
    );
    expect(state.ok).toBe(true);
    expect(await stored()).toEqual({
      runLengthMm: 4500.5,
      trackLines: null,
      stockSheetId: sheetId,
      machineId: laserId,
    });
    expect((await setProjectSiteAction({}, form(trike()))).ok).toBe(true);
  });
});

describe("who may not", () => {
  it.each([
    ["the project's client", "client", 403],
    ["the project's installer", "installer", 403],
    ["a fabricator of another project", "outsider", 404],
  ] as const)("refuses %s and writes nothing", async (_who, caller, status) => {
    actAs(ids[caller]);
    const [before, row] = [await auditCount(), await stored()];
    const state = await setProjectSiteAction(
      {},
      form({ ...trike(), siteRunLengthMm: "1200", trackLines: "1", machineId: laserId }),
    );
    expect(state.ok).toBe(false);
    expect(state.status).toBe(status);
    expect(await auditCount()).toBe(before);
    expect(await stored()).toEqual(row);
  });

  it("refuses a signed-out caller", async () => {
    actAs(null);
    const before = await auditCount();
    expect((await setProjectSiteAction({}, form(trike()))).status).toBe(401);
    expect(await auditCount()).toBe(before);
  });
});

describe("bad figures", () => {
  it("answers each field with its message in the form's words, keeps what was typed and writes nothing", async () => {
    actAs(ids.fabricator);
    const [before, row] = [await auditCount(), await stored()];
    const state = await setProjectSiteAction(
      {},
      form({ projectId, siteRunLengthMm: "six metres", trackLines: "2.5", stockSheetId: "plywood", machineId: "-3" }),
    );
    expect(state.ok).toBe(false);
    expect(state.status).toBe(400);
    expect(state.fields).toEqual({
      siteRunLengthMm: ["Enter the run length on site in millimetres, as a number (or leave it blank)."],
      trackLines: ["The track lines must be a whole number from 1 to 16 (or leave it blank)."],
      stockSheetId: ["Choose a stock sheet from the list."],
      machineId: ["Choose a machine from the list."],
    });
    expect(state.values?.siteRunLengthMm, "what was typed comes back to the form").toBe("six metres");
    expect(await auditCount()).toBe(before);
    expect(await stored()).toEqual(row);
  });

  it.each([
    [{ siteRunLengthMm: "0" }, "siteRunLengthMm", "The run length on site must be at least 10 mm."],
    [{ siteRunLengthMm: "-6000" }, "siteRunLengthMm", "The run length on site must be at least 10 mm."],
    [{ siteRunLengthMm: "250000" }, "siteRunLengthMm", "The run length on site must be at most 100000 mm (100 m)."],
    [{ trackLines: "0" }, "trackLines", "The track lines must be a whole number from 1 to 16 (or leave it blank)."],
    [{ trackLines: "17" }, "trackLines", "The track lines must be a whole number from 1 to 16 (or leave it blank)."],
  ])("%j", async (over, field, message) => {
    actAs(ids.fabricator);
    const before = await auditCount();
    const state = await setProjectSiteAction({}, form({ ...trike(), ...over }));
    expect(state.status).toBe(400);
    expect(state.fields?.[field]).toEqual([message]);
    expect(await auditCount()).toBe(before);
  });

  it("refuses a sheet or machine that is not in the shop library now", async () => {
    actAs(ids.fabricator);
    const [ply] = await db
      .select({ id: materials.id })
      .from(materials)
      .where(eq(materials.name, "Birch plywood 18 mm"));
    const [sheet] = await db.insert(stockSheets).values({
      name: `Retired ply ${runTag}`,
      materialId: ply.id,
      lengthMm: 2440,
      widthMm: 1220,
      source: "common practice",
      sourceKind: "common-practice",
      active: false,
    });
    const [machine] = await db.insert(machines).values({
      name: `Retired router ${runTag}`,
      kind: "router",
      kerfMm: 6,
      bedLengthMm: 2500,
      bedWidthMm: 1250,
      minInsideRadiusMm: 3,
      source: "common practice",
      sourceKind: "common-practice",
      active: false,
    });
    const [before, row] = [await auditCount(), await stored()];
    const badSheet = await setProjectSiteAction({}, form({ ...trike(), stockSheetId: sheet.insertId }));
    expect(badSheet.status).toBe(400);
    expect(badSheet.fields).toEqual({
      stockSheetId: ["That sheet is not in the shop library now: choose one from the list."],
    });
    const badMachine = await setProjectSiteAction({}, form({ ...trike(), machineId: machine.insertId }));
    expect(badMachine.fields).toEqual({
      machineId: ["That machine is not in the shop library now: choose one from the list."],
    });
    const missing = await setProjectSiteAction({}, form({ ...trike(), stockSheetId: 2_000_000_000 }));
    expect(missing.fields?.stockSheetId).toHaveLength(1);
    expect(await auditCount()).toBe(before);
    expect(await stored()).toEqual(row);
  });
});
