import { reviewDetail } from "@/db/queries/reviews";
import { requireReviewAccess, requireReviewSigner } from "@/lib/server/dal";
import { AppError } from "@/lib/server/errors";
import { refuseChanges } from "@/lib/server/immutable";
import { decideReview, signOffJson } from "@/lib/server/reviews";
import { created, idParam, jsonBody, route } from "@/lib/server/route";
import { decisionSchema } from "@/lib/validation/reviews";

const access = (params: { id: string }) => requireReviewAccess(idParam(params.id, "review"));

export const GET = route<{ id: string }>(async (_request, params) => {
  const a = await access(params);
  const decision = (await reviewDetail(a.review.id))?.decision;
  if (!decision) throw new AppError("not_found", "This review has no decision yet.");
  return { signOff: signOffJson(decision, { withOrigin: a.canManage }) };
});

/** The client's decision: only the project's client members (the shop cannot sign for them). */
export const POST = route<{ id: string }>(async (request, params) => {
  const a = await requireReviewSigner(idParam(params.id, "review"));
  const input = await jsonBody(request, decisionSchema);
  const { signOff, payment } = await decideReview(a, input, request);
  return created({ signOff: signOffJson(signOff, { withOrigin: false }), payment });
});

export const { PUT, PATCH, DELETE } = refuseChanges(
  access,
  "GET, POST",
  "A decision is permanent: it cannot be changed or removed.",
);
