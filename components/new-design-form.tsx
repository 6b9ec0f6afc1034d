"use client";
import { useActionState } from "react";
import { createDesignAction } from "@/lib/actions/designs";
import { Button } from "./ui/button";
import { SelectField, TextField } from "./ui/field";
import { FormMessage } from "./ui/notice";

export function NewDesignForm({
  projectId,
  presets,
}: {
  projectId: number;
  presets: { id: string; label: string; group: string }[];
}) {
  const [state, action, pending] = useActionState(createDesignAction, {});
  const v = state.values ?? {};
  return (
    <form action={action} className="flex max-w-xl flex-col gap-3" noValidate>
      <input type="hidden" name="projectId" value={projectId} />
      <TextField
        label="Design name"
        name="name"
        required
        maxLength={160}
        defaultValue={v.name}
        errors={state.fields?.name}
      />
      <SelectField
        label="Start from"
        name="preset"
        defaultValue={v.preset}
        errors={state.fields?.preset}
        hint="Every parameter can be changed in the studio."
        options={presets.map((p) => ({ value: p.id, label: `${p.group}: ${p.label}` }))}
      />
      <FormMessage state={state} />
      <div>
        <Button type="submit" disabled={pending}>
          {pending ? "Creating…" : "Create design"}
        </Button>
      </div>
    </form>
  );
}
