"use server";
// Admin form actions for accounts: add a user, change a role, deactivate or reactivate.
import { revalidatePath } from "next/cache";
import { changeUserRole, createUser, setUserActive } from "@/db/queries/users";
import { formAction } from "@/lib/server/action";
import { requireRole } from "@/lib/server/dal";
import { hashPassword } from "@/lib/server/passwords";
import { sendMail } from "@/lib/server/mail";
import { linkFromRequest } from "@/lib/server/request";
import { changeRoleSchema, newUserSchema, setActiveSchema } from "@/lib/validation/users";

const admin = () => requireRole("admin");

const createUserForm = formAction(newUserSchema, admin, async (input, actor) => {
  await createUser(actor, input, hashPassword);
  await sendMail({
    to: input.email,
    subject: "Your Axlewright account",
    text: `Hello ${input.name},\n\n${actor.name} has made you an Axlewright account (${input.role}).\nSign in at ${await linkFromRequest("/login")} with this e-mail address and the password you were given, then change it at ${await linkFromRequest("/account/password")}.\n`,
  });
  revalidatePath("/admin/users");
  return `Added ${input.name}.`;
});
export async function createUserAction(...args: Parameters<typeof createUserForm>) {
  return createUserForm(...args);
}

const changeRoleForm = formAction(changeRoleSchema, admin, async (input, actor) => {
  await changeUserRole(actor, input.userId, input.role);
  revalidatePath("/admin/users");
  return "Role changed.";
});
export async function changeRoleAction(...args: Parameters<typeof changeRoleForm>) {
  return changeRoleForm(...args);
}

const setActiveForm = formAction(setActiveSchema, admin, async (input, actor) => {
  await setUserActive(actor, input.userId, input.active);
  revalidatePath("/admin/users");
  return input.active ? "Account reactivated." : "Account deactivated.";
});
export async function setActiveAction(...args: Parameters<typeof setActiveForm>) {
  return setActiveForm(...args);
}
