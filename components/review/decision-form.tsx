"use client";
// The client's decision: approve this revision for fabrication (typed full name and a tick), or ask
// for changes (a comment is needed). A decision is final; the shop is e-mailed either way.
import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { failureOf, postJson } from "@/components/api/request-json";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";

type Choice = "approve" | "request-changes";

export function DecisionForm({
  reviewId,
  revisionNumber,
  deposit,
}: {
  reviewId: number;
  revisionNumber: number;
  deposit: string | null;
}) {
  const router = useRouter();
  const [decision, setDecision] = useState<Choice>("approve");
  const [confirmed, setConfirmed] = useState(false);
  const decide = useMutation({
    mutationFn: (body: Record<string, unknown>) =>
      postJson<{ signOff: { reference: string }; payment: { url: string } | null }>(
        `/api/reviews/${reviewId}/decision`,
        body,
      ),
    // An approval with a deposit goes on to the payment page; otherwise the page shows the record.
    onSuccess: (answer) => (answer.payment?.url ? window.location.assign(answer.payment.url) : router.refresh()),
  });
  const failure = failureOf(decide.error);

  function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const comment = String(form.get("comment") ?? "").trim();
    decide.mutate({
      decision,
      typedName: String(form.get("typedName") ?? ""),
      ...(comment ? { comment } : {}),
      ...(decision === "approve" ? { confirm: confirmed } : {}),
    });
  }

  const f = failure?.fields ?? {};
  const approving = decision === "approve";
  return (
    <form onSubmit={submit} className="flex flex-col gap-3" aria-label="Your decision" data-testid="decision-form">
      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 text-sm font-medium">Your decision on revision {revisionNumber}</legend>
        <label
          className={`flex items-start gap-2 rounded-plate border px-3 py-2 text-sm ${approving ? "border-ink bg-white/70" : "border-ink-line"}`}
        >
          <input
            type="radio"
            name="decision"
            value="approve"
            checked={approving}
            onChange={() => setDecision("approve")}
            className="mt-1"
          />
          <span>
            <span className="font-medium">Approve for fabrication</span>
            <span className="block text-ink-soft">
              The shop may cut and build exactly this revision.{deposit ? ` A deposit of ${deposit} is then due.` : ""}
            </span>
          </span>
        </label>
        <label
          className={`flex items-start gap-2 rounded-plate border px-3 py-2 text-sm ${!approving ? "border-ink bg-white/70" : "border-ink-line"}`}
        >
          <input
            type="radio"
            name="decision"
            value="request-changes"
            checked={!approving}
            onChange={() => setDecision("request-changes")}
            className="mt-1"
          />
          <span>
            <span className="font-medium">Ask for changes</span>
            <span className="block text-ink-soft">Say what should change; the shop sends a new revision.</span>
          </span>
        </label>
      </fieldset>
      <div className="flex flex-col gap-1 text-sm">
        <label htmlFor="field-decision-comment" className="font-medium">
          {approving ? "Comment (optional)" : "What should change"}
        </label>
        <textarea
          id="field-decision-comment"
          name="comment"
          rows={3}
          maxLength={4000}
          required={!approving}
          aria-describedby="field-decision-comment-error"
          aria-invalid={f.comment ? true : undefined}
          className="w-full rounded-plate border border-ink-line bg-white/70 px-2.5 py-1.5 text-sm"
        />
        <div id="field-decision-comment-error" aria-live="polite">
          {f.comment?.map((m) => (
            <p key={m} className="text-xs font-medium text-caution-ink">
              {m}
            </p>
          ))}
        </div>
      </div>
      <TextField
        label="Your full name"
        name="typedName"
        autoComplete="name"
        required
        errors={f.typedName}
        hint="As it is on your account; it is saved with your decision."
      />
      {approving ? (
        <label className="flex items-start gap-2 text-sm">
          <input
            type="checkbox"
            name="confirm"
            checked={confirmed}
            onChange={(e) => setConfirmed(e.target.checked)}
            className="mt-1"
          />
          <span>I approve revision {revisionNumber} for fabrication</span>
        </label>
      ) : null}
      {f.confirm ? <p className="text-xs font-medium text-caution-ink">{f.confirm[0]}</p> : null}
      <p className="text-xs text-ink-soft">
        A decision is final and is saved with the time, your network address and your browser. A later change needs a
        new revision.
      </p>
      <div>
        {/* After a decision the page moves on (payment, or the refreshed record): the button stays off meanwhile. */}
        <Button type="submit" disabled={decide.isPending || decide.isSuccess || (approving && !confirmed)}>
          {decide.isPending || decide.isSuccess
            ? "Saving…"
            : approving
              ? `Approve revision ${revisionNumber}`
              : "Ask for changes"}
        </Button>
      </div>
      {failure ? (
        <Notice tone="problem" testId="decision-message">
          {failure.message}
        </Notice>
      ) : null}
    </form>
  );
}
