import "server-only";
// The installer's assembly sheet on the server: who may open it (every member of the project —
// unlike the cut files, which are the shop's), and its content from the stored cut plan.
import { getProjectSummary, projectShop } from "@/db/queries/projects";
import { buildAssemblySheet } from "@/lib/assembly/build";
import type { AssemblySheet } from "@/lib/assembly/sheet";
import type { CutPlanRow } from "@/db/queries/cut-plans";
import { jobForPlan, requireStoredPlan } from "./cut-plans";
import { requireRevisionAccess, requireUser } from "./dal";
import { AppError, notFoundAs } from "./errors";

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

export async function assemblySheetFor(
  plan: CutPlanRow,
  access: Awaited<ReturnType<typeof requireSheetAccess>>,
  opts: { inches?: boolean; bumpLimit?: number } = {},
): Promise<AssemblySheet> {
  const [job, project, shop] = await Promise.all([
    jobForPlan(plan, access.revision, access.designName),
    getProjectSummary(access.projectId),
    projectShop(access.projectId),
  ]);
  return buildAssemblySheet({
    job,
    cutPlanId: plan.id,
    cutPlanNumber: plan.number,
    project: {
      name: project?.name ?? "Project",
      site: project?.site ?? "",
      client: project?.clientOrganisation ?? null,
    },
    approval: job.approval ?? null,
    shop,
    date: new Date(),
    inches: opts.inches,
    bumpLimit: opts.bumpLimit,
  });
}
