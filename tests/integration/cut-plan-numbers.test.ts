// Cut plans are numbered within their revision (1, 2, … — "cut plan 2 of R1"), never by the global
// id: two plans on R1 are 1 and 2, the first on R2 is 1, saves at the same moment never share a
// number (the lock on the revision and the unique index), and the JSON carries `number` beside `id`.
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { and, eq } from "drizzle-orm";
import * as cutPlansRoute from "@/app/api/revisions/[id]/cut-plans/route";
import { db, pool } from "@/db";
import { buildLogEntries, cutPlans, designs } from "@/db/schema";
import { saveRevision } from "@/lib/server/designs";
import type { PlanChoice } from "@/lib/cut-plan/compose";
import { demoChoice, SQUARE, validNest } from "./support/cut-plan";
import { actAs } from "./support/session";
import { makeProject, makeUser } from "./support/fixtures";

vi.mock("@/auth", async () => (await import("./support/session")).mockAuth);
vi.mock("next/cache", async () => (await import("./support/session")).mockCache);

let fabricator = 0;
let projectId = 0;
const revision = { r1: 0, r2: 0 };
let choice: PlanChoice;
let nest: Awaited<ReturnType<typeof validNest>>["nest"];

const json = (method: string, body?: unknown) =>
  new Request("http://test.local/api", {
    method,
    headers: { "content-type": "application/json" },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
const ctx = <P>(params: P) => ({ params: Promise.resolve(params) });

async function save(revisionId: number): Promise<{ id: number; number: number }> {
  const res = await cutPlansRoute.POST(json("POST", { ...choice, nest }), ctx({ id: String(revisionId) }));
  const body = await res.json();
  expect(res.status, JSON.stringify(body)).toBe(201);
  return body.cutPlan;
}

beforeAll(async () => {
  fabricator = (await makeUser("fabricator", "numbers-fabricator")).id;
  projectId = await makeProject("Cut plan numbers", [{ userId: fabricator, role: "fabricator" }]);
  const [d] = await db
    .insert(designs)
    .values({ projectId, name: "Numbered track", mode: "track-for-wheel", draft: SQUARE });
  const actor = { id: fabricator, role: "fabricator" as const, name: "f", email: "f@example.test", active: true };
  revision.r1 = (await saveRevision(actor as never, d.insertId, projectId, { spec: SQUARE, note: "" })).id;
  revision.r2 = (await saveRevision(actor as never, d.insertId, projectId, { spec: SQUARE, note: "again" })).id;
  choice = await demoChoice();
  ({ nest } = await validNest(choice));
  actAs(fabricator);
});

afterAll(async () => {
  await pool.end();
});

describe("cut plan numbers", () => {
  it("counts from 1 within each revision, and the JSON gives the number beside the id", async () => {
    const first = await save(revision.r1);
    const second = await save(revision.r1);
    const onR2 = await save(revision.r2);
    expect([first.number, second.number, onR2.number]).toEqual([1, 2, 1]);
    expect(second.id).toBeGreaterThan(first.id);
    const latest = await (await cutPlansRoute.GET(json("GET"), ctx({ id: String(revision.r1) }))).json();
    expect(latest.cutPlan).toMatchObject({ id: second.id, number: 2 });
  });

  it("names the plan by its number in the build log", async () => {
    const [plan] = await db
      .select({ id: cutPlans.id })
      .from(cutPlans)
      .where(and(eq(cutPlans.revisionId, revision.r2), eq(cutPlans.number, 1)));
    const [entry] = await db
      .select({ text: buildLogEntries.text })
      .from(buildLogEntries)
      .where(eq(buildLogEntries.cutPlanId, plan.id));
    expect(entry.text).toMatch(/^Cut plan 1 of R2 saved for review: /);
  });

  it("gives saves at the same moment different numbers", async () => {
    const saved = await Promise.all([save(revision.r1), save(revision.r1), save(revision.r1), save(revision.r2)]);
    expect(
      saved
        .slice(0, 3)
        .map((p) => p.number)
        .sort(),
    ).toEqual([3, 4, 5]);
    expect(saved[3].number).toBe(2);
    const rows = await db
      .select({ number: cutPlans.number })
      .from(cutPlans)
      .where(eq(cutPlans.revisionId, revision.r1));
    expect(rows.map((r) => r.number).sort()).toEqual([1, 2, 3, 4, 5]);
  });

  it("refuses a repeated number in the database itself", async () => {
    const [row] = await db.select().from(cutPlans).where(eq(cutPlans.revisionId, revision.r1)).limit(1);
    // The same revision and number under a fresh id.
    await expect(db.insert(cutPlans).values({ ...row, id: undefined })).rejects.toThrow();
  });
});
