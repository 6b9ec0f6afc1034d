// The demo's build: for the approved trike run, a stored cut plan made the way the app makes one
// (the shop library's figures, the parts from the revision's own spec, a nest that holds — the plain
// shelf layout — and the same summary), and a few build-log entries with site photos. The photos
// are drawn here (invented pictures, no real site), put through the same checks and cleaning as an
// upload (lib/photos/prepare.ts), and stored in the object store like any other. Idempotent: the
// revision's plan and the log's photos are looked up first.
import { randomUUID } from "node:crypto";
import { PutObjectCommand } from "@aws-sdk/client-s3";
import { and, eq } from "drizzle-orm";
import type { MySql2Database } from "drizzle-orm/mysql2";
import sharp from "sharp";
import * as schema from "../../db/schema";
import { buildCutParts, nestItemsFor, shelfLayout } from "../../lib/cut";
import { composeSettings } from "../../lib/cut-plan/compose";
import { cutPlanName } from "../../lib/cut-plan/name";
import { summariseCutPlan } from "../../lib/cut-plan/summary";
import { approvalReference } from "../../lib/review/reference";
import { PHOTO_EXTENSION, preparePhoto } from "../../lib/photos/prepare";
import { objectStoreClient } from "../../lib/storage/object-store-client";
import { solve } from "../../lib/track";

type Db = MySql2Database<typeof schema>;
const { cutPlans, materials, stockSheets, machines, buildLogEntries, buildLogPhotos, revisions, designs, signOffs } =
  schema;

export interface DemoBuild {
  material: string;
  sheet: string;
  machine: string;
  settings: Record<string, unknown>;
  log: { by: string; kind: schema.LogKind; text: string; parts: string[]; at: string; photo?: string }[];
}

const store = () => objectStoreClient();

