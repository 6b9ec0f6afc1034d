// The role matrix of the review routes: every handler, called as each kind of caller, answers
// exactly the status in the table, and a refused call writes nothing (no audit entry, no review,
// comment, sign-off or deposit row).
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { count } from "drizzle-orm";
import * as revisionReviewsRoute from "@/app/api/revisions/[id]/reviews/route";
import * as signOffRoute from "@/app/api/revisions/[id]/sign-off/route";
import * as reviewRoute from "@/app/api/reviews/[id]/route";
import * as commentsRoute from "@/app/api/reviews/[id]/comments/route";
import * as decisionRoute from "@/app/api/reviews/[id]/decision/route";
import * as previewRoute from "@/app/api/reviews/[id]/preview/route";
import { db, pool } from "@/db";
import { deposits, designs, reviewComments, reviews, signOffs, users } from "@/db/schema";
import { saveRevision } from "@/lib/server/designs";
import { insertReview } from "@/db/queries/reviews";
import { eq } from "drizzle-orm";
import { actAs } from "./support/session";
import {
  CALLERS,
  clientOnly,
  makeCallers,
  projectManage,
  projectView,
  type Caller,
  type CallerIds,
} from "./support/callers";
import { auditCount } from "./support/fixtures";

vi.mock("@/auth", async () => (await import("./support/session")).mockAuth);
vi.mock("next/cache", async () => (await import("./support/session")).mockCache);

let ids: CallerIds;
let projectId = 0;
let designId = 0;
let decidedReviewId = 0;
let approvedRevisionId = 0;

