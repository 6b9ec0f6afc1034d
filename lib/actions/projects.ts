"use server";
// Form actions for projects and their members. Each names its access check; lib/server/action.ts
// runs it before anything else.
import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { addMember, removeMember } from "@/db/queries/members";
import { createProject, setProjectSite, updateProject } from "@/db/queries/projects";
import { formAction } from "@/lib/server/action";
import { requireProjectAccess, requireRole } from "@/lib/server/dal";
import { idParam } from "@/lib/server/route";
import { newMemberSchema, newProjectSchema, projectSiteSchema, projectUpdateSchema } from "@/lib/validation/projects";
import { z } from "zod";

const projectOf = (raw: Record<string, FormDataEntryValue>, need: "view" | "manage") =>
  requireProjectAccess(idParam(typeof raw.projectId === "string" ? raw.projectId : undefined, "project"), need);

const createProjectForm = formAction(
  newProjectSchema,
  () => requireRole("admin", "fabricator"),
  async (input, user) => {
    const id = await createProject(user, input);
    revalidatePath("/projects");
    redirect(`/projects/${id}`);
  },
);
export async function createProjectAction(...args: Parameters<typeof createProjectForm>) {
  return createProjectForm(...args);
}

const updateProjectForm = formAction(
  projectUpdateSchema,
  (raw) => projectOf(raw, "manage"),
  async (input, access) => {
    await updateProject(access.user, access.projectId, input);
    revalidatePath(`/projects/${access.projectId}`);
    return "Project saved.";
  },
);
export async function updateProjectAction(...args: Parameters<typeof updateProjectForm>) {
  return updateProjectForm(...args);
}

// The site and stock a new cut plan starts from: an admin or the project's fabricator.
const projectSiteForm = formAction(
  projectSiteSchema,
  (raw) => projectOf(raw, "manage"),
  async (input, access) => {
    await setProjectSite(access.user, access.projectId, input);
    revalidatePath(`/projects/${access.projectId}`);
    return "Site and stock saved.";
  },
);
export async function setProjectSiteAction(...args: Parameters<typeof projectSiteForm>) {
  return projectSiteForm(...args);
}

const addMemberForm = formAction(
  newMemberSchema,
  (raw) => projectOf(raw, "manage"),
  async (input, access) => {
    await addMember(access.user, access.projectId, input);
    revalidatePath(`/projects/${access.projectId}`);
    return "Member added.";
  },
);
export async function addMemberAction(...args: Parameters<typeof addMemberForm>) {
  return addMemberForm(...args);
}

const removeMemberForm = formAction(
  z.object({ memberId: z.coerce.number().int().positive() }),
  (raw) => projectOf(raw, "manage"),
  async (input, access) => {
    await removeMember(access.user, access.projectId, input.memberId);
    revalidatePath(`/projects/${access.projectId}`);
    return "Member removed.";
  },
);
export async function removeMemberAction(...args: Parameters<typeof removeMemberForm>) {
  return removeMemberForm(...args);
}
