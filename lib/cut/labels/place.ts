// Finds room for a label: an axis-aligned box that lies inside the part's outline, outside its
// holes and clear of its drill holes by a margin. Candidate positions are a grid over the part,
// tried nearest the preferred point first; a box fits when its corners are inside the outline and
// outside every hole and no edge of the outline or of a hole crosses it (point-in-polygon and
// segment-rectangle tests, O'Rourke, "Computational Geometry in C", 1998, §7.4).
import type { Pt } from "@/lib/geometry/point";
import { bounds, boxRing, inflate, intersection, type Box } from "@/lib/geometry/box";
import { pointInRing } from "@/lib/geometry/ring";
import type { DrillHole, Region } from "../types";

function segmentHitsBox(a: Pt, b: Pt, r: Box): boolean {
  if (
    Math.max(a[0], b[0]) < r.minX ||
    Math.min(a[0], b[0]) > r.maxX ||
    Math.max(a[1], b[1]) < r.minY ||
    Math.min(a[1], b[1]) > r.maxY
  )
    return false;
  const inside = (p: Pt) => p[0] >= r.minX && p[0] <= r.maxX && p[1] >= r.minY && p[1] <= r.maxY;
  if (inside(a) || inside(b)) return true;
  // Liang–Barsky clipping of the segment against the box.
  let t0 = 0;
  let t1 = 1;
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const clip = (p: number, q: number) => {
    if (p === 0) return q >= 0;
    const t = q / p;
    if (p < 0) {
      if (t > t1) return false;
      if (t > t0) t0 = t;
    } else {
      if (t < t0) return false;
      if (t < t1) t1 = t;
    }
    return true;
  };
  return (
    clip(-dx, a[0] - r.minX) &&
    clip(dx, r.maxX - a[0]) &&
    clip(-dy, a[1] - r.minY) &&
    clip(dy, r.maxY - a[1]) &&
    t0 <= t1
  );
}

function ringHitsBox(ring: Pt[], r: Box): boolean {
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) if (segmentHitsBox(ring[j], ring[i], r)) return true;
  return false;
}

export function boxFits(box: Box, region: Region, drill: DrillHole[], margin: number): boolean {
  const r = inflate(box, margin);
  const corners = boxRing(r);
  if (!corners.every((c) => pointInRing(c, region.outer))) return false;
  if (ringHitsBox(region.outer, r)) return false;
  for (const h of region.holes) {
    if (ringHitsBox(h, r)) return false;
    if (pointInRing(corners[0], h)) return false;
  }
  for (const d of drill) {
    const qx = Math.max(r.minX, Math.min(d.x, r.maxX));
    const qy = Math.max(r.minY, Math.min(d.y, r.maxY));
    if (Math.hypot(d.x - qx, d.y - qy) < d.diameter / 2) return false;
  }
  return true;
}

/** The lower-left corner of a w × h box that fits (inside `within` too, if given), nearest `prefer` (the box's centre), or null. */
export function findSpot(
  region: Region,
  drill: DrillHole[],
  w: number,
  h: number,
  opts: { margin: number; prefer: Pt; step?: number; maxTries?: number; within?: Box },
): Pt | null {
  const r = bounds(region.outer);
  const b = opts.within ? intersection(r, opts.within) : r;
  const step = opts.step ?? Math.max(0.5, Math.min(w, h) / 2);
  const cx0 = b.minX + w / 2 + opts.margin;
  const cx1 = b.maxX - w / 2 - opts.margin;
  const cy0 = b.minY + h / 2 + opts.margin;
  const cy1 = b.maxY - h / 2 - opts.margin;
  if (cx1 < cx0 || cy1 < cy0) return null;
  const cands: Pt[] = [];
  for (let x = cx0; x <= cx1 + 1e-9; x += step) for (let y = cy0; y <= cy1 + 1e-9; y += step) cands.push([x, y]);
  // The preferred point itself first, clamped into range.
  cands.push([Math.min(cx1, Math.max(cx0, opts.prefer[0])), Math.min(cy1, Math.max(cy0, opts.prefer[1]))]);
  const d2 = (p: Pt) => (p[0] - opts.prefer[0]) ** 2 + (p[1] - opts.prefer[1]) ** 2;
  cands.sort((p, q) => d2(p) - d2(q));
  const tries = Math.min(cands.length, opts.maxTries ?? 20000);
  for (let i = 0; i < tries; i++) {
    const [x, y] = cands[i];
    const box = { minX: x - w / 2, minY: y - h / 2, maxX: x + w / 2, maxY: y + h / 2 };
    if (boxFits(box, region, drill, opts.margin)) return [box.minX, box.minY];
  }
  return null;
}
