import "server-only";
// The client's review on the server: the fabricator's request (the run the mock-up shows, an
// optional deposit, the e-mail with its animated preview), comments, and the decision — signed
// against the spec hash recomputed from the stored spec at that moment, never against what the
// browser says it showed.
import { latestCutPlan } from "@/db/queries/cut-plans";
import { findRevision } from "@/db/queries/designs";
import { getProjectSummary } from "@/db/queries/projects";
import {
  clientMembers,
  insertComment,
  insertReview,
  insertSignOff,
  listRevisionReviews,
  reviewDetail,
  shopContacts,
  type ReviewDetail,
  type ReviewRow,
  type SignOffRow,
} from "@/db/queries/reviews";
import type { EndTreatment, Revision } from "@/db/schema";
import { parseCutSettings } from "@/lib/cut/settings";
import { buildRun, hasTrack } from "@/lib/cut/run-length";
import { formatMoney, toMinor } from "@/lib/money/currency";
import { approvalReference } from "@/lib/review/reference";
import { reviewStatus, showsRun } from "@/lib/review/review-state";
import { ENGINE_VERSION, specHash, type SolveResult } from "@/lib/track";
import type { Decision, NewReview } from "@/lib/validation/reviews";
import { reviewDecidedMail, reviewRequestMail } from "./review-mail";
import type { CurrentUser, ProjectAccess } from "./dal";
import { solveStored } from "./designs";
import { runTask } from "./pool";
import { SERVER_SOLVE_DEADLINE_MS } from "@/lib/validation/limits";
import { AppError, toAppError } from "./errors";
import { sendMail } from "./mail";
import { appUrl, clientAddress, userAgent } from "./request";

/** The run a review shows when neither the request, a cut plan nor an earlier review says (the cut settings' default). */
const DEFAULT_RUN_MM = 2400;

export const reviewPath = (projectId: number, reviewId: number) => `/projects/${projectId}/reviews/${reviewId}`;

/** The run the mock-up shows: as asked, else the revision's cut plan, else an earlier review of the design, else the default. */
async function chooseRun(
  revision: Revision,
  input: NewReview,
  result: SolveResult,
): Promise<{ runLengthMm: number; endTreatment: EndTreatment } | null> {
  if (!showsRun(result.mode)) return null;
  let runLengthMm = input.runLength;
  let endTreatment = input.endTreatment;
  if (runLengthMm === undefined || endTreatment === undefined) {
    const plan = await latestCutPlan(revision.id);
    const composed = (plan?.settings as { composed?: { runLength?: number; endTreatment?: EndTreatment } } | undefined)
      ?.composed;
    const earlier = (await listRevisionReviews(revision.id)).find((r) => r.runLengthMm !== null);
    runLengthMm ??= composed?.runLength ?? earlier?.runLengthMm ?? DEFAULT_RUN_MM;
    endTreatment ??= composed?.endTreatment ?? earlier?.endTreatment ?? "flat";
  }
  if (hasTrack(result)) {
    try {
      buildRun(result, parseCutSettings({ runLength: runLengthMm, endTreatment }));
    } catch (error) {
      // The request's only cut figure is the run length: any refusal of the run is put beside it.
      throw toAppError(error, { cutField: "runLength" });
    }
  }
  return { runLengthMm, endTreatment };
}

export async function requestReview(
  access: ProjectAccess & { revision: Revision; designName: string },
  input: NewReview,
): Promise<{ id: number; revisionId: number; mailed: number }> {
  if (!access.canManage)
    throw new AppError("forbidden", "Only the project's fabricator or an admin can send a revision for review.");
  const { revision, projectId } = access;
  const clients = await clientMembers(projectId);
  if (clients.length === 0)
    throw new AppError(
      "unprocessable",
      "This project has no client member to review it: add the client to the project first.",
    );
  const result = await solveStored(revision.spec);
  const run = await chooseRun(revision, input, result);
  let deposit: { amountMinor: number; currency: string } | null = null;
  if (input.deposit) {
    const minor = toMinor(input.deposit.amount, input.deposit.currency);
    if (minor === null)
      throw new AppError("bad_request", `A ${input.deposit.currency} amount cannot have that many decimals.`, {
        "deposit.amount": ["Too many decimals for this currency."],
      });
    deposit = { amountMinor: minor, currency: input.deposit.currency };
  }
  const id = await insertReview(access.user, {
    revisionId: revision.id,
    revisionNumber: revision.number,
    projectId,
    message: input.message,
    runLengthMm: run?.runLengthMm ?? null,
    endTreatment: run?.endTreatment ?? null,
    deposit,
  });
  const project = await getProjectSummary(projectId);
  // The picture is made once and attached to every client's message: the same engine result the review page rolls.
  const preview = await runTask(
    "animatedPreview",
    { spec: revision.spec },
    { deadlineMs: SERVER_SOLVE_DEADLINE_MS },
  ).then(
    // A Buffer comes back from the thread as a plain Uint8Array; the mailer wants a Buffer.
    (p) => ({ ...p, data: Buffer.from(p.data) }),
    (error: unknown) => {
      console.error("[axlewright] review preview not made:", error instanceof Error ? error.message : error);
      return null;
    },
  );
  let mailed = 0;
  for (const client of clients) {
    const mail = reviewRequestMail({
      to: client,
      from: access.user.name,
      project: project?.name ?? "your project",
      design: access.designName,
      revision: revision.number,
      message: input.message,
      link: appUrl(reviewPath(projectId, id)),
      deposit: deposit ? formatMoney(deposit.amountMinor, deposit.currency) : null,
      preview,
    });
    if (await sendMail(mail)) mailed++;
  }
  return { id, revisionId: revision.id, mailed };
}

