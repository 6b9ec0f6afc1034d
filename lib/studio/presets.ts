// Starting points for a new design, one or more per mode, including the demo projects' designs.
// Plain specs: the engine (lib/track) validates and solves them like any other.
import type { DesignSpecInput } from "@/lib/track";

export interface Preset {
  id: string;
  label: string;
  spec: DesignSpecInput;
}

export const PRESETS: Preset[] = [
  {
    id: "square",
    label: "Square wheel, 400 mm side (trike run)",
    spec: { mode: "track-for-wheel", units: "mm", wheel: { kind: "polygon", sides: 4, side: 400, cornerRadius: 0 } },
  },
  {
    id: "hexagon",
    label: "Hexagon, 100 mm inradius (shapes table)",
    spec: {
      mode: "track-for-wheel",
      units: "mm",
      wheel: { kind: "polygon", sides: 6, inradius: 100, cornerRadius: 0 },
    },
  },
  {
    id: "rounded-square",
    label: "Rounded square, 300 mm side, 20 mm corners",
    spec: { mode: "track-for-wheel", units: "mm", wheel: { kind: "polygon", sides: 4, side: 300, cornerRadius: 20 } },
  },
  {
    id: "ellipse-focus",
    label: "Ellipse, axle at a focus (shapes table)",
    spec: {
      mode: "track-for-wheel",
      units: "mm",
      wheel: { kind: "ellipse", semiMajor: 100, semiMinor: 80, axle: "focus" },
    },
  },
  {
    id: "sine-track",
    label: "Wheel for a sine track, 4 periods per turn",
    spec: {
      mode: "wheel-for-track",
      units: "mm",
      track: { kind: "sine", amplitude: 10, period: 100 },
      periodsPerTurn: 4,
    },
  },
  {
    id: "catenary-row",
    label: "Wheel for a catenary row, 4 periods per turn",
    spec: {
      mode: "wheel-for-track",
      units: "mm",
      track: { kind: "catenary", scale: 200, period: 352.5 },
      periodsPerTurn: 4,
    },
  },
  {
    id: "ellipse-pair",
    label: "Partner of an ellipse turning about its focus",
    spec: {
      mode: "partner-wheel",
      units: "mm",
      wheel: { kind: "ellipse", semiMajor: 100, semiMinor: 80, axle: "focus" },
      lobes: 1,
    },
  },
  {
    id: "window-twins",
    label: "Twin wheels from a sine track (window twins)",
    spec: { mode: "twin-wheels", units: "mm", track: { kind: "sine", amplitude: 20, period: 300 }, periodsPerTurn: 2 },
  },
];

export function presetById(id: string): Preset | undefined {
  return PRESETS.find((p) => p.id === id);
}
