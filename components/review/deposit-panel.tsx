"use client";
// The deposit on a review: its amount and state, and for the client, once it is due, the way to pay.
import { useMutation } from "@tanstack/react-query";
import { failureOf, postJson } from "@/components/api/request-json";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";

export function DepositPanel({
  reviewId,
  text,
  status,
  canPay,
  returned,
}: {
  reviewId: number;
  text: string;
  status: "on-approval" | "due" | "paid";
  canPay: boolean;
  returned: "paid" | "cancelled" | null;
}) {
  const checkout = useMutation({
    mutationFn: () => postJson<{ url: string }>(`/api/reviews/${reviewId}/deposit/checkout`, {}),
    onSuccess: (answer) => window.location.assign(answer.url),
  });
  const failure = failureOf(checkout.error);
  return (
    <div className="flex flex-col gap-2 text-sm" data-testid="deposit-panel">
      <p>
        Deposit:{" "}
        <span className="font-mono" data-testid="deposit-state">
          {text}
        </span>
      </p>
      {status === "paid" ? <Notice tone="done">Paid. Thank you.</Notice> : null}
      {status === "due" && returned === "paid" ? (
        <Notice>The payment service is confirming your payment; this page shows it as paid once it has.</Notice>
      ) : null}
      {status === "due" && returned === "cancelled" ? (
        <Notice tone="problem">The payment was cancelled; nothing was charged. You can pay when you are ready.</Notice>
      ) : null}
      {status === "due" && canPay ? (
        <div>
          <Button type="button" onClick={() => checkout.mutate()} disabled={checkout.isPending || checkout.isSuccess}>
            {checkout.isPending || checkout.isSuccess ? "Opening the payment page…" : "Pay the deposit"}
          </Button>
        </div>
      ) : null}
      {failure ? <Notice tone="problem">{failure.message}</Notice> : null}
    </div>
  );
}
