import { depositOfReview } from "@/db/queries/deposits";
import { requireReviewAccess, requireReviewSigner } from "@/lib/server/dal";
import { AppError } from "@/lib/server/errors";
import { checkoutForDeposit } from "@/lib/server/payments";
import { created, idParam, route } from "@/lib/server/route";

/** The review's deposit and its state, for any member. */
export const GET = route<{ id: string }>(async (_request, params) => {
  const { review } = await requireReviewAccess(idParam(params.id, "review"));
  const deposit = await depositOfReview(review.id);
  if (!deposit) throw new AppError("not_found", "This review asks for no deposit.");
  return {
    deposit: {
      amountMinor: deposit.amountMinor,
      currency: deposit.currency,
      status: deposit.status,
      paidAt: deposit.paidAt?.toISOString() ?? null,
    },
  };
});

/** A payment page for the due deposit: only the project's client members pay it. */
export const POST = route<{ id: string }>(async (_request, params) => {
  const { review, user } = await requireReviewSigner(idParam(params.id, "review"));
  const deposit = await depositOfReview(review.id);
  if (!deposit) throw new AppError("not_found", "This review asks for no deposit.");
  const { url } = await checkoutForDeposit(review, deposit.id, user.email);
  return created({ url });
});
