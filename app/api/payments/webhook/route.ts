import { AppError } from "@/lib/server/errors";
import { handlePaymentWebhook } from "@/lib/server/payments";
import { route } from "@/lib/server/route";

const LIMIT = 256 * 1024;

// The payment service's webhook. There is no session here: the signature, checked against the
// endpoint's secret before anything is read or written, is who is asking.
export const POST = route(async (request) => {
  if (Number(request.headers.get("content-length") ?? "0") > LIMIT) throw new AppError("too_large", "The payment event is too large.");
  const raw = await request.text();
  if (Buffer.byteLength(raw) > LIMIT) throw new AppError("too_large", "The payment event is too large.");
  return handlePaymentWebhook(raw, request.headers.get("stripe-signature"));
});
