// The build log, newest first: each entry's kind, who and when, what happened, the parts it
// concerns and its photos (thumbnails linking to the full picture, both through the checked route).
import { formatWhen } from "@/components/format";
import { Badge } from "@/components/ui/panel";
import type { LogEntryRow } from "@/db/queries/build-log";

const KIND_WORD: Record<string, string> = {
  note: "note",
  cut: "cut",
  assembled: "assembled",
  shipped: "shipped",
  installed: "installed",
  inspection: "inspection",
  problem: "problem",
  fixed: "fixed",
  status: "status",
  review: "review",
  "cut-plan": "cut plan",
};

export function LogList({ entries }: { entries: LogEntryRow[] }) {
  if (entries.length === 0) return <p className="text-sm text-ink-soft">Nothing in the build log yet.</p>;
  return (
    <ol className="flex flex-col gap-2" aria-label="Build log" data-testid="log-list">
      {entries.map((e) => (
        <li
          key={e.id}
          className="rounded-plate border border-ink-line bg-white/50 px-3 py-2 text-sm"
          data-testid={`log-entry-${e.id}`}
          data-kind={e.kind}
        >
          <div className="flex flex-wrap items-baseline gap-x-2 gap-y-1 text-xs text-ink-soft">
            <Badge
              tone={e.kind === "problem" ? "caution" : e.kind === "fixed" || e.kind === "installed" ? "pass" : "ink"}
            >
              {KIND_WORD[e.kind] ?? e.kind}
            </Badge>
            <span className="font-semibold text-ink">{e.author ?? "Axlewright"}</span>
            {e.authorRole ? <span>({e.authorRole})</span> : null}
            <span className="font-mono">{formatWhen(e.createdAt)}</span>
            {e.parts.length ? <span className="font-mono text-ink">{e.parts.join(", ")}</span> : null}
          </div>
          {e.text ? <p className="mt-1 whitespace-pre-wrap">{e.text}</p> : null}
          {e.photos.length ? (
            <ul className="mt-2 flex flex-wrap gap-2">
              {e.photos.map((p) => (
                <li key={p.id}>
                  <a href={`/api/photos/${p.id}`} target="_blank" rel="noreferrer">
                    {/* A plain img: the thumbnail is already made small on the server, and served through the checked route. */}
                    {/* eslint-disable-next-line @next/next/no-img-element */}
                    <img
                      src={`/api/photos/${p.id}?size=thumb`}
                      alt={`Photo ${p.name || p.id}`}
                      width={160}
                      height={Math.round((160 * p.height) / p.width)}
                      loading="lazy"
                      className="h-28 w-auto rounded-plate border border-paper-edge"
                    />
                  </a>
                </li>
              ))}
            </ul>
          ) : null}
        </li>
      ))}
    </ol>
  );
}
