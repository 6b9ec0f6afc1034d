import { addMember, listMembers } from "@/db/queries/members";
import { requireProjectAccess } from "@/lib/server/dal";
import { created, idParam, jsonBody, route } from "@/lib/server/route";
import { newMemberSchema } from "@/lib/validation/projects";

export const GET = route<{ id: string }>(async (_request, params) => {
  const access = await requireProjectAccess(idParam(params.id, "project"));
  return { members: await listMembers(access.projectId) };
});

export const POST = route<{ id: string }>(async (request, params) => {
  const access = await requireProjectAccess(idParam(params.id, "project"), "manage");
  const input = await jsonBody(request, newMemberSchema);
  const id = await addMember(access.user, access.projectId, input);
  return created({ member: (await listMembers(access.projectId)).find((m) => m.id === id) });
});
