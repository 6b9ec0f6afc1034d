"use client";
// The cut-plan page: settings on the left; on the right the run, the parts, the warnings, the nest
// (run in a worker, with progress and cancel) and, once the server has checked and stored it, the
// downloads. Nothing is stored until the fabricator saves a complete nest.
import { useRouter } from "next/navigation";
import { useMemo, useState } from "react";
import { composeSettings, type LibraryChoice } from "@/lib/cut-plan/compose";
import { formToChoice, type PlanForm } from "@/lib/cut-plan/form";
import { placeRing } from "@/lib/cut-plan/verify-nest";
import { bounds, ringArea } from "@/lib/cut/geometry";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { Panel } from "@/components/ui/panel";
import { Table } from "@/components/ui/table";
import { fieldOfError, PlanFields } from "./plan-fields";
import { EndTreatments, RunDrawing } from "./run-panel";
import { SheetView, type SheetViewPart } from "./sheet-view";
import { useNester, useParts } from "./use-cut-worker";
import type { PartsPreview } from "./cut-worker";
import type { SheetNestResult } from "@/lib/nest/types";

export interface PlannerLibrary {
  materials: LibraryChoice["material"][];
  sheets: (LibraryChoice["sheet"] & { materialId: number })[];
  machines: LibraryChoice["machine"][];
}

export interface StoredPlanView {
  id: number;
  createdAt: string;
  createdBy: string | null;
  summary: { sheets: number; utilisation: number; perSheet: number[]; copies: number; material: string; sheet: string; machine: string; warnings: string[]; purpose?: "review" | "production"; unapprovedReason?: string | null };
  files: string[];
}

interface Props {
  revision: { id: number; number: number; spec: unknown; specHash: string };
  designName: string;
  projectName: string;
  library: PlannerLibrary;
  initialForm: PlanForm;
  stored: StoredPlanView | null;
  /** The client has approved this revision: plans are for production. Otherwise the shop chooses, and production needs a reason. */
  approved: boolean;
}

const pct = (v: number) => `${(v * 100).toFixed(1)} %`;

function bbox(ring: [number, number][]) {
  const b = bounds(ring);
  return { length: b.maxX - b.minX, width: b.maxY - b.minY };
}

/**
 * Stock used: the parts' own (nominal) area over the sheets' area — the figure the server stores,
 * so the page and the stored plan never disagree.
 */
function usedShare(preview: PartsPreview, placements: { id: string }[], sheetArea: number): number {
  const area = new Map(preview.plan.parts.map((p) => [p.id, ringArea(p.region.outer) - p.region.holes.reduce((a, h) => a + ringArea(h), 0)]));
  return placements.reduce((sum, pl) => sum + (area.get(pl.id) ?? 0), 0) / sheetArea;
}

function sheetParts(preview: PartsPreview, placements: SheetNestResult["sheets"][number]["placements"]): SheetViewPart[] {
  const byId = new Map(preview.plan.parts.map((p) => [p.id, p]));
  return placements.flatMap((pl) => {
    const part = byId.get(pl.id);
    if (!part) return [];
    return [{ key: `${pl.id}-${pl.copy}`, label: pl.id, kind: part.kind, outer: placeRing(part.region.outer, pl.rotation, pl.x, pl.y), holes: part.region.holes.map((h) => placeRing(h, pl.rotation, pl.x, pl.y)) }];
  });
}

