// Load settings on the server: kept with the draft (PATCH, refused with the field named when bad),
// copied into each revision as it is saved, and used for the cautions of the job README.
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import * as designsRoute from "@/app/api/projects/[id]/designs/route";
import * as designRoute from "@/app/api/designs/[id]/route";
import * as revisionsRoute from "@/app/api/designs/[id]/revisions/route";
import * as revisionRoute from "@/app/api/revisions/[id]/route";
import { db, pool } from "@/db";
import { revisions } from "@/db/schema";
import { checkLoads } from "@/lib/loads";
import { loadsForRevision } from "@/lib/server/loads";
import { loadsInputSchema } from "@/lib/validation/loads";
import { makeProject, makeUser } from "./support/fixtures";
import { actAs } from "./support/session";

vi.mock("@/auth", async () => (await import("./support/session")).mockAuth);

const SQUARE = { mode: "track-for-wheel", units: "mm", wheel: { kind: "polygon", sides: 4, side: 400 } };
const RIDE = {
  use: "ride-on",
  load: { riderMassKg: 110, dynamicFactor: 2, wheels: 2 },
  traction: 0.2,
  mu: 0.8,
  wheel: { material: "Rubber tread 3 mm, 60 Shore A", modulusGpa: 0.004, poisson: 0.49, treadWidthMm: 36 },
  track: {
    material: "Birch plywood 18 mm",
    modulusGpa: 6.86,
    poisson: 0.3,
    widthMm: 36,
    depthMm: 80,
    supportSpanMm: 600,
    densityKgM3: 680,
    allowableMpa: 4,
  },
  clearancesMm: { "wheel to fork": 12 },
};

const ctx = <P>(params: P) => ({ params: Promise.resolve(params) });
const req = (method: string, body?: unknown) =>
  new Request("http://t/api", { method, body: body === undefined ? undefined : JSON.stringify(body) });
let designId = 0;
let clientId = 0;
let fabId = 0;

beforeAll(async () => {
  const fab = (fabId = (await makeUser("fabricator", "loads-fab")).id);
  clientId = (await makeUser("client", "loads-client")).id;
  const projectId = await makeProject("Loads project", [
    { userId: fab, role: "fabricator" },
    { userId: clientId, role: "client" },
  ]);
  actAs(fab);
  designId = (
    await (
      await designsRoute.POST(req("POST", { name: "Square", spec: SQUARE }), ctx({ id: String(projectId) }))
    ).json()
  ).design.id;
});

afterAll(async () => {
  await pool.end();
});

describe("load settings", () => {
  it("are kept with the draft, and a bad one is refused naming the field, keeping the old", async () => {
    expect((await designRoute.PATCH(req("PATCH", { loads: RIDE }), ctx({ id: String(designId) }))).status).toBe(200);
    const bad = await designRoute.PATCH(
      req("PATCH", { loads: { ...RIDE, wheel: { ...RIDE.wheel, poisson: 0.7 } } }),
      ctx({ id: String(designId) }),
    );
    expect(bad.status).toBe(400);
    expect((await bad.json()).fields.loads.join(" ")).toMatch(/Poisson's ratio must be from 0 to 0\.49/);
    const got = await (await designRoute.GET(req("GET"), ctx({ id: String(designId) }))).json();
    expect(got.design.loads).toMatchObject({ use: "ride-on", mu: 0.8 });
  });

  it("are not the client's to change", async () => {
    actAs(clientId);
    expect(
      (await designRoute.PATCH(req("PATCH", { loads: { ...RIDE, use: "display" } }), ctx({ id: String(designId) })))
        .status,
    ).toBe(403);
  });

  it("go into each revision as they are when it is saved, and the cautions come from them", async () => {
    actAs(fabId);
    const saved = await (
      await revisionsRoute.POST(req("POST", { spec: SQUARE, note: "ride" }), ctx({ id: String(designId) }))
    ).json();
    // A later change to the draft's settings does not reach the saved revision.
    await designRoute.PATCH(req("PATCH", { loads: { ...RIDE, use: "display" } }), ctx({ id: String(designId) }));
    const { revision } = await (await revisionRoute.GET(req("GET"), ctx({ id: String(saved.revision.id) }))).json();
    expect(revision.loads).toMatchObject({ use: "ride-on", clearancesMm: { "wheel to fork": 12 } });
    const [row] = await db.select().from(revisions).where(eq(revisions.id, saved.revision.id));
    const server = await loadsForRevision(row);
    expect(server.stored).toBe(true);
    // The same figures as the module run here on the same input (the library's treads only feed the helper).
    const here = checkLoads(loadsInputSchema.parse({ ...RIDE, spec: SQUARE }));
    expect(server.report.grip.needed).toBe(here.grip.needed);
    expect(server.report.cautions.map((c) => [c.signal, c.check])).toEqual(
      here.cautions.map((c) => [c.signal, c.check]),
    );
    expect(server.report.cautions.find((c) => c.check === "grip")?.signal).toBe("WARNING");
    expect(server.report.cautions.find((c) => c.check === "gap")?.name).toBe("wheel to fork");
  });
});
