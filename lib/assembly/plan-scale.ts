// The layout plan printed to scale: a standard drawing scale (ISO 5455: 1:1, 1:2, 1:5, 1:10, 1:20,
// 1:50, 1:100 …, with 1:25 common in building drawings) chosen so the run fits the page in a few
// strips, and the run cut into strips of equal scale. Pure: the printed page and the PDF share it.
export const STANDARD_SCALES = [1, 2, 5, 10, 20, 25, 50, 100, 200, 500, 1000] as const;

export interface PlanStrip {
  /** Run x at the strip's left and right ends, mm. */
  from: number;
  to: number;
}

export interface PlanLayout {
  /** 1 : scale. */
  scale: number;
  strips: PlanStrip[];
}

/** The largest standard scale (the biggest drawing) that fits `length` mm into at most `maxStrips` strips of `widthMm` printed mm. */
export function planLayout(length: number, widthMm: number, maxStrips = 3): PlanLayout {
  const scale =
    STANDARD_SCALES.find((s) => length / s <= widthMm * maxStrips + 1e-9) ??
    STANDARD_SCALES[STANDARD_SCALES.length - 1];
  const perStrip = widthMm * scale;
  const count = Math.max(1, Math.ceil(length / perStrip - 1e-9));
  // Strips of equal length, so each is as wide on paper as the next.
  const each = length / count;
  return { scale, strips: Array.from({ length: count }, (_, i) => ({ from: i * each, to: (i + 1) * each })) };
}
