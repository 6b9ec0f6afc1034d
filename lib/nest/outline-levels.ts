// How coarse the packed outlines must be for the no-fit polygons to fit the run's time budget. The
// dearest no-fit polygon of the set is timed on this machine, the whole set's cost estimated from the
// outlines' convex pieces and vertices, and the outlines coarsened step by step (each still
// containing its part, with its extra area reported) until that estimate fits a share of the budget.
// The fine outlines are kept whenever they fit.
import type { ClipperLib } from "@/lib/geometry/clipper";
import { clipper } from "@/lib/geometry/clipper";
import { convexParts } from "./convex-parts";
import { noFitPolygon } from "./minkowski";
import { buildShapes, FINE_OUTLINES, type OutlinePolicy, type ShapeSet } from "./shapes";
import type { NestItem } from "./types";

/** Share of the budget the no-fit polygons may take; the search needs the rest. */
const NFP_SHARE = 0.3;

const LEVELS: OutlinePolicy[] = [
  FINE_OUTLINES,
  { maxExtraShare: 0.005, maxVertices: 96 },
  { maxExtraShare: 0.005, maxVertices: 48 },
  { maxExtraShare: 0.005, maxVertices: 24 },
  { maxExtraShare: 0.005, maxVertices: 12 },
];

const now = () => (typeof performance !== "undefined" ? performance.now() : Date.now());

/**
 * Relative cost of one no-fit polygon: every convex piece of one outline summed with every piece of
 * the other, each sum linear in the two pieces' vertices (minkowski.ts), then one union of them all.
 */
function weightOf(path: clipper.ReadonlyPath): { pieces: number; vertices: number } {
  return { pieces: convexParts(path).length, vertices: path.length };
}
const pairCost = (a: { pieces: number; vertices: number }, b: { pieces: number; vertices: number }) =>
  a.pieces * b.pieces * (a.vertices / a.pieces + b.vertices / b.pieces);

/**
 * Estimated seconds for every ordered pair's no-fit polygon: the dearest pair is computed and timed
 * here, the others scaled from it by their relative cost.
 */
export function noFitEstimate(lib: ClipperLib, set: ShapeSet): number {
  const fixed = set.shapes.map((s) => weightOf(s.stationary));
  const moving = set.shapes.map((s) => weightOf(s.orbiting));
  let total = 0;
  let worst = -1;
  let at = 0;
  for (let i = 0; i < fixed.length; i++)
    for (let j = 0; j < moving.length; j++) {
      const c = pairCost(fixed[i], moving[j]);
      total += c;
      if (c > worst) [worst, at] = [c, i * moving.length + j];
    }
  if (worst <= 0) return 0;
  const a = set.shapes[Math.floor(at / moving.length)];
  const b = set.shapes[at % moving.length];
  const t0 = now();
  noFitPolygon(lib, a.stationary, b.orbiting);
  return ((now() - t0) / 1000) * (total / worst);
}

export function shapesWithinBudget(
  lib: ClipperLib,
  items: readonly NestItem[],
  scale: number,
  spacing: number,
  seconds: number,
  holes = false,
): { set: ShapeSet; level: number } {
  let set = buildShapes(lib, items, scale, spacing, { ...LEVELS[0], holes });
  for (let level = 1; level < LEVELS.length; level++) {
    if (noFitEstimate(lib, set) <= NFP_SHARE * seconds) return { set, level: level - 1 };
    set = buildShapes(lib, items, scale, spacing, { ...LEVELS[level], holes });
  }
  return { set, level: LEVELS.length - 1 };
}
