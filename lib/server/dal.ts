import "server-only";
// The one place that decides who is asking and what they may do. Every page, server action and
// route handler calls these; the proxy only redirects early.
import { and, eq } from "drizzle-orm";
import { redirect } from "next/navigation";
import { cache } from "react";
import { auth } from "@/auth";
import { db } from "@/db";
import { findDesign, findRevision } from "@/db/queries/designs";
import type { CurrentUser } from "@/db/queries/current-user";
import { findReview } from "@/db/queries/reviews";
import { isSessionEnded } from "@/db/queries/sessions";
import { projectMembers, projects, users, type MemberRole, type UserRole } from "@/db/schema";
import { AppError, notFoundAs } from "./errors";

export type { CurrentUser };

/** The signed-in, active user, read fresh from the database, or null. */
export const getCurrentUser = cache(async (): Promise<CurrentUser | null> => {
  const session = await auth();
  const id = Number(session?.user?.id);
  if (!Number.isInteger(id) || id <= 0) return null;
  const [user] = await db
    .select({
      id: users.id,
      email: users.email,
      name: users.name,
      role: users.role,
      active: users.active,
      sessionsFrom: users.sessionsFrom,
    })
    .from(users)
    .where(eq(users.id, id))
    .limit(1);
  if (!user || !user.active) return null;
  // A session signed in before the password last changed has ended.
  if (user.sessionsFrom && !((session?.user?.signedInAt ?? 0) * 1000 >= user.sessionsFrom.getTime())) return null;
  // So has one signed out, even if a copy of its token comes back.
  const sessionId = session?.user?.sessionId;
  if (sessionId && (await isSessionEnded(sessionId))) return null;
  return { id: user.id, email: user.email, name: user.name, role: user.role };
});

export async function requireUser(): Promise<CurrentUser> {
  const user = await getCurrentUser();
  if (!user) throw new AppError("unauthorized");
  return user;
}

export async function requireRole(...roles: UserRole[]): Promise<CurrentUser> {
  const user = await requireUser();
  if (!roles.includes(user.role)) throw new AppError("forbidden");
  return user;
}

export interface ProjectAccess {
  user: CurrentUser;
  projectId: number;
  /** The user's role in this project; null for an admin who is not a member. */
  memberRole: MemberRole | null;
  /** May change the project and its members: an admin, or the project's fabricator. */
  canManage: boolean;
}

/**
 * The caller's access to one project. A project the caller does not belong to answers 404, the
 * same as one that does not exist, so ids reveal nothing. `manage` asks for change rights (403 otherwise).
 */
export async function requireProjectAccess(
  projectId: number,
  need: "view" | "manage" = "view",
): Promise<ProjectAccess> {
  const user = await requireUser();
  const notFound = new AppError("not_found", "No such project.");
  if (!Number.isInteger(projectId) || projectId <= 0) throw notFound;
  const [row] = await db
    .select({ id: projects.id, memberRole: projectMembers.role })
    .from(projects)
    .leftJoin(projectMembers, and(eq(projectMembers.projectId, projects.id), eq(projectMembers.userId, user.id)))
    .where(eq(projects.id, projectId))
    .limit(1);
  if (!row) throw notFound;
  const memberRole = row.memberRole ?? null;
  if (user.role !== "admin" && !memberRole) throw notFound;
  const canManage = user.role === "admin" || (memberRole === "fabricator" && user.role === "fabricator");
  if (need === "manage" && !canManage)
    throw new AppError("forbidden", "Only the project's fabricator or an admin can change this project.");
  return { user, projectId, memberRole, canManage };
}

/** For pages: the signed-in user, or a redirect to the sign-in page. */
export async function requirePageUser(): Promise<CurrentUser> {
  const user = await getCurrentUser();
  if (!user) redirect("/login");
  return user;
}

/** Access to a design goes through its project: the same rules, and 404 for what one cannot see. */
export async function requireDesignAccess(designId: number, need: "view" | "manage" = "view") {
  await requireUser();
  const design = await findDesign(designId);
  if (!design) throw new AppError("not_found", "No such design.");
  const access = await requireProjectAccess(design.projectId, need).catch(notFoundAs("No such design."));
  return { ...access, design };
}

/** Access to a revision: any member of its project may view it; nobody may change it. */
export async function requireRevisionAccess(revisionId: number) {
  await requireUser();
  const found = await findRevision(revisionId);
  if (!found) throw new AppError("not_found", "No such revision.");
  const access = await requireProjectAccess(found.projectId).catch(notFoundAs("No such revision."));
  return { ...access, revision: found.revision, designName: found.designName };
}

/**
 * Cut plans and cut files belong to the shop: an admin or the project's fabricator. Other members
 * (clients, installers) see the revision but never its cut files.
 */
export async function requireCutPlanAccess(revisionId: number) {
  const access = await requireRevisionAccess(revisionId);
  if (!access.canManage)
    throw new AppError("forbidden", "Cut plans and cut files are for the shop: the project's fabricator or an admin.");
  return access;
}

/** Access to a review goes through its project: any member (and an admin) may read it and comment; 404 for the rest. */
export async function requireReviewAccess(reviewId: number) {
  await requireUser();
  const review = await findReview(reviewId);
  if (!review) throw new AppError("not_found", "No such review.");
  const access = await requireProjectAccess(review.projectId).catch(notFoundAs("No such review."));
  return { ...access, review };
}

/** Only the project's client members decide a review: the shop cannot sign for its client (403). */
export async function requireReviewSigner(reviewId: number) {
  const access = await requireReviewAccess(reviewId);
  if (access.memberRole !== "client")
    throw new AppError(
      "forbidden",
      "Only the project's client can approve or ask for changes; the shop cannot sign for them.",
    );
  return access;
}
