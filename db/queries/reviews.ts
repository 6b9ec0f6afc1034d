import "server-only";
// Reviews, their comments and the client's decision. A decision is one insert into `sign_offs`
// (unique per review, and refused UPDATE and DELETE by a trigger), written in the same transaction
// as its comment, the project's new status, the deposit falling due and the audit entries, so a
// refused or failed decision leaves nothing behind.
import { and, asc, desc, eq, inArray, isNull } from "drizzle-orm";
import { alias } from "drizzle-orm/mysql-core";
import { db } from "@/db";
import { isDuplicateKey } from "@/db/duplicate-key";
import {
  deposits,
  designs,
  organisations,
  projectMembers,
  projects,
  reviewComments,
  reviews,
  revisions,
  signOffs,
  users,
  type DepositStatus,
  type EndTreatment,
  type MemberRole,
  type ReviewDecision,
} from "@/db/schema";
import { approvalReference, type ApprovalStamp } from "@/lib/review/reference";
import { formatMoney } from "@/lib/money/currency";
import { audit } from "./audit";
import type { CurrentUser } from "./current-user";
import { Refusal } from "./refusal";
import { writeLogEntry } from "./build-log";

export interface ReviewRow {
  id: number;
  revisionId: number;
  revisionNumber: number;
  specHash: string;
  designId: number;
  designName: string;
  projectId: number;
  message: string;
  runLengthMm: number | null;
  endTreatment: EndTreatment | null;
  requestedBy: string | null;
  createdAt: string;
}

export interface CommentRow {
  id: number;
  text: string;
  at: number | null;
  author: string;
  authorRole: MemberRole | "admin" | null;
  createdAt: string;
}

export interface SignOffRow {
  id: number;
  reviewId: number;
  revisionId: number;
  specHash: string;
  engineVersion: string;
  decision: ReviewDecision;
  typedName: string;
  userId: number;
  userName: string;
  organisation: string | null;
  commentId: number | null;
  signedAt: string;
  address: string;
  userAgent: string;
}

export interface DepositRow {
  id: number;
  reviewId: number;
  amountMinor: number;
  currency: string;
  status: DepositStatus;
  checkoutSessionId: string | null;
  paidAt: string | null;
}

export interface ReviewDetail extends ReviewRow {
  comments: CommentRow[];
  decision: SignOffRow | null;
  deposit: DepositRow | null;
}

const iso = (d: Date) => d.toISOString();
const requester = alias(users, "requester");

function reviewQuery() {
  return db
    .select({
      id: reviews.id,
      revisionId: reviews.revisionId,
      revisionNumber: revisions.number,
      specHash: revisions.specHash,
      designId: designs.id,
      designName: designs.name,
      projectId: reviews.projectId,
      message: reviews.message,
      runLengthMm: reviews.runLengthMm,
      endTreatment: reviews.endTreatment,
      requestedBy: requester.name,
      createdAt: reviews.createdAt,
    })
    .from(reviews)
    .innerJoin(revisions, eq(revisions.id, reviews.revisionId))
    .innerJoin(designs, eq(designs.id, revisions.designId))
    .leftJoin(requester, eq(requester.id, reviews.requestedById));
}

const toReview = (r: Omit<ReviewRow, "createdAt"> & { createdAt: Date }): ReviewRow => ({
  ...r,
  createdAt: iso(r.createdAt),
});

export async function findReview(id: number): Promise<ReviewRow | null> {
  const [row] = await reviewQuery().where(eq(reviews.id, id)).limit(1);
  return row ? toReview(row) : null;
}

/** Every review of a project with its decision and deposit, newest first (the project page's list). */
export async function listProjectReviews(
  projectId: number,
): Promise<(ReviewRow & { decision: SignOffRow | null; deposit: DepositRow | null })[]> {
  const rows = (await reviewQuery().where(eq(reviews.projectId, projectId)).orderBy(desc(reviews.id))).map(toReview);
  return attachOutcomes(rows);
}

export async function listRevisionReviews(revisionId: number) {
  const rows = (await reviewQuery().where(eq(reviews.revisionId, revisionId)).orderBy(desc(reviews.id))).map(toReview);
  return attachOutcomes(rows);
}

