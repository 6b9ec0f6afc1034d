// The demo "Square-wheel trike run" (docs/product.md §3): square wheels of 400 mm side on a 6.0 m run,
// 18 mm birch plywood on 2440 × 1220 mm sheets, a 6 mm router cutter. Solved once per test file.
import { solve, type SolveResult } from "@/lib/track";
import { loadHersheyFont } from "@/lib/cut/labels/font-file";
import type { GlyphTable } from "@/lib/cut/labels/font";
import type { SheetNestResult } from "@/lib/nest/types";
import type { Part } from "@/lib/cut/types";
import { bounds } from "@/lib/geometry/box";

export const SQUARE_SPEC = {
  mode: "track-for-wheel",
  units: "mm",
  wheel: { kind: "polygon", sides: 4, side: 400, cornerRadius: 0 },
} as const;

export const DEMO_SETTINGS = {
  project: "Square-wheel trike run",
  runLength: 6000,
  material: "Birch plywood",
  sheet: { length: 2440, width: 1220, thickness: 18 },
  machine: { kind: "router", kerf: 6 },
} as const;

let square: SolveResult | undefined;
export function squareResult(): SolveResult {
  square ??= solve(SQUARE_SPEC);
  return square;
}

export function font(): GlyphTable {
  return loadHersheyFont();
}

/**
 * A trivial layout of our own for the export tests (not the nester, not lib/cut's shelf layout):
 * every copy at rotation 0 in its own row, rows stacked up the sheet, a new sheet when one is full.
 */
export function rowNest(
  parts: Part[],
  sheet: { length: number; width: number },
  margin: number,
  gap: number,
): SheetNestResult {
  const sheets: SheetNestResult["sheets"] = [];
  let y = margin;
  let index = 0;
  sheets.push({ index, utilisation: 0, placements: [] });
  for (const p of parts) {
    const b = bounds(p.region.outer);
    for (let copy = 0; copy < p.quantity; copy++) {
      const h = b.maxY - b.minY;
      if (y + h > sheet.width - margin) {
        index++;
        sheets.push({ index, utilisation: 0, placements: [] });
        y = margin;
      }
      sheets[index].placements.push({ id: p.id, copy, rotation: 0, x: margin - b.minX, y: y - b.minY, sheet: index });
      y += h + gap;
    }
  }
  return { sheets, utilisation: 0, unplaced: [], seconds: 0, cancelled: false };
}
