// Offset of a simple integer polygon (Clipper offset, mitred joins with limit 2: a sharp corner is
// squared off no nearer than the offset distance, so the result still holds the round offset).
import type { ClipperLib } from "@/lib/geometry/clipper";
import { clipper } from "@/lib/geometry/clipper";

/** Keeps the outer ring of largest area (a hole closed up by the offset is filled). */
export function offsetPolygon(lib: ClipperLib, path: clipper.ReadonlyPath, delta: number): clipper.Path {
  if (delta === 0) return path.slice();
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