export function CutPlanner({ revision, designName, projectName, library, initialForm, stored, approved }: Props) {
  const router = useRouter();
  const [form, setForm] = useState<PlanForm>(initialForm);
  const [seconds, setSeconds] = useState("15");
  const [save, setSave] = useState<{ state: "idle" | "saving" | "saved" | "failed"; message?: string }>({ state: "idle" });
  const set = <K extends keyof PlanForm>(key: K, value: PlanForm[K]) =>
    setForm((f) => {
      const next = { ...f, [key]: value };
      // A sheet of another material makes no sense: follow the material with its first sheet.
      if (key === "materialId" && !library.sheets.some((s) => String(s.id) === f.stockSheetId && String(s.materialId) === value)) {
        const sheet = library.sheets.filter((s) => String(s.materialId) === value).sort((a, b) => b.lengthMm * b.widthMm - a.lengthMm * a.widthMm)[0];
        if (sheet) next.stockSheetId = String(sheet.id);
      }
      return next;
    });

  const choice = useMemo(() => formToChoice(form), [form]);
  const rows = useMemo(() => {
    const material = library.materials.find((m) => m.id === choice.materialId);
    const sheet = library.sheets.find((s) => s.id === choice.stockSheetId);
    const machine = library.machines.find((m) => m.id === choice.machineId);
    return material && sheet && machine ? { material, sheet, machine } : null;
  }, [choice, library]);
  const settings = useMemo(() => (rows ? composeSettings(choice, rows, projectName) : null), [choice, rows, projectName]);
  const parts = useParts(revision.spec, settings);
  const nester = useNester();

  const errorField = fieldOfError(parts.error?.field);
  const errors: Partial<Record<keyof PlanForm, string>> = errorField && parts.error ? { [errorField]: parts.error.message } : {};
  const preview = parts.error ? undefined : parts.preview;
  const run = preview?.plan.run ?? parts.preview?.plan.run ?? null;
  const nest = nester.state.phase === "done" ? nester.state : null;
  const nestSettingsKey = JSON.stringify(settings);
  const [nestedKey, setNestedKey] = useState<string | null>(null);
  const stale = nest !== null && nestedKey !== nestSettingsKey;

  async function saveNest(intent: { purpose: "review" | "production"; reason?: string }) {
    if (!nest) return;
    setSave({ state: "saving" });
    const response = await fetch(`/api/revisions/${revision.id}/cut-plans`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ ...choice, nest: nest.nest, ...intent }),
    });
    const body = await response.json().catch(() => ({}));
    if (!response.ok) {
      setSave({ state: "failed", message: body.message ?? "The cut plan was not stored." });
      return;
    }
    setSave({ state: "saved", message: `Stored as cut plan ${body.cutPlan.id}: ${body.cutPlan.summary.sheets} sheet(s), ${pct(body.cutPlan.summary.utilisation)} used.` });
    router.refresh();
  }

  function startNest() {
    if (!settings) return;
    setSave({ state: "idle" });
    setNestedKey(nestSettingsKey);
    const s = Number(seconds);
    nester.start(revision.spec, settings, Number.isFinite(s) ? Math.min(120, Math.max(1, s)) : 15);
  }

  const running = nester.state.phase === "running" ? nester.state : null;
  const unplaced = nest?.nest.unplaced ?? [];
  const sheetArea = nest ? nest.preview.plan.settings.sheet.length * nest.preview.plan.settings.sheet.width : 1;
  const usedSheets = nest ? nest.nest.sheets.filter((sh) => sh.placements.length > 0) : [];
  const overall = nest ? usedShare(nest.preview, usedSheets.flatMap((sh) => sh.placements), sheetArea * Math.max(1, usedSheets.length)) : 0;

  return (
    <div className="grid gap-4 lg:grid-cols-[26rem_1fr]">
      <div className="flex flex-col gap-3">
        <Panel title="Settings">
          <PlanFields form={form} set={set} library={library} errors={errors} hasTrack={run !== null || (parts.busy && !parts.preview)} />
        </Panel>
      </div>

      <div className="flex flex-col gap-4">
        {parts.error ? <Notice tone="problem" testId="parts-error">{parts.error.message}</Notice> : null}
        {run ? (
          <Panel title="Run">
            <div className="flex flex-col gap-3">
              <EndTreatments run={run} chosen={form.endTreatment} choose={(t) => set("endTreatment", t)} />
              <RunDrawing run={run} />
              <p className="text-sm" data-testid="run-summary">
                {run.periods} periods of {run.period.toFixed(2)} mm over {run.runLength.toFixed(0)} mm, in {run.segments.length} segments cut at{" "}
                {run.cuts.length ? run.cuts.map((c) => c.toFixed(1)).join(", ") : "—"} mm.
              </p>
            </div>
          </Panel>
        ) : null}

        {preview ? (
          <Panel title={`Parts (${preview.plan.parts.reduce((n, p) => n + p.quantity, 0)} to cut)`}>
            <Table head={["Part", "What", "Size (mm)", "Quantity"]} caption="Parts">
              {preview.plan.parts.map((p) => {
                const b = bbox(p.region.outer);
                return (
                  <tr key={p.id} data-testid={`part-${p.id}`}>
                    <td className="font-mono">{p.id}</td>
                    <td>{p.name}</td>
                    <td className="font-mono">
                      {b.length.toFixed(1)} × {b.width.toFixed(1)}
                    </td>
                    <td className="font-mono">{p.quantity}</td>
                  </tr>
                );
              })}
            </Table>
            {preview.plan.warnings.length ? (
              <ul className="mt-3 flex flex-col gap-1" aria-label="Warnings">
                {preview.plan.warnings.map((w, i) => (
                  <li key={i} className="rounded-plate border border-caution bg-caution-soft px-2 py-1 text-sm text-caution" data-testid="cut-warning">
                    {w.partId ? <span className="font-mono">{w.partId}: </span> : null}
                    {w.message}
                  </li>
                ))}
              </ul>
            ) : null}
          </Panel>
        ) : parts.busy ? (
          <p className="text-sm text-ink-soft">Building the parts…</p>
        ) : null}

        <Panel title="Nest on stock sheets">
          <div className="flex flex-wrap items-end gap-3">
            <div className="flex flex-col gap-1 text-sm">
              <label htmlFor="nest-seconds" className="font-medium">
                Search time (s)
              </label>
              <input id="nest-seconds" inputMode="numeric" className="w-24 rounded-plate border border-ink-line bg-white/70 px-2 py-1 text-sm" value={seconds} onChange={(e) => setSeconds(e.target.value)} />
            </div>
            <Button type="button" onClick={startNest} disabled={!preview || !!running}>
              {nest ? "Nest again" : "Nest parts"}
            </Button>
            {running ? (
              <Button type="button" variant="caution" onClick={nester.cancel} disabled={running.cancelling}>
                {running.cancelling ? "Stopping…" : "Cancel"}
              </Button>
            ) : null}
          </div>
          {running ? (
            <div className="mt-3 flex flex-col gap-1" data-testid="nest-progress">
              <div role="progressbar" aria-label="Nesting" aria-valuemin={0} aria-valuemax={100} aria-valuenow={Math.round((running.progress?.fraction ?? 0) * 100)} className="h-2 w-full overflow-hidden rounded-plate bg-paper-deep">
                <div className="h-full bg-ink transition-[width]" style={{ width: `${(running.progress?.fraction ?? 0) * 100}%` }} />
              </div>
              <p className="text-xs text-ink-soft">
                {running.progress
                  ? `${running.progress.placed} of ${running.progress.total} placed; best so far ${pct(running.progress.bestUtilisation)}${running.progress.message ? ` — ${running.progress.message}` : ""}`
                  : "Starting…"}
              </p>
            </div>
          ) : null}
          {nester.state.phase === "failed" ? <Notice tone="problem">{nester.state.message}</Notice> : null}
          {nest ? (
            <div className="mt-3 flex flex-col gap-3" data-testid="nest-result">
              <p className="text-sm" data-testid="nest-summary">
                {usedSheets.length} sheet(s), {pct(overall)} of the stock used overall
                {nest.nest.cancelled ? " (stopped early: the best layout found so far)" : ""}; {nest.nest.seconds.toFixed(1)} s.
              </p>
              {stale ? <Notice tone="problem">The settings have changed since this nest: nest again before storing it.</Notice> : null}
              {unplaced.length ? (
                <Notice tone="problem" testId="unplaced">
                  Not placed: {unplaced.map((u) => `${u.id} — ${u.reason}`).join("; ")}
                </Notice>
              ) : null}
              {usedSheets.map((sh) => (
                <figure key={sh.index} className="flex flex-col gap-1">
                  <SheetView
                    width={nest.preview.plan.settings.sheet.length}
                    height={nest.preview.plan.settings.sheet.width}
                    margin={nest.preview.plan.settings.margin}
                    grain={nest.preview.plan.settings.sheet.grain}
                    parts={sheetParts(nest.preview, sh.placements)}
                    title={`Sheet ${sh.index + 1}`}
                  />
                  <figcaption className="text-xs text-ink-soft">
                    Sheet {sh.index + 1}: {sh.placements.length} parts, {pct(usedShare(nest.preview, sh.placements, sheetArea))} used
                  </figcaption>
                </figure>
              ))}
              <StoreButtons approved={approved} revisionNumber={revision.number} disabled={unplaced.length > 0 || stale || save.state === "saving"} saving={save.state === "saving"} onStore={saveNest} />
              {save.message ? (
                <Notice tone={save.state === "failed" ? "problem" : "done"} testId="save-message">
                  {save.message}
                </Notice>
              ) : null}
            </div>
          ) : null}
        </Panel>

        <StoredPlan stored={stored} designName={designName} revisionNumber={revision.number} />
      </div>
    </div>
  );
}

