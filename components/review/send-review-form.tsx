"use client";
// The fabricator's request for the client's review: which saved revision, a short message, the run
// the mock-up lays out (track designs), and an optional deposit due on approval.
import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { failureOf, postJson } from "@/components/api/request-json";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { CURRENCY_CODES } from "@/lib/money/currency";

export interface SendableRevision {
  id: number;
  label: string;
  /** The mock-up lays out a run (not for a partner pair). */
  showsRun: boolean;
  run: { lengthMm: number; endTreatment: "flat" | "half" | "scale" } | null;
  /** Why it cannot be sent now (under review, approved), or null. */
  blocked: string | null;
}

const TREATMENTS = [
  { value: "flat", label: "Flat run-out at each end" },
  { value: "half", label: "End on a half period" },
  { value: "scale", label: "Rescale so whole periods fit" },
];
const MM_PER_IN = 25.4;

export function SendReviewForm({
  revisions,
  initialRevisionId,
  clients,
}: {
  revisions: SendableRevision[];
  initialRevisionId?: number;
  clients: string[];
}) {
  const router = useRouter();
  const first = revisions.find((r) => r.id === initialRevisionId) ?? revisions.find((r) => !r.blocked) ?? revisions[0];
  const [revisionId, setRevisionId] = useState(String(first?.id ?? ""));
  const revision = revisions.find((r) => String(r.id) === revisionId);
  const [units, setUnits] = useState<"mm" | "in">("mm");
  const [runLength, setRunLength] = useState(first?.run ? String(first.run.lengthMm) : "2400");
  const [withDeposit, setWithDeposit] = useState(false);
  const send = useMutation({
    mutationFn: ({ id, body }: { id: number; body: Record<string, unknown> }) =>
      postJson<{ id: number; mailed: number }>(`/api/revisions/${id}/reviews`, body),
    onSuccess: () => router.refresh(),
  });
  const failure = failureOf(send.error);

  if (!revision)
    return (
      <p className="text-sm text-ink-soft">
        Save a revision of a design in the studio first: a client reviews a frozen revision.
      </p>
    );

  const pick = (id: string) => {
    setRevisionId(id);
    const r = revisions.find((x) => String(x.id) === id);
    if (r?.run) setRunLength(String(units === "mm" ? r.run.lengthMm : Number((r.run.lengthMm / MM_PER_IN).toFixed(3))));
  };
  const switchUnits = (next: "mm" | "in") => {
    const v = Number(runLength);
    if (Number.isFinite(v) && next !== units)
      setRunLength(String(next === "in" ? Number((v / MM_PER_IN).toFixed(3)) : Number((v * MM_PER_IN).toFixed(1))));
    setUnits(next);
  };

  function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const length = Number(runLength) * (units === "in" ? MM_PER_IN : 1);
    const body = {
      message: String(form.get("message") ?? ""),
      ...(revision!.showsRun
        ? { runLength: Number.isFinite(length) ? length : runLength, endTreatment: String(form.get("endTreatment")) }
        : {}),
      ...(withDeposit
        ? { deposit: { amount: Number(form.get("depositAmount")), currency: String(form.get("depositCurrency")) } }
        : {}),
    };
    send.mutate({ id: revision!.id, body });
  }

  const f = failure?.fields ?? {};
  const message =
    failure?.message ??
    (send.data ? `Sent for review (review ${send.data.id}); ${send.data.mailed} e-mail(s) went out.` : null);
  return (
    <form
      onSubmit={submit}
      className="flex flex-col gap-3"
      aria-label="Send a revision for review"
      data-testid="send-review-form"
    >
      <p className="text-sm text-ink-soft">
        The client{clients.length === 1 ? "" : "s"}{" "}
        {clients.length ? clients.join(", ") : "(none yet: add one to the project)"} will get an e-mail with a link and
        a moving picture of the piece.
      </p>
      <SelectField
        label="Revision"
        name="revisionId"
        value={revisionId}
        onChange={(e) => pick(e.target.value)}
        options={revisions.map((r) => ({
          value: String(r.id),
          label: r.blocked ? `${r.label} — ${r.blocked}` : r.label,
        }))}
      />
      {revision.blocked ? (
        <Notice>
          {revision.label} cannot be sent now: {revision.blocked}.
        </Notice>
      ) : null}
      <div className="flex flex-col gap-1 text-sm">
        <label htmlFor="field-message" className="font-medium">
          Message to the client
        </label>
        <textarea
          id="field-message"
          name="message"
          rows={3}
          maxLength={2000}
          required
          aria-describedby="field-message-error"
          aria-invalid={f.message ? true : undefined}
          className="w-full rounded-plate border border-ink-line bg-white/70 px-2.5 py-1.5 text-sm"
          placeholder="What to look at, and what you need from them."
        />
        <div id="field-message-error" aria-live="polite">
          {f.message?.map((m) => (
            <p key={m} className="text-xs font-medium text-caution-ink">
              {m}
            </p>
          ))}
        </div>
      </div>
      {revision.showsRun ? (
        <fieldset className="grid gap-3 sm:grid-cols-[1fr_auto_1fr]">
          <legend className="mb-1 text-sm font-medium">The run the mock-up shows (as it will be built)</legend>
          <TextField
            label="Run length"
            name="runLength"
            inputMode="decimal"
            value={runLength}
            onChange={(e) => setRunLength(e.target.value)}
            errors={f.runLength}
          />
          <SelectField
            label="Units"
            name="runUnits"
            value={units}
            onChange={(e) => switchUnits(e.target.value as "mm" | "in")}
            options={[
              { value: "mm", label: "mm" },
              { value: "in", label: "in" },
            ]}
          />
          <SelectField
            label="End treatment"
            name="endTreatment"
            defaultValue={revision.run?.endTreatment ?? "flat"}
            options={TREATMENTS}
            errors={f.endTreatment}
          />
        </fieldset>
      ) : null}
      <label className="flex items-center gap-2 text-sm">
        <input type="checkbox" checked={withDeposit} onChange={(e) => setWithDeposit(e.target.checked)} /> Ask for a
        deposit on approval
      </label>
      {withDeposit ? (
        <div className="grid gap-3 sm:grid-cols-2">
          <TextField
            label="Deposit amount"
            name="depositAmount"
            inputMode="decimal"
            required
            errors={f["deposit.amount"] ?? f.deposit}
          />
          <SelectField
            label="Currency"
            name="depositCurrency"
            defaultValue="GBP"
            options={CURRENCY_CODES.map((c) => ({ value: c, label: c }))}
            errors={f["deposit.currency"]}
          />
        </div>
      ) : null}
      <div>
        <Button type="submit" disabled={send.isPending || !!revision.blocked || clients.length === 0}>
          {send.isPending ? "Sending…" : "Send for review"}
        </Button>
      </div>
      {message ? (
        <Notice tone={failure ? "problem" : "done"} testId="send-review-message">
          {message}
        </Notice>
      ) : null}
    </form>
  );
}
