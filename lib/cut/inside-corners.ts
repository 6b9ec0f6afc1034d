// Concave corners tighter than the machine can cut. A round cutter of radius r leaves a fillet of
// radius r in every inside corner (docs/fabrication.md §4.2: "a 1/4″ or 6.35 mm dia tool will create a 1/8″ or
// 3.175 radius on internal corners"); a laser or waterjet leaves about half its kerf.
// - Joints (slots, keys): relief is added (dogbones, lib/cut/dogbone.ts) wherever the radius left
//   would foul the mating part's sharp corner, i.e. when it exceeds the joint clearance.
// - Rolling surfaces (track troughs, wheel outlines): no relief, since it would break the surface
//   the wheel rolls on. A warning gives where and what radius the cutter leaves, and the fix:
//   round the wheel's corners until the track's own smallest radius is at least that.
// A corner's radius on a sampled polyline is measured over the run of consecutive concave
// vertices it spans: arc length between the first and last vertex over the turn between their
// mid-edges (a discrete curvature, as in M. P. do Carmo, "Differential Geometry of Curves and
// Surfaces", 1976, §1-5); a single vertex turning by a finite angle is a sharp corner (radius 0).
import type { Pt, SolveResult } from "@/lib/track";
import { addDogbones, reflexVertices } from "./dogbone";
import { insideRadius, type CutSettings } from "./settings";
import type { CutWarning } from "./types";
import type { Ring } from "@/lib/geometry/ring";
import { fmtLen } from "./units";

/** A vertex turning by more than this (radians) counts as a corner, not a sampled bend. */
export const SHARP_TURN = (20 * Math.PI) / 180;

export interface ConcaveCorner {
  /** The vertex of largest turn in the corner. */
  index: number;
  at: Pt;
  /** The corner's radius of curvature; 0 for a sharp corner. */
  radius: number;
}

function signedTurn(a: Pt, b: Pt, c: Pt): number {
  const a1 = Math.atan2(b[1] - a[1], b[0] - a[0]);
  const a2 = Math.atan2(c[1] - b[1], c[0] - b[0]);
  let d = a2 - a1;
  while (d > Math.PI) d -= 2 * Math.PI;
  while (d < -Math.PI) d += 2 * Math.PI;
  return d;
}

/**
 * Concave corners of radius under `limit`. `material` says on which side of the direction of travel
 * the solid is: "left" for a counter-clockwise outer ring, "right" for a top surface read left to
 * right with the solid below it.
 */
export function concaveCorners(
  points: readonly Pt[],
  opts: { closed: boolean; material: "left" | "right"; limit: number },
): ConcaveCorner[] {
  const n = points.length;
  const sign = opts.material === "left" ? -1 : 1;
  const first = opts.closed ? 0 : 1;
  const last = opts.closed ? n - 1 : n - 2;
  const len = (i: number, j: number) => Math.hypot(points[j][0] - points[i][0], points[j][1] - points[i][1]);
  const at = (i: number) => (i + n) % n;
  const tight: boolean[] = new Array(n).fill(false);
  const phi: number[] = new Array(n).fill(0);
  for (let i = first; i <= last; i++) {
    const t = sign * signedTurn(points[at(i - 1)], points[i], points[at(i + 1)]);
    phi[i] = t;
    if (t <= 1e-12) continue;
    const local = (len(at(i - 1), i) + len(i, at(i + 1))) / 2 / t;
    tight[i] = t > SHARP_TURN || local < opts.limit;
  }
  // Visit the vertices in one pass; a closed ring starts just after a vertex that is not tight, so
  // no corner is split by the wrap.
  let order: number[] = [];
  for (let i = first; i <= last; i++) order.push(i);
  if (opts.closed) {
    const s = tight.indexOf(false);
    if (s < 0) return [];
    order = order.map((_, k) => at(s + 1 + k));
  }
  const out: ConcaveCorner[] = [];
  let k = 0;
  while (k < order.length) {
    if (!tight[order[k]]) {
      k++;
      continue;
    }
    const run: number[] = [];
    while (k < order.length && tight[order[k]]) run.push(order[k++]);
    let best = run[0];
    let total = 0;
    let arc = 0;
    for (let j = 0; j < run.length; j++) {
      total += phi[run[j]];
      if (phi[run[j]] > phi[best]) best = run[j];
      if (j > 0) arc += len(run[j - 1], run[j]);
    }
    let radius: number;
    if (run.length === 1)
      radius = phi[best] > SHARP_TURN ? 0 : (len(at(best - 1), best) + len(best, at(best + 1))) / 2 / phi[best];
    else {
      const inner = total - (phi[run[0]] + phi[run[run.length - 1]]) / 2;
      radius = run.some((j) => phi[j] > SHARP_TURN) || inner <= 0 ? 0 : arc / inner;
    }
    if (radius < opts.limit) out.push({ index: best, at: points[best], radius });
  }
  return out;
}

