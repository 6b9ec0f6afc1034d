import "server-only";
// Cut plans on the server: compose the settings from the request and the shop library, rebuild the
// parts from the revision's own spec with the same code the browser ran, check the browser's nest
// against them (lib/cut-plan/verify-nest.ts), and only then save it. Files are made on request from
// the stored plan, so the app keeps no files of its own. The work runs on the worker pool
// (lib/work/tasks.ts); this module reads and writes the rows.
import { findCutPlan, insertCutPlan, type CutPlanRow } from "@/db/queries/cut-plans";
import { getProjectSummary } from "@/db/queries/projects";
import { approvalOf, approvalStamp } from "@/db/queries/reviews";
import { getShopRows } from "@/db/queries/shop";
import type { Revision } from "@/db/schema";
import { composeSettings, type PlanChoice } from "@/lib/cut-plan/compose";
import type { CutPlanSummary } from "@/lib/cut-plan/summary";
import { approvalReference } from "@/lib/review/reference";
import type { SheetNestResult } from "@/lib/nest/types";
import { RENDER_DEADLINE_MS, SERVER_SOLVE_DEADLINE_MS } from "@/lib/validation/limits";
import type { JobContext } from "@/lib/work/job";
import type { CurrentUser } from "./dal";
import { AppError } from "./errors";
import { libraryMaterials } from "./loads";
import { runTask } from "./pool";

/** The settings of a new plan: the request's own, with the chosen library rows' figures. */
export async function composeFromLibrary(choice: PlanChoice, projectId: number) {
  const [library, project] = await Promise.all([getShopRows(choice), getProjectSummary(projectId)]);
  return { library, settings: composeSettings(choice, library, project?.name ?? "") };
}

export type { CutPlanSummary };

export async function storeCutPlan(
  actor: CurrentUser,
  target: { revision: Revision; projectId: number },
  choice: PlanChoice,
  nest: Pick<SheetNestResult, "sheets" | "unplaced" | "seconds" | "cancelled">,
  intent: { purpose?: "review" | "production"; reason?: string } = {},
  signal?: AbortSignal,
): Promise<{ id: number; number: number; summary: CutPlanSummary }> {
  // The gate: a plan for production of a revision the client has not approved needs a reason.
  const approval = await approvalOf(target.revision.id);
  const purpose = intent.purpose ?? (approval ? "production" : "review");
  const reason = intent.reason?.trim() || null;
  if (purpose === "production" && !approval && !reason)
    throw new AppError(
      "unprocessable",
      `R${target.revision.number} has no client approval. To save this cut plan for production anyway, give your reason: it is logged, and the files stay marked NOT APPROVED.`,
      {
        reason: ["Say why this plan goes to production before the client's approval."],
      },
    );
  const { library, settings } = await composeFromLibrary(choice, target.projectId);
  const checked = await runTask(
    "checkCutPlan",
    {
      spec: target.revision.spec,
      settings,
      nest,
      names: { material: library.material.name, sheet: library.sheet.name, machine: library.machine.name },
      gate: {
        purpose,
        approvalReference: approval ? approvalReference(approval) : null,
        unapprovedReason: !approval && purpose === "production" ? reason : null,
      },
    },
    // Cut refusals land on the request's settings field they name ("settings.runLength").
    { deadlineMs: SERVER_SOLVE_DEADLINE_MS, signal, place: { settings: "settings" } },
  );
  const { problems } = checked;
  if (problems.length || !("summary" in checked)) {
    const shown = problems.slice(0, 5).join(" ");
    throw new AppError(
      "bad_request",
      `The cut plan was not saved: ${shown}${problems.length > 5 ? ` (and ${problems.length - 5} more)` : ""}`,
    );
  }
  const { summary, nest: stored, composed } = checked;
  const { id, number } = await insertCutPlan(
    actor,
    { revisionId: target.revision.id, revisionNumber: target.revision.number, projectId: target.projectId },
    {
      // The library figures are copied in, so a later edit of a library row cannot change this plan.
      settings: { ...choice, composed } as unknown as Record<string, unknown>,
      nest: stored,
      summary: summary as unknown as Record<string, unknown>,
    },
  );
  return { id, number, summary };
}

/**
 * What the worker pool needs to rebuild a stored plan's job (lib/work/job.ts): the revision, the
 * plan's own settings and nest, the library's materials, and the approval as it stands now (a
 * revision approved later gets its reference on every file).
 */
export async function jobContext(plan: CutPlanRow, revision: Revision, designName: string): Promise<JobContext> {
  const [approval, library] = await Promise.all([approvalStamp(revision), libraryMaterials()]);
  return {
    spec: revision.spec,
    revisionNumber: revision.number,
    revisionLoads: revision.loads ?? null,
    composed: (plan.settings as { composed?: unknown }).composed,
    nest: plan.nest as unknown as SheetNestResult,
    cutPlanNumber: plan.number,
    unapprovedReason: (plan.summary as Partial<CutPlanSummary>).unapprovedReason ?? null,
    designName,
    approval,
    library,
  };
}

/** The names of a stored plan's files (job.zip first), made on the pool. */
export async function planFileNames(ctx: JobContext, signal?: AbortSignal): Promise<string[]> {
  return runTask("cutFileNames", ctx, {
    deadlineMs: SERVER_SOLVE_DEADLINE_MS,
    signal,
    place: { cutField: "settings" },
  });
}

/** One file of a stored plan (job.zip: all of them), made on the pool; 404 when the plan has no such file. */
export async function planFile(ctx: JobContext, name: string, signal?: AbortSignal) {
  const file = await runTask("cutFile", { ctx, name }, { deadlineMs: RENDER_DEADLINE_MS, signal });
  if (!file) throw new AppError("not_found", "No such file in this cut plan.");
  return file;
}

/** What the cut page shows of a stored plan: its load check as the files state it, and its file names. */
export function planPageFacts(ctx: JobContext) {
  return runTask("cutPage", ctx, { deadlineMs: SERVER_SOLVE_DEADLINE_MS });
}

export async function requireStoredPlan(id: number): Promise<CutPlanRow> {
  const plan = await findCutPlan(id);
  if (!plan) throw new AppError("not_found", "No such cut plan.");
  return plan;
}
