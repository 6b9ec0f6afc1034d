"use client";
import { useActionState } from "react";
import { changeRoleAction, createUserAction, setActiveAction } from "@/lib/actions/users";
import { roleOptions } from "@/lib/labels";
import { Button } from "./ui/button";
import { SelectField, TextField } from "./ui/field";
import { FormMessage } from "./ui/notice";

const ROLE_OPTIONS = roleOptions(["fabricator", "client", "installer", "admin"]);

export function NewUserForm() {
  const [state, action, pending] = useActionState(createUserAction, {});
  const v = state.values ?? {};
  return (
    <form action={action} className="grid gap-3 sm:grid-cols-2" noValidate>
      <TextField label="Name" name="name" required maxLength={120} defaultValue={v.name} errors={state.fields?.name} />
      <TextField
        label="E-mail"
        name="email"
        type="email"
        required
        maxLength={254}
        defaultValue={v.email}
        errors={state.fields?.email}
      />
      <SelectField
        label="Role"
        name="role"
        defaultValue={v.role ?? "fabricator"}
        errors={state.fields?.role}
        options={ROLE_OPTIONS}
      />
      <TextField
        label="First password"
        name="password"
        type="password"
        autoComplete="new-password"
        required
        errors={state.fields?.password}
        hint="At least 10 characters. Give it to the person by another channel."
      />
      <div className="sm:col-span-2 flex flex-col gap-3">
        <FormMessage state={state} />
        <div>
          <Button type="submit" disabled={pending}>
            {pending ? "Adding…" : "Add person"}
          </Button>
        </div>
      </div>
    </form>
  );
}

export function RoleSelect({ userId, role, name }: { userId: number; role: string; name: string }) {
  const [state, action, pending] = useActionState(changeRoleAction, {});
  return (
    <form action={action} className="flex items-center gap-2">
      <input type="hidden" name="userId" value={userId} />
      <label className="sr-only" htmlFor={`role-${userId}`}>
        Role of {name}
      </label>
      <select
        id={`role-${userId}`}
        name="role"
        defaultValue={role}
        className="rounded-plate border border-ink-line bg-white/70 px-1.5 py-1 text-sm"
      >
        {ROLE_OPTIONS.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      <Button type="submit" variant="quiet" disabled={pending} aria-label={`Save role of ${name}`}>
        Save
      </Button>
      {state.message ? (
        <span className={`text-xs ${state.ok ? "text-pass" : "text-caution-ink"}`}>{state.message}</span>
      ) : null}
    </form>
  );
}

export function ActiveToggle({ userId, active, name }: { userId: number; active: boolean; name: string }) {
  const [state, action, pending] = useActionState(setActiveAction, {});
  return (
    <form action={action} className="flex items-center gap-2">
      <input type="hidden" name="userId" value={userId} />
      <input type="hidden" name="active" value={active ? "false" : "true"} />
      <Button
        type="submit"
        variant={active ? "caution" : "quiet"}
        disabled={pending}
        aria-label={`${active ? "Deactivate" : "Reactivate"} ${name}`}
      >
        {active ? "Deactivate" : "Reactivate"}
      </Button>
      {state.ok === false ? <span className="text-xs text-caution-ink">{state.message}</span> : null}
    </form>
  );
}
