import { jobContext, planFileNames, requireStoredPlan } from "@/lib/server/cut-plans";
import { requireCutPlanAccess, requireUser } from "@/lib/server/dal";
import { idParam, route } from "@/lib/server/route";

/** The files a stored cut plan gives, for the shop (download each from ./[name], or all as job.zip). */
export const GET = route<{ id: string }>(async (request, params) => {
  await requireUser();
  const plan = await requireStoredPlan(idParam(params.id, "cut plan"));
  const access = await requireCutPlanAccess(plan.revisionId);
  return { files: await planFileNames(await jobContext(plan, access.revision, access.designName), request.signal) };
});
