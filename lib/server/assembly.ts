import "server-only";
// The installer's assembly sheet on the server: who may open it (every member of the project —
// unlike the cut files, which are the shop's), and its content from the stored cut plan.
import { getProjectSummary, projectShop } from "@/db/queries/projects";
import type { Paper } from "@/lib/assembly/sheet";
import type { CutPlanRow } from "@/db/queries/cut-plans";
import { RENDER_DEADLINE_MS } from "@/lib/validation/limits";
import { jobContext, requireStoredPlan } from "./cut-plans";
import { requireRevisionAccess, requireUser } from "./dal";
import { AppError, notFoundAs } from "./errors";
import { runTask } from "./pool";

type SheetAccess = Awaited<ReturnType<typeof requireSheetAccess>>;

/** The plan and the caller's access to its project: any member; 404 for the rest, as if it did not exist. */
export async function requireSheetAccess(cutPlanId: number) {
  await requireUser();
  const plan = await requireStoredPlan(cutPlanId);
  const access = await requireRevisionAccess(plan.revisionId).catch(notFoundAs("No such cut plan."));
  return { ...access, plan };
}

/** The bump limit a request asks for, mm: 0.1 to 10, else the default. */
export function bumpLimitParam(raw: string | null | undefined): number | undefined {
  if (raw === null || raw === undefined || raw === "") return undefined;
  const v = Number(raw);
  if (!Number.isFinite(v) || v < 0.1 || v > 10)
    throw new AppError("bad_request", "The bump limit must be a number of millimetres from 0.1 to 10.", {
      limit: ["0.1 to 10 mm"],
    });
  return v;
}

export interface SheetOptions {
  inches?: boolean;
  bumpLimit?: number;
}

async function sheetInput(plan: CutPlanRow, access: SheetAccess, opts: SheetOptions) {
  const [ctx, project, shop] = await Promise.all([
    jobContext(plan, access.revision, access.designName),
    getProjectSummary(access.projectId),
    projectShop(access.projectId),
  ]);
  return {
    ctx,
    sheet: {
      cutPlanId: plan.id,
      cutPlanNumber: plan.number,
      project: {
        name: project?.name ?? "Project",
        site: project?.site ?? "",
        client: project?.clientOrganisation ?? null,
      },
      approval: ctx.approval,
      shop,
      date: new Date().toISOString(),
      inches: opts.inches,
      bumpLimit: opts.bumpLimit,
    },
  };
}

/** The sheet's content (the page draws it), made on the worker pool: its tolerance search is the slow part. */
export async function assemblySheetFor(plan: CutPlanRow, access: SheetAccess, opts: SheetOptions = {}) {
  return runTask("assemblySheet", await sheetInput(plan, access, opts), { deadlineMs: RENDER_DEADLINE_MS });
}

/** The sheet as a PDF on the chosen paper, made on the worker pool. */
export async function assemblySheetPdfFor(
  plan: CutPlanRow,
  access: SheetAccess,
  opts: SheetOptions & { paper: Paper },
  signal?: AbortSignal,
) {
  const input = { ...(await sheetInput(plan, access, opts)), paper: opts.paper };
  return runTask("assemblyPdf", input, { deadlineMs: RENDER_DEADLINE_MS, signal });
}
