"use server";
// Sign-in and sign-out. Sign-in is the one action open to anonymous callers; it validates the form,
// and Auth.js's authorize (auth.ts) checks the password and the rate limit.
import { AuthError } from "next-auth";
import { z } from "zod";
import { signIn, signOut } from "@/auth";
import { formAction, type ActionState } from "@/lib/server/action";
import { requireUser } from "@/lib/server/dal";
import { clientAddressFromHeaders } from "@/lib/server/request";
import { changePassword, SIGN_IN_WINDOW_MINUTES } from "@/lib/server/sign-in";
import { passwordChangeSchema, signInSchema } from "@/lib/validation/auth";

function safeCallback(value: FormDataEntryValue | null): string {
  const s = typeof value === "string" ? value : "";
  // Only paths on this site, never another origin.
  return s.startsWith("/") && !s.startsWith("//") && !s.startsWith("/\\") ? s : "/projects";
}

export async function authenticate(_previous: ActionState, formData: FormData): Promise<ActionState> {
  const email = typeof formData.get("email") === "string" ? String(formData.get("email")).slice(0, 300) : "";
  const values = { email };
  const parsed = signInSchema.safeParse({ email: formData.get("email"), password: formData.get("password") });
  if (!parsed.success) {
    return {
      ok: false,
      status: 400,
      message: "Check the highlighted fields.",
      fields: z.flattenError(parsed.error).fieldErrors,
      values,
    };
  }
  try {
    await signIn("credentials", {
      email: parsed.data.email,
      password: parsed.data.password,
      redirectTo: safeCallback(formData.get("callbackUrl")),
    });
    return { ok: true };
  } catch (error) {
    if (error instanceof AuthError) {
      if (error.type === "CredentialsSignin" && (error as AuthError & { code?: string }).code === "too_many_attempts") {
        return {
          ok: false,
          status: 429,
          message: `Too many failed sign-ins. Wait ${SIGN_IN_WINDOW_MINUTES} minutes and try again.`,
          values,
        };
      }
      if (error.type === "CredentialsSignin")
        return { ok: false, status: 401, message: "That e-mail and password do not match an active account.", values };
      return { ok: false, status: 500, message: "Sign-in failed on our side. Please try again.", values };
    }
    throw error; // the redirect that signals success
  }
}

export async function signOutAction(): Promise<void> {
  await signOut({ redirectTo: "/login" });
}

const changePasswordForm = formAction(
  passwordChangeSchema,
  () => requireUser(),
  async (input, user) => {
    await changePassword(user, input.currentPassword, input.newPassword, await clientAddressFromHeaders());
    return "Password changed. Every session of yours has ended: sign in again with the new password.";
  },
);
export async function changePasswordAction(...args: Parameters<typeof changePasswordForm>) {
  return changePasswordForm(...args);
}