async function attachOutcomes(rows: ReviewRow[]) {
  if (rows.length === 0) return [];
  const ids = rows.map((r) => r.id);
  const [decided, owed] = await Promise.all([
    signOffQuery().where(inArray(signOffs.reviewId, ids)),
    db.select().from(deposits).where(inArray(deposits.reviewId, ids)),
  ]);
  const byReview = new Map(decided.map((s) => [s.reviewId, toSignOff(s)]));
  const depositBy = new Map(owed.map((d) => [d.reviewId, toDeposit(d)]));
  return rows.map((r) => ({ ...r, decision: byReview.get(r.id) ?? null, deposit: depositBy.get(r.id) ?? null }));
}

function signOffQuery() {
  return db
    .select({
      id: signOffs.id,
      reviewId: signOffs.reviewId,
      revisionId: signOffs.revisionId,
      specHash: signOffs.specHash,
      engineVersion: signOffs.engineVersion,
      decision: signOffs.decision,
      typedName: signOffs.typedName,
      userId: signOffs.userId,
      userName: users.name,
      organisation: organisations.name,
      commentId: signOffs.commentId,
      signedAt: signOffs.signedAt,
      address: signOffs.address,
      userAgent: signOffs.userAgent,
    })
    .from(signOffs)
    .innerJoin(users, eq(users.id, signOffs.userId))
    .leftJoin(organisations, eq(organisations.id, users.organisationId));
}

const toSignOff = (s: Omit<SignOffRow, "signedAt"> & { signedAt: Date }): SignOffRow => ({
  ...s,
  signedAt: iso(s.signedAt),
});
const toDeposit = (d: typeof deposits.$inferSelect): DepositRow => ({
  id: d.id,
  reviewId: d.reviewId,
  amountMinor: d.amountMinor,
  currency: d.currency,
  status: d.status,
  checkoutSessionId: d.checkoutSessionId,
  paidAt: d.paidAt ? iso(d.paidAt) : null,
});

export async function reviewDetail(id: number): Promise<ReviewDetail | null> {
  const review = await findReview(id);
  if (!review) return null;
  const [comments, [decision], [deposit]] = await Promise.all([
    listComments(id, review.projectId),
    signOffQuery().where(eq(signOffs.reviewId, id)).limit(1),
    db.select().from(deposits).where(eq(deposits.reviewId, id)).limit(1),
  ]);
  return {
    ...review,
    comments,
    decision: decision ? toSignOff(decision) : null,
    deposit: deposit ? toDeposit(deposit) : null,
  };
}

async function listComments(reviewId: number, projectId: number): Promise<CommentRow[]> {
  const rows = await db
    .select({
      id: reviewComments.id,
      text: reviewComments.text,
      at: reviewComments.at,
      author: users.name,
      userRole: users.role,
      memberRole: projectMembers.role,
      createdAt: reviewComments.createdAt,
    })
    .from(reviewComments)
    .innerJoin(users, eq(users.id, reviewComments.authorId))
    .leftJoin(projectMembers, and(eq(projectMembers.userId, users.id), eq(projectMembers.projectId, projectId)))
    .where(eq(reviewComments.reviewId, reviewId))
    .orderBy(asc(reviewComments.createdAt), asc(reviewComments.id));
  return rows.map((r) => ({
    id: r.id,
    text: r.text,
    at: r.at,
    author: r.author,
    authorRole: r.memberRole ?? (r.userRole === "admin" ? "admin" : null),
    createdAt: iso(r.createdAt),
  }));
}

/** The revision's approval, if its client approved it (a revision is approved at most once: one open review at a time). */
export async function approvalOf(revisionId: number): Promise<SignOffRow | null> {
  const [row] = await signOffQuery()
    .where(and(eq(signOffs.revisionId, revisionId), eq(signOffs.decision, "approve")))
    .orderBy(desc(signOffs.id))
    .limit(1);
  return row ? toSignOff(row) : null;
}

