import "server-only";
// Cut plans on the server: compose the settings from the request and the shop library, rebuild the
// parts from the revision's own spec with the same code the browser ran, check the browser's nest
// against them (lib/cut-plan/verify-nest.ts), and only then save it. Files are made on request from
// the stored plan, so the app keeps no files of its own.
import { findCutPlan, insertCutPlan, type CutPlanRow } from "@/db/queries/cut-plans";
import { getProjectSummary } from "@/db/queries/projects";
import { approvalOf, approvalStamp } from "@/db/queries/reviews";
import { getShopRows } from "@/db/queries/shop";
import type { Revision } from "@/db/schema";
import { buildCutParts, kerfParts, nestItemsFor, revisionBaseName, type CutPlanResult } from "@/lib/cut";
import { loadHersheyFont } from "@/lib/cut/labels/font-file";
import type { JobInput } from "@/lib/cut/export/job";
import { cutFactsOf } from "@/lib/cut/load-facts";
import { loadsForRevision } from "./loads";
import { composeSettings, type PlanChoice } from "@/lib/cut-plan/compose";
import { summariseCutPlan, type CutPlanSummary } from "@/lib/cut-plan/summary";
import { checkNest } from "@/lib/cut-plan/verify-nest";
import { approvalReference } from "@/lib/review/reference";
import type { SheetNestResult } from "@/lib/nest/types";
import type { SolveResult } from "@/lib/track";
import type { CurrentUser } from "./dal";
import { solveStored } from "./designs";
import { AppError, toAppError } from "./errors";

export interface BuiltPlan {
  result: SolveResult;
  plan: CutPlanResult;
}

/** The settings of a new plan: the request's own, with the chosen library rows' figures. */
export async function composeFromLibrary(choice: PlanChoice, projectId: number) {
  const [library, project] = await Promise.all([getShopRows(choice), getProjectSummary(projectId)]);
  return { library, settings: composeSettings(choice, library, project?.name ?? "") };
}

/** The parts of a revision under the given settings, built as the browser builds them (plus labels). */
export function buildPlanParts(revision: Revision, settings: unknown, { labels = true } = {}): BuiltPlan {
  const result = solveStored(revision.spec);
  try {
    const plan = buildCutParts(revision.spec, result, settings, labels ? { font: loadHersheyFont() } : {});
    return { result, plan };
  } catch (error) {
    // Cut refusals land on the request's settings field they name ("settings.runLength").
    throw toAppError(error, { settings: "settings" });
  }
}

export type { CutPlanSummary };

export async function storeCutPlan(
  actor: CurrentUser,
  target: { revision: Revision; projectId: number },
  choice: PlanChoice,
  nest: Pick<SheetNestResult, "sheets" | "unplaced" | "seconds" | "cancelled">,
  intent: { purpose?: "review" | "production"; reason?: string } = {},
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
  const built = buildPlanParts(target.revision, settings, { labels: false });
  const s = built.plan.settings;
  const items = await nestItemsFor(built.plan.parts, s);
  const problems = await checkNest({
    items,
    nest,
    sheet: { width: s.sheet.length, height: s.sheet.width },
    margin: s.margin,
    spacing: s.spacing,
  });
  if (problems.length) {
    const shown = problems.slice(0, 5).join(" ");
    throw new AppError(
      "bad_request",
      `The cut plan was not saved: ${shown}${problems.length > 5 ? ` (and ${problems.length - 5} more)` : ""}`,
    );
  }
  const { summary, nest: stored } = summariseCutPlan(
    built.plan,
    nest,
    { material: library.material.name, sheet: library.sheet.name, machine: library.machine.name },
    {
      purpose,
      approvalReference: approval ? approvalReference(approval) : null,
      unapprovedReason: !approval && purpose === "production" ? reason : null,
    },
  );
  const { id, number } = await insertCutPlan(
    actor,
    { revisionId: target.revision.id, revisionNumber: target.revision.number, projectId: target.projectId },
    {
      // The library figures are copied in, so a later edit of a library row cannot change this plan.
      settings: { ...choice, composed: s } as unknown as Record<string, unknown>,
      nest: stored,
      summary: summary as unknown as Record<string, unknown>,
    },
  );
  return { id, number, summary };
}

/** Everything the exporters need for a stored plan, rebuilt from its revision and its own settings (labels included). */
export async function jobForPlan(plan: CutPlanRow, revision: Revision, designName: string): Promise<JobInput> {
  const composed = (plan.settings as { composed?: unknown }).composed;
  const built = buildPlanParts(revision, composed);
  const { paths } = await kerfParts(built.plan.parts, built.plan.settings);
  const loads = await loadsForRevision(revision, built.result, cutFactsOf(built.plan));
  // The approval is read now, not when the plan was stored: a revision approved later gets its reference on every file.
  return {
    spec: revision.spec,
    loads: loads.report,
    loadsFromDefaults: !loads.stored,
    approval: await approvalStamp(revision),
    unapprovedReason: (plan.summary as Partial<CutPlanSummary>).unapprovedReason ?? null,
    cutPlanNumber: plan.number,
    baseName: revisionBaseName(revision.number, built.plan.settings.project, designName),
    design: designName,
    revision: revision.number,
    result: built.result,
    plan: built.plan,
    toolPaths: paths,
    nest: plan.nest as unknown as SheetNestResult,
  };
}

export async function requireStoredPlan(id: number): Promise<CutPlanRow> {
  const plan = await findCutPlan(id);
  if (!plan) throw new AppError("not_found", "No such cut plan.");
  return plan;
}
