// The revision's saved cut plan (its newest) and its files, or how to get one.
import { Panel } from "@/components/ui/panel";
import { cutPlanName } from "@/lib/cut-plan/name";
import { pct } from "./nest-figures";

export interface SavedPlanView {
  id: number;
  /** 1, 2, … within the revision. */
  number: number;
  createdAt: string;
  createdBy: string | null;
  summary: {
    sheets: number;
    utilisation: number;
    perSheet: number[];
    copies: number;
    material: string;
    sheet: string;
    machine: string;
    warnings: string[];
    purpose?: "review" | "production";
    unapprovedReason?: string | null;
  };
  files: string[];
}

export function SavedPlan({
  saved,
  designName,
  revisionNumber,
}: {
  saved: SavedPlanView | null;
  designName: string;
  revisionNumber: number;
}) {
  if (!saved) {
    return (
      <Panel title="Cut files">
        <p className="text-sm text-ink-soft">
          No cut plan is saved for {designName} R{revisionNumber} yet. Nest the parts and save the result to get the
          files.
        </p>
      </Panel>
    );
  }
  const s = saved.summary;
  return (
    <Panel title="Cut files">
      <p className="mb-2 text-sm" data-testid="stored-plan">
        {cutPlanName(saved.number, revisionNumber)}, saved {new Date(saved.createdAt).toLocaleString()} by{" "}
        {saved.createdBy ?? "—"}: {s.copies} parts on {s.sheets} × {s.sheet}, {pct(s.utilisation)} used; {s.machine}.
        {s.purpose ? (
          <>
            {" "}
            Saved for {s.purpose}
            {s.unapprovedReason ? ` without the client's approval (reason: ${s.unapprovedReason})` : ""}.
          </>
        ) : null}
      </p>
      <a
        href={`/api/cut-plans/${saved.id}/files/job.zip`}
        className="inline-block rounded-plate border border-ink bg-ink px-3 py-1.5 text-sm font-medium text-paper"
        data-testid="download-zip"
        download
      >
        Download everything (ZIP)
      </a>
      <ul className="mt-3 grid gap-1 text-sm sm:grid-cols-2">
        {saved.files
          .filter((f) => f !== "job.zip")
          .map((f) => (
            <li key={f}>
              <a href={`/api/cut-plans/${saved.id}/files/${f}`} className="font-mono text-xs underline" download>
                {f}
              </a>
            </li>
          ))}
      </ul>
    </Panel>
  );
}
