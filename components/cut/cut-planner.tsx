"use client";
// The cut plan page: settings on the left; on the right the run, the parts and their warnings, the
// nest (run in a worker, with progress and cancel) and, once the server has checked and saved it,
// the files. Nothing is saved until the fabricator saves a complete nest.
import { useState } from "react";
import type { PlanForm } from "@/lib/cut-plan/form";
import { Notice } from "@/components/ui/notice";
import { Panel } from "@/components/ui/panel";
import { NestPanel } from "./nest-panel";
import { PartsPanel } from "./parts-panel";
import { fieldOfError, PlanFields } from "./plan-fields";
import { RunPanel } from "./run-panel";
import { SavedPlan, type SavedPlanView } from "./saved-plan";
import { useNester, useParts } from "./use-cut-worker";
import { usePlanForm, type PlannerLibrary } from "./use-plan-form";
import { useSavePlan, type SaveIntent } from "./use-save-plan";

interface Props {
  revision: { id: number; number: number; spec: unknown; specHash: string };
  designName: string;
  projectName: string;
  library: PlannerLibrary;
  initialForm: PlanForm;
  saved: SavedPlanView | null;
  /** The client has approved this revision: plans are for production. Otherwise the shop chooses, and production needs a reason. */
  approved: boolean;
}

/** The nest search time typed, within 1 to 120 s (15 s if it is not a number). */
const searchSeconds = (typed: string) => {
  const s = Number(typed);
  return Number.isFinite(s) ? Math.min(120, Math.max(1, s)) : 15;
};

export function CutPlanner({ revision, designName, projectName, library, initialForm, saved, approved }: Props) {
  const { form, set, choice, settings, settingsOf } = usePlanForm(initialForm, library, projectName);
  const [seconds, setSeconds] = useState("15");
  // Where the joints fall is the plan's to choose only while no cut stations are typed.
  const [chooseJoints, setChooseJoints] = useState(true);
  const parts = useParts(revision.spec, settings);
  const nester = useNester();
  const save = useSavePlan(revision.id);

  const errorField = fieldOfError(parts.error?.field);
  const errors: Partial<Record<keyof PlanForm, string>> =
    errorField && parts.error ? { [errorField]: parts.error.message } : {};
  const preview = parts.error ? undefined : parts.preview;
  const run = preview?.plan.run ?? parts.preview?.plan.run ?? null;
  // A nest belongs to the settings it was made with: changed settings need a new nest before saving.
  const settingsKey = JSON.stringify(settings);
  const [nestedKey, setNestedKey] = useState<string | null>(null);
  const stale = nester.state.phase === "done" && nestedKey !== settingsKey;

  const canChooseJoints = run !== null && form.cuts.trim() === "";

  function startNest() {
    if (!settings) return;
    save.reset();
    setNestedKey(settingsKey);
    const started = form;
    nester.start(revision.spec, settings, searchSeconds(seconds), {
      chooseJoints: canChooseJoints && chooseJoints,
      // The chosen stations go into the cut stations field, so the saved plan (which the server
      // rebuilds from the settings) is cut exactly where this nest was made.
      onJoints: (joints) => {
        if (!joints.changed) return;
        const cuts = joints.cuts.map(String).join(", ");
        set("cuts", cuts);
        setNestedKey(JSON.stringify(settingsOf({ ...started, cuts })));
      },
    });
  }

  function saveNest(intent: SaveIntent) {
    if (nester.state.phase === "done") save.mutate({ choice, nest: nester.state.nest, intent });
  }

  return (
    <div className="grid gap-4 lg:grid-cols-[26rem_1fr]">
      <div className="flex flex-col gap-3">
        <Panel title="Settings">
          <PlanFields
            form={form}
            set={set}
            library={library}
            errors={errors}
            hasTrack={run !== null || (parts.busy && !parts.preview)}
          />
        </Panel>
      </div>

      <div className="flex flex-col gap-4">
        {parts.error ? (
          <Notice tone="problem" testId="parts-error">
            {parts.error.message}
          </Notice>
        ) : null}
        {run ? <RunPanel run={run} endTreatment={form.endTreatment} choose={(t) => set("endTreatment", t)} /> : null}
        {preview ? (
          <PartsPanel preview={preview} />
        ) : parts.busy ? (
          <p className="text-sm text-ink-soft">Building the parts…</p>
        ) : null}
        <NestPanel
          state={nester.state}
          seconds={seconds}
          setSeconds={setSeconds}
          canNest={!!preview}
          onNest={startNest}
          onCancel={nester.cancel}
          jointChoice={canChooseJoints ? { on: chooseJoints, set: setChooseJoints } : null}
          stale={stale}
          approved={approved}
          revisionNumber={revision.number}
          save={save}
          onSave={saveNest}
        />
        <SavedPlan saved={saved} designName={designName} revisionNumber={revision.number} />
      </div>
    </div>
  );
}
