// A neck-and-head key of our own proportions, cut into the base band below the rolling surface, so
// the rolling surface itself is one straight vertical cut and stays continuous across the joint.
// The left segment carries the key (a neck of width w and length n, then a head 2w wide and n
// long), the right segment the slot: the key grown by the clearance c on every side but the
// shared vertical face. Its inside corners get dogbones (lib/cut/inside-corners.ts) so the
// mating sharp corners seat. The head is wider than the neck, so the joint carries tension along
// the run as well as shear (the dovetail and "bowtie" keys of joinery work the same way).
import type { Pt } from "@/lib/geometry/point";
import type { CutSettings } from "../settings";

export interface KeyShape {
  /** Neck width and length, head width and length, clearance. */
  w: number;
  n: number;
  H: number;
  h: number;
  c: number;
  /** How far the key (or the slot) reaches past the station. */
  reach: number;
}

export function keyShape(joint: CutSettings["joint"]): KeyShape {
  const w = joint.keyWidth;
  const n = joint.keyDepth / 2;
  return { w, n, H: 2 * w, h: joint.keyDepth - n, c: joint.clearance, reach: joint.keyDepth + joint.clearance };
}

/** The left segment's end at station s: bottom to top, strictly between the base and the rolling surface. */
export function keyTongue(s: number, yc: number, k: KeyShape): Pt[] {
  const { w, n, H, h } = k;
  return [
    [s, yc - w / 2],
    [s + n, yc - w / 2],
    [s + n, yc - H / 2],
    [s + n + h, yc - H / 2],
    [s + n + h, yc + H / 2],
    [s + n, yc + H / 2],
    [s + n, yc + w / 2],
    [s, yc + w / 2],
  ];
}

/** The right segment's end at station s: top to bottom, the key grown by the clearance. */
export function keySlot(s: number, yc: number, k: KeyShape): Pt[] {
  const { w, n, H, h, c } = k;
  return [
    [s, yc + w / 2 + c],
    [s + n - c, yc + w / 2 + c],
    [s + n - c, yc + H / 2 + c],
    [s + n + h + c, yc + H / 2 + c],
    [s + n + h + c, yc - H / 2 - c],
    [s + n - c, yc - H / 2 - c],
    [s + n - c, yc - w / 2 - c],
    [s, yc - w / 2 - c],
  ];
}
