// The client's review through the route handlers, against the real MariaDB and the local mail sink:
// sending a revision (and its e-mail with the animated preview), comments, the decision and its
// permanent record, the sign-off reference on every cut file, and the gate on unapproved revisions.
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { and, count, eq } from "drizzle-orm";
import DxfParser from "dxf-parser";
import sharp from "sharp";
import * as planFilesRoute from "@/app/api/cut-plans/[id]/files/[name]/route";
import * as cutPlansRoute from "@/app/api/revisions/[id]/cut-plans/route";
import * as revisionReviewsRoute from "@/app/api/revisions/[id]/reviews/route";
import * as signOffRoute from "@/app/api/revisions/[id]/sign-off/route";
import * as reviewRoute from "@/app/api/reviews/[id]/route";
import * as commentsRoute from "@/app/api/reviews/[id]/comments/route";
import * as decisionRoute from "@/app/api/reviews/[id]/decision/route";
import { db, pool } from "@/db";
import {
  auditLog,
  deposits,
  designs,
  projects,
  reviewComments,
  reviews,
  revisions,
  signOffs,
  users,
} from "@/db/schema";
import { saveRevision } from "@/lib/server/designs";
import { ENGINE_VERSION, specHash } from "@/lib/track";
import type { PlanChoice } from "@/lib/cut-plan/compose";
import { demoChoice, SQUARE, validNest } from "./support/cut-plan";
import { mimeParts, partOfType, waitForMail } from "../support/mail";
import { actAs } from "./support/session";
import { auditCount, makeProject, makeUser } from "./support/fixtures";

vi.mock("@/auth", async () => (await import("./support/session")).mockAuth);
vi.mock("next/cache", async () => (await import("./support/session")).mockCache);

const who = {} as Record<
  "fabricator" | "client" | "client2" | "installer" | "admin",
  { id: number; email: string; name: string }
>;
let projectId = 0;
let designId = 0;
let choice: PlanChoice;

