import { listMembers } from "@/db/queries/members";
import { getProjectSummary, updateProject } from "@/db/queries/projects";
import { requireProjectAccess } from "@/lib/server/dal";
import { idParam, jsonBody, route } from "@/lib/server/route";
import { projectUpdateSchema } from "@/lib/validation/projects";

export const GET = route<{ id: string }>(async (_request, params) => {
  const access = await requireProjectAccess(idParam(params.id, "project"));
  return {
    project: await getProjectSummary(access.projectId),
    members: await listMembers(access.projectId),
    you: { memberRole: access.memberRole, canManage: access.canManage },
  };
});

export const PATCH = route<{ id: string }>(async (request, params) => {
  const access = await requireProjectAccess(idParam(params.id, "project"), "manage");
  const input = await jsonBody(request, projectUpdateSchema);
  await updateProject(access.user, access.projectId, input);
  return { project: await getProjectSummary(access.projectId) };
});
