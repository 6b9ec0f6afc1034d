import { listDesigns } from "@/db/queries/designs";
import { createDesign } from "@/lib/server/designs";
import { requireProjectAccess } from "@/lib/server/dal";
import { created, idParam, jsonBody, route } from "@/lib/server/route";
import { newDesignSchema } from "@/lib/validation/designs";
import { SPEC_BODY_LIMIT } from "@/lib/validation/limits";

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
