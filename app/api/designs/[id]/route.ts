import { listRevisions } from "@/db/queries/designs";
import { requireDesignAccess } from "@/lib/server/dal";
import { updateDesign } from "@/lib/server/designs";
import { idParam, jsonBody, route } from "@/lib/server/route";
import { designUpdateSchema } from "@/lib/validation/designs";
import { SPEC_BODY_LIMIT } from "@/lib/validation/limits";

export const GET = route<{ id: string }>(async (_request, params) => {
  const access = await requireDesignAccess(idParam(params.id, "design"));
  const { design } = access;
  return {
    design: {
      id: design.id,
      projectId: design.projectId,
      name: design.name,
      mode: design.mode,
      updatedAt: design.updatedAt.toISOString(),
      // The working draft is the shop's; clients and installers see saved revisions only.
      ...(access.canManage ? { draft: design.draft, loads: design.loads } : {}),
    },
    revisions: await listRevisions(design.id),
    you: { canEdit: access.canManage },
  };
});

export const PATCH = route<{ id: string }>(async (request, params) => {
  const access = await requireDesignAccess(idParam(params.id, "design"), "manage");
  const input = await jsonBody(request, designUpdateSchema, SPEC_BODY_LIMIT);
  await updateDesign(access.user, access.design.id, access.projectId, input);
  return { design: { id: access.design.id } };
});
