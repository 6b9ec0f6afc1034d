// From the shapes a reader found to what the engine takes (lib/track/spec.ts):
//  wheel: one closed loop, no repeated closing point (the engine drops one if present; we never
//         send it), counter-clockwise in the y-up frame, simple (no crossings), 3 … 20 000 points.
//  track: one open polyline with x strictly increasing (the engine's profile rule), ending at the
//         height it starts (within 1e-6 of the period, as the engine checks), 2 … 20 000 points.
// Units are converted last (mm ↔ in at 25.4 mm per inch, exact by definition), so the tolerance
// applies in the file's own units.

import { fail, fmt, fmtPt, MAX_OUTPUT_POINTS, type Pt, type ReadResult, type Subpath, type Units } from "./common";
import { boundsOf, centroid, dist, selfIntersection, signedArea, starShapedAbout, type Bounds } from "./geometry";

export interface Finished {
  points: Pt[];
  closed: boolean;
  units: Units;
  notes: string[];
  bounds: Bounds;
}

export interface FinishOptions {
  want: "wheel" | "track";
  tolerance: number;
  units?: "mm" | "in";
}

function dedupe(points: Pt[], wrap: boolean): Pt[] {
  if (points.length === 0) return points;
  const b = boundsOf(points);
  const eps =
    1e-12 * Math.max(Math.abs(b.minX), Math.abs(b.maxX), Math.abs(b.minY), Math.abs(b.maxY), b.width, b.height);
  const out: Pt[] = [points[0]];
  for (let i = 1; i < points.length; i++) if (dist(points[i], out[out.length - 1]) > eps) out.push(points[i]);
  while (wrap && out.length > 1 && dist(out[0], out[out.length - 1]) <= eps) out.pop();
  return out;
}

function flattenedNote(s: Subpath, tol: number, units: Units): string | null {
  const parts: string[] = [];
  if (s.arcs) parts.push(`${s.arcs} arc${s.arcs === 1 ? "" : "s"}`);
  if (s.curves) parts.push(`${s.curves} Bézier curve${s.curves === 1 ? "" : "s"}`);
  if (!parts.length) return null;
  return `${parts.join(" and ")} flattened to a chord tolerance of ${fmt(tol)}${units === "unknown" ? " (file units)" : ` ${units}`}`;
}

const checkFinite = (pts: Pt[], label: string) => {
  if (!pts.every(([x, y]) => Number.isFinite(x) && Number.isFinite(y)))
    fail(`${label} has coordinates too large to work with.`);
};

function wheel(read: ReadResult, tol: number, notes: string[]): { points: Pt[]; chosen: Subpath } {
  const closed: Array<{ s: Subpath; points: Pt[]; area: number }> = [];
  const open: Array<{ s: Subpath; gap: number; a: Pt; b: Pt }> = [];
  for (const s of read.subpaths) {
    checkFinite(s.points, s.label);
    let pts = dedupe(s.points, false);
    if (pts.length < 2) continue;
    const a = pts[0];
    const b = pts[pts.length - 1];
    const gap = dist(a, b);
    if (!(s.closed || s.vertexList) && gap > tol) {
      open.push({ s, gap, a, b });
      continue;
    }
    if (!s.closed && !s.vertexList && gap > 0)
      notes.push(`closed ${s.label}: its ends were ${fmt(gap)} apart, within the tolerance`);
    if (s.vertexList) notes.push("the CSV points are taken as a closed polygon: the last point joins the first");
    if (gap <= tol && pts.length > 2) pts = pts.slice(0, -1); // drop the repeated closing point
    pts = dedupe(pts, true);
    if (pts.length >= 3) closed.push({ s, points: pts, area: signedArea(pts) });
  }
  if (!closed.length) {
    if (open.length) {
      const o = open.reduce((p, q) => (q.s.points.length > p.s.points.length ? q : p));
      fail(
        `The outline is open: ${o.s.label} ends ${fmt(o.gap)} from where it starts (${fmtPt(o.a)} and ${fmtPt(o.b)}), more than the tolerance ${fmt(tol)}; a wheel needs a closed loop.`,
      );
    }
    fail("No closed outline was found in the file (nothing with at least three distinct points).");
  }
  const best = closed.reduce((p, q) => (Math.abs(q.area) > Math.abs(p.area) ? q : p));
  if (closed.length > 1)
    notes.push(
      `took the largest closed shape, ${best.s.label}; ${closed.length - 1} other closed shape${closed.length === 2 ? " was" : "s were"} ignored`,
    );
  if (open.length)
    notes.push(`${open.length} open shape${open.length === 1 ? " was" : "s were"} ignored (a wheel is a closed loop)`);
  let pts = best.points;
  const x = selfIntersection(pts);
  if (x)
    fail(
      `The outline crosses or touches itself near ${fmtPt(x.at)} (the edges that start at its points ${x.i} and ${x.j}, counted from 0 in ${best.s.label}); a wheel outline must be a simple loop.`,
    );
  if (best.area === 0) fail(`${best.s.label} encloses no area.`);
  if (best.area < 0) {
    pts = [pts[0], ...pts.slice(1).reverse()];
    notes.push("point order reversed to run counter-clockwise");
  }
  return { points: pts, chosen: best.s };
}

