import { listMembers, removeMember, updateMemberRole } from "@/db/queries/members";
import { requireProjectAccess } from "@/lib/server/dal";
import { idParam, jsonBody, route } from "@/lib/server/route";
import { memberUpdateSchema } from "@/lib/validation/projects";

type Params = { id: string; memberId: string };

export const PATCH = route<Params>(async (request, params) => {
  const access = await requireProjectAccess(idParam(params.id, "project"), "manage");
  const memberId = idParam(params.memberId, "member");
  const input = await jsonBody(request, memberUpdateSchema);
  await updateMemberRole(access.user, access.projectId, memberId, input.role);
  return { member: (await listMembers(access.projectId)).find((m) => m.id === memberId) };
});

export const DELETE = route<Params>(async (_request, params) => {
  const access = await requireProjectAccess(idParam(params.id, "project"), "manage");
  await removeMember(access.user, access.projectId, idParam(params.memberId, "member"));
  return { removed: true };
});