const SQUARE = {
  mode: "track-for-wheel",
  units: "mm",
  wheel: { kind: "polygon", sides: 4, side: 200, cornerRadius: 0 },
};
const json = (method: string, body?: unknown) =>
  new Request("http://test.local/api", {
    method,
    headers: { "content-type": "application/json", "user-agent": "role-matrix" },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
const ctx = <P>(params: P) => ({ params: Promise.resolve(params) });

const fabricator = () => ({
  id: ids["fabricator member"],
  role: "fabricator" as const,
  name: "Fab",
  email: "fab@example.test",
});

async function freshRevision(): Promise<number> {
  return (await saveRevision(fabricator(), designId, projectId, { spec: SQUARE, note: "matrix" })).id;
}

/** A review waiting for the client, written straight through the query (no mail), on a revision of its own. */
async function freshReview(): Promise<number> {
  const revisionId = await freshRevision();
  return insertReview(fabricator(), {
    revisionId,
    revisionNumber: 0,
    projectId,
    message: "Matrix review",
    runLengthMm: 1200,
    endTreatment: "flat",
    deposit: null,
  });
}

async function rowCounts(): Promise<number[]> {
  return Promise.all([
    auditCount(),
    ...[reviews, reviewComments, signOffs, deposits].map(async (t) => (await db.select({ n: count() }).from(t))[0].n),
  ]);
}

interface Case {
  name: string;
  expect: Record<Caller, number>;
  /** Makes a fresh target (its own writes are not the call's), handed to `call`. */
  prepare?: () => Promise<number>;
  call: (target: number) => Promise<number>;
}

const CASES: Case[] = [
  {
    name: "POST /api/revisions/[id]/reviews",
    expect: projectManage(201),
    prepare: freshRevision,
    call: async (revisionId) =>
      (
        await revisionReviewsRoute.POST(
          json("POST", { message: "Please look", runLength: 1200, endTreatment: "flat" }),
          ctx({ id: String(revisionId) }),
        )
      ).status,
  },
  {
    name: "GET /api/revisions/[id]/reviews",
    expect: projectView(200),
    call: async () => (await revisionReviewsRoute.GET(json("GET"), ctx({ id: String(approvedRevisionId) }))).status,
  },
  {
    name: "GET /api/reviews/[id]",
    expect: projectView(200),
    call: async () => (await reviewRoute.GET(json("GET"), ctx({ id: String(decidedReviewId) }))).status,
  },
  ...(["PUT", "PATCH", "DELETE"] as const).map((m) => ({
    name: `${m} /api/reviews/[id]`,
    expect: projectView(405),
    call: async () =>
      (await reviewRoute[m](json(m, { message: "changed" }), ctx({ id: String(decidedReviewId) }))).status,
  })),
  {
    name: "GET /api/reviews/[id]/comments",
    expect: projectView(200),
    call: async () => (await commentsRoute.GET(json("GET"), ctx({ id: String(decidedReviewId) }))).status,
  },
  {
    name: "POST /api/reviews/[id]/comments",
    expect: projectView(201),
    call: async () =>
      (
        await commentsRoute.POST(
          json("POST", { text: "A comment from the matrix", at: 300 }),
          ctx({ id: String(decidedReviewId) }),
        )
      ).status,
  },
  {
    name: "POST /api/reviews/[id]/decision",
    expect: clientOnly(201),
    prepare: freshReview,
    call: async (reviewId) => {
      const [me] = await db.select({ name: users.name }).from(users).where(eq(users.id, ids["client member"]));
      return (
        await decisionRoute.POST(
          json("POST", { decision: "approve", typedName: me.name }),
          ctx({ id: String(reviewId) }),
        )
      ).status;
    },
  },
  {
    name: "GET /api/reviews/[id]/decision",
    expect: projectView(200),
    call: async () => (await decisionRoute.GET(json("GET"), ctx({ id: String(decidedReviewId) }))).status,
  },
  ...(["PUT", "PATCH", "DELETE"] as const).map((m) => ({
    name: `${m} /api/reviews/[id]/decision`,
    expect: projectView(405),
    call: async () =>
      (
        await decisionRoute[m](
          json(m, { decision: "request-changes", typedName: "x", comment: "y" }),
          ctx({ id: String(decidedReviewId) }),
        )
      ).status,
  })),
  {
    name: "GET /api/revisions/[id]/sign-off",
    expect: projectView(200),
    call: async () => (await signOffRoute.GET(json("GET"), ctx({ id: String(approvedRevisionId) }))).status,
  },
  ...(["PUT", "PATCH", "DELETE"] as const).map((m) => ({
    name: `${m} /api/revisions/[id]/sign-off`,
    expect: projectView(405),
    call: async () =>
      (await signOffRoute[m](json(m, { typedName: "x" }), ctx({ id: String(approvedRevisionId) }))).status,
  })),
  {
    name: "GET /api/reviews/[id]/preview",
    expect: projectView(200),
    call: async () => (await previewRoute.GET(json("GET"), ctx({ id: String(decidedReviewId) }))).status,
  },
];

beforeAll(async () => {
  ({ ids, projectId } = await makeCallers("Review matrix"));
  const [d] = await db
    .insert(designs)
    .values({ projectId, name: "Matrix track", mode: "track-for-wheel", draft: SQUARE });
  designId = d.insertId;
  decidedReviewId = await freshReview();
  const [me] = await db.select({ name: users.name }).from(users).where(eq(users.id, ids["client member"]));
  actAs(ids["client member"]);
  const res = await decisionRoute.POST(
    json("POST", { decision: "approve", typedName: me.name }),
    ctx({ id: String(decidedReviewId) }),
  );
  const body = await res.json();
  expect(res.status, JSON.stringify(body)).toBe(201);
  approvedRevisionId = body.signOff.revisionId;
});

afterAll(async () => {
  await pool.end();
});

describe("review routes by caller", () => {
  for (const c of CASES) {
    describe(c.name, () => {
      for (const caller of CALLERS) {
        const expected = c.expect[caller];
        it(`${caller} → ${expected}`, async () => {
          const target = c.prepare ? await c.prepare() : 0;
          actAs(caller === "anonymous" ? null : ids[caller]);
          const before = await rowCounts();
          const status = await c.call(target);
          expect(status).toBe(expected);
          if (status >= 400) expect(await rowCounts()).toEqual(before);
        });
      }
    });
  }
});
