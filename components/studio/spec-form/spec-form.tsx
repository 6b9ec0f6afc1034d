"use client";
// Every parameter of a design spec, in the units the user chose. Errors show beside the field that
// causes them: the engine's schema for ranges and combinations, its formula reader as one types.
import { convertSpec, type Units } from "@/lib/studio/units";
import type { DesignSpecInput } from "@/lib/track";
import { defaultSpecFor, MODE_LABELS, type Mode } from "./defaults";
import { NumberInput, SelectInput } from "@/components/ui/inputs";
import { specErrors } from "./field-errors";
import { TrackFields } from "./track-fields";
import { WheelFields } from "./wheel-fields";

export function SpecForm({
  spec,
  onChange,
  readOnly,
}: {
  spec: DesignSpecInput;
  onChange: (spec: DesignSpecInput) => void;
  readOnly?: boolean;
}) {
  const units: Units = spec.units ?? "mm";
  const errors = specErrors(spec);
  const usesWheel = spec.mode === "track-for-wheel" || spec.mode === "partner-wheel";
  return (
    <fieldset className="flex flex-col gap-3" disabled={readOnly} aria-label="Design parameters">
      <div className="grid grid-cols-2 gap-3">
        <SelectInput<Mode>
          label="Mode"
          testId="mode"
          value={spec.mode}
          options={Object.entries(MODE_LABELS).map(([value, label]) => ({ value: value as Mode, label }))}
          onChange={(mode) => onChange(convertSpec(defaultSpecFor(mode), units))}
        />
        <SelectInput<Units>
          label="Units"
          testId="units"
          value={units}
          options={[
            { value: "mm", label: "millimetres" },
            { value: "in", label: "inches" },
          ]}
          onChange={(to) => onChange(convertSpec(spec, to))}
        />
      </div>
      {usesWheel && spec.wheel ? (
        <WheelFields
          wheel={spec.wheel}
          units={units}
          errors={errors}
          onChange={(wheel) => onChange({ ...spec, wheel })}
        />
      ) : null}
      {!usesWheel && spec.track ? (
        <TrackFields
          track={spec.track}
          units={units}
          errors={errors}
          onChange={(track) => onChange({ ...spec, track })}
        />
      ) : null}
      <div className="grid grid-cols-2 gap-3">
        {spec.mode === "partner-wheel" ? (
          <NumberInput
            label="Lobes"
            integer
            min={1}
            max={64}
            value={spec.lobes}
            error={errors.lobes}
            hint="Repeats of the partner's pattern per partner turn."
            onChange={(lobes) => onChange({ ...spec, lobes })}
          />
        ) : null}
        {spec.mode === "wheel-for-track" || spec.mode === "twin-wheels" ? (
          <NumberInput
            label="Periods per turn"
            integer
            min={1}
            max={64}
            value={spec.periodsPerTurn}
            error={errors.periodsPerTurn}
            hint="Track periods the wheel rolls over in one turn."
            onChange={(periodsPerTurn) => onChange({ ...spec, periodsPerTurn })}
          />
        ) : null}
        <NumberInput
          label="Chord tolerance"
          unit={units}
          min={units === "in" ? 0.00001 : 0.0001}
          value={spec.tolerance ?? (units === "in" ? 0.0005 : 0.01)}
          error={errors.tolerance}
          hint="Largest gap between the true curve and the cut polyline."
          onChange={(tolerance) => onChange({ ...spec, tolerance })}
        />
      </div>
      {errors[""] ? <p className="text-xs text-caution-ink">{errors[""]}</p> : null}
    </fieldset>
  );
}
