import { reviewDetail } from "@/db/queries/reviews";
import { requireReviewAccess } from "@/lib/server/dal";
import { AppError } from "@/lib/server/errors";
import { refuseChanges } from "@/lib/server/immutable";
import { reviewJson } from "@/lib/server/reviews";
import { idParam, route } from "@/lib/server/route";

const access = (params: { id: string }) => requireReviewAccess(idParam(params.id, "review"));

/** The review with its comments, decision and deposit, for any member of the project. */
export const GET = route<{ id: string }>(async (_request, params) => {
  const a = await access(params);
  const detail = await reviewDetail(a.review.id);
  if (!detail) throw new AppError("not_found", "No such review.");
  return { review: reviewJson(detail, { withOrigin: a.canManage }) };
});

export const { PUT, PATCH, DELETE } = refuseChanges(
  access,
  "GET",
  "A review request is kept as it was sent; comment on it, or send the revision again.",
);
