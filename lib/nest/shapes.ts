// Collision shapes: each allowed rotation of each item as an integer Clipper polygon, inflated by
// half the part spacing (Clipper offset with mitred joins), so that two shapes that touch leave
// their parts `spacing` apart.
//
// Exact fits: two integer polygons that fit exactly leave a feasible region of zero area, which
// Clipper drops. The stationary copy of each shape (the one the no-fit polygons are built around)
// is therefore shrunk by EXACT_FIT_STEPS integer steps, which opens such regions to one step's
// width. The price is a possible overlap of that depth, far below any cutting tolerance (scale.ts).
import { boundsOfXY, type Box } from "@/lib/geometry/box";
import type { ClipperLib } from "@/lib/geometry/clipper";
import { clipper, toPath } from "@/lib/geometry/clipper";
import { rotateRing } from "@/lib/geometry/place";
import { ringArea } from "@/lib/geometry/ring";
import type { NestItem } from "./types";

export const EXACT_FIT_STEPS = 1;

export interface Shape {
  item: number;
  /** Degrees. */
  rotation: number;
  /** Inflated by spacing/2, less EXACT_FIT_STEPS: used as the fixed polygon of a no-fit polygon. */
  stationary: clipper.Path;
  /** Inflated by spacing/2: used as the moving polygon of a no-fit polygon and for containment. */
  orbiting: clipper.Path;
  /** Bounding box of `orbiting`, in integer steps. */
  box: Box;
}

export interface ShapeSet {
  scale: number;
  shapes: Shape[];
  /** shapeOf[item][k] = index into `shapes` of the item's k-th allowed rotation. */
  shapeOf: number[][];
  /** Area of each item as given (not inflated), in the input's units². */
  itemArea: number[];
}

/** Offset of a simple polygon; keeps the outer ring of largest area (a hole closed up is filled). */
export function offsetPolygon(lib: ClipperLib, path: clipper.Path, delta: number): clipper.Path {
  if (delta === 0) return path;
  const out = lib.offsetToPaths({
    delta,
    offsetInputs: [{ data: path, joinType: clipper.JoinType.Miter, endType: clipper.EndType.ClosedPolygon }],
    miterLimit: 2,
  });
  let best: clipper.Path | undefined;
  let bestArea = 0;
  for (const p of out ?? []) {
    const a = lib.area(p);
    if (a > bestArea) [best, bestArea] = [p, a];
  }
  if (!best) throw new Error("offsetPolygon: the offset removed the whole polygon");
  return best;
}

export function buildShapes(lib: ClipperLib, items: readonly NestItem[], scale: number, spacing: number): ShapeSet {
  const half = Math.round((spacing / 2) * scale);
  const shapes: Shape[] = [];
  const shapeOf = items.map((item, i) =>
    item.rotations.map((rotation) => {
      const exact = toPath(rotateRing(item.polygon, rotation), scale);
      if (lib.area(exact) < 0) exact.reverse();
      const orbiting = offsetPolygon(lib, exact, half);
      // Clipper's mitred offset leaves edges one step long at the corners; they only breed slivers.
      const stationary = lib.cleanPolygon(offsetPolygon(lib, exact, half - EXACT_FIT_STEPS), 1.5);
      shapes.push({ item: i, rotation, stationary, orbiting, box: boundsOfXY(orbiting) });
      return shapes.length - 1;
    }),
  );
  return { scale, shapes, shapeOf, itemArea: items.map((it) => ringArea(it.polygon)) };
}
