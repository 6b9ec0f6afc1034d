import { createProject, getProjectSummary, listVisibleProjects } from "@/db/queries/projects";
import { requireRole, requireUser } from "@/lib/server/dal";
import { created, jsonBody, route } from "@/lib/server/route";
import { newProjectSchema } from "@/lib/validation/projects";

export const GET = route(async () => {
  const user = await requireUser();
  return { projects: await listVisibleProjects(user) };
});

export const POST = route(async (request) => {
  const user = await requireRole("admin", "fabricator");
  const input = await jsonBody(request, newProjectSchema);
  const id = await createProject(user, input);
  return created({ project: await getProjectSummary(id) });
});
