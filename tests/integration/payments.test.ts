// Deposits paid through the stripe SDK against the local payment service: the client approves, is
// sent to the service's payment page, pays, and the service's signed webhook marks the deposit paid
// — verified by the SDK's own constructEvent. A forged, altered, stale or replayed event is refused
// with 400 and changes nothing; only the project's client members open a payment page.
import { spawn, type ChildProcess } from "node:child_process";
import http from "node:http";
import net from "node:net";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { and, count, eq } from "drizzle-orm";
import Stripe from "stripe";
import * as checkoutRoute from "@/app/api/reviews/[id]/deposit/checkout/route";
import * as decisionRoute from "@/app/api/reviews/[id]/decision/route";
import * as webhookRoute from "@/app/api/payments/webhook/route";
import { db, pool } from "@/db";
import { auditLog, deposits, designs, paymentEvents, users } from "@/db/schema";
import { saveRevision } from "@/lib/server/designs";
import { insertReview } from "@/db/queries/reviews";
import { actAs } from "./support/session";
import { CALLERS, clientOnly, makeCallers, type CallerIds } from "./support/callers";
import { auditCount } from "./support/fixtures";

vi.mock("@/auth", async () => (await import("./support/session")).mockAuth);
vi.mock("next/cache", async () => (await import("./support/session")).mockCache);

const SQUARE = {
  mode: "track-for-wheel",
  units: "mm",
  wheel: { kind: "polygon", sides: 4, side: 300, cornerRadius: 0 },
};
const secret = process.env.STRIPE_WEBHOOK_SECRET!;
const sdk = new Stripe("sk_test_unused");
let ids: CallerIds;
let projectId = 0;
let designId = 0;
let fake: ChildProcess;
let fakePort = 0;
let capture: http.Server;
const delivered: Array<{ body: string; signature: string }> = [];

const json = (method: string, body?: unknown) =>
  new Request("http://test.local/api", {
    method,
    headers: { "content-type": "application/json" },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
const ctx = <P>(params: P) => ({ params: Promise.resolve(params) });
const hook = (body: string, signature?: string) =>
  webhookRoute.POST(
    new Request("http://test.local/api/payments/webhook", {
      method: "POST",
      headers: { "content-type": "application/json", ...(signature ? { "stripe-signature": signature } : {}) },
      body,
    }),
    ctx({}),
  );

function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const s = net.createServer().listen(0, "127.0.0.1", () => {
      const p = (s.address() as net.AddressInfo).port;
      s.close(() => resolve(p));
    });
  });
}

const fab = () => ({
  id: ids["fabricator member"],
  role: "fabricator" as const,
  name: "Fab",
  email: "fab@example.test",
});

/** A review of a fresh revision asking for a deposit, approved by the client member through the route (so the deposit falls due). */
async function approvedWithDeposit(
  amount = 125000,
  currency = "GBP",
): Promise<{ reviewId: number; depositId: number; paymentUrl: string | null }> {
  const revisionId = (await saveRevision(fab(), designId, projectId, { spec: SQUARE, note: "" })).id;
  const reviewId = await insertReview(fab(), {
    revisionId,
    revisionNumber: 1,
    projectId,
    message: "Deposit test",
    runLengthMm: 2000,
    endTreatment: "flat",
    deposit: { amountMinor: amount, currency },
  });
  const [me] = await db.select({ name: users.name }).from(users).where(eq(users.id, ids["client member"]));
  actAs(ids["client member"]);
  const res = await decisionRoute.POST(
    json("POST", { decision: "approve", typedName: me.name }),
    ctx({ id: String(reviewId) }),
  );
  const body = await res.json();
  expect(res.status, JSON.stringify(body)).toBe(201);
  const [dep] = await db.select().from(deposits).where(eq(deposits.reviewId, reviewId));
  return { reviewId, depositId: dep.id, paymentUrl: body.payment?.url ?? null };
}

/** Pays on the fake's page, as a browser would, and returns the webhook it delivered. */
async function payOnFake(url: string): Promise<{ body: string; signature: string; redirect: string | null }> {
  const before = delivered.length;
  const res = await fetch(`${url}/pay`, { method: "POST", redirect: "manual" });
  expect(res.status).toBe(303);
  const deadline = Date.now() + 5000;
  while (delivered.length === before && Date.now() < deadline) await new Promise((r) => setTimeout(r, 50));
  expect(delivered.length, "the fake delivered a webhook").toBe(before + 1);
  return { ...delivered[delivered.length - 1], redirect: res.headers.get("location") };
}

