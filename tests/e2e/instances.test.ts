// Several instances on one database and object store: a sign-in, a saved revision and a sign-off made
// through one instance are seen through another, because nothing the other needs is kept in a
// process. And a write cut short by killing the app (SIGKILL, no shutdown) is found whole or not at
// all once it runs again: revisions and cut plans are written in one transaction each.
import { and, count, eq, inArray } from "drizzle-orm";
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db";
import { auditLog, buildLogEntries, cutPlans, revisions, users } from "@/db/schema";
import { demoChoice, SQUARE, validNest } from "../integration/support/cut-plan";
import { makeUser } from "../integration/support/fixtures";
import { baseUrl, launchBrowser } from "./support/browser";
import { AppInstance } from "./support/instance";
import { SignInPage } from "./pages/sign-in-page";

let browser: Browser;
let other: AppInstance;
// People of this test's own (tests/integration/support/fixtures.ts), so the demo accounts' project
// lists, which other browser tests check, stay as they were.
const PASSWORD = "integration-password-1";
let fabricator: string;
let client: string;
let clientUser: { id: number; email: string };

/** Signs in through the main instance's sign-in page and returns the session cookie. */
async function cookieOf(email: string): Promise<string> {
  const context = await browser.newContext();
  const page = await context.newPage();
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.signIn(email, PASSWORD);
  await page.waitForURL(/\/projects$/);
  const c = (await context.cookies()).find((x) => x.name.endsWith("authjs.session-token"))!;
  await context.close();
  return `${c.name}=${c.value}`;
}

