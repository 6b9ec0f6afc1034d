"use client";
import Link from "next/link";
import { useState } from "react";
import type { RevisionRow } from "@/db/queries/designs";
import { formatWhen } from "@/components/format";
import { Button } from "@/components/ui/button";

/** The design's saved revisions, newest first: open one read-only, tick two to compare, or (the shop) send one for the client's review. */
export function RevisionList({
  revisions,
  base,
  openNumber,
  reviewBase,
}: {
  revisions: RevisionRow[];
  base: string;
  openNumber?: number;
  reviewBase?: string;
}) {
  const [picked, setPicked] = useState<number[]>([]);
  if (revisions.length === 0)
    return <p className="text-sm text-ink-soft">No revisions yet. Save one to freeze the current design.</p>;
  const toggle = (n: number) => setPicked((p) => (p.includes(n) ? p.filter((x) => x !== n) : [...p, n].slice(-2)));
  return (
    <div className="flex flex-col gap-2">
      <ol className="flex flex-col divide-y divide-ink-line text-sm" aria-label="Revisions">
        {revisions.map((r) => (
          <li
            key={r.id}
            className={`flex items-center gap-3 py-1.5 ${openNumber === r.number ? "bg-paper-deep" : ""}`}
            data-testid={`revision-${r.number}`}
          >
            <input
              type="checkbox"
              aria-label={`Compare revision ${r.number}`}
              checked={picked.includes(r.number)}
              onChange={() => toggle(r.number)}
            />
            <Link
              href={`${base}?revision=${r.number}`}
              className="font-mono font-semibold underline decoration-ink-line underline-offset-2"
            >
              R{r.number}
            </Link>
            {/* A plain img: the preview is already a small PNG made on the server for this revision. */}
            {/* eslint-disable-next-line @next/next/no-img-element */}
            <img
              src={`/api/revisions/${r.id}/preview`}
              alt={`Revision ${r.number} preview`}
              width={96}
              height={54}
              className="rounded-plate border border-paper-edge"
              loading="lazy"
            />
            <span className="flex-1 truncate">{r.note || <span className="text-ink-soft">no note</span>}</span>
            <span className="text-xs text-ink-soft">{r.createdBy ?? "—"}</span>
            <span className="font-mono text-xs text-ink-soft">{formatWhen(r.createdAt)}</span>
            <span
              className="text-xs text-ink-soft"
              title={`Fingerprint: the SHA-256 of the design as saved, ${r.specHash}`}
            >
              fingerprint <span className="font-mono">{r.specHash.slice(0, 10)}…</span>
            </span>
            {reviewBase ? (
              <Link
                href={`${reviewBase}?review=${r.id}#send-review`}
                className="text-xs underline decoration-ink-line underline-offset-2"
                aria-label={`Send revision ${r.number} for the client's review`}
              >
                Review…
              </Link>
            ) : null}
          </li>
        ))}
      </ol>
      <div>
        {picked.length === 2 ? (
          <Link href={`${base}/compare?a=${Math.min(...picked)}&b=${Math.max(...picked)}`}>
            <Button type="button" variant="quiet">
              Compare R{Math.min(...picked)} and R{Math.max(...picked)}
            </Button>
          </Link>
        ) : (
          <p className="text-xs text-ink-soft">Tick two revisions to compare them.</p>
        )}
      </div>
    </div>
  );
}
