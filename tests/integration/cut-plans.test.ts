// Cut plans through the route handlers: who may store and download them, the server's own check of
// a nest made elsewhere, and bad input that must leave nothing behind.
import { execFileSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { count, eq } from "drizzle-orm";
import * as planFilesRoute from "@/app/api/cut-plans/[id]/files/[name]/route";
import * as planListRoute from "@/app/api/cut-plans/[id]/files/route";
import * as cutPlansRoute from "@/app/api/revisions/[id]/cut-plans/route";
import { db, pool } from "@/db";
import { cutPlans, designs, stockSheets } from "@/db/schema";
import { saveRevision } from "@/lib/server/designs";
import type { PlanChoice } from "@/lib/cut-plan/compose";
import { demoChoice, SQUARE, validNest } from "./support/cut-plan";
import { actAs } from "./support/session";
import { auditCount, makeProject, makeUser } from "./support/fixtures";

vi.mock("@/auth", async () => (await import("./support/session")).mockAuth);
vi.mock("next/cache", async () => (await import("./support/session")).mockCache);

const who = {} as Record<"fabricator" | "client" | "installer" | "outsider" | "admin", number>;
let revisionId = 0;
let projectId = 0;
let choice: PlanChoice;

const json = (method: string, body?: unknown) =>
  new Request("http://test.local/api", {
    method,
    headers: { "content-type": "application/json" },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
const ctx = <P>(params: P) => ({ params: Promise.resolve(params) });

const planCount = async () =>
  (await db.select({ n: count() }).from(cutPlans).where(eq(cutPlans.revisionId, revisionId)))[0].n;

beforeAll(async () => {
  for (const role of ["fabricator", "client", "installer"] as const)
    who[role] = (await makeUser(role, `cut-${role}`)).id;
  who.outsider = (await makeUser("fabricator", "cut-outsider")).id;
  who.admin = (await makeUser("admin", "cut-admin")).id;
  projectId = await makeProject("Cut plan project", [
    { userId: who.fabricator, role: "fabricator" },
    { userId: who.client, role: "client" },
    { userId: who.installer, role: "installer" },
  ]);
  const [d] = await db
    .insert(designs)
    .values({ projectId, name: "Trike track", mode: "track-for-wheel", draft: SQUARE });
  const actor = { id: who.fabricator, role: "fabricator" as const, name: "f", email: "f@example.test", active: true };
  revisionId = (await saveRevision(actor as never, d.insertId, projectId, { spec: SQUARE, note: "" })).id;
  choice = await demoChoice();
});

afterAll(async () => {
  await pool.end();
});

describe("storing a cut plan", () => {
  it("stores a nest that holds, for the project's fabricator, and lists its files", async () => {
    const { nest, plan } = await validNest(choice);
    expect(nest.unplaced).toEqual([]);
    actAs(who.fabricator);
    const before = await auditCount();
    const res = await cutPlansRoute.POST(json("POST", { ...choice, nest }), ctx({ id: String(revisionId) }));
    const body = await res.json();
    expect(res.status, JSON.stringify(body)).toBe(201);
    expect(await auditCount()).toBe(before + 1);
    // 6000 mm over a 352.55 mm period (2·200·asinh 1, Hall & Wagon 1992) is 17 whole periods.
    expect(body.cutPlan.summary.periods).toBe(17);
    expect(body.cutPlan.summary.copies).toBe(plan.parts.reduce((n, p) => n + p.quantity, 0));
    const latest = await (await cutPlansRoute.GET(json("GET"), ctx({ id: String(revisionId) }))).json();
    expect(latest.cutPlan.id).toBe(body.cutPlan.id);
    const files = await (await planListRoute.GET(json("GET"), ctx({ id: String(body.cutPlan.id) }))).json();
    expect(files.files).toContain("job.zip");
    expect(files.files.some((f: string) => /sheet-1-mm\.dxf$/.test(f))).toBe(true);
    expect(files.files.some((f: string) => /bom\.csv$/.test(f))).toBe(true);
  });

  it("gives the ZIP with every file to the fabricator, and no cut file to a client or an installer", async () => {
    const [plan] = await db.select({ id: cutPlans.id }).from(cutPlans).where(eq(cutPlans.revisionId, revisionId));
    actAs(who.fabricator);
    const zip = await planFilesRoute.GET(json("GET"), ctx({ id: String(plan.id), name: "job.zip" }));
    expect(zip.status).toBe(200);
    expect(zip.headers.get("content-type")).toBe("application/zip");
    const dir = mkdtempSync(join(tmpdir(), "axlewright-zip-"));
    writeFileSync(join(dir, "job.zip"), Buffer.from(await zip.arrayBuffer()));
    // Listed by Info-ZIP's unzip, an independent reader of the format.
    const listing = execFileSync("unzip", ["-Z1", join(dir, "job.zip")], { encoding: "utf8" });
    for (const pattern of [
      /README\.txt/,
      /bom\.csv/,
      /sheet-1-mm\.dxf/,
      /sheet-1-mm\.svg/,
      /sheet-1-preview\.png/,
      /parts-mm\.dxf/,
    ])
      expect(listing).toMatch(pattern);
    for (const [caller, status] of [
      ["client", 403],
      ["installer", 403],
      ["outsider", 404],
    ] as const) {
      actAs(who[caller]);
      expect(
        (await planFilesRoute.GET(json("GET"), ctx({ id: String(plan.id), name: "job.zip" }))).status,
        caller,
      ).toBe(status);
      expect((await cutPlansRoute.GET(json("GET"), ctx({ id: String(revisionId) }))).status, caller).toBe(status);
    }
    actAs(null);
    expect((await planFilesRoute.GET(json("GET"), ctx({ id: String(plan.id), name: "job.zip" }))).status).toBe(401);
    actAs(who.admin);
    expect((await planFilesRoute.GET(json("GET"), ctx({ id: String(plan.id), name: "nonsense.exe" }))).status).toBe(
      404,
    );
  });

  it.each([
    ["client", 403],
    ["installer", 403],
    ["outsider", 404],
  ] as const)("refuses a plan from the %s (%i) and writes nothing", async (caller, status) => {
    const { nest } = await validNest(choice);
    actAs(who[caller]);
    const before = await planCount();
    expect((await cutPlansRoute.POST(json("POST", { ...choice, nest }), ctx({ id: String(revisionId) }))).status).toBe(
      status,
    );
    expect(await planCount()).toBe(before);
  });
});

describe("the server's own check", () => {
  it("refuses a nest with two parts on top of each other", async () => {
    const { nest } = await validNest(choice);
    const [a, b] = nest.sheets[0].placements;
    const tampered = {
      ...nest,
      sheets: [
        {
          ...nest.sheets[0],
          placements: [a, { ...b, x: a.x, y: a.y, rotation: a.rotation }, ...nest.sheets[0].placements.slice(2)],
        },
        ...nest.sheets.slice(1),
      ],
    };
    actAs(who.fabricator);
    const before = await planCount();
    const res = await cutPlansRoute.POST(json("POST", { ...choice, nest: tampered }), ctx({ id: String(revisionId) }));
    expect(res.status).toBe(400);
    expect((await res.json()).message).toMatch(/closer than the 6 part spacing/);
    expect(await planCount()).toBe(before);
  });

  it("refuses a nest that leaves a part out", async () => {
    const { nest } = await validNest(choice);
    const short = {
      ...nest,
      sheets: [{ ...nest.sheets[0], placements: nest.sheets[0].placements.slice(1) }, ...nest.sheets.slice(1)],
    };
    actAs(who.fabricator);
    const res = await cutPlansRoute.POST(json("POST", { ...choice, nest: short }), ctx({ id: String(revisionId) }));
    expect(res.status).toBe(400);
    expect((await res.json()).message).toMatch(/missing from the nest/);
  });
});

describe("bad settings", () => {
  const post = async (settings: Record<string, unknown>, over: Partial<PlanChoice> = {}) => {
    const { nest } = await validNest(choice);
    actAs(who.fabricator);
    const before = [await planCount(), await auditCount()];
    const res = await cutPlansRoute.POST(
      json("POST", { ...choice, ...over, settings: { ...choice.settings, ...settings }, nest }),
      ctx({ id: String(revisionId) }),
    );
    expect([await planCount(), await auditCount()], "nothing written").toEqual(before);
    return { status: res.status, body: await res.json() };
  };

  it("a run shorter than one period", async () => {
    const r = await post({ runLength: 300 });
    expect(r.status).toBe(400);
    expect(r.body.message).toMatch(/shorter than one period/);
    expect(Object.keys(r.body.fields ?? {})).toContain("settings.runLength");
  });

  it("a key slot narrower than the cutter", async () => {
    const r = await post({ joint: { kind: "key", keyWidth: 4, keyDepth: 48 } });
    expect(r.status).toBe(400);
    expect(r.body.message).toMatch(/narrower than the 6 mm kerf/);
  });

  it("a sheet smaller than a part", async () => {
    const [tiny] = await db.insert(stockSheets).values({
      name: `Offcut ${Date.now()}`,
      materialId: choice.materialId,
      lengthMm: 500,
      widthMm: 300,
      grain: "length",
      source: "test offcut",
      sourceKind: "measured",
    });
    const r = await post({}, { stockSheetId: tiny.insertId });
    expect(r.status).toBe(400);
    expect(r.body.message).toMatch(/too long|too wide/);
  });

  it("a request that tries to set the machine itself", async () => {
    // The kerf comes from the library row; a request's own "machine" is ignored, not trusted.
    const { nest } = await validNest(choice);
    actAs(who.fabricator);
    const res = await cutPlansRoute.POST(
      json("POST", { ...choice, settings: { ...choice.settings, machine: { kind: "router", kerf: -1 } }, nest }),
      ctx({ id: String(revisionId) }),
    );
    expect(res.status).toBe(201);
  });
});
