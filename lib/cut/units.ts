// Unit handling: lib/cut works in millimetres; a design in inches is converted by the exact
// 25.4 mm/in (the international inch, NIST Handbook 44 Appendix C), and the exporters convert back
// to the user's output unit.
import type { Pt } from "@/lib/geometry/point";

export const MM_PER_IN = 25.4;

export type OutputUnits = "mm" | "in";

/** Millimetres per one unit of the design. */
export function mmPerUnit(units: "mm" | "in"): number {
  return units === "in" ? MM_PER_IN : 1;
}

export const toMm = (pts: readonly Pt[], k: number): Pt[] =>
  k === 1 ? pts.map(([x, y]) => [x, y]) : pts.map(([x, y]) => [x * k, y * k]);

/** Converts millimetres to the output unit. */
export function fromMm(v: number, units: OutputUnits): number {
  return units === "in" ? v / MM_PER_IN : v;
}

/** A length for people: 4 significant figures, the unit after it. */
export function fmtLen(mm: number, units: OutputUnits = "mm"): string {
  const v = fromMm(mm, units);
  const digits = units === "in" ? 3 : Math.abs(v) >= 100 ? 1 : 2;
  return `${Number(v.toFixed(digits))} ${units}`;
}
