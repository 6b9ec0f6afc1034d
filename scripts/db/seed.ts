// Seeds the shop library (db/shop-library.json: common figures with their sources) and the invented
// demo scenario (db/demo-data.json: people, projects, and one design per project with a first
// revision solved by the engine). Idempotent: each row is looked up by its natural key first, so a
// re-run keeps what is there (including changed passwords and edited library rows) and adds nothing twice.
import { and, eq, isNull, sql } from "drizzle-orm";
import { drizzle } from "drizzle-orm/mysql2";
import mysql from "mysql2/promise";
import demo from "../../db/demo-data.json";
import library from "../../db/shop-library.json";
import * as schema from "../../db/schema";
import { summarise } from "../../lib/revision-summary";
import { loadsSettingsSchema } from "../../lib/validation/loads";
import { toMinor, type Currency } from "../../lib/money/currency";
import { seedDemoBuild, type DemoBuild } from "./demo-build";
import { hashPassword } from "../../lib/server/passwords";
import { ENGINE_VERSION, parseSpec, solve, specHash } from "../../lib/track";

const connection = await mysql.createConnection({ uri: process.env.DATABASE_URL! });
const db = drizzle({ client: connection, schema, mode: "default" });
/** A demo design's load settings, checked by the same schema the studio's saves go through. */
function demoLoads(d: { loads?: unknown }): Record<string, unknown> | null {
  return d.loads === undefined ? null : (loadsSettingsSchema.parse(d.loads) as unknown as Record<string, unknown>);
}

const {
  auditLog,
  organisations,
  users,
  projects,
  projectMembers,
  designs,
  revisions,
  materials,
  stockSheets,
  machines,
  reviews,
  reviewComments,
  signOffs,
  deposits,
  paymentEvents,
} = schema;
type SourceKind = (typeof schema.SOURCE_KINDS)[number];
let added = 0;

async function idOf<T extends { id: number }>(rows: Promise<T[]>): Promise<number | undefined> {
  return (await rows)[0]?.id;
}

/** A demo project's site and stock, its library rows named by their natural key (db/shop-library.json). */
interface DemoSite {
  runLength: number;
  trackLines: number;
  sheet: string;
  machine: string;
}

async function siteValues(s: DemoSite) {
  const stockSheetId = await idOf(
    db.select({ id: stockSheets.id }).from(stockSheets).where(eq(stockSheets.name, s.sheet)),
  );
  const machineId = await idOf(db.select({ id: machines.id }).from(machines).where(eq(machines.name, s.machine)));
  if (stockSheetId === undefined) throw new Error(`demo data: no stock sheet named "${s.sheet}" in the shop library`);
  if (machineId === undefined) throw new Error(`demo data: no machine named "${s.machine}" in the shop library`);
  return { siteRunLengthMm: s.runLength, trackLines: s.trackLines, stockSheetId, machineId };
}

/**
 * A demo project made before projects recorded their site (drizzle/0008_project_site.sql) gets the
 * figures once: only while all four are unset and nobody has ever saved them (no audit entry), so a
 * person's own figures, or their clearing them, survive every re-run.
 */
async function fillSiteOnce(projectId: number, values: Awaited<ReturnType<typeof siteValues>>) {
  const [saved] = await db
    .select({ id: auditLog.id })
    .from(auditLog)
    .where(
      and(
        eq(auditLog.entity, "projects"),
        eq(auditLog.entityId, String(projectId)),
        sql`json_contains_path(${auditLog.detail}, 'one', '$.site')`,
      ),
    )
    .limit(1);
  if (saved) return;
  await db
    .update(projects)
    .set(values)
    .where(
      and(
        eq(projects.id, projectId),
        isNull(projects.siteRunLengthMm),
        isNull(projects.trackLines),
        isNull(projects.stockSheetId),
        isNull(projects.machineId),
      ),
    );
}

