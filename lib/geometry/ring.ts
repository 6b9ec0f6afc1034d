// Ring basics in plain floating point, shared by the part builder (lib/cut) and the nester
// (lib/nest): the bounding box type and the shoelace area (positive for a counter-clockwise ring).
import type { Pt } from "@/lib/track";

export interface Box {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

/** Shoelace formula: positive for a counter-clockwise ring. */
export function signedArea(ring: readonly Pt[]): number {
  let s = 0;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) s += ring[j][0] * ring[i][1] - ring[i][0] * ring[j][1];
  return s / 2;
}

export function ringArea(ring: readonly Pt[]): number {
  return Math.abs(signedArea(ring));
}
