"use client";
// The cut-plan settings, as plain labelled fields. Errors from the settings schema arrive with the
// field's path ("joint.keyWidth") and are shown beside that field.
import type { ReactNode } from "react";
import { CheckInput, SelectInput, TextInput } from "@/components/ui/inputs";
import type { PlanForm } from "@/lib/cut-plan/form";
import { ROTATION_LABELS } from "@/lib/cut/settings";

export interface LibraryOptions {
  materials: { id: number; name: string }[];
  sheets: { id: number; name: string; materialId: number }[];
  machines: { id: number; name: string }[];
}

type Set = <K extends keyof PlanForm>(key: K, value: PlanForm[K]) => void;

// Thin bindings of the shared inputs to one key of the plan form; ids stay "cut-<key>" so an error
// path from the settings schema finds its field.
function NumberInput({
  name,
  label,
  form,
  set,
  error,
  hint,
  unit = "mm",
}: {
  name: keyof PlanForm;
  label: string;
  form: PlanForm;
  set: Set;
  error?: string;
  hint?: ReactNode;
  unit?: string;
}) {
  return (
    <TextInput
      id={`cut-${name}`}
      label={label}
      unit={unit || undefined}
      inputMode="decimal"
      value={form[name] as string}
      error={error}
      hint={hint}
      onChange={(v) => set(name, v as never)}
    />
  );
}

function Select({
  name,
  label,
  form,
  set,
  options,
  error,
}: {
  name: keyof PlanForm;
  label: string;
  form: PlanForm;
  set: Set;
  options: { value: string; label: string }[];
  error?: string;
}) {
  return (
    <SelectInput
      id={`cut-${name}`}
      label={label}
      value={form[name] as string}
      options={options}
      error={error}
      onChange={(v) => set(name, v as never)}
    />
  );
}

function Check({ name, label, form, set }: { name: keyof PlanForm; label: string; form: PlanForm; set: Set }) {
  return (
    <CheckInput
      id={`cut-${name}`}
      label={label}
      checked={form[name] as boolean}
      onChange={(v) => set(name, v as never)}
    />
  );
}

function Group({ title, children }: { title: string; children: ReactNode }) {
  return (
    <fieldset className="grid grid-cols-2 gap-3 rounded-plate border border-paper-edge p-3">
      <legend className="px-1 text-xs font-semibold uppercase tracking-wider text-ink-soft">{title}</legend>
      {children}
    </fieldset>
  );
}

/** Which field a schema error belongs to: its path, as the settings name it. */
const FIELD_OF: Record<string, keyof PlanForm> = {
  runLength: "runLength",
  endTreatment: "endTreatment",
  baseDepth: "baseDepth",
  trackLines: "trackLines",
  layers: "layers",
  cuts: "cuts",
  "joint.keyWidth": "keyWidth",
  "joint.keyDepth": "keyDepth",
  "joint.clearance": "clearance",
  "joint.dowelDiameter": "dowelDiameter",
  "joint.dowelInset": "dowelInset",
  "joint.dowelSpacing": "dowelSpacing",
  supportSpacing: "supportSpacing",
  supportHoleDiameter: "supportHoleDiameter",
  wheelCount: "wheelCount",
  boreDiameter: "boreDiameter",
  "lightening.count": "lighteningCount",
  "lightening.rim": "lighteningRim",
  labelHeight: "labelHeight",
  margin: "margin",
  spacing: "spacing",
  "machine.kerf": "machineId",
  sheet: "stockSheetId",
};

export function fieldOfError(path: string | undefined): keyof PlanForm | undefined {
  if (!path) return undefined;
  if (FIELD_OF[path]) return FIELD_OF[path];
  if (path.startsWith("cuts")) return "cuts";
  if (path.startsWith("sheet")) return "stockSheetId";
  if (path.startsWith("machine")) return "machineId";
  return undefined;
}