/** An invented "site photo": a drawing of the scene it names, with the demo's caption. */
function demoPicture(caption: string): string {
  const w = 1600;
  const h = 1066;
  const humps = Array.from({ length: 9 }, (_, i) => {
    const x0 = 120 + i * 150;
    return `M${x0} 700 Q${x0 + 75} 760 ${x0 + 150} 700`;
  }).join(" ");
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${w}" height="${h}">
  <defs><linearGradient id="sky" x1="0" y1="0" x2="0" y2="1"><stop offset="0" stop-color="#d9dde3"/><stop offset="1" stop-color="#b9b2a4"/></linearGradient></defs>
  <rect width="${w}" height="${h}" fill="url(#sky)"/>
  <rect y="760" width="${w}" height="${h - 760}" fill="#8c7b62"/>
  <path d="M120 700 ${humps.replace(/M\d+ 700 /g, "")} L1470 820 L120 820 Z" fill="#d8c49a" stroke="#5c4a2e" stroke-width="6"/>
  <rect x="520" y="470" width="230" height="230" fill="#e7d7b1" stroke="#5c4a2e" stroke-width="6" transform="rotate(20 635 585)"/>
  <rect x="40" y="40" width="${w - 80}" height="90" fill="rgba(255,255,255,0.8)"/>
  <text x="70" y="100" font-family="DejaVu Sans, sans-serif" font-size="44" fill="#1d3557">Demo photo (invented): ${caption.replace(/[<&>]/g, "")}</text>
</svg>`;
}

/** The trike run's cut plan and build log, unless the revision has a plan already. */
export async function seedDemoBuild(
  db: Db,
  projectId: number,
  designName: string,
  projectName: string,
  demo: DemoBuild,
  userIds: Map<string, number>,
): Promise<number> {
  const [design] = await db
    .select()
    .from(designs)
    .where(and(eq(designs.projectId, projectId), eq(designs.name, designName)))
    .limit(1);
  if (!design) return 0;
  const [revision] = await db
    .select()
    .from(revisions)
    .where(and(eq(revisions.designId, design.id), eq(revisions.number, 1)))
    .limit(1);
  if (
    !revision ||
    (await db.select({ id: cutPlans.id }).from(cutPlans).where(eq(cutPlans.revisionId, revision.id)).limit(1)).length
  )
    return 0;
  const [material] = await db.select().from(materials).where(eq(materials.name, demo.material));
  const [sheet] = await db.select().from(stockSheets).where(eq(stockSheets.name, demo.sheet));
  const [machine] = await db.select().from(machines).where(eq(machines.name, demo.machine));
  const choice = { materialId: material.id, stockSheetId: sheet.id, machineId: machine.id, settings: demo.settings };
  const settings = composeSettings(choice, { material, sheet, machine }, projectName);
  const plan = buildCutParts(revision.spec, solve(revision.spec), settings);
  const s = plan.settings;
  const nest = shelfLayout({
    items: await nestItemsFor(plan.parts, s),
    sheet: { width: s.sheet.length, height: s.sheet.width },
    margin: s.margin,
    spacing: s.spacing,
  });
  const [approval] = await db
    .select()
    .from(signOffs)
    .where(and(eq(signOffs.revisionId, revision.id), eq(signOffs.decision, "approve")))
    .limit(1);
  const { summary, nest: stored } = summariseCutPlan(
    plan,
    nest,
    { material: material.name, sheet: sheet.name, machine: machine.name },
    {
      purpose: approval ? "production" : "review",
      approvalReference: approval ? approvalReference(approval) : null,
      unapprovedReason: null,
    },
  );
  const fabricatorId = userIds.get("fabricator@example.test")!;
  const planId = await db.transaction(async (tx) => {
    const [res] = await tx.insert(cutPlans).values({
      revisionId: revision.id,
      // The revision's first plan (none is seeded before it).
      number: 1,
      settings: { ...choice, composed: s } as unknown as Record<string, unknown>,
      nest: stored,
      summary: summary as unknown as Record<string, unknown>,
      createdById: fabricatorId,
      createdAt: new Date(demo.log[0]?.at ?? Date.now()),
    });
    await tx.insert(buildLogEntries).values({
      projectId,
      kind: "cut-plan",
      text: `${cutPlanName(1, revision.number)} saved for ${summary.purpose}: ${summary.copies} parts on ${summary.sheets} × ${summary.sheet}.`,
      parts: [],
      cutPlanId: res.insertId,
      detail: { revisionId: revision.id, number: 1 },
      authorId: fabricatorId,
      createdAt: new Date(demo.log[0]?.at ?? Date.now()),
    });
    return res.insertId;
  });

  const s3 = store();
  const bucket = process.env.S3_BUCKET ?? "axlewright";
  for (const entry of demo.log) {
    const authorId = userIds.get(entry.by)!;
    const photo = entry.photo
      ? await preparePhoto(
          await sharp(Buffer.from(demoPicture(entry.photo)))
            .jpeg({ quality: 82 })
            .toBuffer(),
          `${entry.photo}.jpg`,
        )
      : null;
    const keys = photo
      ? { object: `projects/${projectId}/photos/${randomUUID()}.${PHOTO_EXTENSION[photo.contentType]}`, thumb: "" }
      : null;
    if (photo && keys) {
      keys.thumb = keys.object.replace(/\.[a-z]+$/, "-thumb.webp");
      await s3.send(
        new PutObjectCommand({ Bucket: bucket, Key: keys.object, Body: photo.data, ContentType: photo.contentType }),
      );
      await s3.send(
        new PutObjectCommand({ Bucket: bucket, Key: keys.thumb, Body: photo.thumb, ContentType: photo.thumbType }),
      );
    }
    await db.transaction(async (tx) => {
      const [res] = await tx.insert(buildLogEntries).values({
        projectId,
        kind: entry.kind,
        text: entry.text,
        parts: entry.parts,
        authorId,
        createdAt: new Date(entry.at),
        cutPlanId: entry.kind === "installed" ? planId : null,
        detail: entry.kind === "installed" && entry.parts.length === 1 ? { item: entry.parts[0], done: true } : null,
      });
      if (photo && keys)
        await tx.insert(buildLogPhotos).values({
          entryId: res.insertId,
          projectId,
          objectKey: keys.object,
          thumbKey: keys.thumb,
          contentType: photo.contentType,
          bytes: photo.data.length,
          thumbBytes: photo.thumb.length,
          width: photo.width,
          height: photo.height,
          originalName: photo.name,
          uploadedById: authorId,
          createdAt: new Date(entry.at),
        });
    });
  }
  return 1 + demo.log.length;
}
