// A small world of its own for each test file: people of every role, a project some of them belong
// to and one they do not. Names carry a run tag, so repeated runs never collide with each other or
// with the seeded demo data.
import { count, eq } from "drizzle-orm";
import { db } from "@/db";
import { auditLog, projectMembers, projects, users, type MemberRole, type UserRole } from "@/db/schema";
import { hashPassword } from "@/lib/server/passwords";

export const runTag = `${Date.now().toString(36)}${Math.floor(Math.random() * 1e6).toString(36)}`;
let serial = 0;
let passwordHash: string | undefined;

export async function makeUser(role: UserRole, label: string = role): Promise<{ id: number; email: string }> {
  passwordHash ??= await hashPassword("integration-password-1");
  const email = `${label}.${runTag}.${++serial}@example.test`;
  const [res] = await db.insert(users).values({ email, name: `${label} ${serial}`, role, passwordHash });
  return { id: res.insertId, email };
}

export async function makeProject(name: string, members: { userId: number; role: MemberRole }[]): Promise<number> {
  const [res] = await db.insert(projects).values({ name: `${name} ${runTag}`, site: "Test bench" });
  for (const m of members)
    await db.insert(projectMembers).values({ projectId: res.insertId, userId: m.userId, role: m.role });
  return res.insertId;
}

export async function addMembership(projectId: number, userId: number, role: MemberRole): Promise<number> {
  const [res] = await db.insert(projectMembers).values({ projectId, userId, role });
  return res.insertId;
}

/** Every mutation writes one audit entry, so this count tells whether anything was written. */
export async function auditCount(): Promise<number> {
  const [row] = await db.select({ n: count() }).from(auditLog);
  return row.n;
}

export async function membershipExists(memberId: number): Promise<boolean> {
  return (
    (await db.select({ id: projectMembers.id }).from(projectMembers).where(eq(projectMembers.id, memberId))).length ===
    1
  );
}
