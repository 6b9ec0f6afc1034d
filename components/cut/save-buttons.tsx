"use client";
// Saving the cut plan. With the client's approval it is for production. Without it the shop saves
// it for review (files marked NOT APPROVED), or for production after confirming with a reason,
// which the server logs.
import { useState } from "react";
import { Button } from "@/components/ui/button";
import type { SaveIntent } from "./use-save-plan";

interface Props {
  approved: boolean;
  revisionNumber: number;
  disabled: boolean;
  saving: boolean;
  onSave: (intent: SaveIntent) => void;
}

const SAVE = "Save as this revision's cut plan";
const SAVING = "Checking and saving…";

export function SaveButtons({ approved, revisionNumber, disabled, saving, onSave }: Props) {
  const [asking, setAsking] = useState(false);
  const [reason, setReason] = useState("");
  if (approved)
    return (
      <div className="flex items-center gap-3">
        <Button type="button" onClick={() => onSave({ purpose: "production" })} disabled={disabled}>
          {saving ? SAVING : SAVE}
        </Button>
      </div>
    );
  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap items-center gap-3">
        <Button type="button" onClick={() => onSave({ purpose: "review" })} disabled={disabled}>
          {saving ? SAVING : SAVE}
        </Button>
        <Button
          type="button"
          variant="caution"
          onClick={() => setAsking((a) => !a)}
          disabled={disabled}
          aria-expanded={asking}
        >
          Save for production without approval…
        </Button>
      </div>
      <p className="text-xs text-ink-soft">
        R{revisionNumber} is not approved by the client: a saved cut plan is for review, and its files say NOT APPROVED
        — FOR REVIEW ONLY.
      </p>
      {asking ? (
        <div
          className="flex flex-col gap-2 rounded-plate border border-caution bg-caution-soft p-3"
          role="group"
          aria-label="Save for production without approval"
        >
          <label htmlFor="unapproved-reason" className="text-sm font-medium text-caution-ink">
            Why does this go to production before the client approves it? (logged)
          </label>
          <textarea
            id="unapproved-reason"
            rows={2}
            maxLength={500}
            value={reason}
            onChange={(e) => setReason(e.target.value)}
            className="w-full rounded-plate border border-ink-line bg-white/80 px-2.5 py-1.5 text-sm"
          />
          <div>
            <Button
              type="button"
              variant="caution"
              disabled={disabled || reason.trim() === ""}
              onClick={() => onSave({ purpose: "production", reason: reason.trim() })}
            >
              Confirm: save for production
            </Button>
          </div>
        </div>
      ) : null}
    </div>
  );
}
