// The rolling check as a list of figures with a pass / warn state. Pure (no React) so the panel
// and the unit tests read the same thresholds.

import type { SolveResult } from "@/lib/track";
import { fmt } from "@/lib/studio/view-math";

import { CLOSURE_LIMIT, FRICTION_GUIDE, SHARP_SHARE, lengthTolerance } from "@/lib/studio/check-limits";

export { CLOSURE_LIMIT, FRICTION_GUIDE, SHARP_SHARE };

export type FigureState = "pass" | "warn" | "info";

export interface Figure {
  key: string;
  label: string;
  value: string;
  state: FigureState;
  note?: string;
  /** The check has a place to show on the canvas. */
  locate?: "interference" | "friction";
}

const radius = (r: number | undefined, units: string) =>
  r === undefined ? "—" : r === 0 ? "0 (corner)" : Number.isFinite(r) ? `${fmt(r)} ${units}` : "∞ (straight)";

export function checkFigures(r: SolveResult): Figure[] {
  const c = r.check;
  const u = r.units;
  const pair = r.mode === "partner-wheel" || r.mode === "twin-wheels";
  const size = r.mode === "partner-wheel" ? (r.centreDistance ?? r.wheel.rMax) : r.wheel.rMax;
  const tol = lengthTolerance(u);
  const out: Figure[] = [
    {
      key: "interference",
      label: pair ? "Overlap away from the contact" : "Cut into the track away from the contact",
      value: `${fmt(c.interference.depth)} ${u}`,
      state: c.interference.depth > 0 ? "warn" : "pass",
      note:
        c.interference.depth > 0
          ? pair
            ? "The wheels overlap away from the contact."
            : "The wheel cuts into the track away from the contact."
          : undefined,
      locate: c.interference.depth > 0 && c.interference.at ? "interference" : undefined,
    },
    {
      key: "friction",
      label: "Grip needed (μ)",
      value: fmt(c.frictionDemand.max, 3),
      state: c.frictionDemand.max > FRICTION_GUIDE ? "warn" : "pass",
      note:
        c.frictionDemand.max > FRICTION_GUIDE
          ? `Above ${FRICTION_GUIDE}. The real limit depends on the materials in contact.`
          : `At or below ${FRICTION_GUIDE}; the real limit depends on the materials in contact.`,
      locate: "friction",
    },
    {
      key: "closure",
      label: pair ? "Turn left over after one lobe (Δθ)" : "Turn left over after one period (Δθ)",
      value: `${fmt(c.closureError, 3)} rad`,
      state: Math.abs(c.closureError) > CLOSURE_LIMIT ? "warn" : "pass",
    },
    {
      key: "axle",
      label: r.mode === "partner-wheel" ? "Centre distance off its value (Δa)" : "Axle off its line (Δh)",
      value: `${fmt(c.axleDeviation, 3)} ${u}`,
      state: c.axleDeviation > tol ? "warn" : "pass",
    },
    {
      key: "slip",
      label: "Slip between the rolled lengths (Δs)",
      value: `${fmt(c.slip, 3)} ${u}`,
      state: c.slip > tol ? "warn" : "pass",
    },
  ];
  const radii: Array<[string, string, number | undefined]> = [
    [
      "wheel",
      r.mode === "partner-wheel"
        ? "Tightest bend radius, driver (ρ)"
        : r.mode === "twin-wheels"
          ? "Tightest bend radius, upper wheel (ρ)"
          : "Tightest bend radius, wheel (ρ)",
      c.minCurvatureRadius.wheel,
    ],
    [
      "partner",
      r.mode === "twin-wheels" ? "Tightest bend radius, lower wheel (ρ)" : "Tightest bend radius, partner (ρ)",
      c.minCurvatureRadius.partner,
    ],
    ["track", "Tightest bend radius, track (ρ)", c.minCurvatureRadius.track],
  ];
  for (const [key, label, value] of radii) {
    if (value === undefined) continue;
    const sharp = value < SHARP_SHARE * size;
    out.push({
      key: `radius-${key}`,
      label,
      value: radius(value, u),
      state: sharp ? "warn" : "pass",
      note: sharp
        ? `Under ${SHARP_SHARE * 100}% of the wheel size: round it for parts people touch, and check the cutter fits.`
        : undefined,
    });
  }
  if (c.speedRatio)
    out.push({
      key: "speed-ratio",
      label: r.mode === "twin-wheels" ? "Speed ratio, lower / upper" : "Speed ratio, partner / driver",
      value: `${fmt(c.speedRatio.min, 3)} – ${fmt(c.speedRatio.max, 3)}`,
      state: "info",
    });
  if (c.symmetryError !== undefined)
    out.push({
      key: "symmetry",
      label: "Point-symmetry error of the track",
      value: `${fmt(c.symmetryError, 3)} ${u}`,
      state: c.symmetryError > 1e-9 * size ? "warn" : "pass",
      note: c.symmetryError > 1e-9 * size ? "The two wheels are not identical." : undefined,
    });
  return out;
}
