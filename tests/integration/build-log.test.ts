// The build log and its photos through the route handlers, against the real MariaDB and the local
// object store: who may write and read, hostile uploads refused with nothing left behind in the
// database or the bucket, photos stored upright and without their EXIF (GPS included), a failed
// write that removes its objects again, installation ticks, and the assembly sheet's PDF read back
// with Debian's poppler-utils.
import { execFileSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { ListObjectsV2Command } from "@aws-sdk/client-s3";
import { objectStoreClient } from "@/lib/storage/object-store-client";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { count, eq } from "drizzle-orm";
import sharp from "sharp";
import * as logRoute from "@/app/api/projects/[id]/log/route";
import * as photoRoute from "@/app/api/photos/[id]/route";
import * as ticksRoute from "@/app/api/cut-plans/[id]/ticks/route";
import * as sheetRoute from "@/app/api/cut-plans/[id]/assembly-sheet/route";
import * as cutPlansRoute from "@/app/api/revisions/[id]/cut-plans/route";
import { db, pool } from "@/db";
import { buildLogEntries, buildLogPhotos, designs, users } from "@/db/schema";
import { saveRevision } from "@/lib/server/designs";
import { insertReview } from "@/db/queries/reviews";
import * as decisionRoute from "@/app/api/reviews/[id]/decision/route";
import { cameraJpeg, hasGpsPointer, pngBomb } from "../support/images";
import { CALLERS, makeCallers, projectView, type Caller, type CallerIds } from "./support/callers";
import { demoChoice, validNest } from "./support/cut-plan";
import { auditCount } from "./support/fixtures";
import { actAs } from "./support/session";

vi.mock("@/auth", async () => (await import("./support/session")).mockAuth);
vi.mock("next/cache", async () => (await import("./support/session")).mockCache);

// A short run keeps the sheet quick: 1500 mm of 200 mm-square humps.
const SPEC = { mode: "track-for-wheel", units: "mm", wheel: { kind: "polygon", sides: 4, side: 200, cornerRadius: 0 } };
let ids: CallerIds;
let projectId = 0;
let planId = 0;
let planParts: string[] = [];
let reference = "";
const s3 = objectStoreClient();

const ctx = <P>(params: P) => ({ params: Promise.resolve(params) });
const json = (method: string, body?: unknown) =>
  new Request("http://test.local/api", {
    method,
    headers: { "content-type": "application/json" },
    body: body === undefined ? undefined : JSON.stringify(body),
  });

function multipart(
  fields: Record<string, string>,
  files: { name: string; type: string; data: Buffer }[] = [],
): Request {
  const form = new FormData();
  for (const [k, v] of Object.entries(fields)) form.set(k, v);
  for (const f of files) form.append("photos[]", new File([new Uint8Array(f.data)], f.name, { type: f.type }));
  return new Request("http://test.local/api/log", { method: "POST", body: form });
}

async function objectCount(): Promise<number> {
  let n = 0;
  let token: string | undefined;
  do {
    const page = await s3.send(
      new ListObjectsV2Command({ Bucket: process.env.S3_BUCKET ?? "axlewright", ContinuationToken: token }),
    );
    n += page.KeyCount ?? 0;
    token = page.IsTruncated ? page.NextContinuationToken : undefined;
  } while (token);
  return n;
}

const tableCount = async (t: typeof buildLogEntries | typeof buildLogPhotos) =>
  (await db.select({ n: count() }).from(t))[0].n;
const everything = async () =>
  Promise.all([auditCount(), tableCount(buildLogEntries), tableCount(buildLogPhotos), objectCount()]);

async function post(
  as: number | null,
  fields: Record<string, string>,
  files: { name: string; type: string; data: Buffer }[] = [],
) {
  actAs(as);
  const res = await logRoute.POST(multipart(fields, files), ctx({ id: String(projectId) }));
  return { res, body: await res.json() };
}

beforeAll(async () => {
  ({ ids, projectId } = await makeCallers("Build log"));
  const fab = { id: ids["fabricator member"], role: "fabricator" as const, name: "Fab", email: "fab@example.test" };
  const [d] = await db.insert(designs).values({ projectId, name: "Log track", mode: "track-for-wheel", draft: SPEC });
  const revision = await saveRevision(fab, d.insertId, projectId, { spec: SPEC, note: "" });
  // Approved by the project's client, so the sheet carries a reference.
  const reviewId = await insertReview(fab, {
    revisionId: revision.id,
    revisionNumber: revision.number,
    projectId,
    message: "Log test",
    runLengthMm: 1500,
    endTreatment: "flat",
    deposit: null,
  });
  const [client] = await db.select({ name: users.name }).from(users).where(eq(users.id, ids["client member"]));
  actAs(ids["client member"]);
  const decided = await (
    await decisionRoute.POST(
      json("POST", { decision: "approve", typedName: client.name }),
      ctx({ id: String(reviewId) }),
    )
  ).json();
  reference = decided.signOff.reference;
  const choice = {
    ...(await demoChoice()),
    settings: { runLength: 1500, endTreatment: "flat", trackLines: 1, wheelCount: 2 },
  };
  const { nest, plan } = await validNest(choice, SPEC);
  planParts = plan.parts.map((p) => p.id);
  actAs(ids["fabricator member"]);
  const stored = await (
    await cutPlansRoute.POST(json("POST", { ...choice, nest }), ctx({ id: String(revision.id) }))
  ).json();
  planId = stored.cutPlan.id;
});

afterAll(async () => {
  await pool.end();
});

describe("writing to the build log, by caller", () => {
  const expected: Record<Caller, number> = {
    anonymous: 401,
    admin: 201,
    "fabricator member": 201,
    "fabricator non-member": 404,
    "client member": 201,
    "client non-member": 404,
    "installer member": 201,
    "installer non-member": 404,
  };
  for (const caller of CALLERS) {
    it(`a text note: ${caller} → ${expected[caller]}`, async () => {
      const before = await everything();
      const { res } = await post(caller === "anonymous" ? null : ids[caller], {
        kind: "note",
        text: `Note from ${caller}`,
      });
      expect(res.status).toBe(expected[caller]);
      if (res.status >= 400) expect(await everything()).toEqual(before);
    });
  }

  it("lets a client add notes but not milestones or photos, and writes nothing when it refuses", async () => {
    const before = await everything();
    expect((await post(ids["client member"], { kind: "problem", text: "The hump is loose" })).res.status).toBe(403);
    expect(
      (
        await post(ids["client member"], { kind: "note", text: "Photo" }, [
          { name: "a.jpg", type: "image/jpeg", data: await cameraJpeg() },
        ])
      ).res.status,
    ).toBe(403);
    expect(await everything()).toEqual(before);
  });

  it("reads the log newest first for every member, and not for others", async () => {
    for (const caller of CALLERS) {
      actAs(caller === "anonymous" ? null : ids[caller]);
      const res = await logRoute.GET(
        new Request(`http://test.local/api/projects/${projectId}/log`),
        ctx({ id: String(projectId) }),
      );
      expect(res.status, caller).toBe(projectView(200)[caller]);
      if (res.ok) {
        const { entries } = await res.json();
        const times = entries.map((e: { createdAt: string }) => Date.parse(e.createdAt));
        expect([...times].sort((a, b) => b - a)).toEqual(times);
        // The app's own entries are there: the review, the decision and the stored plan.
        expect(entries.map((e: { kind: string }) => e.kind)).toEqual(expect.arrayContaining(["review", "cut-plan"]));
      }
    }
  });
});

describe("photos", () => {
  let photoId = 0;

  it("stores a photo upright, without EXIF or GPS, with a 480 px thumbnail, served only to members", async () => {
    const source = await cameraJpeg();
    const meta = await sharp(source).metadata();
    expect(meta.orientation).toBe(6);
    expect(hasGpsPointer(meta.exif)).toBe(true);
    const before = await everything();
    const { res, body } = await post(
      ids["installer member"],
      { kind: "installed", text: "T01 in place", parts: "t01, T02" },
      [{ name: "site.jpg", type: "image/jpeg", data: source }],
    );
    expect(res.status, JSON.stringify(body)).toBe(201);
    expect(body.photos).toHaveLength(1);
    photoId = body.photos[0].id;
    const after = await everything();
    expect(after[2]).toBe(before[2] + 1); // one photo row
    expect(after[3]).toBe(before[3] + 2); // the photo and its thumbnail in the bucket
    const [entry] = await db.select().from(buildLogEntries).where(eq(buildLogEntries.id, body.id));
    expect(entry.parts).toEqual(["T01", "T02"]);

    actAs(ids["client member"]);
    const full = await photoRoute.GET(
      new Request(`http://test.local/api/photos/${photoId}`),
      ctx({ id: String(photoId) }),
    );
    expect(full.status).toBe(200);
    expect(full.headers.get("content-type")).toBe("image/jpeg");
    const stored = await sharp(Buffer.from(await full.arrayBuffer())).metadata();
    // Read back by sharp: turned upright (the 640 × 400 picture stood on its side is 400 × 640), no EXIF, no orientation tag.
    expect([stored.width, stored.height]).toEqual([400, 640]);
    expect(stored.exif).toBeUndefined();
    expect(stored.orientation).toBeUndefined();
    const thumb = await photoRoute.GET(
      new Request(`http://test.local/api/photos/${photoId}?size=thumb`),
      ctx({ id: String(photoId) }),
    );
    const tm = await sharp(Buffer.from(await thumb.arrayBuffer())).metadata();
    expect(tm.format).toBe("webp");
    expect(tm.width).toBeLessThanOrEqual(480);
    expect(tm.exif).toBeUndefined();
  });

  it("serves a photo to members only: 404 for another project's people, 401 signed out", async () => {
    for (const caller of CALLERS) {
      actAs(caller === "anonymous" ? null : ids[caller]);
      const res = await photoRoute.GET(
        new Request(`http://test.local/api/photos/${photoId}`),
        ctx({ id: String(photoId) }),
      );
      expect(res.status, caller).toBe(projectView(200)[caller]);
    }
  });

  const hostile: Array<[string, () => Promise<{ name: string; type: string; data: Buffer }>, number, RegExp]> = [
    [
      "a renamed executable",
      async () => ({
        name: "site.jpg",
        type: "image/jpeg",
        data: Buffer.concat([Buffer.from("MZ\x90\x00\x03\x00\x00\x00", "latin1"), Buffer.alloc(4000, 1)]),
      }),
      415,
      /not a JPEG, PNG or WebP/,
    ],
    [
      "an SVG with a script",
      async () => ({
        name: "plan.svg",
        type: "image/svg+xml",
        data: Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"><script>alert(1)</script></svg>'),
      }),
      415,
      /drawings \(SVG\)/,
    ],
    [
      "a truncated JPEG",
      async () => {
        const j = await cameraJpeg();
        return { name: "cut.jpg", type: "image/jpeg", data: j.subarray(0, Math.floor(j.length * 0.6)) };
      },
      422,
      /damaged or cut short/,
    ],
    [
      "an oversized file",
      async () => ({
        name: "huge.jpg",
        type: "image/jpeg",
        data: Buffer.concat([Buffer.from([0xff, 0xd8, 0xff, 0xe0]), Buffer.alloc(15 * 1024 * 1024)]),
      }),
      413,
      /at most 15 MB/,
    ],
    [
      "a 20 000 × 20 000 PNG bomb",
      async () => ({ name: "bomb.png", type: "image/png", data: pngBomb() }),
      413,
      /20000 × 20000 px .* at most 40/,
    ],
  ];
  for (const [what, make, status, message] of hostile) {
    it(`refuses ${what} with ${status}, leaving the database and the bucket as they were`, async () => {
      const file = await make();
      const before = await everything();
      const { res, body } = await post(ids["installer member"], { kind: "note", text: what }, [file]);
      expect(res.status, JSON.stringify(body)).toBe(status);
      expect(body.message).toMatch(message);
      expect(await everything()).toEqual(before);
    });
  }

  it("removes the stored objects again when the database write fails", async () => {
    const before = await everything();
    const spy = vi.spyOn(db, "transaction").mockRejectedValueOnce(new Error("connection lost"));
    const { res } = await post(ids["fabricator member"], { kind: "cut", text: "Cut" }, [
      { name: "a.jpg", type: "image/jpeg", data: await cameraJpeg() },
    ]);
    spy.mockRestore();
    expect(res.status).toBe(500);
    expect(await everything()).toEqual(before);
  });
});

describe("installation ticks", () => {
  it("ticks a part as installed and writes a log entry naming it; unticks too; counts progress", async () => {
    actAs(ids["installer member"]);
    const start = await (await ticksRoute.GET(json("GET"), ctx({ id: String(planId) }))).json();
    expect(start.total).toBe(
      planParts.length + start.items.filter((i: { item: string }) => i.item.includes("/")).length,
    );
    const res = await ticksRoute.POST(json("POST", { item: planParts[0], done: true }), ctx({ id: String(planId) }));
    const body = await res.json();
    expect(res.status, JSON.stringify(body)).toBe(201);
    expect(body.installed).toBe(start.installed + 1);
    const [entry] = await db.select().from(buildLogEntries).where(eq(buildLogEntries.id, body.id));
    expect(entry).toMatchObject({ kind: "installed", parts: [planParts[0]], cutPlanId: planId });
    const undo = await (
      await ticksRoute.POST(json("POST", { item: planParts[0], done: false }), ctx({ id: String(planId) }))
    ).json();
    expect(undo.installed).toBe(start.installed);
    const before = await auditCount();
    expect(
      (await ticksRoute.POST(json("POST", { item: "ZZ99", done: true }), ctx({ id: String(planId) }))).status,
    ).toBe(400);
    expect(await auditCount()).toBe(before);
  });

  it("takes ticks from the crew, the shop and admins; the client reads them", async () => {
    const expected: Record<Caller, number> = {
      anonymous: 401,
      admin: 201,
      "fabricator member": 201,
      "fabricator non-member": 404,
      "client member": 403,
      "client non-member": 404,
      "installer member": 201,
      "installer non-member": 404,
    };
    for (const caller of CALLERS) {
      actAs(caller === "anonymous" ? null : ids[caller]);
      const before = await auditCount();
      const res = await ticksRoute.POST(json("POST", { item: planParts[1], done: true }), ctx({ id: String(planId) }));
      expect(res.status, caller).toBe(expected[caller]);
      if (res.status >= 400) expect(await auditCount()).toBe(before);
      expect((await ticksRoute.GET(json("GET"), ctx({ id: String(planId) }))).status, caller).toBe(
        projectView(200)[caller],
      );
    }
  });
});

describe("the assembly sheet PDF", () => {
  it("is made for every member, holds every part id and the reference, on the paper asked for", async () => {
    const dir = mkdtempSync(join(tmpdir(), "axlewright-sheet-"));
    for (const [paper, size] of [
      ["a4", /595\.2\d* x 841\.8\d* pts \(A4\)/],
      ["letter", /612 x 792 pts \(letter\)/],
    ] as const) {
      actAs(ids["installer member"]);
      const res = await sheetRoute.GET(
        new Request(`http://test.local/api/cut-plans/${planId}/assembly-sheet?paper=${paper}`),
        ctx({ id: String(planId) }),
      );
      expect(res.status).toBe(200);
      expect(res.headers.get("content-type")).toBe("application/pdf");
      expect(res.headers.get("content-disposition")).toMatch(
        new RegExp(`filename="r1-.*build-log.*log-track-assembly-${paper}\\.pdf"`),
      );
      const file = join(dir, `${paper}.pdf`);
      writeFileSync(file, Buffer.from(await res.arrayBuffer()));
      // Debian's poppler-utils, an independent reader of the PDF.
      expect(execFileSync("/usr/bin/pdfinfo", [file], { encoding: "utf8" })).toMatch(size);
      const text = execFileSync("/usr/bin/pdftotext", ["-layout", file, "-"], { encoding: "utf8" });
      for (const id of planParts) expect(text).toContain(id);
      expect(text).toContain(reference);
      expect(text).toContain("±");
    }
  });

  it("works the tolerances out for the bump limit asked for, and refuses one out of range", async () => {
    actAs(ids["installer member"]);
    const dir = mkdtempSync(join(tmpdir(), "axlewright-limit-"));
    const tolerances = async (limit: string) => {
      const res = await sheetRoute.GET(
        new Request(`http://test.local/api/cut-plans/${planId}/assembly-sheet?paper=a4&limit=${limit}`),
        ctx({ id: String(planId) }),
      );
      expect(res.status).toBe(200);
      const file = join(dir, `l${limit}.pdf`);
      writeFileSync(file, Buffer.from(await res.arrayBuffer()));
      return [
        ...execFileSync("/usr/bin/pdftotext", ["-layout", file, "-"], { encoding: "utf8" }).matchAll(
          /± ?(\d+\.\d+) mm/g,
        ),
      ].map((m) => Number(m[1]));
    };
    const wide = await tolerances("1");
    const tight = await tolerances("0.5");
    expect(wide.length).toBeGreaterThan(0);
    expect(tight.length).toBe(wide.length);
    // Half the bump allowed, no more than half the tolerance (to the 0.05 mm the figures are rounded down to).
    tight.forEach((t, i) => expect(t).toBeLessThanOrEqual(wide[i] / 2 + 0.05));
    const bad = await sheetRoute.GET(
      new Request(`http://test.local/api/cut-plans/${planId}/assembly-sheet?paper=a4&limit=50`),
      ctx({ id: String(planId) }),
    );
    expect(bad.status).toBe(400);
  });

  it("is there for every member of the project and nobody else", async () => {
    for (const caller of CALLERS) {
      actAs(caller === "anonymous" ? null : ids[caller]);
      const res = await sheetRoute.GET(
        new Request(`http://test.local/api/cut-plans/${planId}/assembly-sheet?paper=a4`),
        ctx({ id: String(planId) }),
      );
      expect(res.status, caller).toBe(projectView(200)[caller]);
    }
  });
});
