import { latestCutPlan } from "@/db/queries/cut-plans";
import { storeCutPlan } from "@/lib/server/cut-plans";
import { requireCutPlanAccess } from "@/lib/server/dal";
import { created, idParam, jsonBody, route } from "@/lib/server/route";
import { newCutPlanSchema } from "@/lib/validation/cut-plans";
import { CUT_PLAN_BODY_LIMIT } from "@/lib/validation/limits";

/** The revision's current cut plan (or null): for the shop only. */
export const GET = route<{ id: string }>(async (_request, params) => {
  const access = await requireCutPlanAccess(idParam(params.id, "revision"));
  return { cutPlan: await latestCutPlan(access.revision.id) };
});

/** Stores a nest made in the browser as the revision's cut plan, once the server's own check holds. */
export const POST = route<{ id: string }>(async (request, params) => {
  const access = await requireCutPlanAccess(idParam(params.id, "revision"));
  const { nest, purpose, reason, ...choice } = await jsonBody(request, newCutPlanSchema, CUT_PLAN_BODY_LIMIT);
  const stored = await storeCutPlan(
    access.user,
    { revision: access.revision, projectId: access.projectId },
    choice,
    nest,
    { purpose, reason },
    request.signal,
  );
  return created({ cutPlan: stored });
});
