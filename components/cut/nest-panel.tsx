"use client";
// A new cut plan: nest the parts on stock sheets (in a worker, with progress and cancel), look at
// the sheets, and save the result as the revision's next cut plan.
import { CheckInput, TextInput } from "@/components/ui/inputs";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { Panel } from "@/components/ui/panel";
import { failureOf } from "@/components/api/request-json";
import { cutPlanName } from "@/lib/cut-plan/name";
import type { PartsPreview } from "./cut-worker";
import { jointSentence, nestEnding, nestFigures, pct, sheetParts, usedShare } from "./nest-figures";
import { SaveButtons } from "./save-buttons";
import { SheetView } from "./sheet-view";
import type { NestState } from "./use-cut-worker";
import type { SaveIntent, useSavePlan } from "./use-save-plan";

type Done = Extract<NestState, { phase: "done" }>;
type Running = Extract<NestState, { phase: "running" }>;

interface Props {
  state: NestState;
  seconds: string;
  setSeconds: (s: string) => void;
  canNest: boolean;
  onNest: () => void;
  onCancel: () => void;
  /** The check box "Choose the joints to save sheets": offered (not null) when the run has a track and no stations are typed. */
  jointChoice: { on: boolean; set: (on: boolean) => void } | null;
  /** The settings have changed since the nest was made. */
  stale: boolean;
  approved: boolean;
  revisionNumber: number;
  save: ReturnType<typeof useSavePlan>;
  onSave: (intent: SaveIntent) => void;
}

export function NestPanel({
  state,
  seconds,
  setSeconds,
  canNest,
  onNest,
  onCancel,
  jointChoice,
  stale,
  approved,
  revisionNumber,
  save,
  onSave,
}: Props) {
  const running = state.phase === "running" ? state : null;
  return (
    <Panel title="Nest parts on stock sheets">
      <div className="flex flex-wrap items-end gap-3">
        <div className="w-28">
          <TextInput
            id="nest-seconds"
            label="Search time"
            unit="s"
            inputMode="numeric"
            value={seconds}
            onChange={setSeconds}
          />
        </div>
        <Button type="button" onClick={onNest} disabled={!canNest || !!running}>
          {state.phase === "done" ? "Nest again" : "Nest parts"}
        </Button>
        {running ? (
          <Button type="button" variant="caution" onClick={onCancel} disabled={running.cancelling}>
            {running.cancelling ? "Stopping…" : "Cancel"}
          </Button>
        ) : null}
      </div>
      {jointChoice ? (
        <div className="mt-3">
          <CheckInput
            id="nest-choose-joints"
            label="Choose the joints to save sheets"
            checked={jointChoice.on}
            disabled={!!running}
            onChange={jointChoice.set}
          />
          <p className="mt-1 text-xs text-ink-soft">
            In the first half of the search time, other segment lengths in whole periods are tried, within the joint
            rules and with at most two more joints; the stations that nest on the fewest sheets are kept.
          </p>
        </div>
      ) : null}
      {running ? <NestProgressBar running={running} /> : null}
      {state.phase === "failed" ? <Notice tone="problem">{state.message}</Notice> : null}
      {state.phase === "done" ? (
        <NestResult
          nest={state}
          stale={stale}
          approved={approved}
          revisionNumber={revisionNumber}
          save={save}
          onSave={onSave}
        />
      ) : null}
    </Panel>
  );
}

function NestProgressBar({ running }: { running: Running }) {
  const p = running.progress;
  return (
    <div className="mt-3 flex flex-col gap-1" data-testid="nest-progress">
      <div
        role="progressbar"
        aria-label="Nesting"
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={Math.round((p?.fraction ?? 0) * 100)}
        className="h-2 w-full overflow-hidden rounded-plate bg-paper-deep"
      >
        <div className="h-full bg-ink transition-[width]" style={{ width: `${(p?.fraction ?? 0) * 100}%` }} />
      </div>
      <p className="text-xs text-ink-soft">
        {running.joints
          ? `Choosing the joints: ${running.joints.tried} of ${running.joints.candidates} other choices nested${running.joints.bestSheets ? `; fewest so far ${running.joints.bestSheets} sheet(s)` : ""}`
          : p
            ? `${p.placed} of ${p.total} placed; best so far ${pct(p.bestUtilisation)}${p.message ? ` — ${p.message}` : ""}`
            : "Starting…"}
      </p>
    </div>
  );
}

function NestResult({
  nest,
  stale,
  approved,
  revisionNumber,
  save,
  onSave,
}: {
  nest: Done;
  stale: boolean;
  approved: boolean;
  revisionNumber: number;
  save: ReturnType<typeof useSavePlan>;
  onSave: (intent: SaveIntent) => void;
}) {
  const { sheetArea, usedSheets, overall } = nestFigures(nest);
  const unplaced = nest.nest.unplaced;
  return (
    <div className="mt-3 flex flex-col gap-3" data-testid="nest-result">
      <p className="text-sm" data-testid="nest-summary">
        {usedSheets.length} sheet(s), {pct(overall)} of the stock used overall ({nestEnding(nest.nest)});{" "}
        {nest.nest.seconds.toFixed(1)} s.
      </p>
      {nest.joints ? (
        <p className="text-sm" data-testid="joint-choice">
          {jointSentence(nest.joints)}
        </p>
      ) : null}
      {stale ? (
        <Notice tone="problem">The settings have changed since this nest: nest again before saving it.</Notice>
      ) : null}
      {unplaced.length ? (
        <Notice tone="problem" testId="unplaced">
          Not placed: {unplaced.map((u) => `${u.id} — ${u.reason}`).join("; ")}
        </Notice>
      ) : null}
      {usedSheets.map((sh) => (
        <NestedSheet key={sh.index} preview={nest.preview} sheet={sh} sheetArea={sheetArea} />
      ))}
      <SaveButtons
        approved={approved}
        revisionNumber={revisionNumber}
        disabled={unplaced.length > 0 || stale || save.isPending}
        saving={save.isPending}
        onSave={onSave}
      />
      <SaveMessage save={save} revisionNumber={revisionNumber} />
    </div>
  );
}

function NestedSheet({
  preview,
  sheet,
  sheetArea,
}: {
  preview: PartsPreview;
  sheet: Done["nest"]["sheets"][number];
  sheetArea: number;
}) {
  const s = preview.plan.settings;
  return (
    <figure className="flex flex-col gap-1">
      <SheetView
        width={s.sheet.length}
        height={s.sheet.width}
        margin={s.margin}
        grain={s.sheet.grain}
        parts={sheetParts(preview, sheet.placements)}
        title={`Sheet ${sheet.index + 1}`}
      />
      <figcaption className="text-xs text-ink-soft">
        Sheet {sheet.index + 1}: {sheet.placements.length} parts, {pct(usedShare(preview, sheet.placements, sheetArea))}{" "}
        used
      </figcaption>
    </figure>
  );
}

function SaveMessage({ save, revisionNumber }: { save: ReturnType<typeof useSavePlan>; revisionNumber: number }) {
  const failure = failureOf(save.error);
  const saved = save.data?.cutPlan;
  if (!failure && !saved) return null;
  return (
    <Notice tone={failure ? "problem" : "done"} testId="save-message">
      {failure
        ? failure.message
        : `Saved as ${cutPlanName(saved!.number, revisionNumber, { midSentence: true })}: ${saved!.summary.sheets} sheet(s), ${pct(saved!.summary.utilisation)} used.`}
    </Notice>
  );
}
