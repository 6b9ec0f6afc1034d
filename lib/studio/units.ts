// Switching a spec between millimetres and inches: every length scales by 25.4 (the inch is exactly
// 25.4 mm by the 1959 international yard and pound agreement), and formulas are rewritten so they
// draw the same shape: r(θ) becomes r(θ)/25.4 (to inches), y(x) becomes y(25.4·x)/25.4.
import { parse, type MathNode } from "mathjs";
import type { DesignSpecInput } from "@/lib/track";

export type Units = "mm" | "in";
export const MM_PER_INCH = 25.4;

type Spec = DesignSpecInput;
type Wheel = NonNullable<Spec["wheel"]>;
type Track = NonNullable<Spec["track"]>;

const LENGTH_KEYS = [
  "inradius",
  "circumradius",
  "side",
  "cornerRadius",
  "semiMajor",
  "semiMinor",
  "radius",
  "axleOffset",
  "amplitude",
  "period",
  "scale",
] as const;

function round(v: number): number {
  // Keep what the user sees tidy without losing real precision (12 significant digits).
  return Number(v.toPrecision(12));
}

/** y(x) in the old units → the same curve in the new: (expr with x → x·k) / k, k = old units per new unit. */
function rescaleFormula(source: string, variable: "x" | "theta", k: number): string {
  let root: MathNode;
  try {
    root = parse(source);
  } catch {
    return source; // a formula that does not parse is left for the engine to report
  }
  const scaledArgument =
    variable === "x"
      ? root.transform((node) =>
          (node as { isSymbolNode?: boolean; name?: string }).isSymbolNode && (node as { name?: string }).name === "x"
            ? parse(`(${k} * x)`)
            : node,
        )
      : root;
  return `(${scaledArgument.toString()}) / ${k}`;
}

function scaleWheel(w: Wheel, f: number, k: number): Wheel {
  const out: Record<string, unknown> = { ...w };
  for (const key of LENGTH_KEYS) if (typeof out[key] === "number") out[key] = round((out[key] as number) * f);
  if (w.kind === "ellipse" && typeof w.axle === "object") out.axle = { x: round(w.axle.x * f), y: round(w.axle.y * f) };
  if (w.kind === "outline") {
    out.points = w.points.map(([x, y]) => [round(x * f), round(y * f)]);
    out.axle = { x: round(w.axle.x * f), y: round(w.axle.y * f) };
  }
  if (w.kind === "polar") out.r = rescaleFormula(w.r, "theta", k);
  return out as Wheel;
}

function scaleTrack(t: Track, f: number, k: number): Track {
  const out: Record<string, unknown> = { ...t };
  for (const key of LENGTH_KEYS) if (typeof out[key] === "number") out[key] = round((out[key] as number) * f);
  if (t.kind === "profile") out.points = t.points.map(([x, y]) => [round(x * f), round(y * f)]);
  if (t.kind === "function") out.y = rescaleFormula(t.y, "x", k);
  return out as Track;
}

/** The same design expressed in other units. */
export function convertSpec(spec: Spec, to: Units): Spec {
  const from: Units = spec.units ?? "mm";
  if (from === to) return spec;
  const f = to === "in" ? 1 / MM_PER_INCH : MM_PER_INCH; // new value = old value × f
  const k = 1 / f; // old units per new unit
  return {
    ...spec,
    units: to,
    ...(spec.wheel ? { wheel: scaleWheel(spec.wheel, f, k) } : {}),
    ...(spec.track ? { track: scaleTrack(spec.track, f, k) } : {}),
    ...(spec.tolerance !== undefined ? { tolerance: round(spec.tolerance * f) } : {}),
  };
}
