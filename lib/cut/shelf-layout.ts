// A plain shelf layout of bounding boxes (first fit by decreasing height; the "level" packings of
// E. G. Coffman, M. R. Garey, D. S. Johnson & R. E. Tarjan, "Performance bounds for level-oriented
// two-dimensional packing algorithms", SIAM J. Computing 9(4):808–826, 1980), in the nester's
// result shape. It stands in when the real nester (lib/nest) is not available, and it is far from
// dense: every part takes its whole bounding box.
import type { NestItem, SheetNestResult, SheetPlacement } from "@/lib/nest/types";
import { bounds, boxHeight, boxWidth } from "@/lib/geometry/box";
import { placer } from "@/lib/geometry/place";
import { ringArea } from "@/lib/geometry/ring";

interface Copy {
  id: string;
  copy: number;
  rotation: number;
  w: number;
  h: number;
  minX: number;
  minY: number;
  area: number;
}

export function shelfLayout(input: {
  items: NestItem[];
  sheet: { width: number; height: number };
  margin: number;
  spacing: number;
}): SheetNestResult {
  const t0 = Date.now();
  const { width: W, height: H } = input.sheet;
  const m = input.margin;
  const g = input.spacing;
  const copies: Copy[] = [];
  const unplaced: SheetNestResult["unplaced"] = [];
  for (const item of input.items) {
    const options = item.rotations
      .filter((r) => Math.abs(r / 90 - Math.round(r / 90)) < 1e-9)
      .map((r) => {
        const b = bounds(item.polygon.map(placer(r, 0, 0)));
        return { r, w: boxWidth(b), h: boxHeight(b), minX: b.minX, minY: b.minY };
      })
      .filter((o) => o.w <= W - 2 * m + 1e-9 && o.h <= H - 2 * m + 1e-9)
      // Long side along the sheet's length; then the lowest shelf.
      .sort((a, b) => a.h - b.h || a.r - b.r);
    for (let c = 0; c < item.quantity; c++) {
      const o = options[0];
      if (!o)
        unplaced.push({
          id: item.id,
          copy: c,
          reason: "larger than the sheet less its margins in every allowed rotation",
        });
      else
        copies.push({
          id: item.id,
          copy: c,
          rotation: o.r,
          w: o.w,
          h: o.h,
          minX: o.minX,
          minY: o.minY,
          area: ringArea(item.polygon),
        });
    }
  }
  copies.sort((a, b) => b.h - a.h || b.w - a.w);
  type Shelf = { y: number; h: number; x: number };
  const sheets: Array<{ shelves: Shelf[]; placements: SheetPlacement[]; area: number }> = [];
  for (const c of copies) {
    let done = false;
    for (let si = 0; si <= sheets.length && !done; si++) {
      if (si === sheets.length) sheets.push({ shelves: [], placements: [], area: 0 });
      const sh = sheets[si];
      let shelf = sh.shelves.find((s) => s.h >= c.h - 1e-9 && s.x + c.w <= W - m + 1e-9);
      if (!shelf) {
        const top = sh.shelves.length
          ? sh.shelves[sh.shelves.length - 1].y + sh.shelves[sh.shelves.length - 1].h + g
          : m;
        if (top + c.h > H - m + 1e-9) continue;
        shelf = { y: top, h: c.h, x: m };
        sh.shelves.push(shelf);
      }
      sh.placements.push({
        id: c.id,
        copy: c.copy,
        rotation: c.rotation,
        x: shelf.x - c.minX,
        y: shelf.y - c.minY,
        sheet: si,
      });
      sh.area += c.area;
      shelf.x += c.w + g;
      done = true;
    }
  }
  const used = sheets.filter((s) => s.placements.length);
  const total = used.reduce((a, s) => a + s.area, 0);
  return {
    sheets: used.map((s, index) => ({
      index,
      utilisation: s.area / (W * H),
      placements: s.placements.map((p) => ({ ...p, sheet: index })),
    })),
    utilisation: used.length ? total / (used.length * W * H) : 0,
    unplaced,
    seconds: (Date.now() - t0) / 1000,
    cancelled: false,
  };
}
