// Seeds the invented demo scenario (db/demo-data.json). Idempotent: each row is looked up by its
// natural key first, so a re-run keeps what is there (including changed passwords) and adds nothing twice.
import { and, eq } from "drizzle-orm";
import { drizzle } from "drizzle-orm/mysql2";
import mysql from "mysql2/promise";
import demo from "../../db/demo-data.json";
import * as schema from "../../db/schema";
import { hashPassword } from "../../lib/server/passwords";

const connection = await mysql.createConnection({ uri: process.env.DATABASE_URL! });
const db = drizzle({ client: connection, schema, mode: "default" });
const { organisations, users, projects, projectMembers } = schema;
let added = 0;

async function idOf<T extends { id: number }>(rows: Promise<T[]>): Promise<number | undefined> {
  return (await rows)[0]?.id;
}

try {
  const orgIds = new Map<string, number>();
  for (const org of demo.organisations) {
    let id = await idOf(db.select({ id: organisations.id }).from(organisations).where(eq(organisations.name, org.name)));
    if (id === undefined) {
      const [res] = await db.insert(organisations).values({ name: org.name, kind: org.kind as "shop" | "client" | "installer" });
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
        email: u.email, name: u.name, role: u.role as schema.UserRole, passwordHash, organisationId: orgIds.get(u.organisation),
      });
      id = res.insertId;
      added++;
    }
    userIds.set(u.email, id);
  }

  const adminId = userIds.get("admin@example.test");
  for (const p of demo.projects) {
    let id = await idOf(db.select({ id: projects.id }).from(projects).where(eq(projects.name, p.name)));
    if (id === undefined) {
      const [res] = await db.insert(projects).values({
        name: p.name, site: p.site, status: p.status as schema.ProjectStatus, clientOrganisationId: orgIds.get(p.client), createdById: adminId,
      });
      id = res.insertId;
      added++;
    }
    for (const m of p.members) {
      const userId = userIds.get(m.email)!;
      const existing = await idOf(
        db.select({ id: projectMembers.id }).from(projectMembers).where(and(eq(projectMembers.projectId, id), eq(projectMembers.userId, userId))),
      );
      if (existing === undefined) {
        await db.insert(projectMembers).values({ projectId: id, userId, role: m.role as schema.MemberRole, addedById: adminId });
        added++;
      }
    }
  }
  console.log(`[axlewright] demo data seeded (${added} new rows)`);
} finally {
  await connection.end();
}
