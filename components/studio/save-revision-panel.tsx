"use client";
// The note and the button that freeze the working spec as the next revision.
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { TextInput } from "@/components/ui/inputs";
import { Notice } from "@/components/ui/notice";
import { Panel } from "@/components/ui/panel";
import type { DesignSpecInput } from "@/lib/track";
import type { LoadsSettings } from "@/lib/validation/loads";
import { useSaveRevision } from "./use-save-revision";

export function SaveRevisionPanel(props: {
  designId: number;
  spec: DesignSpecInput;
  loads: LoadsSettings;
  blocked: boolean;
  onSaved: () => void;
}) {
  const [note, setNote] = useState("");
  const save = useSaveRevision(props.designId, () => {
    setNote("");
    props.onSaved();
  });
  return (
    <Panel title="Save a revision">
      <div className="flex flex-col gap-2">
        <TextInput
          id="revision-note"
          label="Note"
          maxLength={500}
          value={note}
          onChange={setNote}
          placeholder="What changed, for the client and the shop"
        />
        <Button
          type="button"
          onClick={() => save.mutate({ spec: props.spec, note, loads: props.loads })}
          disabled={save.isPending || props.blocked}
        >
          {save.isPending ? "Saving…" : "Save revision"}
        </Button>
        {save.isSuccess ? <Notice tone="done">Saved revision R{save.data.number}.</Notice> : null}
        {save.isError ? <Notice tone="problem">{save.error.message}</Notice> : null}
      </div>
    </Panel>
  );
}
