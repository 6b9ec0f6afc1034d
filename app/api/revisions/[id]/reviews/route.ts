import { listRevisionReviews } from "@/db/queries/reviews";
import { requireRevisionAccess } from "@/lib/server/dal";
import { AppError } from "@/lib/server/errors";
import { reviewStatus } from "@/lib/review/review-state";
import { requestReview } from "@/lib/server/reviews";
import { created, idParam, jsonBody, route } from "@/lib/server/route";
import { newReviewSchema } from "@/lib/validation/reviews";

/** The revision's reviews, newest first, for any member. */
export const GET = route<{ id: string }>(async (_request, params) => {
  const access = await requireRevisionAccess(idParam(params.id, "revision"));
  const rows = await listRevisionReviews(access.revision.id);
  return {
    reviews: rows.map((r) => ({
      id: r.id,
      revisionId: r.revisionId,
      message: r.message,
      createdAt: r.createdAt,
      requestedBy: r.requestedBy,
      status: reviewStatus(r),
    })),
  };
});

/** Sends the revision to the project's client for review: admin or the project's fabricator. */
export const POST = route<{ id: string }>(async (request, params) => {
  const access = await requireRevisionAccess(idParam(params.id, "revision"));
  if (!access.canManage)
    throw new AppError("forbidden", "Only the project's fabricator or an admin can send a revision for review.");
  const input = await jsonBody(request, newReviewSchema);
  const sent = await requestReview(access, input);
  return created(sent);
});
