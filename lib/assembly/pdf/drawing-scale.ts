// The layout plan's scale: one of the recommended scales of ISO 5455:1979 (Technical drawings —
// Scales, §5: full size 1:1 and the reductions 1:2, 1:5, 1:10 and their multiples by ten), the
// same in x and y, so a rule laid on the print measures the run. A run too long to read in one
// strip at a legible scale is cut into equal strips, each drawn at that same scale.

/** ISO 5455 §5: full size and the recommended reduction scales, as the denominator of 1 : d. */
export const ISO_5455_SCALES = [1, 2, 5, 10, 20, 50, 100, 200, 500, 1000, 2000, 5000, 10000] as const;

/** Points per millimetre: 1 pt = 1/72 in and 1 in = 25.4 mm exactly. */
export const PT_PER_MM = 72 / 25.4;

export interface StripRange {
  /** Run x at the strip's left and right ends, mm. */
  x0: number;
  x1: number;
}

export interface PlanScale {
  /** The scale is 1 : denominator. */
  denominator: number;
  /** Points on paper per millimetre of run. */
  ptPerMm: number;
  strips: StripRange[];
}

export const ptPerMm = (denominator: number) => PT_PER_MM / denominator;

/** Cuts the run into the fewest equal strips that fit `widthPt` at 1 : d, tidied to a round length. */
export function splitRun(length: number, widthPt: number, denominator: number): StripRange[] {
  const cap = widthPt / ptPerMm(denominator);
  if (!(length > 0)) return [{ x0: 0, x1: Math.max(length, 0) }];
  const n = Math.max(1, Math.ceil(length / cap - 1e-9));
  if (n === 1) return [{ x0: 0, x1: length }];
  const step = cap >= 5000 ? 500 : cap >= 1000 ? 100 : cap >= 100 ? 10 : 1;
  const tidy = Math.ceil(length / n / step) * step;
  const size = tidy <= cap && tidy * (n - 1) < length ? tidy : length / n;
  return Array.from({ length: n }, (_, i) => ({ x0: i * size, x1: Math.min((i + 1) * size, length) }));
}

export interface ScaleChoice {
  length: number;
  /** Width on paper a strip may take, pt. */
  widthPt: number;
  /** The strips at 1 : d as drawn: whether every label finds a place, and their total height, pt. */
  measure: (denominator: number, strips: StripRange[]) => { legible: boolean; height: number };
  /** Height the strips may take on the plan's page, pt. */
  pageRoom: number;
  /** At and below this scale the humps shrink past reading, so several strips beat one smaller strip. */
  legibleTo?: number;
}

/**
 * The largest standard scale at which the run reads: one strip if that takes no smaller scale than
 * 1 : legibleTo, else several strips (from 1 : legibleTo down), and every station label must find
 * a place. Of those, the first whose strips fit on the plan's page; failing that, the first that
 * reads at all, over as many pages as it needs.
 */
export function chooseScale({ length, widthPt, measure, pageRoom, legibleTo = 20 }: ScaleChoice): PlanScale {
  let overPages: PlanScale | null = null;
  for (const d of ISO_5455_SCALES) {
    const strips = splitRun(length, widthPt, d);
    if (strips.length > 1 && d < legibleTo) continue;
    const m = measure(d, strips);
    if (!m.legible) continue;
    const choice = { denominator: d, ptPerMm: ptPerMm(d), strips };
    if (m.height <= pageRoom) return choice;
    overPages ??= choice;
  }
  if (overPages) return overPages;
  const d = ISO_5455_SCALES[ISO_5455_SCALES.length - 1];
  return { denominator: d, ptPerMm: ptPerMm(d), strips: splitRun(length, widthPt, d) };
}
