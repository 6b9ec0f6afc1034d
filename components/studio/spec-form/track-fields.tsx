"use client";
import type { Units } from "@/lib/studio/units";
import type { DesignSpecInput } from "@/lib/track";
import { inUnits, TRACK_DEFAULTS } from "./defaults";
import { FormulaInput, NumberInput, SelectInput } from "@/components/ui/inputs";
import { OutlineUpload } from "./outline-upload";
import { formulaError, type FieldErrors } from "./field-errors";

type Track = NonNullable<DesignSpecInput["track"]>;
type Kind = Track["kind"];

const KIND_LABELS: { value: Kind; label: string }[] = [
  { value: "sine", label: "Sine wave" },
  { value: "catenary", label: "Catenary row" },
  { value: "cycloid", label: "Inverted cycloid" },
  { value: "function", label: "Formula y(x)" },
  { value: "profile", label: "Uploaded profile" },
];

export function TrackFields({
  track,
  units,
  errors,
  onChange,
}: {
  track: Track;
  units: Units;
  errors: FieldErrors;
  onChange: (t: Track) => void;
}) {
  const e = (key: string) => errors[`track.${key}`];
  return (
    <div className="flex flex-col gap-3 rounded-plate border border-paper-edge p-3">
      <SelectInput<Kind>
        label="Track"
        testId="track-kind"
        value={track.kind}
        options={KIND_LABELS}
        onChange={(kind) => onChange(inUnits(TRACK_DEFAULTS[kind], units))}
      />
      {track.kind === "sine" ? (
        <div className="grid grid-cols-2 gap-3">
          <NumberInput
            label="Amplitude"
            unit={units}
            min={0}
            value={track.amplitude}
            error={e("amplitude")}
            onChange={(amplitude) => amplitude !== undefined && onChange({ ...track, amplitude })}
          />
          <NumberInput
            label="Period"
            unit={units}
            min={0}
            value={track.period}
            error={e("period")}
            onChange={(period) => period !== undefined && onChange({ ...track, period })}
          />
        </div>
      ) : null}
      {track.kind === "catenary" ? (
        <div className="grid grid-cols-2 gap-3">
          <NumberInput
            label="Scale (crest height)"
            unit={units}
            min={0}
            value={track.scale}
            error={e("scale")}
            onChange={(scale) => scale !== undefined && onChange({ ...track, scale })}
          />
          <NumberInput
            label="Period"
            unit={units}
            min={0}
            value={track.period}
            error={e("period")}
            onChange={(period) => period !== undefined && onChange({ ...track, period })}
          />
        </div>
      ) : null}
      {track.kind === "cycloid" ? (
        <NumberInput
          label="Rolling-circle radius"
          unit={units}
          min={0}
          value={track.radius}
          error={e("radius")}
          onChange={(radius) => radius !== undefined && onChange({ ...track, radius })}
        />
      ) : null}
      {track.kind === "function" ? (
        <div className="grid grid-cols-[2fr_1fr] gap-3">
          <FormulaInput
            label={`y(x) in ${units}`}
            variable="x"
            value={track.y}
            check={(s) => formulaError(s, "x")}
            hint="Use x, pi, e and elementary functions; one period from x = 0."
            onChange={(y) => onChange({ ...track, y })}
          />
          <NumberInput
            label="Period"
            unit={units}
            min={0}
            value={track.period}
            error={e("period")}
            onChange={(period) => period !== undefined && onChange({ ...track, period })}
          />
        </div>
      ) : null}
      {track.kind === "profile" ? (
        <>
          <OutlineUpload want="track" units={units} onPoints={(points) => onChange({ kind: "profile", points })} />
          <p className="text-xs text-ink-soft">
            <span className="font-mono">{track.points.length}</span> points, one period.
          </p>
        </>
      ) : null}
    </div>
  );
}
