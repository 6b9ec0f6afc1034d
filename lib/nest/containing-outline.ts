// The outline the nester packs in place of a part's own: fewer vertices, and guaranteed to contain
// the part, so a layout of these outlines is a layout of the parts. No-fit polygons cost the product
// of the two outlines' vertex counts (Bennell & Oliveira 2008, §4), and a track segment's catenary
// edge drawn to 0.01 mm has hundreds of vertices, so this is what keeps the time budget.
//
// Method: Douglas–Peucker to ε (lib/geometry/simplify.ts) keeps every dropped vertex within ε of the
// chord that replaced it, so each pocket between a chord and the original edge lies within ε of the
// chord; growing the simplified ring by ε (+ one integer step for rounding; Clipper offset, mitred)
// therefore covers it. Unlike a fixed growth, ε is chosen per outline from the extra area allowed, so
// a track segment's humps and troughs (what lets two segments nest head to tail) keep their shape.
// Each outline is checked to contain the original (Clipper difference) and its extra area measured.
import type { ClipperLib } from "@/lib/geometry/clipper";
import { boundsOfXY } from "@/lib/geometry/box";
import { clipper } from "@/lib/geometry/clipper";
import type { Pt } from "@/lib/geometry/point";
import { simplifyRing } from "@/lib/geometry/simplify";
import { boxPath, offsetPolygon, pathPerimeter } from "./paths";

export interface ContainingOutline {
  path: clipper.Path;
  /** Area added to the original, integer steps². */
  extra: number;
  /** The ε used, integer steps (0: the original was kept). */
  epsilon: number;
}

/** What an outline may cost: extra area (integer steps²) and, optionally, a cap on its vertices. */
export interface OutlineBudget {
  maxExtra: number;
  maxVertices?: number;
}

const toPts = (path: clipper.ReadonlyPath): Pt[] => path.map((q) => [q.x, q.y]);
const fromPts = (pts: readonly Pt[]): clipper.Path => pts.map(([x, y]) => ({ x: Math.round(x), y: Math.round(y) }));

/** Area of `inner` outside `outer` (0 when `outer` contains it). */
export function uncoveredArea(lib: ClipperLib, inner: clipper.ReadonlyPath, outer: clipper.ReadonlyPath): number {
  const out = lib.clipToPaths({
    clipType: clipper.ClipType.Difference,
    subjectInputs: [{ data: inner, closed: true }],
    clipInputs: [{ data: outer }],
    subjectFillType: clipper.PolyFillType.NonZero,
    clipFillType: clipper.PolyFillType.NonZero,
  });
  return out.reduce((s, p) => s + lib.area(p), 0);
}

/**
 * The grown outline cut back to the original's bounding box: it still contains the original (which
 * lies inside its box), and a part that fits a sheet or a strip exactly still fits as its outline.
 */
function withinBox(lib: ClipperLib, grown: clipper.Path, original: clipper.ReadonlyPath): clipper.Path | null {
  const rect = boxPath(boundsOfXY(original));
  const out = lib.clipToPaths({
    clipType: clipper.ClipType.Intersection,
    subjectInputs: [{ data: grown, closed: true }],
    clipInputs: [{ data: rect }],
    subjectFillType: clipper.PolyFillType.NonZero,
    clipFillType: clipper.PolyFillType.NonZero,
  });
  let best: clipper.Path | null = null;
  for (const p of out) if (!best || Math.abs(lib.area(p)) > Math.abs(lib.area(best))) best = p;
  return best;
}

/** The outline simplified to ε and grown to contain `path` (counter-clockwise, integer). */
export function outlineAt(lib: ClipperLib, path: clipper.ReadonlyPath, epsilon: number): ContainingOutline | null {
  const simple = fromPts(simplifyRing(toPts(path), epsilon));
  if (simple.length < 3 || simple.length >= path.length) return null;
  const grown = withinBox(lib, lib.cleanPolygon(offsetPolygon(lib, simple, Math.ceil(epsilon) + 1), 1.5), path);
  if (!grown) return null;
  if (lib.area(grown) < 0) grown.reverse();
  // A tiny uncovered sliver can only come from rounding; anything more means the ring was not simple.
  if (uncoveredArea(lib, path, grown) > 0) return null;
  return { path: grown, extra: lib.area(grown) - lib.area(path), epsilon };
}

/**
 * The containing outline with the fewest vertices whose extra area stays within the budget (found by
 * bisection on ε), or, with `maxVertices`, the least extra area within that many vertices. The
 * original is returned when nothing better fits.
 */
export function containingOutline(
  lib: ClipperLib,
  path: clipper.ReadonlyPath,
  budget: OutlineBudget,
): ContainingOutline {
  const original: ContainingOutline = { path: path.slice(), extra: 0, epsilon: 0 };
  if (path.length <= 8) return original;
  const perimeter = pathPerimeter(path);
  const capped = budget.maxVertices !== undefined && path.length > budget.maxVertices;
  if (capped) {
    // Double ε until the vertex cap holds: the coarse fallback when a fine outline is too costly.
    let eps = Math.max(1, budget.maxExtra / perimeter);
    for (let k = 0; k < 40; k++, eps *= 2) {
      const o = outlineAt(lib, path, eps);
      if (o && o.path.length <= budget.maxVertices!) return o;
    }
    return original;
  }
  // Extra area grows about as perimeter × ε: start there and bisect on ε for the largest that fits.
  let lo = 0;
  let hi = (2 * budget.maxExtra) / perimeter;
  let best = original;
  for (let k = 0; k < 8 && hi >= 1; k++) {
    const eps = k === 0 ? hi / 2 : (lo + hi) / 2;
    const o = outlineAt(lib, path, eps);
    if (o && o.extra <= budget.maxExtra) {
      if (o.path.length < best.path.length) best = o;
      lo = eps;
    } else hi = eps;
  }
  return best;
}
