// Designs and revisions: who may do what, revisions that cannot change, and hashes that are the
// engine's own canonical hash.
import { eq, sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import * as designsRoute from "@/app/api/projects/[id]/designs/route";
import * as designRoute from "@/app/api/designs/[id]/route";
import * as revisionsRoute from "@/app/api/designs/[id]/revisions/route";
import * as revisionRoute from "@/app/api/revisions/[id]/route";
import * as previewRoute from "@/app/api/revisions/[id]/preview/route";
import { db, pool } from "@/db";
import { revisions } from "@/db/schema";
import { canonicalJson, specHash } from "@/lib/track";
import { CALLERS, makeCallers, projectManage, projectView, type Caller, type CallerIds } from "./support/callers";
import { auditCount } from "./support/fixtures";
import { actAs } from "./support/session";

vi.mock("@/auth", async () => (await import("./support/session")).mockAuth);

const SQUARE = { mode: "track-for-wheel", units: "mm", wheel: { kind: "polygon", sides: 4, side: 400 } };

let ids: CallerIds;
let projectId = 0;
let designId = 0;
let revisionId = 0;

const ctx = <P>(params: P) => ({ params: Promise.resolve(params) });
const req = (method: string, body?: unknown) =>
  new Request("http://t/api", { method, body: body === undefined ? undefined : JSON.stringify(body) });

beforeAll(async () => {
  ({ ids, projectId } = await makeCallers("designs"));
  actAs(ids["fabricator member"]);
  const res = await designsRoute.POST(
    req("POST", { name: "Trike track", spec: SQUARE }),
    ctx({ id: String(projectId) }),
  );
  designId = (await res.json()).design.id;
  const saved = await revisionsRoute.POST(req("POST", { spec: SQUARE, note: "first" }), ctx({ id: String(designId) }));
  revisionId = (await saved.json()).revision.id;
});

afterAll(async () => {
  await pool.end();
});

const view = projectView(200);
const edit = projectManage;
const immutable: Record<Caller, number> = {
  ...view,
  admin: 409,
  "fabricator member": 409,
  "client member": 409,
  "installer member": 409,
};

const CASES: { name: string; expect: Record<Caller, number>; writes: boolean; call: () => Promise<Response> }[] = [
  {
    name: "GET /api/projects/[id]/designs",
    expect: view,
    writes: false,
    call: () => designsRoute.GET(req("GET"), ctx({ id: String(projectId) })),
  },
  {
    name: "POST /api/projects/[id]/designs",
    expect: edit(201),
    writes: true,
    call: () => designsRoute.POST(req("POST", { name: "Another", spec: SQUARE }), ctx({ id: String(projectId) })),
  },
  {
    name: "GET /api/designs/[id]",
    expect: view,
    writes: false,
    call: () => designRoute.GET(req("GET"), ctx({ id: String(designId) })),
  },
  {
    name: "PATCH /api/designs/[id]",
    expect: edit(200),
    writes: true,
    call: () =>
      designRoute.PATCH(req("PATCH", { draft: { ...SQUARE, tolerance: 0.02 } }), ctx({ id: String(designId) })),
  },
  {
    name: "GET /api/designs/[id]/revisions",
    expect: view,
    writes: false,
    call: () => revisionsRoute.GET(req("GET"), ctx({ id: String(designId) })),
  },
  {
    name: "POST /api/designs/[id]/revisions",
    expect: edit(201),
    writes: true,
    call: () => revisionsRoute.POST(req("POST", { spec: SQUARE, note: "again" }), ctx({ id: String(designId) })),
  },
  {
    name: "GET /api/revisions/[id]",
    expect: view,
    writes: false,
    call: () => revisionRoute.GET(req("GET"), ctx({ id: String(revisionId) })),
  },
  {
    name: "GET /api/revisions/[id]/preview",
    expect: view,
    writes: false,
    call: () => previewRoute.GET(req("GET"), ctx({ id: String(revisionId) })),
  },
  {
    name: "PATCH /api/revisions/[id]",
    expect: immutable,
    writes: false,
    call: () => revisionRoute.PATCH(req("PATCH", { note: "changed" }), ctx({ id: String(revisionId) })),
  },
  {
    name: "DELETE /api/revisions/[id]",
    expect: immutable,
    writes: false,
    call: () => revisionRoute.DELETE(req("DELETE"), ctx({ id: String(revisionId) })),
  },
];

describe.each(CASES)("$name", (c) => {
  it.each(CALLERS)("as %s", async (caller) => {
    actAs(caller === "anonymous" ? null : ids[caller]);
    const before = await auditCount();
    const res = await c.call();
    expect(res.status).toBe(c.expect[caller]);
    expect((await auditCount()) - before).toBe(c.writes && res.status < 400 ? 1 : 0);
  });
});

describe("revisions", () => {
  it("are numbered one after another", async () => {
    actAs(ids.admin);
    const body = await (await revisionsRoute.GET(req("GET"), ctx({ id: String(designId) }))).json();
    const numbers = (body.revisions as { number: number }[]).map((r) => r.number).sort((a, b) => a - b);
    expect(numbers).toEqual(numbers.map((_, i) => i + 1));
  });

  it("carry the engine's canonical SHA-256 of the spec", async () => {
    actAs(ids["client member"]);
    const { revision } = await (await revisionRoute.GET(req("GET"), ctx({ id: String(revisionId) }))).json();
    expect(revision.specHash).toBe(specHash(SQUARE));
    expect(revision.specHash).toMatch(/^[0-9a-f]{64}$/);
    // The stored spec hashes to the stored hash, and FIPS 180-4 SHA-256 of its canonical JSON matches Node's own.
    const { createHash } = await import("node:crypto");
    expect(createHash("sha256").update(canonicalJson(revision.spec)).digest("hex")).toBe(revision.specHash);
  });

  it("cannot be changed even with SQL behind the application's back", async () => {
    // Drizzle wraps the driver's error; the trigger's own words are in its cause.
    const refusal = (p: Promise<unknown>) =>
      p.then(
        () => "accepted",
        (e: Error & { cause?: Error }) => e.cause?.message ?? e.message,
      );
    expect(await refusal(db.update(revisions).set({ note: "tampered" }).where(eq(revisions.id, revisionId)))).toMatch(
      /immutable/,
    );
    expect(await refusal(db.delete(revisions).where(eq(revisions.id, revisionId)))).toMatch(/immutable/);
    const [row] = await db.select().from(revisions).where(eq(revisions.id, revisionId));
    expect(row.note).toBe("first");
  });

  it("refuses a spec the engine refuses, with the engine's message, and stores nothing", async () => {
    actAs(ids["fabricator member"]);
    const [{ n: before }] = (await db.execute(sql`select count(*) as n from revisions`))[0] as unknown as {
      n: number;
    }[];
    const res = await revisionsRoute.POST(
      req("POST", { spec: { mode: "track-for-wheel", wheel: { kind: "polar", r: "100 - 200*cos(theta)" } }, note: "" }),
      ctx({ id: String(designId) }),
    );
    expect(res.status).toBe(400);
    expect((await res.json()).message).toMatch(/./);
    const [{ n: after }] = (await db.execute(sql`select count(*) as n from revisions`))[0] as unknown as {
      n: number;
    }[];
    expect(Number(after)).toBe(Number(before));
  });

  it("hide the working draft from clients", async () => {
    actAs(ids["client member"]);
    const body = await (await designRoute.GET(req("GET"), ctx({ id: String(designId) }))).json();
    expect(body.design.draft).toBeUndefined();
    expect(body.you.canEdit).toBe(false);
    actAs(ids["fabricator member"]);
    const mine = await (await designRoute.GET(req("GET"), ctx({ id: String(designId) }))).json();
    expect(mine.design.draft.mode).toBe("track-for-wheel");
  });

  it("have a PNG preview", async () => {
    actAs(ids["installer member"]);
    const res = await previewRoute.GET(req("GET"), ctx({ id: String(revisionId) }));
    expect(res.headers.get("content-type")).toBe("image/png");
    const bytes = new Uint8Array(await res.arrayBuffer());
    // PNG signature (ISO/IEC 15948 §5.2): 137 80 78 71 13 10 26 10.
    expect([...bytes.slice(0, 8)]).toEqual([137, 80, 78, 71, 13, 10, 26, 10]);
  });
});
