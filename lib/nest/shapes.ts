// Collision shapes: each allowed rotation of each item as an integer Clipper polygon, inflated by
// half the part spacing (Clipper offset with mitred joins), so that two shapes that touch leave
// their parts `spacing` apart, and replaced by a containing outline of fewer vertices
// (containing-outline.ts) whose extra area is measured and bounded.
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
import { containingOutline } from "./containing-outline";
import { offsetPolygon } from "./paths";
import type { NestItem, OutlineReport } from "./types";

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
  /**
   * The part's holes shrunk by spacing/2 (counter-clockwise): an orbiting shape inside one keeps
   * the spacing from the hole's edge. Empty when holes are not used.
   */
  holes: clipper.Path[];
}

export interface ShapeSet {
  scale: number;
  shapes: Shape[];
  /** shapeOf[item][k] = index into `shapes` of the item's k-th allowed rotation. */
  shapeOf: number[][];
  /** Area of each item as given (not inflated), in the input's units². */
  itemArea: number[];
  /** Each item's outline as packed (its first allowed rotation). */
  outlines: OutlineReport[];
}

/** How far an outline may be coarsened: extra area as a share of the part's, and a vertex cap. */
export interface OutlinePolicy {
  maxExtraShare: number;
  maxVertices?: number;
  /** Keep the items' holes for nesting small parts in them (sheet mode). */
  holes?: boolean;
}

/** The fine outlines: at most 0.5 % of each part's area added (issue 13's bound). */
export const FINE_OUTLINES: OutlinePolicy = { maxExtraShare: 0.005 };

export function buildShapes(
  lib: ClipperLib,
  items: readonly NestItem[],
  scale: number,
  spacing: number,
  policy: OutlinePolicy = FINE_OUTLINES,
): ShapeSet {
  const half = Math.round((spacing / 2) * scale);
  const shapes: Shape[] = [];
  const itemArea = items.map((it) => ringArea(it.polygon));
  const outlines: OutlineReport[] = [];
  const shapeOf = items.map((item, i) =>
    item.rotations.map((rotation, k) => {
      const exact = toPath(rotateRing(item.polygon, rotation), scale);
      if (lib.area(exact) < 0) exact.reverse();
      const inflated = offsetPolygon(lib, exact, half);
      const maxExtra = policy.maxExtraShare * itemArea[i] * scale * scale;
      const outline = containingOutline(lib, inflated, { maxExtra, maxVertices: policy.maxVertices });
      const orbiting = outline.path;
      // Clipper's mitred offset leaves edges one step long at the corners; they only breed slivers.
      const stationary = lib.cleanPolygon(offsetPolygon(lib, orbiting, -EXACT_FIT_STEPS), 1.5);
      if (k === 0)
        outlines.push({
          id: item.id,
          vertices: item.polygon.length,
          outlineVertices: orbiting.length,
          extraArea: outline.extra / (scale * scale),
          extraShare: itemArea[i] > 0 ? outline.extra / (scale * scale) / itemArea[i] : 0,
        });
      const holes = policy.holes ? holeContainers(lib, item, rotation, scale, half) : [];
      shapes.push({ item: i, rotation, stationary, orbiting, box: boundsOfXY(orbiting), holes });
      return shapes.length - 1;
    }),
  );
  return { scale, shapes, shapeOf, itemArea, outlines };
}

/** The item's holes turned and scaled, counter-clockwise, shrunk by half the spacing; vanished ones dropped. */
function holeContainers(
  lib: ClipperLib,
  item: NestItem,
  rotation: number,
  scale: number,
  half: number,
): clipper.Path[] {
  const out: clipper.Path[] = [];
  for (const ring of item.holes ?? []) {
    const path = toPath(rotateRing(ring, rotation), scale);
    if (lib.area(path) < 0) path.reverse();
    try {
      out.push(offsetPolygon(lib, path, -half));
    } catch {
      // The spacing closes the hole up: nothing fits in it.
    }
  }
  return out;
}