function track(read: ReadResult, tol: number, notes: string[]): { points: Pt[]; chosen: Subpath } {
  const open = read.subpaths.filter((s) => !s.closed);
  const closedCount = read.subpaths.length - open.length;
  if (!open.length)
    fail(
      closedCount
        ? "A track profile must be an open polyline (one period, left to right); the file holds only closed shapes."
        : "No polyline was found in the file for the track profile.",
    );
  for (const s of open) checkFinite(s.points, s.label);
  const extent = (s: Subpath) => {
    const b = boundsOf(s.points);
    return b.width;
  };
  const best = open.reduce((p, q) => (extent(q) > extent(p) ? q : p));
  if (open.length > 1)
    notes.push(
      `took the widest open shape, ${best.label}; ${open.length - 1} other open shape${open.length === 2 ? " was" : "s were"} ignored`,
    );
  if (closedCount)
    notes.push(`${closedCount} closed shape${closedCount === 1 ? " was" : "s were"} ignored (a track profile is open)`);
  let pts = dedupe(best.points, false);
  if (pts.length < 2) fail(`${best.label} has fewer than two distinct points.`);
  if (pts[pts.length - 1][0] < pts[0][0]) {
    pts = pts.slice().reverse();
    notes.push("point order reversed to run left to right");
  }
  for (let i = 1; i < pts.length; i++) {
    const [x0, y0] = pts[i - 1];
    const [x1, y1] = pts[i];
    if (x1 > x0) continue;
    if (x1 === x0)
      fail(
        `The track profile has a vertical step at x = ${fmt(x0)} (from y = ${fmt(y0)} to ${fmt(y1)}, point ${i}); x must increase from point to point.`,
      );
    fail(
      `The track profile doubles back at x = ${fmt(x0)} (point ${i} goes back to x = ${fmt(x1)}); a profile must run left to right, one y for each x.`,
    );
  }
  const P = pts[pts.length - 1][0] - pts[0][0];
  const y0 = pts[0][1];
  const y1 = pts[pts.length - 1][1];
  if (Math.abs(y1 - y0) > 1e-6 * P) {
    if (Math.abs(y1 - y0) > tol)
      fail(
        `One period of track must end at the height it starts: y = ${fmt(y0)} at x = ${fmt(pts[0][0])} but y = ${fmt(y1)} at x = ${fmt(pts[pts.length - 1][0])}.`,
      );
    pts[pts.length - 1] = [pts[pts.length - 1][0], y0];
    notes.push(
      `the last point's height was set to the first's (they differed by ${fmt(Math.abs(y1 - y0))}, within the tolerance)`,
    );
  }
  return { points: pts, chosen: best };
}

export function finish(read: ReadResult, opts: FinishOptions): Finished {
  const notes = [...read.notes];
  const { points: raw, chosen } =
    opts.want === "wheel" ? wheel(read, opts.tolerance, notes) : track(read, opts.tolerance, notes);
  const flat = flattenedNote(chosen, opts.tolerance, read.units);
  if (flat) notes.push(flat);
  let points = raw;
  let units = read.units;
  if (opts.units && units !== "unknown" && opts.units !== units) {
    const k = units === "mm" ? 1 / 25.4 : 25.4;
    points = points.map(([x, y]) => [x * k, y * k] as Pt);
    notes.push(`converted from ${units} to ${opts.units} (25.4 mm per inch)`);
    units = opts.units;
  } else if (opts.units && units === "unknown") {
    units = opts.units;
    notes.push(`the file does not state its units; the numbers are taken as ${opts.units}, as asked`);
  }
  const min = opts.want === "wheel" ? 3 : 2;
  if (points.length < min)
    fail(
      `The ${opts.want === "wheel" ? "outline" : "profile"} has ${points.length} distinct points; it needs at least ${min}.`,
    );
  if (points.length > MAX_OUTPUT_POINTS)
    fail(
      `The ${opts.want === "wheel" ? "outline" : "profile"} has ${points.length.toLocaleString("en-US")} points after flattening, more than the engine's limit of ${MAX_OUTPUT_POINTS.toLocaleString("en-US")}; use a larger tolerance or a simpler drawing.`,
    );
  if (opts.want === "wheel") {
    const c = centroid(points);
    if (!starShapedAbout(points, c).ok)
      notes.push(
        `the outline is not star-shaped about its area centroid ${fmtPt([c.x, c.y])}: place the axle where every ray from it crosses the outline once`,
      );
  } else {
    notes.push(
      `period = ${fmt(points[points.length - 1][0] - points[0][0])}${units === "unknown" ? "" : ` ${units}`} (last x − first x)`,
    );
  }
  return { points, closed: opts.want === "wheel", units, notes, bounds: boundsOf(points) };
}