const json = (method: string, body?: unknown, headers: Record<string, string> = {}) =>
  new Request("http://test.local/api", {
    method,
    headers: { "content-type": "application/json", ...headers },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
const ctx = <P>(params: P) => ({ params: Promise.resolve(params) });
const fab = () => ({
  id: who.fabricator.id,
  role: "fabricator" as const,
  name: who.fabricator.name,
  email: who.fabricator.email,
});

async function person(role: "fabricator" | "client" | "installer" | "admin", label: string) {
  const u = await makeUser(role, label);
  const [row] = await db.select({ name: users.name }).from(users).where(eq(users.id, u.id));
  return { ...u, name: row.name };
}

async function newRevision(spec: unknown = SQUARE): Promise<{ id: number; number: number; specHash: string }> {
  return saveRevision(fab(), designId, projectId, { spec, note: "review test" });
}

async function send(
  revisionId: number,
  body: Record<string, unknown> = { message: "Please review the trike run.", runLength: 6000, endTreatment: "flat" },
) {
  actAs(who.fabricator.id);
  const res = await revisionReviewsRoute.POST(json("POST", body), ctx({ id: String(revisionId) }));
  return { res, body: await res.json() };
}

async function decide(
  reviewId: number,
  as: number,
  body: Record<string, unknown>,
  headers: Record<string, string> = {},
) {
  actAs(as);
  const res = await decisionRoute.POST(json("POST", body, headers), ctx({ id: String(reviewId) }));
  return { res, body: await res.json() };
}

const tableCount = async (t: typeof reviews | typeof reviewComments | typeof signOffs | typeof deposits) =>
  (await db.select({ n: count() }).from(t))[0].n;
const everything = async () =>
  Promise.all([
    auditCount(),
    tableCount(reviews),
    tableCount(reviewComments),
    tableCount(signOffs),
    tableCount(deposits),
  ]);
const projectStatus = async () =>
  (await db.select({ s: projects.status }).from(projects).where(eq(projects.id, projectId)))[0].s;

beforeAll(async () => {
  who.fabricator = await person("fabricator", "rev-fab");
  who.client = await person("client", "rev-client");
  who.client2 = await person("client", "rev-client-two");
  who.installer = await person("installer", "rev-installer");
  who.admin = await person("admin", "rev-admin");
  projectId = await makeProject("Review project", [
    { userId: who.fabricator.id, role: "fabricator" },
    { userId: who.client.id, role: "client" },
    { userId: who.client2.id, role: "client" },
    { userId: who.installer.id, role: "installer" },
  ]);
  const [d] = await db
    .insert(designs)
    .values({ projectId, name: "Trike track", mode: "track-for-wheel", draft: SQUARE });
  designId = d.insertId;
  choice = await demoChoice();
});

afterAll(async () => {
  await pool.end();
});

describe("sending a revision for review", () => {
  it("opens the review, moves the project to client review, and e-mails each client the link and an animated preview", async () => {
    const revision = await newRevision();
    const before = await auditCount();
    const { res, body } = await send(revision.id, {
      message: "Please review the trike run.",
      runLength: 6000,
      endTreatment: "flat",
      deposit: { amount: 1500, currency: "GBP" },
    });
    expect(res.status, JSON.stringify(body)).toBe(201);
    expect(body).toMatchObject({ id: expect.any(Number), revisionId: revision.id });
    expect(await projectStatus()).toBe("review");
    const [entry] = await db
      .select()
      .from(auditLog)
      .where(and(eq(auditLog.entity, "reviews"), eq(auditLog.entityId, String(body.id))));
    expect(entry).toMatchObject({ action: "request-review", entity: "reviews", projectId, actorId: who.fabricator.id });
    expect(await auditCount()).toBe(before + 1);
    const [dep] = await db.select().from(deposits).where(eq(deposits.reviewId, body.id));
    expect(dep).toMatchObject({ amountMinor: 150000, currency: "GBP", status: "on-approval" });

    for (const client of [who.client, who.client2]) {
      const [mail] = await waitForMail(client.email, new RegExp(`Review requested: .*Trike track R${revision.number}`));
      expect(mail, `no review e-mail reached ${client.email}`).toBeDefined();
      // One message per client: nobody else is on it.
      expect(mail.to).toEqual([client.email]);
      const parts = mimeParts(mail.raw);
      const link = `/projects/${projectId}/reviews/${body.id}`;
      const text = partOfType(parts, /^text\/plain/)!.body.toString("utf8");
      const html = partOfType(parts, /^text\/html/)!.body.toString("utf8");
      expect(text).toContain(link);
      expect(text).toContain("£1,500.00");
      expect(html).toContain(`href="${process.env.APP_URL}${link}"`);
      const picture = partOfType(parts, /^image\/webp/)!;
      expect(picture, "the preview is attached").toBeDefined();
      const cid = /<([^>]+)>/.exec(picture.headers["content-id"] ?? "")?.[1];
      expect(html).toContain(`cid:${cid}`);
      // Read back by libvips through sharp: an animation, within the caps the issue sets.
      const meta = await sharp(picture.body, { animated: true }).metadata();
      expect(meta.format).toBe("webp");
      expect(meta.pages).toBeGreaterThan(1);
      expect(meta.width).toBeLessThanOrEqual(600);
      expect(picture.body.length).toBeLessThanOrEqual(1024 * 1024);
    }
    // The installer is not asked.
    expect(await waitForMail(who.installer.email, /Review requested/, { count: 1, timeoutMs: 500 })).toEqual([]);
  });

  it("refuses a second review of a revision still waiting, and writes nothing", async () => {
    const revision = await newRevision();
    expect((await send(revision.id)).res.status).toBe(201);
    const before = await everything();
    const { res, body } = await send(revision.id);
    expect(res.status).toBe(409);
    expect(body.message).toMatch(/already with the client/);
    expect(await everything()).toEqual(before);
  });

  it("refuses a run shorter than one period, with the message on the field", async () => {
    const revision = await newRevision();
    const before = await everything();
    const { res, body } = await send(revision.id, { message: "Short run", runLength: 100, endTreatment: "flat" });
    expect(res.status).toBe(400);
    expect(body.fields.runLength[0]).toMatch(/shorter than one period/);
    expect(await everything()).toEqual(before);
  });

  it("refuses a deposit with more decimals than its currency has, and a review where there is no client", async () => {
    const revision = await newRevision();
    const before = await everything();
    const yen = await send(revision.id, {
      message: "Deposit",
      runLength: 6000,
      deposit: { amount: 10.5, currency: "JPY" },
    });
    expect(yen.res.status).toBe(400);
    expect(yen.body.fields["deposit.amount"]).toBeDefined();
    const lonely = await makeProject("Review project without client", [
      { userId: who.fabricator.id, role: "fabricator" },
    ]);
    const [d] = await db
      .insert(designs)
      .values({ projectId: lonely, name: "Lonely", mode: "track-for-wheel", draft: SQUARE });
    const rev = await saveRevision(fab(), d.insertId, lonely, { spec: SQUARE, note: "" });
    const after = await everything();
    const none = await send(rev.id);
    expect(none.res.status).toBe(422);
    expect(none.body.message).toMatch(/no client member/);
    expect(await everything()).toEqual(after);
    expect(after[0]).toBe(before[0] + 1); // only the revision saved above
  });
});

describe("comments", () => {
  it("pins a comment to a place along the run, and refuses a place off the run", async () => {
    const revision = await newRevision();
    const { body: sent } = await send(revision.id);
    actAs(who.client.id);
    const ok = await commentsRoute.POST(
      json("POST", { text: "Is this where the queue starts?", at: 1500 }),
      ctx({ id: String(sent.id) }),
    );
    const okBody = await ok.json();
    expect(ok.status, JSON.stringify(okBody)).toBe(201);
    expect(okBody.comment).toMatchObject({
      text: "Is this where the queue starts?",
      at: 1500,
      author: who.client.name,
      authorRole: "client",
    });
    const before = await everything();
    const off = await commentsRoute.POST(
      json("POST", { text: "Beyond the end", at: 7000 }),
      ctx({ id: String(sent.id) }),
    );
    expect(off.status).toBe(400);
    expect((await off.json()).fields.at).toBeDefined();
    const empty = await commentsRoute.POST(json("POST", { text: "   " }), ctx({ id: String(sent.id) }));
    expect(empty.status).toBe(400);
    expect(await everything()).toEqual(before);
    const detail = await (await reviewRoute.GET(json("GET"), ctx({ id: String(sent.id) }))).json();
    expect(detail.review.comments.map((c: { at: number | null }) => c.at)).toEqual([1500]);
    expect(detail.review.run).toEqual({ lengthMm: 6000, endTreatment: "flat" });
  });
});

describe("the decision", () => {
  it("records an approval against the hash recomputed from the stored spec, and e-mails the shop", async () => {
    const revision = await newRevision();
    const { body: sent } = await send(revision.id);
    const { res, body } = await decide(
      sent.id,
      who.client.id,
      { decision: "approve", typedName: `  ${who.client.name.toUpperCase()} ` },
      { "x-forwarded-for": "198.51.100.7, 10.0.0.1", "user-agent": "ReviewTest/1.0" },
    );
    expect(res.status, JSON.stringify(body)).toBe(201);
    // The hash the test computes itself from the spec (SHA-256 of the canonical JSON, lib/track).
    expect(body.signOff).toMatchObject({
      revisionId: revision.id,
      specHash: specHash(SQUARE),
      decision: "approve",
      typedName: who.client.name.toUpperCase(),
    });
    expect(Date.parse(body.signOff.signedAt)).toBeGreaterThan(Date.now() - 60_000);
    const [row] = await db.select().from(signOffs).where(eq(signOffs.id, body.signOff.id));
    expect(row).toMatchObject({
      reviewId: sent.id,
      userId: who.client.id,
      address: "198.51.100.7",
      userAgent: "ReviewTest/1.0",
      engineVersion: ENGINE_VERSION,
    });
    // The time is kept to the millisecond: the column's fractional-second precision, as MariaDB reports it.
    const [[column]] = (await pool.query(
      "SELECT DATETIME_PRECISION AS p FROM information_schema.COLUMNS WHERE TABLE_SCHEMA = DATABASE() AND TABLE_NAME = 'sign_offs' AND COLUMN_NAME = 'signed_at'",
    )) as unknown as [{ p: number }[]];
    expect(Number(column.p)).toBe(3);
    expect(await projectStatus()).toBe("approved");
    const [mail] = await waitForMail(who.fabricator.email, new RegExp(`Approved: .*Trike track R${revision.number}`));
    expect(mail, "the fabricator hears of the approval").toBeDefined();
    const text = partOfType(mimeParts(mail.raw), /^text\/plain/)!.body.toString("utf8");
    expect(text).toContain(`${specHash(SQUARE).slice(0, 12)}/`);
    expect(text).toContain(`/projects/${projectId}/reviews/${sent.id}`);

    const signOff = await (await signOffRoute.GET(json("GET"), ctx({ id: String(revision.id) }))).json();
    expect(signOff.signOff).toMatchObject({
      id: body.signOff.id,
      reference: `${specHash(SQUARE).slice(0, 12)}/${body.signOff.signedAt.slice(0, 10)}`,
    });
  });

  it("refuses a second decision on the same review, and writes nothing", async () => {
    const revision = await newRevision();
    const { body: sent } = await send(revision.id);
    expect(
      (
        await decide(sent.id, who.client.id, {
          decision: "request-changes",
          typedName: who.client.name,
          comment: "Longer run, please.",
        })
      ).res.status,
    ).toBe(201);
    const before = await everything();
    const again = await decide(sent.id, who.client2.id, { decision: "approve", typedName: who.client2.name });
    expect(again.res.status).toBe(409);
    expect(await everything()).toEqual(before);
  });

  it("asks for the account's own name (422 on typedName), and a comment to request changes", async () => {
    const revision = await newRevision();
    const { body: sent } = await send(revision.id);
    const before = await everything();
    const wrong = await decide(sent.id, who.client.id, { decision: "approve", typedName: "Someone Else" });
    expect(wrong.res.status).toBe(422);
    expect(wrong.body.fields.typedName[0]).toContain(who.client.name);
    const bare = await decide(sent.id, who.client.id, { decision: "request-changes", typedName: who.client.name });
    expect(bare.res.status).toBe(400);
    expect(bare.body.fields.comment).toBeDefined();
    const unticked = await decide(sent.id, who.client.id, {
      decision: "approve",
      typedName: who.client.name,
      confirm: false,
    });
    expect(unticked.res.status).toBe(400);
    expect(await everything()).toEqual(before);
  });

  it("records a request for changes with its comment, sends the project back to design, and tells the shop", async () => {
    const revision = await newRevision();
    const { body: sent } = await send(revision.id);
    const { res, body } = await decide(sent.id, who.client2.id, {
      decision: "request-changes",
      typedName: who.client2.name,
      comment: "Make the humps lower for small riders.",
    });
    expect(res.status).toBe(201);
    expect(body.signOff.decision).toBe("request-changes");
    expect(await projectStatus()).toBe("design");
    const [row] = await db.select().from(signOffs).where(eq(signOffs.id, body.signOff.id));
    const [comment] = await db.select().from(reviewComments).where(eq(reviewComments.id, row.commentId!));
    expect(comment.text).toBe("Make the humps lower for small riders.");
    expect(
      (await waitForMail(who.fabricator.email, new RegExp(`Changes requested: .*R${revision.number}`))).length,
    ).toBe(1);
    // No approval: the sign-off route answers 404.
    expect((await signOffRoute.GET(json("GET"), ctx({ id: String(revision.id) }))).status).toBe(404);
  });

  it("does not sign a revision whose stored spec no longer gives its recorded hash", async () => {
    // Revisions cannot be updated (trigger), so the damaged one is inserted as such.
    const [bad] = await db.insert(revisions).values({
      designId,
      number: 9000 + Math.floor(Math.random() * 999),
      spec: SQUARE,
      specHash: "0".repeat(64),
      engineVersion: ENGINE_VERSION,
      summary: {},
      note: "damaged",
    });
    const { res: sentRes, body: sent } = await send(bad.insertId);
    expect(sentRes.status, JSON.stringify(sent)).toBe(201);
    const before = await everything();
    const { res, body } = await decide(sent.id, who.client.id, { decision: "approve", typedName: who.client.name });
    expect(res.status).toBe(409);
    expect(body.message).toMatch(/no longer matches its recorded hash/);
    expect(await everything()).toEqual(before);
  });

  it("is never inherited by a later revision", async () => {
    const first = await newRevision();
    const { body: sent } = await send(first.id);
    expect((await decide(sent.id, who.client.id, { decision: "approve", typedName: who.client.name })).res.status).toBe(
      201,
    );
    const later = await newRevision();
    actAs(who.fabricator.id);
    expect((await signOffRoute.GET(json("GET"), ctx({ id: String(first.id) }))).status).toBe(200);
    expect((await signOffRoute.GET(json("GET"), ctx({ id: String(later.id) }))).status).toBe(404);
    // The approved revision cannot be sent again; the later one can.
    expect((await send(first.id)).res.status).toBe(409);
    expect((await send(later.id)).res.status).toBe(201);
  });

  it("cannot be changed or removed in the database itself (trigger)", async () => {
    const [row] = await db.select({ id: signOffs.id }).from(signOffs).limit(1);
    expect(row, "an earlier test stored a sign-off").toBeDefined();
    await expect(pool.query("UPDATE sign_offs SET typed_name = 'Forged' WHERE id = ?", [row.id])).rejects.toThrow(
      /Sign-offs are permanent/,
    );
    await expect(pool.query("DELETE FROM sign_offs WHERE id = ?", [row.id])).rejects.toThrow(/Sign-offs are permanent/);
    const [still] = await db.select().from(signOffs).where(eq(signOffs.id, row.id));
    expect(still.typedName).not.toBe("Forged");
  });
});

describe("cut files and the approval", () => {
  async function storePlan(revisionId: number, extra: Record<string, unknown> = {}) {
    const { nest } = await validNest(choice);
    actAs(who.fabricator.id);
    const res = await cutPlansRoute.POST(json("POST", { ...choice, nest, ...extra }), ctx({ id: String(revisionId) }));
    return { res, body: await res.json() };
  }

  async function file(planId: number, pattern: RegExp): Promise<string> {
    actAs(who.fabricator.id);
    const list = (await import("@/app/api/cut-plans/[id]/files/route")).GET;
    const names: string[] = (await (await list(json("GET"), ctx({ id: String(planId) }))).json()).files;
    const name = names.find((n) => pattern.test(n))!;
    const res = await planFilesRoute.GET(json("GET"), ctx({ id: String(planId), name }));
    expect(res.status).toBe(200);
    return res.text();
  }

  function referenceTexts(dxf: string): string[] {
    const parsed = new DxfParser().parseSync(dxf)!;
    return parsed.entities
      .filter((e) => e.type === "TEXT" && e.layer === "REFERENCE")
      .map((e) => (e as unknown as { text: string }).text);
  }

  it("asks for a reason to store a production plan of an unapproved revision, logs it, and marks every file NOT APPROVED", async () => {
    const revision = await newRevision();
    const before = await auditCount();
    const refused = await storePlan(revision.id, { purpose: "production" });
    expect(refused.res.status).toBe(422);
    expect(refused.body.fields.reason).toBeDefined();
    expect(await auditCount()).toBe(before);
    const stored = await storePlan(revision.id, {
      purpose: "production",
      reason: "Client approved by phone; paperwork follows.",
    });
    expect(stored.res.status, JSON.stringify(stored.body)).toBe(201);
    const [entry] = await db
      .select()
      .from(auditLog)
      .where(and(eq(auditLog.entity, "cut_plans"), eq(auditLog.entityId, String(stored.body.cutPlan.id))));
    expect(JSON.stringify(entry.detail)).toContain("Client approved by phone; paperwork follows.");
    const readme = await file(stored.body.cutPlan.id, /^README\.txt$/);
    expect(readme).toContain("NOT APPROVED — FOR REVIEW ONLY");
    expect(readme).toContain("Client approved by phone; paperwork follows.");
    expect(referenceTexts(await file(stored.body.cutPlan.id, /sheet-1-mm\.dxf$/))).toContain(
      "NOT APPROVED - FOR REVIEW ONLY",
    );
    expect(await file(stored.body.cutPlan.id, /parts-mm\.svg$/)).toMatch(
      /<title>[^<]*NOT APPROVED — FOR REVIEW ONLY<\/title>/,
    );
    // A plan for review needs no reason.
    expect((await storePlan(revision.id)).res.status).toBe(201);
  });

  it("puts the approval's reference in the README, on the REFERENCE layer of every DXF and in the SVG title", async () => {
    const revision = await newRevision();
    const { body: sent } = await send(revision.id);
    const { body: decided } = await decide(sent.id, who.client.id, { decision: "approve", typedName: who.client.name });
    const reference = decided.signOff.reference as string;
    expect(reference).toBe(`${specHash(SQUARE).slice(0, 12)}/${decided.signOff.signedAt.slice(0, 10)}`);
    const stored = await storePlan(revision.id);
    expect(stored.res.status).toBe(201);
    expect(stored.body.cutPlan.summary).toMatchObject({ purpose: "production", approvalReference: reference });
    const readme = await file(stored.body.cutPlan.id, /^README\.txt$/);
    expect(readme).toContain(`APPROVED R${revision.number} ${reference} by ${who.client.name}`);
    expect(readme).not.toContain("NOT APPROVED");
    for (const pattern of [/sheet-1-mm\.dxf$/, /parts-mm\.dxf$/])
      expect(referenceTexts(await file(stored.body.cutPlan.id, pattern)).some((t) => t.includes(reference))).toBe(true);
    expect(await file(stored.body.cutPlan.id, /sheet-1-mm\.svg$/)).toMatch(
      new RegExp(`<title>[^<]*${reference.replace("/", "\\/")}[^<]*</title>`),
    );
  });
});