const state = async (depositId: number) => {
  const [dep] = await db.select().from(deposits).where(eq(deposits.id, depositId));
  const [{ n }] = await db.select({ n: count() }).from(paymentEvents);
  return {
    status: dep.status,
    paidAt: dep.paidAt,
    session: dep.checkoutSessionId,
    events: n,
    audit: await auditCount(),
  };
};

beforeAll(async () => {
  // Our own payment service and webhook catcher, so the deliveries come here (the app server is not running during these tests).
  capture = http.createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on("data", (c) => chunks.push(c));
    req.on("end", () => {
      delivered.push({
        body: Buffer.concat(chunks).toString("utf8"),
        signature: String(req.headers["stripe-signature"] ?? ""),
      });
      res.writeHead(200).end();
    });
  });
  await new Promise<void>((r) => capture.listen(0, "127.0.0.1", () => r()));
  fakePort = await freePort();
  fake = spawn(process.execPath, [path.resolve("scripts/fakes/payment-service.mjs")], {
    env: {
      ...process.env,
      PAYMENT_SERVICE_PORT: String(fakePort),
      PAYMENT_WEBHOOK_URL: `http://127.0.0.1:${(capture.address() as net.AddressInfo).port}/hook`,
    },
    stdio: "ignore",
  });
  process.env.STRIPE_API_HOST = "127.0.0.1";
  process.env.STRIPE_API_PORT = String(fakePort);
  process.env.STRIPE_API_PROTOCOL = "http";
  for (let i = 0; i < 100; i++) {
    if (
      await fetch(`http://127.0.0.1:${fakePort}/sessions`)
        .then((r) => r.ok)
        .catch(() => false)
    )
      break;
    await new Promise((r) => setTimeout(r, 100));
  }

  ({ ids, projectId } = await makeCallers("Deposit"));
  const [d] = await db
    .insert(designs)
    .values({ projectId, name: "Deposit track", mode: "track-for-wheel", draft: SQUARE });
  designId = d.insertId;
});

afterAll(async () => {
  fake?.kill();
  capture?.close();
  await pool.end();
});

