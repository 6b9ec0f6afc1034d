import { reviewDetail } from "@/db/queries/reviews";
import { requireReviewAccess } from "@/lib/server/dal";
import { addReviewComment } from "@/lib/server/reviews";
import { created, idParam, jsonBody, route } from "@/lib/server/route";
import { newCommentSchema } from "@/lib/validation/reviews";

export const GET = route<{ id: string }>(async (_request, params) => {
  const a = await requireReviewAccess(idParam(params.id, "review"));
  return { comments: (await reviewDetail(a.review.id))?.comments ?? [] };
});

/** Any member of the project (and an admin) may comment; `at` pins the comment to a place along the run. */
export const POST = route<{ id: string }>(async (request, params) => {
  const a = await requireReviewAccess(idParam(params.id, "review"));
  const input = await jsonBody(request, newCommentSchema);
  const { id } = await addReviewComment(a, input);
  const comment = (await reviewDetail(a.review.id))?.comments.find((c) => c.id === id);
  return created({ comment });
});
