// Penetration depth from a no-fit polygon: when B's reference point lies inside NFP(A, B), the
// shortest translation that separates the two shapes is the distance from that point to the NFP's
// boundary (Imamichi, Yagiura & Nagamochi 2009, "An iterated local search algorithm based on
// nonlinear programming for the irregular strip packing problem", Discrete Optimization
// 6(4):345–361, §3). Zero outside or on the boundary.
import type { Nfp } from "./no-fit-cache";

/** Depth of point (px, py), relative to the NFP's own frame, in integer steps. */
export function penetrationDepth(nfp: Nfp, px: number, py: number): number {
  const b = nfp.box;
  if (px <= b.minX || px >= b.maxX || py <= b.minY || py >= b.maxY) return 0;
  const e = nfp.edges;
  let inside = false;
  for (let k = 0; k < e.length; k += 4) {
    const y1 = e[k + 1];
    const y2 = e[k + 3];
    if (y1 > py !== y2 > py) {
      const x1 = e[k];
      const xCross = x1 + ((py - y1) * (e[k + 2] - x1)) / (y2 - y1);
      if (px < xCross) inside = !inside;
    }
  }
  if (!inside) return 0;
  let best = Infinity;
  for (let k = 0; k < e.length; k += 4) {
    const x1 = e[k],
      y1 = e[k + 1];
    const dx = e[k + 2] - x1,
      dy = e[k + 3] - y1;
    const wx = px - x1,
      wy = py - y1;
    const len2 = dx * dx + dy * dy;
    let t = len2 > 0 ? (wx * dx + wy * dy) / len2 : 0;
    t = t < 0 ? 0 : t > 1 ? 1 : t;
    const ex = wx - t * dx,
      ey = wy - t * dy;
    const d2 = ex * ex + ey * ey;
    if (d2 < best) best = d2;
  }
  return Math.sqrt(best);
}
