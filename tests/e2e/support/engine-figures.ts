// What the studio's readouts should say, worked out here in the test process by the engine itself
// (lib/track solve), so a browser test can tell the figures on screen are the engine's.
import type { SolveResult } from "@/lib/track";

/** The engine's value(s) behind each canvas readout label (components/studio/view/canvas-readout.tsx). */
export function engineFigure(r: SolveResult, label: string): number[] {
  const range = (o?: { rMin: number; rMax: number }) => (o ? [o.rMin, o.rMax] : []);
  switch (label) {
    case "period":
      return [r.period!];
    case "depth":
      return [r.depth!];
    case "axle height":
      return [r.axleHeight!];
    case "lower axle":
      return [r.lowerAxleHeight!];
    case "centre distance":
      return [r.centreDistance!];
    case "wheel r":
    case "upper wheel r":
    case "driver r":
      return range(r.wheel);
    case "partner r":
    case "lower wheel r":
      return range(r.partner);
    default:
      throw new Error(`no engine figure for the readout "${label}"`);
  }
}

/** The numbers in a readout such as "352.5 mm" or "141.4 – 200 mm" (the dash is an en dash). */
export function shownNumbers(text: string): number[] {
  return text
    .replace(/ (mm|in|rad)$/, "")
    .split(" – ")
    .map((s) => Number(s));
}

/**
 * Whether a figure shown to four significant digits (the readout's rounding) is the engine's
 * value: at most half a unit in the last shown place away.
 */
export function showsValue(shown: number, value: number, digits = 4): boolean {
  if (!Number.isFinite(shown) || !Number.isFinite(value)) return false;
  if (value === 0) return shown === 0;
  const unit = 10 ** (Math.floor(Math.log10(Math.abs(value))) - (digits - 1));
  return Math.abs(shown - value) <= unit / 2 + 1e-9 * Math.abs(value);
}