async function call(base: string, cookie: string, method: string, path: string, body?: unknown) {
  const res = await fetch(`${base}${path}`, {
    method,
    headers: { cookie, "content-type": "application/json" },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  const text = await res.text();
  return { status: res.status, body: text ? JSON.parse(text) : null };
}

/** A project of our own with the demo client as its client and one design, made through the main instance. */
async function projectWithDesign(name: string) {
  const p = await call(baseUrl, fabricator, "POST", "/api/projects", {
    name,
    clientOrganisation: "Test bench client",
  });
  expect(p.status, JSON.stringify(p.body)).toBe(201);
  const projectId = p.body.project.id as number;
  const m = await call(baseUrl, fabricator, "POST", `/api/projects/${projectId}/members`, {
    userId: clientUser.id,
    role: "client",
  });
  expect(m.status, JSON.stringify(m.body)).toBe(201);
  const d = await call(baseUrl, fabricator, "POST", `/api/projects/${projectId}/designs`, {
    name: "Square run",
    spec: SQUARE,
  });
  expect(d.status, JSON.stringify(d.body)).toBe(201);
  return { projectId, designId: d.body.design.id as number };
}

beforeAll(async () => {
  browser = await launchBrowser();
  other = await AppInstance.start();
  const fab = await makeUser("fabricator", "instances-fabricator");
  clientUser = await makeUser("client", "instances-client");
  fabricator = await cookieOf(fab.email);
  client = await cookieOf(clientUser.email);
});

afterAll(async () => {
  await other?.kill();
  await browser?.close();
  await pool.end();
});

describe("two instances on one database", () => {
  it("see the same sign-in, the same saved revision and the same sign-off", async () => {
    // Signed in through the main instance, the session is good on the other.
    const listed = await call(other.url, fabricator, "GET", "/api/projects");
    expect(listed.status).toBe(200);
    expect(listed.body).toEqual((await call(baseUrl, fabricator, "GET", "/api/projects")).body);

    const { designId } = await projectWithDesign("Two instances check");
    const saved = await call(baseUrl, fabricator, "POST", `/api/designs/${designId}/revisions`, {
      spec: SQUARE,
      note: "Saved through the first instance",
    });
    expect(saved.status, JSON.stringify(saved.body)).toBe(201);
    const seen = await call(other.url, fabricator, "GET", `/api/designs/${designId}`);
    expect(seen.body.revisions.map((r: { number: number; note: string }) => [r.number, r.note])).toEqual([
      [1, "Saved through the first instance"],
    ]);

    const sent = await call(baseUrl, fabricator, "POST", `/api/revisions/${saved.body.revision.id}/reviews`, {
      message: "Through the first instance.",
      runLength: 2400,
      endTreatment: "flat",
    });
    expect(sent.status, JSON.stringify(sent.body)).toBe(201);
    const [me] = await db.select({ name: users.name }).from(users).where(eq(users.id, clientUser.id));
    const decided = await call(baseUrl, client, "POST", `/api/reviews/${sent.body.id}/decision`, {
      decision: "approve",
      typedName: me.name,
    });
    expect(decided.status, JSON.stringify(decided.body)).toBe(201);
    const review = await call(other.url, client, "GET", `/api/reviews/${sent.body.id}`);
    expect(review.status).toBe(200);
    expect(review.body.review.decision).toMatchObject({ decision: "approve", specHash: decided.body.signOff.specHash });
  });
});

describe("a write cut short by SIGKILL", () => {
  const delays = [0, 5, 15, 30, 60, 120, 250];

  it("saving a revision: afterwards each revision has its audit entry, and none is half there", async () => {
    const { designId } = await projectWithDesign("Killed while saving a revision");
    for (const delay of delays) {
      const request = call(other.url, fabricator, "POST", `/api/designs/${designId}/revisions`, {
        spec: SQUARE,
        note: `killed after ${delay} ms`,
      }).catch(() => null);
      await new Promise((r) => setTimeout(r, delay));
      await other.kill();
      await request;
      await other.run();
    }
    const rows = await db.select({ id: revisions.id }).from(revisions).where(eq(revisions.designId, designId));
    expect(rows.length).toBeLessThanOrEqual(delays.length);
    const ids = rows.map((r) => String(r.id));
    const audited = ids.length
      ? await db
          .select({ n: count() })
          .from(auditLog)
          .where(and(eq(auditLog.entity, "revisions"), inArray(auditLog.entityId, ids)))
      : [{ n: 0 }];
    expect(audited[0].n).toBe(rows.length);
    // And the instance, started again, works: one more save goes through whole.
    const after = await call(other.url, fabricator, "POST", `/api/designs/${designId}/revisions`, {
      spec: SQUARE,
      note: "after",
    });
    expect(after.status).toBe(201);
  });

  it("saving a cut plan: afterwards each plan has its audit entry and its build-log entry, and none is half there", async () => {
    const { designId } = await projectWithDesign("Killed while saving a cut plan");
    const saved = await call(baseUrl, fabricator, "POST", `/api/designs/${designId}/revisions`, {
      spec: SQUARE,
      note: "",
    });
    const revisionId = saved.body.revision.id as number;
    const choice = await demoChoice();
    const { nest } = await validNest(choice);
    for (const delay of delays) {
      const request = call(other.url, fabricator, "POST", `/api/revisions/${revisionId}/cut-plans`, {
        ...choice,
        nest,
        purpose: "review",
      }).catch(() => null);
      await new Promise((r) => setTimeout(r, delay));
      await other.kill();
      await request;
      await other.run();
    }
    const plans = await db.select({ id: cutPlans.id }).from(cutPlans).where(eq(cutPlans.revisionId, revisionId));
    const ids = plans.map((p) => p.id);
    const audited = ids.length
      ? (
          await db
            .select({ n: count() })
            .from(auditLog)
            .where(and(eq(auditLog.entity, "cut_plans"), inArray(auditLog.entityId, ids.map(String))))
        )[0].n
      : 0;
    const logged = ids.length
      ? (await db.select({ n: count() }).from(buildLogEntries).where(inArray(buildLogEntries.cutPlanId, ids)))[0].n
      : 0;
    expect(audited).toBe(plans.length);
    expect(logged).toBe(plans.length);
    const after = await call(other.url, fabricator, "POST", `/api/revisions/${revisionId}/cut-plans`, {
      ...choice,
      nest,
      purpose: "review",
    });
    expect(after.status, JSON.stringify(after.body)).toBe(201);
  });
});
