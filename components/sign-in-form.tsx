"use client";
import { useActionState } from "react";
import { authenticate } from "@/lib/actions/auth";
import { Button } from "./ui/button";
import { TextField } from "./ui/field";
import { FormMessage } from "./ui/notice";

export function SignInForm({ callbackUrl }: { callbackUrl: string }) {
  const [state, action, pending] = useActionState(authenticate, {});
  return (
    <form action={action} className="flex flex-col gap-4" noValidate>
      <input type="hidden" name="callbackUrl" value={callbackUrl} />
      <TextField
        label="E-mail"
        name="email"
        type="email"
        autoComplete="username"
        required
        defaultValue={state.values?.email}
        errors={state.fields?.email}
        autoFocus
      />
      <TextField
        label="Password"
        name="password"
        type="password"
        autoComplete="current-password"
        required
        errors={state.fields?.password}
      />
      <FormMessage state={state} />
      <Button type="submit" disabled={pending}>
        {pending ? "Signing in…" : "Sign in"}
      </Button>
    </form>
  );
}
