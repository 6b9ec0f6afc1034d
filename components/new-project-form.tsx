"use client";
import { useActionState } from "react";
import { createProjectAction } from "@/lib/actions/projects";
import { Button } from "./ui/button";
import { TextField } from "./ui/field";
import { FormMessage } from "./ui/notice";

export function NewProjectForm() {
  const [state, action, pending] = useActionState(createProjectAction, {});
  const v = state.values ?? {};
  return (
    <form action={action} className="grid gap-3 sm:grid-cols-[2fr_2fr_2fr_auto] sm:items-start" noValidate>
      <TextField
        label="Project name"
        name="name"
        required
        maxLength={160}
        defaultValue={v.name}
        errors={state.fields?.name}
      />
      <TextField
        label="Client organisation"
        name="clientOrganisation"
        maxLength={160}
        defaultValue={v.clientOrganisation}
        errors={state.fields?.clientOrganisation}
      />
      <TextField label="Site" name="site" maxLength={200} defaultValue={v.site} errors={state.fields?.site} />
      <div className="sm:pt-6">
        <Button type="submit" disabled={pending}>
          {pending ? "Creating…" : "Create project"}
        </Button>
      </div>
      <div className="sm:col-span-4">
        <FormMessage state={state} />
      </div>
    </form>
  );
}