export function PlanFields({
  form,
  set,
  library,
  errors,
  hasTrack,
}: {
  form: PlanForm;
  set: Set;
  library: LibraryOptions;
  errors: Partial<Record<keyof PlanForm, string>>;
  hasTrack: boolean;
}) {
  const p = { form, set };
  return (
    <div className="flex flex-col gap-3">
      <Group title="Stock and machine">
        <Select
          {...p}
          name="materialId"
          label="Material"
          error={errors.materialId}
          options={library.materials.map((m) => ({ value: String(m.id), label: m.name }))}
        />
        <Select
          {...p}
          name="stockSheetId"
          label="Stock sheet"
          error={errors.stockSheetId}
          options={library.sheets
            .filter((s) => String(s.materialId) === form.materialId)
            .map((s) => ({ value: String(s.id), label: s.name }))}
        />
        <Select
          {...p}
          name="machineId"
          label="Machine"
          error={errors.machineId}
          options={library.machines.map((m) => ({ value: String(m.id), label: m.name }))}
        />
        <Select
          {...p}
          name="rotations"
          label="Rotations allowed"
          options={Object.entries(ROTATION_LABELS).map(([value, label]) => ({ value, label }))}
        />
        <NumberInput {...p} name="margin" label="Sheet margin" error={errors.margin} />
        <NumberInput
          {...p}
          name="spacing"
          label="Part spacing"
          error={errors.spacing}
          hint="Stock left between two cuts."
        />
      </Group>
      {hasTrack ? (
        <Group title="Run and track">
          <NumberInput {...p} name="runLength" label="Run length on site" error={errors.runLength} />
          <NumberInput {...p} name="baseDepth" label="Base below the lowest point" error={errors.baseDepth} />
          <NumberInput
            {...p}
            name="trackLines"
            label="Track lines"
            unit=""
            error={errors.trackLines}
            hint="Parallel tracks, one per wheel line."
          />
          <NumberInput
            {...p}
            name="layers"
            label="Layers per track"
            unit=""
            error={errors.layers}
            hint="Sheets glued face to face."
          />
          <div className="col-span-2">
            <NumberInput
              {...p}
              name="cuts"
              label="Cut stations along the run"
              error={errors.cuts}
              hint="Leave empty to cut at crests, as long as the sheet allows; or list your own, e.g. 1410, 2820."
            />
          </div>
          <Select
            {...p}
            name="jointKind"
            label="Joint between segments"
            options={[
              { value: "key", label: "Keyed joint" },
              { value: "dowel", label: "Dowels and a splice plate" },
            ]}
          />
          {form.jointKind === "key" ? (
            <>
              <NumberInput {...p} name="keyWidth" label="Key neck width" error={errors.keyWidth} />
              <NumberInput {...p} name="keyDepth" label="Key depth" error={errors.keyDepth} />
              <NumberInput {...p} name="clearance" label="Joint clearance" error={errors.clearance} />
            </>
          ) : (
            <>
              <NumberInput {...p} name="dowelDiameter" label="Dowel hole diameter" error={errors.dowelDiameter} />
              <NumberInput {...p} name="dowelInset" label="Dowel inset from the cut" error={errors.dowelInset} />
              <NumberInput {...p} name="dowelSpacing" label="Dowel spacing" error={errors.dowelSpacing} />
            </>
          )}
          <NumberInput {...p} name="supportSpacing" label="Support hole spacing" error={errors.supportSpacing} />
          <NumberInput
            {...p}
            name="supportHoleDiameter"
            label="Support hole diameter"
            error={errors.supportHoleDiameter}
          />
        </Group>
      ) : null}
      <Group title="Wheels">
        <NumberInput {...p} name="wheelCount" label="Wheels to cut" unit="" error={errors.wheelCount} />
        <NumberInput
          {...p}
          name="boreDiameter"
          label="Axle bore diameter"
          error={errors.boreDiameter}
          hint="0 for no bore."
        />
        <div className="col-span-2">
          <Check {...p} name="lightening" label="Lightening holes" />
        </div>
        {form.lightening ? (
          <>
            <NumberInput {...p} name="lighteningCount" label="Holes" unit="" error={errors.lighteningCount} />
            <NumberInput {...p} name="lighteningRim" label="Rim kept" error={errors.lighteningRim} />
          </>
        ) : null}
      </Group>
      <Group title="Files">
        <NumberInput {...p} name="labelHeight" label="Label letter height" error={errors.labelHeight} />
        <Select
          {...p}
          name="outputUnits"
          label="File units"
          options={[
            { value: "mm", label: "Millimetres" },
            { value: "in", label: "Inches" },
          ]}
        />
        <div className="col-span-2">
          <Check
            {...p}
            name="kerfInFile"
            label="Offset the cuts for the kerf in the files (otherwise the shop's CAM does it)"
          />
        </div>
      </Group>
    </div>
  );
}
