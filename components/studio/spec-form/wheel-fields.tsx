"use client";
import type { Units } from "@/lib/studio/units";
import type { DesignSpecInput } from "@/lib/track";
import { axleRefusal } from "@/lib/studio/axle-placement";
import { inUnits, WHEEL_DEFAULTS } from "./defaults";
import { FormulaInput, NumberInput, SelectInput } from "@/components/ui/inputs";
import { OutlineUpload } from "./outline-upload";
import { formulaError, type FieldErrors } from "./field-errors";

type Wheel = NonNullable<DesignSpecInput["wheel"]>;
type Kind = Wheel["kind"];
type PolygonSize = "inradius" | "circumradius" | "side";

const KIND_LABELS: { value: Kind; label: string }[] = [
  { value: "polygon", label: "Regular polygon" },
  { value: "ellipse", label: "Ellipse" },
  { value: "circle", label: "Circle, offset axle" },
  { value: "polar", label: "Polar formula r(θ)" },
  { value: "outline", label: "Uploaded outline" },
];

export function WheelFields({
  wheel,
  units,
  errors,
  onChange,
}: {
  wheel: Wheel;
  units: Units;
  errors: FieldErrors;
  onChange: (w: Wheel) => void;
}) {
  const e = (key: string) => errors[`wheel.${key}`];
  return (
    <div className="flex flex-col gap-3 rounded-plate border border-paper-edge p-3">
      <SelectInput<Kind>
        label="Wheel"
        testId="wheel-kind"
        value={wheel.kind}
        options={KIND_LABELS}
        onChange={(kind) => onChange(inUnits(WHEEL_DEFAULTS[kind], units, ["sides"]))}
      />
      {wheel.kind === "polygon" ? <PolygonFields wheel={wheel} units={units} e={e} onChange={onChange} /> : null}
      {wheel.kind === "ellipse" ? (
        <div className="grid grid-cols-2 gap-3">
          <NumberInput
            label="Semi-major axis"
            unit={units}
            min={0}
            value={wheel.semiMajor}
            error={e("semiMajor") ?? errors.wheel}
            onChange={(semiMajor) => semiMajor !== undefined && onChange({ ...wheel, semiMajor })}
          />
          <NumberInput
            label="Semi-minor axis"
            unit={units}
            min={0}
            value={wheel.semiMinor}
            error={e("semiMinor")}
            onChange={(semiMinor) => semiMinor !== undefined && onChange({ ...wheel, semiMinor })}
          />
          <SelectInput<"focus" | "centre" | "point">
            label="Axle at"
            value={typeof wheel.axle === "object" ? "point" : (wheel.axle ?? "focus")}
            options={[
              { value: "focus", label: "a focus" },
              { value: "centre", label: "the centre" },
              { value: "point", label: "a point (x, y from the centre)" },
            ]}
            onChange={(at) => onChange({ ...wheel, axle: at === "point" ? { x: 0, y: 0 } : at })}
          />
          {typeof wheel.axle === "object" ? (
            <div className="grid grid-cols-2 gap-2">
              <NumberInput
                label="Axle x"
                unit={units}
                value={wheel.axle.x}
                error={e("axle.x")}
                onChange={(x) =>
                  x !== undefined &&
                  typeof wheel.axle === "object" &&
                  onChange({ ...wheel, axle: { ...wheel.axle, x } })
                }
              />
              <NumberInput
                label="Axle y"
                unit={units}
                value={wheel.axle.y}
                error={e("axle.y")}
                onChange={(y) =>
                  y !== undefined &&
                  typeof wheel.axle === "object" &&
                  onChange({ ...wheel, axle: { ...wheel.axle, y } })
                }
              />
            </div>
          ) : null}
        </div>
      ) : null}
      {wheel.kind === "circle" ? (
        <div className="grid grid-cols-2 gap-3">
          <NumberInput
            label="Radius"
            unit={units}
            min={0}
            value={wheel.radius}
            error={e("radius")}
            onChange={(radius) => radius !== undefined && onChange({ ...wheel, radius })}
          />
          <NumberInput
            label="Axle offset from centre"
            unit={units}
            min={0}
            value={wheel.axleOffset}
            error={e("axleOffset")}
            onChange={(axleOffset) => onChange({ ...wheel, axleOffset })}
          />
        </div>
      ) : null}
      {wheel.kind === "polar" ? (
        <FormulaInput
          label={`r(θ) in ${units}`}
          variable="theta"
          value={wheel.r}
          check={(s) => formulaError(s, "theta")}
          hint="Use theta, pi, e, + − * / ^ and sin, cos, tan, sqrt, exp, log, abs …"
          onChange={(r) => onChange({ ...wheel, r })}
        />
      ) : null}
      {wheel.kind === "outline" ? <OutlineFields wheel={wheel} units={units} e={e} onChange={onChange} /> : null}
    </div>
  );
}