/** The revision's reviews that are still waiting for the client. */
async function openReviewsOf(revisionId: number, ex: Pick<typeof db, "select"> = db): Promise<number[]> {
  const rows = await ex
    .select({ id: reviews.id })
    .from(reviews)
    .leftJoin(signOffs, eq(signOffs.reviewId, reviews.id))
    .where(and(eq(reviews.revisionId, revisionId), isNull(signOffs.id)));
  return rows.map((r) => r.id);
}

/** Active client members of a project: who reviews and signs. */
export async function clientMembers(projectId: number): Promise<{ id: number; name: string; email: string }[]> {
  return db
    .select({ id: users.id, name: users.name, email: users.email })
    .from(projectMembers)
    .innerJoin(users, eq(users.id, projectMembers.userId))
    .where(and(eq(projectMembers.projectId, projectId), eq(projectMembers.role, "client"), eq(users.active, true)))
    .orderBy(asc(users.name));
}

/** Active fabricator members of a project, and the person who asked for the review: who hears of the decision. */
export async function shopContacts(
  projectId: number,
  alsoUserId: number | null,
): Promise<{ id: number; name: string; email: string }[]> {
  const members = await db
    .select({ id: users.id, name: users.name, email: users.email })
    .from(projectMembers)
    .innerJoin(users, eq(users.id, projectMembers.userId))
    .where(and(eq(projectMembers.projectId, projectId), eq(projectMembers.role, "fabricator"), eq(users.active, true)));
  if (alsoUserId !== null && !members.some((m) => m.id === alsoUserId)) {
    const [extra] = await db
      .select({ id: users.id, name: users.name, email: users.email })
      .from(users)
      .where(and(eq(users.id, alsoUserId), eq(users.active, true)))
      .limit(1);
    if (extra) members.push(extra);
  }
  return members;
}

export interface NewReviewRow {
  revisionId: number;
  revisionNumber: number;
  projectId: number;
  message: string;
  runLengthMm: number | null;
  endTreatment: EndTreatment | null;
  deposit: { amountMinor: number; currency: string } | null;
}

export async function insertReview(actor: CurrentUser, input: NewReviewRow): Promise<number> {
  return db.transaction(async (tx) => {
    // The revision's row is locked so two requests at once cannot both open a review of it.
    await tx.select({ id: revisions.id }).from(revisions).where(eq(revisions.id, input.revisionId)).for("update");
    const [approved] = await tx
      .select({ id: signOffs.id })
      .from(signOffs)
      .where(and(eq(signOffs.revisionId, input.revisionId), eq(signOffs.decision, "approve")))
      .limit(1);
    if (approved)
      throw new Refusal(
        "conflict",
        `R${input.revisionNumber} is approved already: a later change needs a new revision, sent for review again.`,
      );
    const open = await openReviewsOf(input.revisionId, tx);
    if (open.length)
      throw new Refusal(
        "conflict",
        `R${input.revisionNumber} is already with the client for review (review ${open[0]}); wait for their decision.`,
      );
    const [res] = await tx.insert(reviews).values({
      revisionId: input.revisionId,
      projectId: input.projectId,
      message: input.message,
      runLengthMm: input.runLengthMm,
      endTreatment: input.endTreatment,
      requestedById: actor.id,
    });
    const id = res.insertId;
    if (input.deposit)
      await tx.insert(deposits).values({
        reviewId: id,
        projectId: input.projectId,
        amountMinor: input.deposit.amountMinor,
        currency: input.deposit.currency,
      });
    await tx.update(projects).set({ status: "review" }).where(eq(projects.id, input.projectId));
    await writeLogEntry(tx, actor.id, input.projectId, {
      kind: "review",
      text: `${actor.name} sent R${input.revisionNumber} for the client's review${input.deposit ? `, with a deposit of ${formatMoney(input.deposit.amountMinor, input.deposit.currency)} due on approval` : ""}. Status: Client review.`,
      detail: { reviewId: id, revisionId: input.revisionId },
    });
    await audit(tx, {
      actorId: actor.id,
      action: "request-review",
      entity: "reviews",
      entityId: id,
      projectId: input.projectId,
      detail: {
        revisionId: input.revisionId,
        revision: input.revisionNumber,
        runLengthMm: input.runLengthMm,
        endTreatment: input.endTreatment,
        deposit: input.deposit,
        status: "review",
      },
    });
    return id;
  });
}

