"use client";
// Changing one's own password: the current one, the new one twice. On success every session of the
// account ends (this one too), so the next step is signing in with the new password.
import Link from "next/link";
import { useActionState } from "react";
import { changePasswordAction } from "@/lib/actions/auth";
import { PASSWORD_MIN_LENGTH } from "@/lib/validation/limits";
import { Button } from "./ui/button";
import { TextField } from "./ui/field";
import { FormMessage } from "./ui/notice";

export function PasswordForm() {
  const [state, action, pending] = useActionState(changePasswordAction, {});
  if (state.ok)
    return (
      <div className="flex flex-col gap-3">
        <FormMessage state={state} />
        <Link href="/login" className="underline">
          Sign in with the new password
        </Link>
      </div>
    );
  return (
    <form action={action} className="flex max-w-md flex-col gap-3" noValidate>
      <TextField
        label="Current password"
        name="currentPassword"
        type="password"
        autoComplete="current-password"
        required
        errors={state.fields?.currentPassword}
      />
      <TextField
        label="New password"
        name="newPassword"
        type="password"
        autoComplete="new-password"
        required
        minLength={PASSWORD_MIN_LENGTH}
        errors={state.fields?.newPassword}
        hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
      />
      <TextField
        label="New password again"
        name="newPasswordAgain"
        type="password"
        autoComplete="new-password"
        required
        errors={state.fields?.newPasswordAgain}
      />
      <FormMessage state={state} />
      <div>
        <Button type="submit" disabled={pending}>
          {pending ? "Saving…" : "Save"}
        </Button>
      </div>
    </form>
  );
}