function PolygonFields({
  wheel,
  units,
  e,
  onChange,
}: {
  wheel: Extract<Wheel, { kind: "polygon" }>;
  units: Units;
  e: (k: string) => string | undefined;
  onChange: (w: Wheel) => void;
}) {
  const sizeBy: PolygonSize =
    wheel.side !== undefined ? "side" : wheel.circumradius !== undefined ? "circumradius" : "inradius";
  const size = wheel[sizeBy];
  return (
    <div className="grid grid-cols-2 gap-3">
      <NumberInput
        label="Sides"
        integer
        min={3}
        max={360}
        value={wheel.sides}
        error={e("sides")}
        onChange={(sides) => sides !== undefined && onChange({ ...wheel, sides })}
      />
      <SelectInput<PolygonSize>
        label="Size given by"
        value={sizeBy}
        options={[
          { value: "side", label: "side length" },
          { value: "inradius", label: "inradius (axle to side)" },
          { value: "circumradius", label: "circumradius (axle to corner)" },
        ]}
        onChange={(by) =>
          onChange({ kind: "polygon", sides: wheel.sides, cornerRadius: wheel.cornerRadius, [by]: size })
        }
      />
      <NumberInput
        label={sizeBy === "side" ? "Side" : sizeBy === "inradius" ? "Inradius" : "Circumradius"}
        unit={units}
        min={0}
        value={size}
        error={e(sizeBy) ?? e("")}
        onChange={(v) => v !== undefined && onChange({ ...wheel, [sizeBy]: v })}
      />
      <NumberInput
        label="Corner radius"
        unit={units}
        min={0}
        value={wheel.cornerRadius ?? 0}
        error={e("cornerRadius")}
        onChange={(cornerRadius) => onChange({ ...wheel, cornerRadius: cornerRadius ?? 0 })}
      />
    </div>
  );
}

function OutlineFields({
  wheel,
  units,
  e,
  onChange,
}: {
  wheel: Extract<Wheel, { kind: "outline" }>;
  units: Units;
  e: (k: string) => string | undefined;
  onChange: (w: Wheel) => void;
}) {
  // The engine's own refusal of this axle (not star-shaped about it, outside it), beside the fields
  // that place it; the canvas handle gives the same words.
  const refusal = e("axle.x") || e("points") || e("axle.y") ? undefined : axleRefusal(wheel.points, wheel.axle);
  return (
    <div className="flex flex-col gap-3">
      <OutlineUpload
        want="wheel"
        units={units}
        onPoints={(points, axle) => onChange({ kind: "outline", points, axle: axle ?? wheel.axle })}
      />
      <p className="text-xs text-ink-soft">
        <span className="font-mono">{wheel.points.length}</span> points. Place the axle by typing its position, or drag
        it on the canvas (or focus it there and use the arrow keys).
      </p>
      <div className="grid grid-cols-2 gap-3">
        <NumberInput
          label="Axle x"
          unit={units}
          value={wheel.axle.x}
          error={e("axle.x") ?? e("points") ?? refusal}
          onChange={(x) => x !== undefined && onChange({ ...wheel, axle: { ...wheel.axle, x } })}
        />
        <NumberInput
          label="Axle y"
          unit={units}
          value={wheel.axle.y}
          error={e("axle.y")}
          onChange={(y) => y !== undefined && onChange({ ...wheel, axle: { ...wheel.axle, y } })}
        />
      </div>
    </div>
  );
}
