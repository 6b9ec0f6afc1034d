import "server-only";
import { asc, eq, ne } from "drizzle-orm";
import { db } from "@/db";
import { organisations, users, type UserRole } from "@/db/schema";
import { audit } from "./audit";
import type { CurrentUser } from "./current-user";
import { Refusal } from "./refusal";

export interface UserRow {
  id: number;
  email: string;
  name: string;
  role: UserRole;
  active: boolean;
  organisation: string | null;
}

export async function listUsers(): Promise<UserRow[]> {
  return db
    .select({
      id: users.id,
      email: users.email,
      name: users.name,
      role: users.role,
      active: users.active,
      organisation: organisations.name,
    })
    .from(users)
    .leftJoin(organisations, eq(organisations.id, users.organisationId))
    .orderBy(asc(users.role), asc(users.name));
}

/** People who can be added to projects: active and not admins. */
export async function listAssignableUsers(): Promise<UserRow[]> {
  return (await listUsers()).filter((u) => u.active && u.role !== "admin");
}

/** Adds an account; `hashPassword` (Argon2id, lib/server/passwords.ts) runs only once the e-mail is known to be free. */
export async function createUser(
  actor: CurrentUser,
  input: { email: string; name: string; role: UserRole; password: string },
  hashPassword: (password: string) => Promise<string>,
): Promise<number> {
  const [taken] = await db.select({ id: users.id }).from(users).where(eq(users.email, input.email)).limit(1);
  if (taken)
    throw new Refusal("conflict", "An account with that e-mail already exists.", { email: ["Already in use."] });
  const passwordHash = await hashPassword(input.password);
  return db.transaction(async (tx) => {
    const [res] = await tx
      .insert(users)
      .values({ email: input.email, name: input.name, role: input.role, passwordHash });
    await audit(tx, {
      actorId: actor.id,
      action: "create",
      entity: "users",
      entityId: res.insertId,
      detail: { email: input.email, role: input.role },
    });
    return res.insertId;
  });
}

async function existingUser(userId: number) {
  const [user] = await db.select().from(users).where(eq(users.id, userId)).limit(1);
  if (!user) throw new Refusal("not_found", "No such user.");
  return user;
}

/** The last active admin keeps the role and the account, so the shop is never locked out. */
async function assertNotLastAdmin(userId: number) {
  const admins = await db.select({ id: users.id }).from(users).where(eq(users.role, "admin"));
  const activeOthers = (
    await db.select({ id: users.id, role: users.role, active: users.active }).from(users).where(ne(users.id, userId))
  ).filter((u) => u.role === "admin" && u.active);
  if (admins.some((a) => a.id === userId) && activeOthers.length === 0) {
    throw new Refusal("conflict", "This is the last active admin; make someone else admin first.");
  }
}

export async function changeUserRole(actor: CurrentUser, userId: number, role: UserRole): Promise<void> {
  const user = await existingUser(userId);
  if (user.role === role) return;
  if (user.role === "admin") await assertNotLastAdmin(userId);
  await db.transaction(async (tx) => {
    await tx.update(users).set({ role }).where(eq(users.id, userId));
    await audit(tx, {
      actorId: actor.id,
      action: "change_role",
      entity: "users",
      entityId: userId,
      detail: { from: user.role, to: role },
    });
  });
}

export async function setUserActive(actor: CurrentUser, userId: number, active: boolean): Promise<void> {
  const user = await existingUser(userId);
  if (user.active === active) return;
  if (!active) {
    if (userId === actor.id) throw new Refusal("bad_request", "You cannot deactivate your own account.");
    if (user.role === "admin") await assertNotLastAdmin(userId);
  }
  await db.transaction(async (tx) => {
    await tx.update(users).set({ active }).where(eq(users.id, userId));
    await audit(tx, {
      actorId: actor.id,
      action: active ? "activate" : "deactivate",
      entity: "users",
      entityId: userId,
    });
  });
}
