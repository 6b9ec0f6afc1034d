import { createDesign, listDesigns } from "@/db/queries/designs";
import { requireProjectAccess } from "@/lib/server/dal";
import { created, idParam, jsonBody, route } from "@/lib/server/route";
import { newDesignSchema, SPEC_BODY_LIMIT } from "@/lib/validation/designs";

export const GET = route<{ id: string }>(async (_request, params) => {
  const access = await requireProjectAccess(idParam(params.id, "project"));
  return { designs: await listDesigns(access.projectId) };
});

export const POST = route<{ id: string }>(async (request, params) => {
  const access = await requireProjectAccess(idParam(params.id, "project"), "manage");
  const input = await jsonBody(request, newDesignSchema, SPEC_BODY_LIMIT);
  const id = await createDesign(access.user, access.projectId, input);
  return created({ design: { id } });
});
