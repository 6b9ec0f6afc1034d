// Kerf compensation: the tool-centre paths for a part, by Clipper's polygon offset (A. Johnson's
// Clipper 6.4.2, whose offsetter follows X. Chen & S. McMains, "Polygon Offsetting by Computing
// Winding Numbers", ASME IDETC/CIE 2005, DETC2005-85513: the boundary of the ring's Minkowski sum
// with a disc). The outer ring moves out by k/2, each hole in towards
// its own inside by k/2 (docs/fabrication.md §4.1: "outer contours are offset outward by k/2 and holes inward by
// k/2"). Joins are round: at a convex corner the cutter's centre swings round the corner on an arc
// of radius k/2, which leaves the part's corner sharp; at a concave corner the centre path meets in
// a point and the part keeps a radius of k/2, the least a round cutter can leave. Work is in integer
// micrometres (SCALE_PER_MM = 1000), arcs to 1 µm.
import { clipper, fromPath, loadClipper, SCALE_PER_MM, toPath, type ClipperLib } from "@/lib/geometry/clipper";
import { cleanRing, orient, ringArea, type Ring } from "@/lib/geometry/ring";
import type { CutSettings } from "./settings";
import type { CutWarning, Part, Region } from "./types";

/** Largest departure of an offset arc from the true circle, mm. */
export const ARC_TOLERANCE = 0.001;

function offsetRing(lib: ClipperLib, ring: Ring, delta: number): Ring[] {
  const paths = lib.offsetToPaths({
    delta: delta * SCALE_PER_MM,
    arcTolerance: ARC_TOLERANCE * SCALE_PER_MM,
    offsetInputs: [
      {
        data: toPath(orient(ring, true), SCALE_PER_MM),
        joinType: clipper.JoinType.Round,
        endType: clipper.EndType.ClosedPolygon,
      },
    ],
  });
  return (paths ?? []).map((p) => cleanRing(fromPath(p, SCALE_PER_MM), 0.0015)).filter((r) => r.length >= 3);
}

export interface ToolPath extends Region {
  /** Holes the cutter cannot enter (smaller than the kerf): they vanish from the tool path. */
  lostHoles: number[];
}

/**
 * The tool-centre path of a region: outer ring grown by kerf/2 (the largest piece, should a sliver
 * split off), holes shrunk by kerf/2. Rings counter-clockwise outside, clockwise for holes.
 */
export function kerfRegion(lib: ClipperLib, region: Region, kerf: number): ToolPath {
  const d = kerf / 2;
  const outs = offsetRing(lib, region.outer, d);
  const outer = outs.sort((a, b) => ringArea(b) - ringArea(a))[0];
  const holes: Ring[] = [];
  const lostHoles: number[] = [];
  region.holes.forEach((h, i) => {
    const shrunk = offsetRing(lib, h, -d);
    if (!shrunk.length) lostHoles.push(i);
    for (const r of shrunk) holes.push(orient(r, false));
  });
  return { outer: orient(outer, true), holes, lostHoles };
}

/** Tool paths for every part, by id. */
export async function kerfParts(
  parts: Part[],
  settings: Pick<CutSettings, "machine">,
): Promise<{ paths: Map<string, ToolPath>; warnings: CutWarning[] }> {
  const lib = await loadClipper();
  const paths = new Map<string, ToolPath>();
  const warnings: CutWarning[] = [];
  for (const p of parts) {
    const t = kerfRegion(lib, p.region, settings.machine.kerf);
    if (t.lostHoles.length)
      warnings.push({
        code: "hole-too-small",
        partId: p.id,
        message: `Part ${p.id} has ${t.lostHoles.length} hole${t.lostHoles.length > 1 ? "s" : ""} smaller than the ${settings.machine.kerf} mm kerf: the cutter cannot cut ${t.lostHoles.length > 1 ? "them" : "it"}. Drill ${t.lostHoles.length > 1 ? "them" : "it"} instead.`,
      });
    paths.set(p.id, t);
  }
  return { paths, warnings };
}