describe("paying a deposit", () => {
  it("sends the client from the approval to the payment page, and the signed webhook marks the deposit paid once", async () => {
    const { depositId, paymentUrl, reviewId } = await approvedWithDeposit();
    expect(paymentUrl).toMatch(new RegExp(`^http://127\\.0\\.0\\.1:${fakePort}/pay/cs_test_`));
    const page = await fetch(paymentUrl!);
    expect(page.status).toBe(200);
    expect(await page.text()).toContain("£1,250.00");
    const due = await state(depositId);
    expect(due.status).toBe("due");

    const paid = await payOnFake(paymentUrl!);
    expect(paid.redirect).toContain(`/projects/${projectId}/reviews/${reviewId}?deposit=paid`);
    // The fake's signature verifies with the SDK's own check, independently of our route.
    const event = sdk.webhooks.constructEvent(paid.body, paid.signature, secret);
    expect(event.type).toBe("checkout.session.completed");

    const res = await hook(paid.body, paid.signature);
    expect(res.status, await res.clone().text()).toBe(200);
    expect(await res.json()).toEqual({ received: true, changed: true });
    const after = await state(depositId);
    expect(after.status).toBe("paid");
    expect(after.paidAt).toBeInstanceOf(Date);
    expect(after.events).toBe(due.events + 1);
    expect(after.audit).toBe(due.audit + 1);
    const [entry] = await db
      .select()
      .from(auditLog)
      .where(and(eq(auditLog.entity, "deposits"), eq(auditLog.entityId, String(depositId))));
    expect(entry.action).toBe("deposit-paid");

    // The same delivery again is a replay: 400, and nothing more is written.
    const replay = await hook(paid.body, paid.signature);
    expect(replay.status).toBe(400);
    expect(await state(depositId)).toEqual(after);
    // A paid deposit opens no new payment page.
    actAs(ids["client member"]);
    expect((await checkoutRoute.POST(json("POST", {}), ctx({ id: String(reviewId) }))).status).toBe(409);
  });

  it("refuses forged, altered, unsigned, garbled and stale events with 400, writing nothing", async () => {
    const { depositId, paymentUrl } = await approvedWithDeposit();
    const paid = await payOnFake(paymentUrl!);
    const before = await state(depositId);
    const altered = paid.body.replace(/"amount_total":\d+/, '"amount_total":1');
    const stale = sdk.webhooks.generateTestHeaderString({
      payload: paid.body,
      secret,
      timestamp: Math.floor(Date.now() / 1000) - 3600,
    });
    const cases: Array<[string, string, string | undefined]> = [
      [
        "signed with another secret",
        paid.body,
        sdk.webhooks.generateTestHeaderString({ payload: paid.body, secret: "whsec_not_ours" }),
      ],
      ["body altered after signing", altered, paid.signature],
      ["no signature", paid.body, undefined],
      ["garbled signature", paid.body, "t=abc,v1=zzz"],
      ["older than the tolerance", paid.body, stale],
    ];
    for (const [what, body, signature] of cases) {
      const res = await hook(body, signature);
      expect(res.status, what).toBe(400);
      expect(await state(depositId), what).toEqual(before);
    }
    // The genuine delivery still works afterwards.
    expect((await hook(paid.body, paid.signature)).status).toBe(200);
  });

  it("refuses a correctly signed event whose amount or currency is not the deposit's", async () => {
    const { depositId, paymentUrl } = await approvedWithDeposit(50000, "EUR");
    const paid = await payOnFake(paymentUrl!);
    const before = await state(depositId);
    for (const change of [
      (s: string) => s.replace(/"amount_total":\d+/, '"amount_total":49999'),
      (s: string) => s.replace(/"currency":"eur"/, '"currency":"usd"'),
    ]) {
      const body = change(paid.body);
      expect(body).not.toBe(paid.body);
      const res = await hook(body, sdk.webhooks.generateTestHeaderString({ payload: body, secret }));
      expect(res.status).toBe(400);
      expect((await res.json()).message).toMatch(/amount or currency/);
      expect(await state(depositId)).toEqual(before);
    }
  });

  it("records an event of another type once and changes nothing", async () => {
    const payload = JSON.stringify({
      id: `evt_other_${Date.now()}`,
      object: "event",
      type: "charge.refunded",
      data: { object: {} },
    });
    const header = sdk.webhooks.generateTestHeaderString({ payload, secret });
    expect(await (await hook(payload, header)).json()).toEqual({ received: true, changed: false });
    expect((await hook(payload, header)).status).toBe(400);
  });
});

describe("the payment page route by caller", () => {
  const expected = clientOnly(201);
  let reviewId = 0;
  let depositId = 0;
  beforeAll(async () => {
    ({ reviewId, depositId } = await approvedWithDeposit());
  });
  for (const caller of CALLERS) {
    it(`${caller} → ${expected[caller]}`, async () => {
      actAs(caller === "anonymous" ? null : ids[caller]);
      const before = await state(depositId);
      const res = await checkoutRoute.POST(json("POST", {}), ctx({ id: String(reviewId) }));
      expect(res.status).toBe(expected[caller]);
      if (res.status >= 400) expect(await state(depositId)).toEqual(before);
      else expect((await res.json()).url).toMatch(/\/pay\/cs_test_/);
    });
  }

  it("answers 409 before approval and 404 where no deposit was asked for", async () => {
    const revisionId = (await saveRevision(fab(), designId, projectId, { spec: SQUARE, note: "" })).id;
    const waiting = await insertReview(fab(), {
      revisionId,
      revisionNumber: 1,
      projectId,
      message: "Not yet",
      runLengthMm: 2000,
      endTreatment: "flat",
      deposit: { amountMinor: 1000, currency: "GBP" },
    });
    const revision2 = (await saveRevision(fab(), designId, projectId, { spec: SQUARE, note: "" })).id;
    const none = await insertReview(fab(), {
      revisionId: revision2,
      revisionNumber: 2,
      projectId,
      message: "No deposit",
      runLengthMm: 2000,
      endTreatment: "flat",
      deposit: null,
    });
    actAs(ids["client member"]);
    expect((await checkoutRoute.POST(json("POST", {}), ctx({ id: String(waiting) }))).status).toBe(409);
    expect((await checkoutRoute.POST(json("POST", {}), ctx({ id: String(none) }))).status).toBe(404);
    expect((await checkoutRoute.GET(json("GET"), ctx({ id: String(waiting) }))).status).toBe(200);
  });
});
