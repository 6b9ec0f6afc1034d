// Output polylines sampled to a chord tolerance, adaptively by curvature: a segment is split while
// its sagitta — the chord error, ≈ κL²/8 for an arc of curvature κ and length L — exceeds the
// tolerance. The sagitta is measured directly at the segment's midpoint and quarter points, so
// flat stretches get few points and tight bends many, instead of a fixed count. Corners are forced
// vertices.

import { Deadline, NO_DEADLINE } from "./deadline";
import { EngineError } from "./errors";
import type { Pt } from "@/lib/geometry/point";

export type { Pt };

export interface Sampled {
  /** Parameter of each vertex. */
  u: number[];
  pts: Pt[];
}

export const MAX_OUTPUT_POINTS = 200_000;

function distToChord(p: Pt, a: Pt, b: Pt): number {
  const ex = b[0] - a[0];
  const ey = b[1] - a[1];
  const L2 = ex * ex + ey * ey;
  if (L2 === 0) return Math.hypot(p[0] - a[0], p[1] - a[1]);
  let s = ((p[0] - a[0]) * ex + (p[1] - a[1]) * ey) / L2;
  s = Math.max(0, Math.min(1, s));
  return Math.hypot(p[0] - a[0] - s * ex, p[1] - a[1] - s * ey);
}

/**
 * Samples the curve c(u) for u in [u0, u1]. `breaks` are parameters that must be vertices (corners).
 * `minSegments` segments per smooth stretch at least, so a feature cannot hide between two samples.
 */
export function sampleCurve(
  c: (u: number) => Pt,
  u0: number,
  u1: number,
  breaks: readonly number[],
  tol: number,
  opts: { minSegments?: number; deadline?: Deadline; budget?: { left: number } } = {},
): Sampled {
  const deadline = opts.deadline ?? NO_DEADLINE;
  const minSeg = opts.minSegments ?? 4;
  const budget = opts.budget ?? { left: MAX_OUTPUT_POINTS };
  const knots = [u0, ...breaks.filter((b) => b > u0 && b < u1).sort((a, b) => a - b), u1];
  const u: number[] = [u0];
  const pts: Pt[] = [c(u0)];
  const refine = (a: number, pa: Pt, b: number, pb: Pt, depth: number) => {
    deadline.check();
    const m = 0.5 * (a + b);
    const pm = c(m);
    const err = Math.max(
      distToChord(pm, pa, pb),
      distToChord(c(0.5 * (a + m)), pa, pb),
      distToChord(c(0.5 * (m + b)), pa, pb),
    );
    if (err > tol && depth < 40 && m > a && m < b) {
      // The sagitta grows as κL²/8, so cut into the number of parts that brings it under the
      // tolerance, instead of halving blindly.
      const parts = Math.min(16, Math.max(2, Math.ceil(Math.sqrt(err / tol) * 1.02)));
      let ua = a;
      let qa = pa;
      for (let i = 1; i <= parts; i++) {
        const ub = i === parts ? b : a + ((b - a) * i) / parts;
        const qb = i === parts ? pb : c(ub);
        refine(ua, qa, ub, qb, depth + 1);
        ua = ub;
        qa = qb;
      }
    } else {
      if (--budget.left < 0)
        throw new EngineError(
          "too-fine",
          `The tolerance ${tol} needs more than ${MAX_OUTPUT_POINTS} output points; use a coarser tolerance.`,
          "tolerance",
        );
      u.push(b);
      pts.push(pb);
    }
  };
  for (let k = 0; k + 1 < knots.length; k++) {
    const a = knots[k];
    const b = knots[k + 1];
    let ua = a;
    let pa = pts[pts.length - 1];
    for (let i = 1; i <= minSeg; i++) {
      const ub = i === minSeg ? b : a + ((b - a) * i) / minSeg;
      const pb = c(ub);
      refine(ua, pa, ub, pb, 0);
      ua = ub;
      pa = pb;
    }
  }
  return thin(c, u, pts, new Set(knots), tol);
}

/**
 * Bisection leaves segments between half and all of the tolerance; this pass joins neighbours
 * greedily while the exact curve — every vertex in between and the midpoint of every original
 * segment in between — stays within the tolerance of the longer chord. Corners are kept.
 */
function thin(c: (u: number) => Pt, u: number[], pts: Pt[], keep: Set<number>, tol: number): Sampled {
  const mids: Array<Pt | undefined> = new Array(u.length);
  const mid = (i: number): Pt => (mids[i] ??= c(0.5 * (u[i] + u[i + 1])));
  const outU = [u[0]];
  const outP = [pts[0]];
  let i = 0;
  while (i < u.length - 1) {
    let j = i + 1;
    while (j + 1 < u.length && !keep.has(u[j])) {
      const cand = j + 1;
      let ok = true;
      for (let k = i; k < cand && ok; k++) {
        if (k > i && distToChord(pts[k], pts[i], pts[cand]) > tol) ok = false;
        else if (distToChord(mid(k), pts[i], pts[cand]) > tol) ok = false;
      }
      if (!ok) break;
      j = cand;
    }
    outU.push(u[j]);
    outP.push(pts[j]);
    i = j;
  }
  return { u: outU, pts: outP };
}