/**
 * Storing the plan. With the client's approval it is for production. Without it the shop stores it
 * for review (files marked NOT APPROVED), or for production after confirming with a reason, which
 * the server logs.
 */
function StoreButtons({ approved, revisionNumber, disabled, saving, onStore }: { approved: boolean; revisionNumber: number; disabled: boolean; saving: boolean; onStore: (intent: { purpose: "review" | "production"; reason?: string }) => void }) {
  const [asking, setAsking] = useState(false);
  const [reason, setReason] = useState("");
  if (approved)
    return (
      <div className="flex items-center gap-3">
        <Button type="button" onClick={() => onStore({ purpose: "production" })} disabled={disabled}>
          {saving ? "Checking and storing…" : "Store as this revision's cut plan"}
        </Button>
      </div>
    );
  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap items-center gap-3">
        <Button type="button" onClick={() => onStore({ purpose: "review" })} disabled={disabled}>
          {saving ? "Checking and storing…" : "Store as this revision's cut plan"}
        </Button>
        <Button type="button" variant="caution" onClick={() => setAsking((a) => !a)} disabled={disabled} aria-expanded={asking}>
          Store for production without approval…
        </Button>
      </div>
      <p className="text-xs text-ink-soft">R{revisionNumber} is not approved by the client: a stored plan is for review, and its files say NOT APPROVED — FOR REVIEW ONLY.</p>
      {asking ? (
        <div className="flex flex-col gap-2 rounded-plate border border-caution bg-caution-soft p-3" role="group" aria-label="Store for production without approval">
          <label htmlFor="unapproved-reason" className="text-sm font-medium text-caution">
            Why does this go to production before the client approves it? (logged)
          </label>
          <textarea id="unapproved-reason" rows={2} maxLength={500} value={reason} onChange={(e) => setReason(e.target.value)} className="w-full rounded-plate border border-ink-line bg-white/80 px-2.5 py-1.5 text-sm" />
          <div>
            <Button type="button" variant="caution" disabled={disabled || reason.trim() === ""} onClick={() => onStore({ purpose: "production", reason: reason.trim() })}>
              Confirm: store for production
            </Button>
          </div>
        </div>
      ) : null}
    </div>
  );
}

