// Plain ring helpers in floating point: signed area (shoelace formula), orientation, rotation about
// the origin, bounding boxes. Rings are closed implicitly (first point not repeated).
import type { Pt } from "@/lib/track";
import type { Ring } from "@/lib/cut/types";

export { ringArea, signedArea, type Box } from "@/lib/geometry/ring";
import { signedArea, type Box } from "@/lib/geometry/ring";

/** Drops a repeated closing point and makes the ring counter-clockwise. */
export function normaliseRing(ring: readonly Pt[]): Ring {
  const out = ring.map(([x, y]) => [x, y] as Pt);
  while (out.length > 1) {
    const [a, b] = [out[0], out[out.length - 1]];
    if (a[0] !== b[0] || a[1] !== b[1]) break;
    out.pop();
  }
  if (signedArea(out) < 0) out.reverse();
  return out;
}

/** cos and sin of a rotation in degrees, exact for multiples of 90°. */
export function cosSin(degrees: number): [number, number] {
  const d = ((degrees % 360) + 360) % 360;
  if (d === 0) return [1, 0];
  if (d === 90) return [0, 1];
  if (d === 180) return [-1, 0];
  if (d === 270) return [0, -1];
  const r = (d * Math.PI) / 180;
  return [Math.cos(r), Math.sin(r)];
}

/** Rotates about (0, 0) counter-clockwise by `degrees`. */
export function rotateRing(ring: readonly Pt[], degrees: number): Ring {
  const [c, s] = cosSin(degrees);
  return ring.map(([x, y]) => [c * x - s * y, s * x + c * y] as Pt);
}

/** The absolute outline of a placed copy: rotate about the item's origin first, then translate. */
export function placeRing(ring: readonly Pt[], rotation: number, x: number, y: number): Ring {
  return rotateRing(ring, rotation).map(([px, py]) => [px + x, py + y] as Pt);
}

export function boundsOf(ring: readonly Pt[]): Box {
  const box = { minX: Infinity, minY: Infinity, maxX: -Infinity, maxY: -Infinity };
  for (const [x, y] of ring) {
    if (x < box.minX) box.minX = x;
    if (y < box.minY) box.minY = y;
    if (x > box.maxX) box.maxX = x;
    if (y > box.maxY) box.maxY = y;
  }
  return box;
}

/** Area of the part of a ring that lies at x > x0 (the ring clipped by one half-plane). */
export function areaBeyondX(ring: readonly Pt[], x0: number): number {
  const out: Pt[] = [];
  for (let i = 0, n = ring.length; i < n; i++) {
    const p = ring[i];
    const q = ring[(i + 1) % n];
    const pin = p[0] > x0;
    const qin = q[0] > x0;
    if (pin) out.push(p);
    if (pin !== qin) {
      const t = (x0 - p[0]) / (q[0] - p[0]);
      out.push([x0, p[1] + t * (q[1] - p[1])]);
    }
  }
  return out.length >= 3 ? Math.abs(signedArea(out)) : 0;
}