interface DemoReview {
  sentBy: string;
  sentAt: string;
  message: string;
  runLength: number;
  endTreatment: schema.EndTreatment;
  deposit?: { amount: number; currency: Currency; paidAt?: string };
  comments: { by: string; at: number | null; text: string; createdAt: string }[];
  decision?: {
    by: string;
    decision: schema.ReviewDecision;
    typedName: string;
    signedAt: string;
    address: string;
    userAgent: string;
  };
}

/**
 * A review of the design's first revision, as the app would have written it: the request, the
 * thread, and (for the approved project) the client's sign-off, the deposit and its payment. Only
 * when the revision has no review yet, so a re-run adds nothing.
 */
async function seedReview(projectId: number, designId: number, r: DemoReview, userIds: Map<string, number>) {
  const [revision] = await db
    .select()
    .from(revisions)
    .where(and(eq(revisions.designId, designId), eq(revisions.number, 1)))
    .limit(1);
  if (!revision || (await idOf(db.select({ id: reviews.id }).from(reviews).where(eq(reviews.revisionId, revision.id)))))
    return;
  await db.transaction(async (tx) => {
    const [res] = await tx.insert(reviews).values({
      revisionId: revision.id,
      projectId,
      message: r.message,
      runLengthMm: r.runLength,
      endTreatment: r.endTreatment,
      requestedById: userIds.get(r.sentBy),
      createdAt: new Date(r.sentAt),
    });
    const reviewId = res.insertId;
    for (const c of r.comments)
      await tx
        .insert(reviewComments)
        .values({ reviewId, authorId: userIds.get(c.by)!, text: c.text, at: c.at, createdAt: new Date(c.createdAt) });
    let depositId: number | undefined;
    if (r.deposit) {
      const paid = r.decision?.decision === "approve" && r.deposit.paidAt;
      const [dep] = await tx.insert(deposits).values({
        reviewId,
        projectId,
        amountMinor: toMinor(r.deposit.amount, r.deposit.currency)!,
        currency: r.deposit.currency,
        status: paid ? "paid" : r.decision?.decision === "approve" ? "due" : "on-approval",
        checkoutSessionId: paid ? `cs_demo_seed_${reviewId}` : null,
        paidAt: paid ? new Date(r.deposit.paidAt!) : null,
      });
      depositId = dep.insertId;
      if (paid)
        await tx.insert(paymentEvents).values({
          eventId: `evt_demo_seed_${reviewId}`,
          type: "checkout.session.completed",
          depositId,
          receivedAt: new Date(r.deposit.paidAt!),
        });
    }
    if (r.decision) {
      // The hash is recomputed from the stored spec, as the decision route does.
      await tx.insert(signOffs).values({
        reviewId,
        revisionId: revision.id,
        specHash: specHash(revision.spec),
        engineVersion: ENGINE_VERSION,
        decision: r.decision.decision,
        typedName: r.decision.typedName,
        userId: userIds.get(r.decision.by)!,
        signedAt: new Date(r.decision.signedAt),
        address: r.decision.address,
        userAgent: r.decision.userAgent,
      });
    }
  });
  added++;
}

