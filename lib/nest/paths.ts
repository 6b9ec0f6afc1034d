// Small operations on integer Clipper paths that several nesting modules share: offsets (Clipper
// offset, mitred joins with limit 2: a sharp corner is squared off no nearer than the offset distance,
// so the result still holds the round offset), the outer ring of largest area, translation, a box as a
// path, and perimeter.
import type { Box } from "@/lib/geometry/box";
import type { ClipperLib } from "@/lib/geometry/clipper";
import { clipper } from "@/lib/geometry/clipper";

/** Offset of closed paths (their union). */
export function offsetPaths(lib: ClipperLib, paths: readonly clipper.ReadonlyPath[], delta: number): clipper.Paths {
  if (delta === 0) return paths.map((p) => p.slice());
  return (
    lib.offsetToPaths({
      delta,
      offsetInputs: paths.map((data) => ({
        data,
        joinType: clipper.JoinType.Miter,
        endType: clipper.EndType.ClosedPolygon,
      })),
      miterLimit: 2,
    }) ?? []
  );
}

/** The outer ring of largest area, or undefined when there is none. */
export function largestOuter(lib: ClipperLib, paths: readonly clipper.Path[]): clipper.Path | undefined {
  let best: clipper.Path | undefined;
  let bestArea = 0;
  for (const p of paths) {
    const a = lib.area(p);
    if (a > bestArea) [best, bestArea] = [p, a];
  }
  return best;
}

/** Offset of a simple polygon; keeps the outer ring of largest area (a hole closed up is filled). */
export function offsetPolygon(lib: ClipperLib, path: clipper.ReadonlyPath, delta: number): clipper.Path {
  if (delta === 0) return path.slice();
  const best = largestOuter(lib, offsetPaths(lib, [path], delta));
  if (!best) throw new Error("offsetPolygon: the offset removed the whole polygon");
  return best;
}

export const shiftPath = (path: clipper.ReadonlyPath, dx: number, dy: number): clipper.Path =>
  path.map((p) => ({ x: p.x + dx, y: p.y + dy }));

/** The box as a counter-clockwise path. */
export const boxPath = (b: Box): clipper.Path => [
  { x: b.minX, y: b.minY },
  { x: b.maxX, y: b.minY },
  { x: b.maxX, y: b.maxY },
  { x: b.minX, y: b.maxY },
];

export function pathPerimeter(path: clipper.ReadonlyPath): number {
  let s = 0;
  for (let i = 0; i < path.length; i++) {
    const q = path[(i + 1) % path.length];
    s += Math.hypot(q.x - path[i].x, q.y - path[i].y);
  }
  return s;
}
