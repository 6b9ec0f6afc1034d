// Bottom-left-fill placement in one rectangular container (Burke, Hellier, Kendall & Whitwell 2006,
// "A new bottom-left-fill heuristic algorithm for the two-dimensional irregular packing problem",
// Operations Research 54(3):587–601), on no-fit polygons: the feasible positions of the next shape
// are its inner-fit rectangle minus the union of the no-fit polygons of the shapes already placed
// (Bennell & Oliveira 2008, §6); the position chosen is the vertex of that region where the shape's
// left edge is lowest in x (along the length), then its bottom edge lowest in y. Holes left between earlier parts are feasible
// regions like any other, so later, smaller parts fall into them (the "fill").
import type { Box } from "@/lib/geometry/box";
import type { ClipperLib } from "@/lib/geometry/clipper";
import { clipper } from "@/lib/geometry/clipper";
import { innerFitRectangle } from "./inner-fit";
import { boxPath, shiftPath } from "./paths";
import type { NoFitCache } from "./no-fit-cache";
import { EXACT_FIT_STEPS, type ShapeSet } from "./shapes";

export interface PlacedShape {
  shape: number;
  x: number;
  y: number;
}

export interface Position {
  x: number;
  y: number;
  /** Keys compared in order, smaller is better: the shape's left edge, then its bottom edge. */
  k1: number;
  k2: number;
}

export function better(a: Position, b: Position | null): boolean {
  return !b || a.k1 < b.k1 || (a.k1 === b.k1 && a.k2 < b.k2);
}

/**
 * The part of `region` (reference-point positions, within `box`) where `shape` overlaps none of
 * `placed`: the region minus the union of the placed shapes' no-fit polygons (Bennell & Oliveira
 * 2008, §6), only those whose box meets `box` taken. Empty when nothing is left.
 */
function clearOf(
  lib: ClipperLib,
  nfps: NoFitCache,
  shape: number,
  placed: readonly PlacedShape[],
  region: clipper.Paths,
  box: Box,
): clipper.Paths {
  const clip: clipper.Path[] = [];
  for (const p of placed) {
    const nfp = nfps.get(p.shape, shape);
    if (
      nfp.box.minX + p.x >= box.maxX ||
      nfp.box.maxX + p.x <= box.minX ||
      nfp.box.minY + p.y >= box.maxY ||
      nfp.box.maxY + p.y <= box.minY
    )
      continue;
    for (const path of nfp.paths) clip.push(shiftPath(path, p.x, p.y));
  }
  if (!clip.length) return region;
  return lib.clipToPaths({
    clipType: clipper.ClipType.Difference,
    subjectInputs: region.map((data) => ({ data, closed: true })),
    clipInputs: [{ data: clip }],
    subjectFillType: clipper.PolyFillType.NonZero,
    clipFillType: clipper.PolyFillType.NonZero,
  });
}

/**
 * Reference-point positions where `shape` overlaps none of `placed`: the inner-fit rectangle minus
 * the union of the placed shapes' no-fit polygons. Empty when none.
 */
export function feasibleRegion(
  lib: ClipperLib,
  nfps: NoFitCache,
  shape: number,
  placed: readonly PlacedShape[],
  ifp: Box,
): clipper.Paths {
  return clearOf(lib, nfps, shape, placed, [boxPath(ifp)], ifp);
}

export const clamp = (v: number, lo: number, hi: number) => (lo <= hi ? Math.min(Math.max(v, lo), hi) : v);

export class Bin {
  placed: PlacedShape[] = [];
  /** Largest x reached by the placed shapes' bounding boxes. */
  extentX: number;

  constructor(
    private readonly lib: ClipperLib,
    private readonly set: ShapeSet,
    private readonly nfps: NoFitCache,
    readonly container: Box,
  ) {
    this.extentX = container.minX;
  }

  /** The bottom-left vertex of the shape's feasible region, or null when it does not fit. */
  bestPosition(shape: number): Position | null {
    const box = this.set.shapes[shape].box;
    const ifp = innerFitRectangle(this.container, box, EXACT_FIT_STEPS);
    if (!ifp) return null;
    const exact = innerFitRectangle(this.container, box) ?? ifp; // null only when it misses by under a step
    const region = feasibleRegion(this.lib, this.nfps, shape, this.placed, ifp);
    let best: Position | null = null;
    for (const path of region)
      for (const q of path) {
        const x = clamp(q.x, exact.minX, exact.maxX);
        const y = clamp(q.y, exact.minY, exact.maxY);
        const c: Position = { x, y, k1: x + box.minX, k2: y + box.minY };
        if (better(c, best)) best = c;
      }
    for (const c of this.holePositions(shape)) if (better(c, best)) best = c;
    return best;
  }

  /**
   * Bottom-left candidates inside the holes of parts already placed: the shape's fit in the hole,
   * less the no-fit polygons of every other placed shape (the host's own covers its hole).
   */
  private holePositions(shape: number): Position[] {
    const out: Position[] = [];
    const box = this.set.shapes[shape].box;
    this.placed.forEach((host, h) => {
      const holes = this.set.shapes[host.shape].holes;
      for (let k = 0; k < holes.length; k++) {
        const fit = this.nfps.holeFit(host.shape, k, shape);
        if (!fit.box) continue;
        const moved = fit.paths.map((path) => shiftPath(path, host.x, host.y));
        const movedBox = {
          minX: fit.box.minX + host.x,
          maxX: fit.box.maxX + host.x,
          minY: fit.box.minY + host.y,
          maxY: fit.box.maxY + host.y,
        };
        const others = this.placed.filter((_, i) => i !== h);
        const region = clearOf(this.lib, this.nfps, shape, others, moved, movedBox);
        for (const path of region)
          for (const q of path) out.push({ x: q.x, y: q.y, k1: q.x + box.minX, k2: q.y + box.minY });
      }
    });
    return out;
  }

  place(shape: number, at: { x: number; y: number }): void {
    this.placed.push({ shape, x: at.x, y: at.y });
    const right = at.x + this.set.shapes[shape].box.maxX;
    if (right > this.extentX) this.extentX = right;
  }
}