export async function addReviewComment(
  access: ProjectAccess & { review: ReviewRow },
  input: { text: string; at?: number | null },
) {
  const at = input.at ?? null;
  if (at !== null) {
    const range =
      access.review.runLengthMm !== null
        ? {
            max: access.review.runLengthMm,
            what: `a place along the ${Math.round(access.review.runLengthMm)} mm run (mm from its start)`,
          }
        : { max: 360, what: "the driver's turn in degrees (0 to 360)" };
    if (at < 0 || at > range.max)
      throw new AppError("bad_request", `The pin must be ${range.what}.`, {
        at: [`Between 0 and ${Number(range.max.toFixed(1))}.`],
      });
  }
  const id = await insertComment(access.user, access.review, { text: input.text, at });
  return { id };
}

/** Names match when they are the same words, whatever the case, spacing or Unicode form. */
export function sameName(typed: string, account: string): boolean {
  const norm = (s: string) => s.normalize("NFKC").trim().replace(/\s+/g, " ").toLocaleLowerCase("en");
  return norm(typed) === norm(account);
}

export async function decideReview(
  access: ProjectAccess & { review: ReviewRow },
  input: Decision,
  request: Request,
): Promise<{ signOff: SignOffRow; payment: { url: string } | null }> {
  const { review, user } = access;
  const existing = await reviewDetail(review.id);
  if (existing?.decision)
    throw new AppError("conflict", "This review has been decided already; a decision cannot be changed.");
  if (!sameName(input.typedName, user.name))
    throw new AppError("unprocessable", "The name typed does not match the name on your account.", {
      typedName: [`Type your full name as it is on your account: ${user.name}.`],
    });
  const found = await findRevision(review.revisionId);
  if (!found) throw new AppError("not_found", "No such revision.");
  // The hash is recomputed from the spec as stored now: a revision whose stored spec no longer
  // gives its recorded hash is not signed, whatever the page showed.
  const hash = specHash(found.revision.spec);
  if (hash !== found.revision.specHash)
    throw new AppError(
      "conflict",
      `R${found.revision.number}'s stored spec no longer matches its recorded hash, so it cannot be signed. Nothing was saved; tell the shop.`,
    );
  const signOff = await insertSignOff(user, review, {
    decision: input.decision,
    typedName: input.typedName.trim().replace(/\s+/g, " "),
    comment: input.comment || null,
    specHash: hash,
    engineVersion: ENGINE_VERSION,
    address: clientAddress(request),
    userAgent: userAgent(request),
  });
  const project = await getProjectSummary(review.projectId);
  const shop = await shopContacts(review.projectId, null);
  for (const to of shop) {
    await sendMail(
      reviewDecidedMail({
        to,
        project: project?.name ?? "the project",
        design: review.designName,
        revision: review.revisionNumber,
        decision: input.decision,
        by: `${signOff.typedName}${signOff.organisation ? ` (${signOff.organisation})` : ""}`,
        reference: approvalReference(signOff),
        signedAt: signOff.signedAt,
        comment: input.comment || null,
        link: appUrl(reviewPath(review.projectId, review.id)),
      }),
    );
  }
  let payment: { url: string } | null = null;
  if (input.decision === "approve" && existing?.deposit) payment = await startDepositPayment(review, existing, user);
  return { signOff, payment };
}

/** Sends the client on to pay a due deposit; a payment-service failure leaves the decision standing and the page offers to try again. */
async function startDepositPayment(
  review: ReviewRow,
  detail: ReviewDetail,
  user: CurrentUser,
): Promise<{ url: string } | null> {
  try {
    const { checkoutForDeposit } = await import("./payments");
    const { url } = await checkoutForDeposit(review, detail.deposit!.id, user.email);
    return { url };
  } catch (error) {
    console.error("[axlewright] deposit checkout not started:", error instanceof Error ? error.message : error);
    return null;
  }
}

/** The public face of a sign-off: what the API answers, minus the address and browser unless the caller is the shop. */
export function signOffJson(s: SignOffRow, opts: { withOrigin: boolean }) {
  return {
    id: s.id,
    reviewId: s.reviewId,
    revisionId: s.revisionId,
    specHash: s.specHash,
    engineVersion: s.engineVersion,
    decision: s.decision,
    typedName: s.typedName,
    signedAt: s.signedAt,
    reference: approvalReference(s),
    signedBy: { id: s.userId, name: s.userName, organisation: s.organisation },
    ...(opts.withOrigin ? { address: s.address, userAgent: s.userAgent } : {}),
  };
}

export function reviewJson(r: ReviewDetail, opts: { withOrigin: boolean }) {
  return {
    id: r.id,
    revisionId: r.revisionId,
    revision: r.revisionNumber,
    specHash: r.specHash,
    design: { id: r.designId, name: r.designName },
    projectId: r.projectId,
    message: r.message,
    run: r.runLengthMm !== null ? { lengthMm: r.runLengthMm, endTreatment: r.endTreatment } : null,
    requestedBy: r.requestedBy,
    createdAt: r.createdAt,
    status: reviewStatus(r),
    comments: r.comments,
    decision: r.decision ? signOffJson(r.decision, opts) : null,
    deposit: r.deposit
      ? {
          amountMinor: r.deposit.amountMinor,
          currency: r.deposit.currency,
          status: r.deposit.status,
          paidAt: r.deposit.paidAt,
        }
      : null,
  };
}
