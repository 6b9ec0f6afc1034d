"use client";
// The design's name and where the person stands: a read-only revision (with the way back and, for the
// shop, a copy into the draft), unsaved changes kept in this browser, or view-only access.
import Link from "next/link";
import { Button } from "@/components/ui/button";

export function StudioHeader(props: {
  name: string;
  base: string;
  revisionNumber?: number;
  canEdit: boolean;
  unsaved: boolean;
  onCopyRevision?: () => void;
}) {
  const { revisionNumber } = props;
  return (
    <div className="flex flex-wrap items-center gap-3">
      <h1 className="text-2xl font-semibold tracking-tight">{props.name}</h1>
      {revisionNumber !== undefined ? (
        <>
          <span
            className="rounded-plate border border-ink-line px-2 py-0.5 font-mono text-sm"
            data-testid="read-only-badge"
          >
            R{revisionNumber} · read-only
          </span>
          <Link href={props.base} className="text-sm underline">
            Back to the working draft
          </Link>
          {props.onCopyRevision ? (
            <Button type="button" variant="quiet" onClick={props.onCopyRevision}>
              Copy into the working draft
            </Button>
          ) : null}
        </>
      ) : props.unsaved ? (
        <span
          className="rounded-plate border border-caution px-2 py-0.5 text-sm text-caution-ink"
          data-testid="unsaved-flag"
        >
          Unsaved changes (kept in this browser)
        </span>
      ) : null}
      {!props.canEdit ? (
        <span className="text-sm text-ink-soft">You can view this design; only the shop edits it.</span>
      ) : null}
    </div>
  );
}
