// Where a part fits inside a hole of a bigger part: the positions t of the moving shape B with
// B + t inside hole H. That is the complement of Hᶜ ⊕ (−B) (Bennell & Oliveira 2008, §5, the
// inner-fit polygon, here of a polygonal container): the ring between H and a frame around it is
// cut into convex pieces (convex-parts.ts), each summed with −B's pieces, and their union taken from
// the inner-fit rectangle of H's box.
import { boundsOfXY, inflate } from "@/lib/geometry/box";
import type { ClipperLib } from "@/lib/geometry/clipper";
import { clipper } from "@/lib/geometry/clipper";
import { convexParts, convexSum } from "./convex-parts";
import { reflect } from "./minkowski";
import { boxPath } from "./paths";

/**
 * Reference-point positions of `moving` (counter-clockwise, at its own origin) that keep it inside
 * `hole` (counter-clockwise): empty when it does not fit.
 */
export function holeFit(lib: ClipperLib, hole: clipper.ReadonlyPath, moving: clipper.ReadonlyPath): clipper.Paths {
  const h = boundsOfXY(hole);
  const m = boundsOfXY(moving);
  // The inner-fit rectangle of the hole's box: B's box inside H's box.
  const ifr = { minX: h.minX - m.minX, maxX: h.maxX - m.maxX, minY: h.minY - m.minY, maxY: h.maxY - m.maxY };
  if (ifr.minX >= ifr.maxX || ifr.minY >= ifr.maxY) return [];
  // A frame wide enough that B, anywhere in that rectangle, never reaches past it.
  const pad = Math.max(m.maxX - m.minX, m.maxY - m.minY) + 2;
  const frame = boxPath(inflate(h, pad));
  const outside = convexParts(frame, [hole]);
  const minus = convexParts(moving).map(reflect);
  const blocked: clipper.Path[] = [];
  for (const a of outside) for (const b of minus) blocked.push(convexSum(a, b));
  const rect = boxPath(ifr);
  return lib.clipToPaths({
    clipType: clipper.ClipType.Difference,
    subjectInputs: [{ data: rect, closed: true }],
    clipInputs: [{ data: blocked }],
    subjectFillType: clipper.PolyFillType.NonZero,
    clipFillType: clipper.PolyFillType.NonZero,
  });
}
