// A part's engraved label: the project, the part's id and an arrow pointing in the direction of
// travel (the wheel rolls towards +x), in single strokes, as large as fits up to the asked cap
// height and placed where the part has room (place.ts). If the full label does not fit, the id and
// arrow alone are tried.
import type { Pt } from "@/lib/geometry/point";
import type { Box } from "@/lib/geometry/box";
import type { DrillHole, Region } from "../types";
import type { GlyphTable } from "./font";
import { findSpot } from "./place";
import { layoutBlock } from "./text";

export interface LabelRequest {
  lines: string[];
  arrow: boolean;
  maxHeight: number;
  minHeight: number;
  /** Where the label would best sit (its centre). */
  prefer: Pt;
  margin: number;
  /** Keep the label inside this box too (a track part's base band). */
  within?: Box;
}

export interface PlacedLabel {
  strokes: Pt[][];
  capHeight: number;
  /** False when only the last line (id and arrow) fitted. */
  full: boolean;
  missing: string[];
}

export function placeLabel(
  font: GlyphTable,
  region: Region,
  drill: DrillHole[],
  req: LabelRequest,
): PlacedLabel | null {
  const variants = req.lines.length > 1 ? [req.lines, req.lines.slice(-1)] : [req.lines];
  for (const lines of variants) {
    for (let h = req.maxHeight; h >= req.minHeight - 1e-9; h *= 0.8) {
      const block = layoutBlock(font, lines, h, req.arrow);
      const w = block.box.maxX;
      const bh = block.box.maxY;
      const at = findSpot(region, drill, w, bh, {
        margin: req.margin,
        prefer: req.prefer,
        step: Math.max(1, h / 2),
        within: req.within,
      });
      if (at)
        return {
          strokes: block.strokes.map((s) => s.map(([x, y]): Pt => [x + at[0], y + at[1]])),
          capHeight: h,
          full: lines.length === req.lines.length,
          missing: block.missing,
        };
    }
  }
  return null;
}
