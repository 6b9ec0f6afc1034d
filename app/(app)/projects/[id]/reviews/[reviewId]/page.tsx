import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { formatWhen } from "@/components/format";
import { CautionList } from "@/components/review/caution-list";
import { DecisionForm } from "@/components/review/decision-form";
import { DepositPanel } from "@/components/review/deposit-panel";
import { REVIEW_STATUS_LABEL, depositText } from "@/components/review/review-status";
import { ReviewWorkspace } from "@/components/review/review-workspace";
import { Badge, Panel } from "@/components/ui/panel";
import { latestCutPlan } from "@/db/queries/cut-plans";
import { findRevision } from "@/db/queries/designs";
import { getProjectSummary } from "@/db/queries/projects";
import { reviewDetail } from "@/db/queries/reviews";
import { cutFactsOfSettings } from "@/lib/cut/load-facts";
import { parseCutSettings } from "@/lib/cut/settings";
import { cautionParts } from "@/lib/loads";
import { formatMoney } from "@/lib/money/currency";
import { plainFigures } from "@/lib/review/plain-figures";
import { approvalReference } from "@/lib/review/reference";
import { reviewStatus } from "@/lib/review/review-state";
import type { RevisionSummary } from "@/lib/revision-summary";
import { requirePageUser, requireReviewAccess } from "@/lib/server/dal";
import { loadsForRevision } from "@/lib/server/loads";
import { AppError } from "@/lib/server/errors";

export const metadata: Metadata = { title: "Review" };

export default async function ReviewPage({
  params,
  searchParams,
}: {
  params: Promise<{ id: string; reviewId: string }>;
  searchParams: Promise<{ deposit?: string }>;
}) {
  await requirePageUser();
  const { id, reviewId } = await params;
  const { deposit: returned } = await searchParams;
  const access = await requireReviewAccess(/^\d{1,10}$/.test(reviewId) ? Number(reviewId) : -1).catch((e) => {
    if (e instanceof AppError && e.kind === "not_found") notFound();
    throw e;
  });
  if (String(access.projectId) !== id) notFound();
  const [detail, found, project, plan] = await Promise.all([
    reviewDetail(access.review.id),
    findRevision(access.review.revisionId),
    getProjectSummary(access.projectId),
    latestCutPlan(access.review.revisionId),
  ]);
  if (!detail || !found) notFound();
  const spec = found.revision.spec as { mode: string; units?: "mm" | "in" };
  const summary = found.revision.summary as unknown as RevisionSummary;
  const status = reviewStatus(detail);
  const decision = detail.decision;
  const signer = access.memberRole === "client";
  const units = spec.units ?? "mm";
  const figures = plainFigures({ mode: spec.mode, units, check: summary.check });
  // The load-path cautions from the same check as the studio and the cut files: the revision's load
  // settings, and the stored plan's board and support spacing when there is one.
  const composed = (plan?.settings as { composed?: unknown } | undefined)?.composed;
  const loads = await loadsForRevision(
    found.revision,
    composed ? cutFactsOfSettings(parseCutSettings(composed)) : undefined,
  );
  const cautions = loads.report.cautions.map(cautionParts);
  const run =
    detail.runLengthMm !== null ? { runLength: detail.runLengthMm, endTreatment: detail.endTreatment ?? "flat" } : null;
  const deposit = detail.deposit;

  return (
    <>
      <Link href={`/projects/${access.projectId}`} className="no-print text-sm text-ink-soft hover:underline">
        ← {project?.name ?? "Project"}
      </Link>
      <div className="flex flex-wrap items-baseline gap-3">
        <h1 className="text-2xl font-semibold tracking-tight">
          Review: {detail.designName} <span className="font-mono">R{detail.revisionNumber}</span>
        </h1>
        <Badge tone={status === "approved" ? "pass" : status === "changes-requested" ? "caution" : "ink"}>
          {REVIEW_STATUS_LABEL[status]}
        </Badge>
      </div>
      <div className="flex flex-col gap-1 text-sm">
        <p className="text-ink-soft">
          {detail.requestedBy ?? "The shop"} sent this for review on{" "}
          <span className="font-mono text-xs">{formatWhen(detail.createdAt)}</span>
          {project?.site ? <> · for {project.site}</> : null}
        </p>
        <blockquote className="whitespace-pre-wrap rounded-plate border-l-4 border-ink bg-white/60 px-3 py-2">
          {detail.message}
        </blockquote>
      </div>

      {decision ? (
        <div
          className={`rounded-plate border px-3 py-2 text-sm ${decision.decision === "approve" ? "border-pass/40 bg-white/60 text-pass" : "border-caution bg-caution-soft text-caution-ink"}`}
          data-testid="decision-record"
        >
          {decision.decision === "approve" ? (
            <>
              <strong>Approved for fabrication</strong> by {decision.typedName}
              {decision.organisation ? ` (${decision.organisation})` : ""} on{" "}
              <span className="font-mono text-xs">{formatWhen(decision.signedAt)}</span>. Reference{" "}
              <span className="font-mono" data-testid="approval-reference">
                {approvalReference(decision)}
              </span>
              .
            </>
          ) : (
            <>
              <strong>Changes requested</strong> by {decision.typedName} on{" "}
              <span className="font-mono text-xs">{formatWhen(decision.signedAt)}</span>. The shop will send a new
              revision.
            </>
          )}
        </div>
      ) : null}

      <ReviewWorkspace
        reviewId={detail.id}
        spec={found.revision.spec}
        run={run}
        pair={spec.mode === "partner-wheel"}
        comments={detail.comments}
      />

      <div className="grid gap-4 lg:grid-cols-2">
        <Panel title="What the checks say">
          <ul className="flex flex-col gap-2 text-sm" data-testid="plain-figures">
            {figures.map((f) => (
              <li key={f.key} className="flex gap-2">
                <span aria-hidden className={`font-mono ${f.ok ? "text-pass" : "text-caution-ink"}`}>
                  {f.ok ? "✓" : "!"}
                </span>
                <span>
                  <span className="font-medium">{f.label}.</span> {f.text}
                </span>
              </li>
            ))}
          </ul>
          <p className="mt-2 text-xs text-ink-soft">
            Figures from the rolling check of R{detail.revisionNumber} (fingerprint{" "}
            <span className="font-mono">{detail.specHash.slice(0, 12)}</span>, calculation version{" "}
            {found.revision.engineVersion}).
          </p>
        </Panel>
        <Panel title="Cautions">
          <CautionList cautions={cautions} disclaimer={loads.report.disclaimer} />
        </Panel>
      </div>

      {deposit ? (
        <Panel title="Deposit">
          <DepositPanel
            reviewId={detail.id}
            text={depositText(deposit)}
            status={deposit.status}
            canPay={signer}
            returned={returned === "paid" || returned === "cancelled" ? returned : null}
          />
        </Panel>
      ) : null}

      {status === "open" ? (
        signer ? (
          <Panel title="Your decision">
            <DecisionForm
              reviewId={detail.id}
              revisionNumber={detail.revisionNumber}
              deposit={deposit ? formatMoney(deposit.amountMinor, deposit.currency) : null}
            />
          </Panel>
        ) : (
          <p className="text-sm text-ink-soft" data-testid="awaiting-client">
            Waiting for the client&apos;s decision. Only the project&apos;s client can approve this revision or ask for
            changes.
          </p>
        )
      ) : null}
    </>
  );
}