/** Whether a joint's inside corners need dogbones: when the radius left exceeds the clearance. */
export function jointNeedsRelief(settings: CutSettings): boolean {
  return insideRadius(settings) > settings.joint.clearance;
}

/** Dogbones at a ring's reflex vertices in [from, to] (a joint's stretch of the outline), if the machine needs them. */
export function relieveJointCorners(ring: Ring, from: number, to: number, settings: CutSettings): Ring {
  if (!jointNeedsRelief(settings)) return ring;
  return addDogbones(ring, reflexVertices(ring, from, to), insideRadius(settings)).ring;
}

const list = (xs: number[]) => {
  const shown = xs.slice(0, 12).map((x) => Number(x.toFixed(1)));
  return `${shown.join(", ")}${xs.length > shown.length ? `, … (${xs.length} in all)` : ""}`;
};

/** The run's rolling surface: one warning for all its concave corners the cutter rounds. */
export function trackSurfaceWarnings(
  profile: readonly Pt[],
  settings: CutSettings,
  result?: Pick<SolveResult, "check">,
): CutWarning[] {
  const r = insideRadius(settings);
  const corners = concaveCorners(profile, { closed: false, material: "right", limit: r });
  if (!corners.length) return [];
  const xs = corners.map((c) => c.at[0]);
  const sharp = corners.every((c) => c.radius === 0);
  const tool =
    settings.machine.kind === "router" ? `the ${fmtLen(settings.machine.kerf)} cutter` : `the ${settings.machine.kind}`;
  const now = result?.check.minCurvatureRadius.track;
  return [
    {
      code: "inside-corner",
      message:
        `${tool[0].toUpperCase()}${tool.slice(1)} leaves a ${fmtLen(r)} radius in ${corners.length} ${sharp ? "sharp " : "tight "}trough${corners.length > 1 ? "s" : ""} of the track ` +
        `(run x = ${list(xs)} mm). They are not relieved, since that would break the rolling surface; a sharp wheel corner would ride on the rounded trough. ` +
        `Round the wheel's corners and solve again until the track's smallest curvature radius is at least ${fmtLen(r)}` +
        `${now !== undefined ? ` (it is ${fmtLen(now)} now)` : ""}.`,
      at: xs,
    },
  ];
}

/** A wheel outline (counter-clockwise ring): concave stretches the cutter rounds. */
export function wheelSurfaceWarnings(partId: string, outline: Ring, settings: CutSettings): CutWarning[] {
  const r = insideRadius(settings);
  const corners = concaveCorners(outline, { closed: true, material: "left", limit: r });
  if (!corners.length) return [];
  const worst = Math.min(...corners.map((c) => c.radius));
  return [
    {
      code: "inside-corner",
      partId,
      message: `Wheel ${partId} has ${corners.length} concave corner${corners.length > 1 ? "s" : ""} tighter than the ${fmtLen(r)} radius the machine leaves (smallest ${fmtLen(worst)}). They are not relieved, since that would break the rolling surface; soften the design there or use a smaller cutter.`,
      at: corners.flatMap((c) => c.at),
    },
  ];
}
