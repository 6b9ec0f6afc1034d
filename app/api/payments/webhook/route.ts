import { handlePaymentWebhook } from "@/lib/server/payments";
import { rawTextBody } from "@/lib/server/raw-body";
import { route } from "@/lib/server/route";
import { WEBHOOK_BODY_LIMIT } from "@/lib/validation/limits";

// The payment service's webhook. There is no session here: the signature, checked against the
// endpoint's secret before anything is read or written, is who is asking.
export const POST = route(async (request) => {
  // The exact bytes sent: the signature covers them.
  return handlePaymentWebhook(await rawTextBody(request, WEBHOOK_BODY_LIMIT), request.headers.get("stripe-signature"));
});
