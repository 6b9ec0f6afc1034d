import "server-only";
// Deposits paid through the card-payment service's `stripe` SDK: a Checkout Session per due
// deposit, and the signed webhook that says it was paid. In development and tests the SDK talks to
// the local fake (scripts/fakes/payment-service.mjs) named by STRIPE_API_HOST/PORT/PROTOCOL; in
// production those are unset and the SDK talks to the real service with the shop's own keys.
import Stripe from "stripe";
import { isDuplicateKey } from "@/db/duplicate-key";
import { eventSeen, findDeposit, markDepositPaid, recordEvent, setCheckoutSession } from "@/db/queries/deposits";
import { getProjectSummary } from "@/db/queries/projects";
import type { ReviewRow } from "@/db/queries/reviews";
import { PAYMENT_SERVICE_TIMEOUT_MS } from "@/lib/validation/limits";
import { AppError } from "./errors";
import { appUrl } from "./request";

let client: Stripe | undefined;

function stripe(): Stripe {
  const key = process.env.STRIPE_SECRET_KEY;
  if (!key) throw new AppError("internal", "Payments are not set up on this server (no STRIPE_SECRET_KEY).");
  const host = process.env.STRIPE_API_HOST;
  client ??= new Stripe(key, {
    ...(host
      ? {
          host,
          port: Number(process.env.STRIPE_API_PORT ?? 443),
          protocol: (process.env.STRIPE_API_PROTOCOL ?? "https") as "http" | "https",
        }
      : {}),
    maxNetworkRetries: 1,
    timeout: PAYMENT_SERVICE_TIMEOUT_MS,
  });
  return client;
}

/** A payment page for the review's due deposit: the open session already made for it, or a new one. */
export async function checkoutForDeposit(
  review: ReviewRow,
  depositId: number,
  customerEmail: string,
): Promise<{ url: string; sessionId: string }> {
  const deposit = await findDeposit(depositId);
  if (!deposit) throw new AppError("not_found", "This review asks for no deposit.");
  if (deposit.status !== "due")
    throw new AppError(
      "conflict",
      deposit.status === "paid" ? "The deposit is paid already." : "The deposit falls due when the client approves.",
    );
  if (deposit.checkoutSessionId) {
    const open = await stripe()
      .checkout.sessions.retrieve(deposit.checkoutSessionId)
      .catch(() => null);
    if (open?.status === "open" && open.url) return { url: open.url, sessionId: open.id };
  }
  const back = `/projects/${review.projectId}/reviews/${review.id}`;
  const project = await getProjectSummary(review.projectId);
  const description = `Deposit for ${project?.name ?? "the project"}: ${review.designName} R${review.revisionNumber}`;
  const session = await stripe().checkout.sessions.create({
    mode: "payment",
    line_items: [
      {
        quantity: 1,
        price_data: {
          currency: deposit.currency.toLowerCase(),
          unit_amount: deposit.amountMinor,
          product_data: { name: description },
        },
      },
    ],
    customer_email: customerEmail,
    client_reference_id: `deposit-${deposit.id}`,
    metadata: { depositId: String(deposit.id), reviewId: String(review.id), projectId: String(review.projectId) },
    success_url: appUrl(`${back}?deposit=paid&session={CHECKOUT_SESSION_ID}`),
    cancel_url: appUrl(`${back}?deposit=cancelled`),
  });
  if (!session.url) throw new AppError("internal", "The payment service gave no payment page.");
  await setCheckoutSession(deposit.id, session.id);
  return { url: session.url, sessionId: session.id };
}

/**
 * A webhook from the payment service. The signature is checked by the SDK (`constructEvent`, with its
 * default five-minute tolerance, so an old delivery is refused too); an event already acted on is
 * refused; a completed, paid session marks its deposit paid once its amount and currency match.
 */
export async function handlePaymentWebhook(
  rawBody: string,
  signature: string | null,
): Promise<{ received: true; changed: boolean }> {
  const secret = process.env.STRIPE_WEBHOOK_SECRET;
  if (!secret) throw new AppError("internal", "Payments are not set up on this server (no STRIPE_WEBHOOK_SECRET).");
  if (!signature) throw new AppError("bad_request", "The payment event has no signature.");
  let event: Stripe.Event;
  try {
    event = stripe().webhooks.constructEvent(rawBody, signature, secret);
  } catch {
    throw new AppError("bad_request", "The payment event's signature does not verify; it was ignored.");
  }
  if (await eventSeen(event.id))
    throw new AppError("bad_request", "This payment event was processed already; a replay changes nothing.");
  if (event.type !== "checkout.session.completed") {
    await recordEvent(event.id, event.type).catch(duplicateAsReplay);
    return { received: true, changed: false };
  }
  const session = event.data.object as Stripe.Checkout.Session;
  const deposit = await findDeposit(Number(session.metadata?.depositId));
  if (!deposit) throw new AppError("bad_request", "The payment event names no deposit of ours.");
  if (session.payment_status !== "paid")
    throw new AppError("bad_request", "The payment event is not for a paid session.");
  if (session.id !== deposit.checkoutSessionId)
    throw new AppError("bad_request", "The payment event is for another payment page than this deposit's.");
  if (session.amount_total !== deposit.amountMinor || session.currency?.toUpperCase() !== deposit.currency)
    throw new AppError(
      "bad_request",
      "The payment event's amount or currency does not match the deposit; nothing was marked paid.",
    );
  if (deposit.status !== "due")
    throw new AppError(
      "bad_request",
      deposit.status === "paid" ? "The deposit is paid already." : "The deposit is not due.",
    );
  const changed = await markDepositPaid(deposit, { id: event.id, type: event.type, sessionId: session.id }).catch(
    duplicateAsReplay,
  );
  if (!changed) throw new AppError("bad_request", "The deposit is paid already.");
  return { received: true, changed };
}

/** Two deliveries of one event at once: the second loses on the unique event id, and is a replay. */
function duplicateAsReplay(error: unknown): never {
  if (isDuplicateKey(error))
    throw new AppError("bad_request", "This payment event was processed already; a replay changes nothing.");
  throw error;
}
