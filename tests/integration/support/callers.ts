// The eight kinds of caller every role-matrix test asks as: signed out, an admin, and a fabricator,
// client and installer each of the project under test and of another project.
import { makeProject, makeUser } from "./fixtures";

export const CALLERS = [
  "anonymous",
  "admin",
  "fabricator member",
  "fabricator non-member",
  "client member",
  "client non-member",
  "installer member",
  "installer non-member",
] as const;
export type Caller = (typeof CALLERS)[number];
export type CallerIds = Record<Exclude<Caller, "anonymous">, number>;

/** One person per kind of caller; the members belong to the returned project, the others to a project of their own. */
export async function makeCallers(label: string): Promise<{ ids: CallerIds; projectId: number }> {
  const ids = {} as CallerIds;
  ids.admin = (await makeUser("admin", `${label}-admin`)).id;
  for (const role of ["fabricator", "client", "installer"] as const) {
    ids[`${role} member`] = (await makeUser(role, `${label}-${role}-member`)).id;
    ids[`${role} non-member`] = (await makeUser(role, `${label}-${role}-outsider`)).id;
  }
  const projectId = await makeProject(`${label} project`, [
    { userId: ids["fabricator member"], role: "fabricator" },
    { userId: ids["client member"], role: "client" },
    { userId: ids["installer member"], role: "installer" },
  ]);
  await makeProject(`${label} other project`, [
    { userId: ids["fabricator non-member"], role: "fabricator" },
    { userId: ids["client non-member"], role: "client" },
    { userId: ids["installer non-member"], role: "installer" },
  ]);
  return { ids, projectId };
}

/** Status tables by who may do it: any member (and admins), the shop (admin and the project's fabricator), or only the project's client. */
export const projectView = (ok: number): Record<Caller, number> => ({
  anonymous: 401,
  admin: ok,
  "fabricator member": ok,
  "fabricator non-member": 404,
  "client member": ok,
  "client non-member": 404,
  "installer member": ok,
  "installer non-member": 404,
});
export const projectManage = (ok: number): Record<Caller, number> => ({
  anonymous: 401,
  admin: ok,
  "fabricator member": ok,
  "fabricator non-member": 404,
  "client member": 403,
  "client non-member": 404,
  "installer member": 403,
  "installer non-member": 404,
});
export const clientOnly = (ok: number): Record<Caller, number> => ({
  anonymous: 401,
  admin: 403,
  "fabricator member": 403,
  "fabricator non-member": 404,
  "client member": ok,
  "client non-member": 404,
  "installer member": 403,
  "installer non-member": 404,
});