export async function insertComment(
  actor: CurrentUser,
  review: Pick<ReviewRow, "id" | "projectId">,
  input: { text: string; at: number | null },
): Promise<number> {
  return db.transaction(async (tx) => {
    const [res] = await tx
      .insert(reviewComments)
      .values({ reviewId: review.id, authorId: actor.id, text: input.text, at: input.at });
    await audit(tx, {
      actorId: actor.id,
      action: "comment",
      entity: "review_comments",
      entityId: res.insertId,
      projectId: review.projectId,
      detail: { reviewId: review.id, at: input.at },
    });
    return res.insertId;
  });
}

export interface NewSignOff {
  decision: ReviewDecision;
  typedName: string;
  comment: string | null;
  specHash: string;
  engineVersion: string;
  address: string;
  userAgent: string;
}

export async function insertSignOff(actor: CurrentUser, review: ReviewRow, input: NewSignOff): Promise<SignOffRow> {
  let id: number;
  try {
    id = await db.transaction(async (tx) => {
      // One clock for the record and the log line that quotes its reference.
      const signedAt = new Date();
      let commentId: number | null = null;
      if (input.comment) {
        const [c] = await tx
          .insert(reviewComments)
          .values({ reviewId: review.id, authorId: actor.id, text: input.comment, at: null });
        commentId = c.insertId;
      }
      const [res] = await tx.insert(signOffs).values({
        reviewId: review.id,
        revisionId: review.revisionId,
        specHash: input.specHash,
        engineVersion: input.engineVersion,
        decision: input.decision,
        typedName: input.typedName,
        userId: actor.id,
        commentId,
        address: input.address,
        userAgent: input.userAgent,
        signedAt,
      });
      const status = input.decision === "approve" ? "approved" : "design";
      await tx.update(projects).set({ status }).where(eq(projects.id, review.projectId));
      await writeLogEntry(tx, actor.id, review.projectId, {
        kind: "review",
        text:
          input.decision === "approve"
            ? `${input.typedName} approved ${review.designName} R${review.revisionNumber} for fabrication (reference ${approvalReference({ specHash: input.specHash, signedAt })}). Status: Approved.`
            : `${input.typedName} asked for changes to ${review.designName} R${review.revisionNumber}: ${input.comment ?? ""} Status: In design.`,
        detail: { reviewId: review.id, revisionId: review.revisionId, decision: input.decision },
      });
      if (input.decision === "approve")
        await tx
          .update(deposits)
          .set({ status: "due" })
          .where(and(eq(deposits.reviewId, review.id), eq(deposits.status, "on-approval")));
      await audit(tx, {
        actorId: actor.id,
        action: input.decision === "approve" ? "approve" : "request-changes",
        entity: "sign_offs",
        entityId: res.insertId,
        projectId: review.projectId,
        detail: {
          reviewId: review.id,
          revisionId: review.revisionId,
          revision: review.revisionNumber,
          specHash: input.specHash,
          status,
          commentId,
        },
      });
      return res.insertId;
    });
  } catch (error) {
    // Another decision on this review got there first.
    if (isDuplicateKey(error))
      throw new Refusal("conflict", "This review has been decided already; a decision cannot be changed.");
    throw error;
  }
  const [row] = await signOffQuery().where(eq(signOffs.id, id)).limit(1);
  return toSignOff(row);
}

/** The project's deposit as its page shows it: the newest review's that asked for one. */
export async function projectDeposit(projectId: number): Promise<DepositRow | null> {
  const [row] = await db
    .select()
    .from(deposits)
    .where(eq(deposits.projectId, projectId))
    .orderBy(desc(deposits.id))
    .limit(1);
  return row ? toDeposit(row) : null;
}

/** The approval stamp every later file of a revision carries, or null: the files say NOT APPROVED. */
export async function approvalStamp(revision: { id: number; number: number }): Promise<ApprovalStamp | null> {
  const s = await approvalOf(revision.id);
  if (!s) return null;
  return {
    reference: approvalReference(s),
    revision: revision.number,
    typedName: s.typedName,
    organisation: s.organisation,
    signedAt: s.signedAt,
  };
}
