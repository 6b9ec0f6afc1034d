import { listRevisions } from "@/db/queries/designs";
import { requireDesignAccess } from "@/lib/server/dal";
import { saveRevision } from "@/lib/server/designs";
import { created, idParam, jsonBody, route } from "@/lib/server/route";
import { newRevisionSchema } from "@/lib/validation/designs";
import { SPEC_BODY_LIMIT } from "@/lib/validation/limits";

export const GET = route<{ id: string }>(async (_request, params) => {
  const access = await requireDesignAccess(idParam(params.id, "design"));
  return { revisions: await listRevisions(access.design.id) };
});

export const POST = route<{ id: string }>(async (request, params) => {
  const access = await requireDesignAccess(idParam(params.id, "design"), "manage");
  const input = await jsonBody(request, newRevisionSchema, SPEC_BODY_LIMIT);
  const revision = await saveRevision(access.user, access.design.id, access.projectId, input, request.signal);
  return created({ revision });
});