try {
  const orgIds = new Map<string, number>();
  for (const org of demo.organisations) {
    let id = await idOf(
      db.select({ id: organisations.id }).from(organisations).where(eq(organisations.name, org.name)),
    );
    if (id === undefined) {
      const [res] = await db
        .insert(organisations)
        .values({ name: org.name, kind: org.kind as "shop" | "client" | "installer" });
      id = res.insertId;
      added++;
    }
    orgIds.set(org.name, id);
  }

  const userIds = new Map<string, number>();
  const passwordHash = await hashPassword(demo.password);
  for (const u of demo.users) {
    let id = await idOf(db.select({ id: users.id }).from(users).where(eq(users.email, u.email)));
    if (id === undefined) {
      const [res] = await db.insert(users).values({
        email: u.email,
        name: u.name,
        role: u.role as schema.UserRole,
        passwordHash,
        organisationId: orgIds.get(u.organisation),
      });
      id = res.insertId;
      added++;
    }
    userIds.set(u.email, id);
  }

  const materialIds = new Map<string, number>();
  for (const m of library.materials) {
    let id = await idOf(db.select({ id: materials.id }).from(materials).where(eq(materials.name, m.name)));
    if (id === undefined) {
      const [res] = await db
        .insert(materials)
        .values({ ...m, kind: m.kind as schema.MaterialKind, sourceKind: m.sourceKind as SourceKind });
      id = res.insertId;
      added++;
    }
    materialIds.set(m.name, id);
  }
  for (const { material, ...sheet } of library.stockSheets) {
    if (await idOf(db.select({ id: stockSheets.id }).from(stockSheets).where(eq(stockSheets.name, sheet.name))))
      continue;
    await db.insert(stockSheets).values({
      ...sheet,
      materialId: materialIds.get(material)!,
      grain: sheet.grain as (typeof schema.GRAIN_DIRECTIONS)[number],
      sourceKind: sheet.sourceKind as SourceKind,
    });
    added++;
  }
  for (const machine of library.machines) {
    if (await idOf(db.select({ id: machines.id }).from(machines).where(eq(machines.name, machine.name)))) continue;
    await db
      .insert(machines)
      .values({ ...machine, kind: machine.kind as schema.MachineKind, sourceKind: machine.sourceKind as SourceKind });
    added++;
  }

  const adminId = userIds.get("admin@example.test");
  const fabricatorId = userIds.get("fabricator@example.test");
  for (const p of demo.projects) {
    const site = "siteAndStock" in p && p.siteAndStock ? await siteValues(p.siteAndStock as DemoSite) : null;
    let id = await idOf(db.select({ id: projects.id }).from(projects).where(eq(projects.name, p.name)));
    if (id === undefined) {
      const [res] = await db.insert(projects).values({
        name: p.name,
        site: p.site,
        status: p.status as schema.ProjectStatus,
        clientOrganisationId: orgIds.get(p.client),
        createdById: adminId,
        ...site,
      });
      id = res.insertId;
      added++;
    } else if (site) await fillSiteOnce(id, site);
    for (const m of p.members) {
      const userId = userIds.get(m.email)!;
      const existing = await idOf(
        db
          .select({ id: projectMembers.id })
          .from(projectMembers)
          .where(and(eq(projectMembers.projectId, id), eq(projectMembers.userId, userId))),
      );
      if (existing === undefined) {
        await db
          .insert(projectMembers)
          .values({ projectId: id, userId, role: m.role as schema.MemberRole, addedById: adminId });
        added++;
      }
    }
    for (const d of p.designs ?? []) {
      let designId = await idOf(
        db
          .select({ id: designs.id })
          .from(designs)
          .where(and(eq(designs.projectId, id), eq(designs.name, d.name))),
      );
      if (designId === undefined) {
        // The same path as saving in the studio: the engine's schema, its solve, its canonical hash.
        const spec = parseSpec(d.spec);
        const [res] = await db.insert(designs).values({
          projectId: id,
          name: d.name,
          mode: spec.mode,
          draft: spec as unknown as Record<string, unknown>,
          loads: demoLoads(d),
          createdById: fabricatorId,
        });
        designId = res.insertId;
        await db.insert(revisions).values({
          designId,
          number: 1,
          spec: spec as unknown as Record<string, unknown>,
          specHash: specHash(spec),
          engineVersion: ENGINE_VERSION,
          summary: summarise(solve(spec)) as unknown as Record<string, unknown>,
          loads: demoLoads(d),
          note: d.note,
          createdById: fabricatorId,
        });
        added += 2;
      }
      if ("review" in d && d.review) await seedReview(id, designId, d.review as DemoReview, userIds);
      if ("build" in d && d.build) added += await seedDemoBuild(db, id, d.name, p.name, d.build as DemoBuild, userIds);
    }
  }
  console.log(`[axlewright] demo data seeded (${added} new rows)`);
} finally {
  await connection.end();
}
