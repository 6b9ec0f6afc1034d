"use client";
import { useActionState } from "react";
import { addMemberAction, removeMemberAction } from "@/lib/actions/projects";
import { Button } from "./ui/button";
import { SelectField } from "./ui/field";
import { MEMBER_ROLE_ORDER, roleOptions } from "@/lib/labels";
import { FormMessage } from "./ui/notice";

export function AddMemberForm({
  projectId,
  people,
}: {
  projectId: number;
  people: { id: number; name: string; role: string; email: string }[];
}) {
  const [state, action, pending] = useActionState(addMemberAction, {});
  const v = state.values ?? {};
  return (
    <form action={action} className="grid gap-3 sm:grid-cols-[3fr_2fr_auto] sm:items-start" noValidate>
      <input type="hidden" name="projectId" value={projectId} />
      <SelectField
        label="Person"
        name="userId"
        defaultValue={v.userId}
        errors={state.fields?.userId}
        options={[
          { value: "", label: "Choose…" },
          ...people.map((p) => ({ value: String(p.id), label: `${p.name} (${p.role}, ${p.email})` })),
        ]}
      />
      <SelectField
        label="Role in this project"
        name="role"
        defaultValue={v.role}
        errors={state.fields?.role}
        hint="The same as the person's role."
        options={roleOptions(MEMBER_ROLE_ORDER)}
      />
      <div className="sm:pt-6">
        <Button type="submit" disabled={pending}>
          {pending ? "Adding…" : "Add member"}
        </Button>
      </div>
      <div className="sm:col-span-3">
        <FormMessage state={state} />
      </div>
    </form>
  );
}

export function RemoveMemberButton({
  projectId,
  memberId,
  name,
}: {
  projectId: number;
  memberId: number;
  name: string;
}) {
  const [state, action, pending] = useActionState(removeMemberAction, {});
  return (
    <form
      action={action}
      onSubmit={(e) => {
        if (!confirm(`Remove ${name} from this project?`)) e.preventDefault();
      }}
    >
      <input type="hidden" name="projectId" value={projectId} />
      <input type="hidden" name="memberId" value={memberId} />
      <Button type="submit" variant="quiet" disabled={pending} aria-label={`Remove ${name}`}>
        Remove
      </Button>
      {state.ok === false ? <span className="ml-2 text-xs text-caution-ink">{state.message}</span> : null}
    </form>
  );
}