function StoredPlan({ stored, designName, revisionNumber }: { stored: StoredPlanView | null; designName: string; revisionNumber: number }) {
  if (!stored) {
    return (
      <Panel title="Cut files">
        <p className="text-sm text-ink-soft">
          No cut plan is stored for {designName} R{revisionNumber} yet. Nest the parts and store the result to get the files.
        </p>
      </Panel>
    );
  }
  const s = stored.summary;
  return (
    <Panel title="Cut files">
      <p className="mb-2 text-sm" data-testid="stored-plan">
        Cut plan {stored.id}, stored {new Date(stored.createdAt).toLocaleString()} by {stored.createdBy ?? "—"}: {s.copies} parts on {s.sheets} × {s.sheet}, {pct(s.utilisation)} used; {s.machine}.
        {s.purpose ? <> Stored for {s.purpose}{s.unapprovedReason ? ` without the client's approval (reason: ${s.unapprovedReason})` : ""}.</> : null}
      </p>
      <a href={`/api/cut-plans/${stored.id}/files/job.zip`} className="inline-block rounded-plate border border-ink bg-ink px-3 py-1.5 text-sm font-medium text-paper" data-testid="download-zip" download>
        Download everything (ZIP)
      </a>
      <ul className="mt-3 grid gap-1 text-sm sm:grid-cols-2">
        {stored.files
          .filter((f) => f !== "job.zip")
          .map((f) => (
            <li key={f}>
              <a href={`/api/cut-plans/${stored.id}/files/${f}`} className="font-mono text-xs underline" download>
                {f}
              </a>
            </li>
          ))}
      </ul>
    </Panel>
  );
}
