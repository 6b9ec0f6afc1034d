// What a field group starts with when the user switches to another wheel, track or mode.
import { PRESETS } from "@/lib/studio/presets";
import { MODE_NAMES, type DesignSpecInput } from "@/lib/track";

type Wheel = NonNullable<DesignSpecInput["wheel"]>;
type Track = NonNullable<DesignSpecInput["track"]>;
export type Mode = DesignSpecInput["mode"];

export const WHEEL_DEFAULTS: Record<Wheel["kind"], Wheel> = {
  polygon: { kind: "polygon", sides: 4, side: 200, cornerRadius: 0 },
  ellipse: { kind: "ellipse", semiMajor: 100, semiMinor: 80, axle: "focus" },
  circle: { kind: "circle", radius: 100, axleOffset: 20 },
  polar: { kind: "polar", r: "100 + 20*cos(3*theta)" },
  outline: {
    kind: "outline",
    points: [
      [-100, -100],
      [100, -100],
      [100, 100],
      [-100, 100],
    ],
    axle: { x: 0, y: 0 },
  },
};

export const TRACK_DEFAULTS: Record<Track["kind"], Track> = {
  sine: { kind: "sine", amplitude: 10, period: 100 },
  catenary: { kind: "catenary", scale: 200, period: 352.5 },
  cycloid: { kind: "cycloid", radius: 50 },
  function: { kind: "function", y: "10*sin(2*pi*x/100)", period: 100 },
  profile: {
    kind: "profile",
    points: [
      [0, 0],
      [25, 10],
      [50, 0],
      [75, -10],
      [100, 0],
    ],
  },
};

/** A default in the user's units: every length scaled from millimetres (counts such as sides stay). */
export function inUnits<T extends object>(value: T, units: "mm" | "in", counts: readonly string[] = []): T {
  const scale = units === "in" ? 1 / 25.4 : 1;
  const out = structuredClone(value) as Record<string, unknown>;
  for (const [k, v] of Object.entries(out))
    if (typeof v === "number" && !counts.includes(k)) out[k] = Number((v * scale).toPrecision(6));
  return out as T;
}

export const MODE_LABELS: Record<Mode, string> = MODE_NAMES;

/** The first preset of a mode, in the units the user is working in. */
export function defaultSpecFor(mode: Mode): DesignSpecInput {
  return structuredClone(PRESETS.find((p) => p.spec.mode === mode)!.spec);
}
