import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { db } from "@/db";
import { projectMembers, projects, users, type MemberRole } from "@/db/schema";
import { audit } from "./audit";
import type { CurrentUser } from "./current-user";
import { Refusal } from "./refusal";

export interface MemberRow {
  id: number;
  userId: number;
  name: string;
  email: string;
  role: MemberRole;
  active: boolean;
}

export async function listMembers(projectId: number): Promise<MemberRow[]> {
  return db
    .select({
      id: projectMembers.id,
      userId: users.id,
      name: users.name,
      email: users.email,
      role: projectMembers.role,
      active: users.active,
    })
    .from(projectMembers)
    .innerJoin(users, eq(users.id, projectMembers.userId))
    .where(eq(projectMembers.projectId, projectId))
    .orderBy(asc(projectMembers.role), asc(users.name));
}

/** A membership of this project; one of another project is "not found" here, and nothing is touched. */
async function memberOfProject(projectId: number, memberId: number) {
  const [row] = await db
    .select()
    .from(projectMembers)
    .where(and(eq(projectMembers.id, memberId), eq(projectMembers.projectId, projectId)))
    .limit(1);
  if (!row) throw new Refusal("not_found", "That person is not a member of this project.");
  return row;
}

function checkRoleFits(userRole: string, memberRole: MemberRole) {
  if (userRole === "admin")
    throw new Refusal("bad_request", "Admins see every project already; they are not added as members.", {
      userId: ["Admins are not added as members."],
    });
  if (userRole !== memberRole) {
    throw new Refusal(
      "bad_request",
      `This person's role is ${userRole}; they can join a project only as ${userRole}.`,
      {
        role: [`Must match the person's role (${userRole}).`],
      },
    );
  }
}

export async function addMember(
  actor: CurrentUser,
  projectId: number,
  input: { userId: number; role: MemberRole },
): Promise<number> {
  const [user] = await db.select().from(users).where(eq(users.id, input.userId)).limit(1);
  if (!user) throw new Refusal("bad_request", "No such person.", { userId: ["No such person."] });
  if (!user.active)
    throw new Refusal("bad_request", "That account is deactivated.", { userId: ["That account is deactivated."] });
  checkRoleFits(user.role, input.role);
  return db.transaction(async (tx) => {
    const [existing] = await tx
      .select({ id: projectMembers.id })
      .from(projectMembers)
      .where(and(eq(projectMembers.projectId, projectId), eq(projectMembers.userId, input.userId)))
      .limit(1);
    if (existing)
      throw new Refusal("conflict", `${user.name} is already a member of this project.`, {
        userId: ["Already a member."],
      });
    const [res] = await tx
      .insert(projectMembers)
      .values({ projectId, userId: input.userId, role: input.role, addedById: actor.id });
    await tx.update(projects).set({ updatedAt: new Date() }).where(eq(projects.id, projectId));
    await audit(tx, {
      actorId: actor.id,
      action: "add",
      entity: "project_members",
      entityId: res.insertId,
      projectId,
      detail: { userId: input.userId, role: input.role },
    });
    return res.insertId;
  });
}

export async function updateMemberRole(
  actor: CurrentUser,
  projectId: number,
  memberId: number,
  role: MemberRole,
): Promise<void> {
  const member = await memberOfProject(projectId, memberId);
  const [user] = await db.select({ role: users.role }).from(users).where(eq(users.id, member.userId)).limit(1);
  checkRoleFits(user?.role ?? "", role);
  await db.transaction(async (tx) => {
    await tx.update(projectMembers).set({ role }).where(eq(projectMembers.id, memberId));
    await audit(tx, {
      actorId: actor.id,
      action: "update",
      entity: "project_members",
      entityId: memberId,
      projectId,
      detail: { role },
    });
  });
}

export async function removeMember(actor: CurrentUser, projectId: number, memberId: number): Promise<void> {
  const member = await memberOfProject(projectId, memberId);
  if (member.userId === actor.id && actor.role !== "admin") {
    throw new Refusal("bad_request", "You cannot remove yourself; ask an admin.");
  }
  await db.transaction(async (tx) => {
    await tx.delete(projectMembers).where(eq(projectMembers.id, memberId));
    await audit(tx, {
      actorId: actor.id,
      action: "remove",
      entity: "project_members",
      entityId: memberId,
      projectId,
      detail: { userId: member.userId },
    });
  });
}
