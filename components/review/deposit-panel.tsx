"use client";
// The deposit on a review: its amount and state, and for the client, once it is due, the way to pay.
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { postJson } from "./review-api";

export function DepositPanel({ reviewId, text, status, canPay, returned }: { reviewId: number; text: string; status: "on-approval" | "due" | "paid"; canPay: boolean; returned: "paid" | "cancelled" | null }) {
  const [state, setState] = useState<{ busy?: boolean; message?: string }>({});
  async function pay() {
    setState({ busy: true });
    const answer = await postJson<{ url: string }>(`/api/reviews/${reviewId}/deposit/checkout`, {});
    if (!answer.ok) setState({ message: answer.message });
    else window.location.assign(answer.body.url);
  }
  return (
    <div className="flex flex-col gap-2 text-sm" data-testid="deposit-panel">
      <p>
        Deposit: <span className="font-mono" data-testid="deposit-state">{text}</span>
      </p>
      {status === "paid" ? <Notice tone="done">Paid. Thank you.</Notice> : null}
      {status === "due" && returned === "paid" ? <Notice>The payment service is confirming your payment; this page shows it as paid once it has.</Notice> : null}
      {status === "due" && returned === "cancelled" ? <Notice tone="problem">The payment was cancelled; nothing was charged. You can pay when you are ready.</Notice> : null}
      {status === "due" && canPay ? (
        <div>
          <Button type="button" onClick={pay} disabled={state.busy}>
            {state.busy ? "Opening the payment page…" : "Pay the deposit"}
          </Button>
        </div>
      ) : null}
      {state.message ? <Notice tone="problem">{state.message}</Notice> : null}
    </div>
  );
}
