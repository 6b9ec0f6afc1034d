// Turns a placement sequence into a layout: each copy, in order and in the rotation its gene names,
// goes to the first container where bottom-left-fill finds it a place (first fit over sheets, as in
// Burke et al. 2006's multi-sheet use of BLF); a copy that fits nowhere is left out and counted.
// Neighbouring sequences share a prefix, so a decode can start from the first changed position and
// copy the earlier placements from the previous decode instead of searching for them again.
import type { Box } from "@/lib/geometry/box";
import type { ClipperLib } from "@/lib/geometry/clipper";
import { Bin } from "./bottom-left-fill";
import type { NoFitCache } from "./no-fit-cache";
import type { ShapeSet } from "./shapes";

export interface Gene {
  /** Index into the list of copies. */
  copy: number;
  /** Index into the item's allowed rotations. */
  rot: number;
}

export interface Copy {
  item: number;
  /** 0-based copy index within the item. */
  index: number;
}

/** Where one gene ended up: a bin and a position, or bin = -1 when it did not fit. */
export interface Step {
  bin: number;
  shape: number;
  x: number;
  y: number;
}

export interface Decoded {
  steps: Step[];
  bins: Bin[];
  /** Total area (in input units²) of the copies left out. */
  unplacedArea: number;
  unplacedCount: number;
}

export interface DecoderSetup {
  lib: ClipperLib;
  set: ShapeSet;
  nfps: NoFitCache;
  copies: Copy[];
  /** Usable region of every container, integer steps. */
  container: Box;
  maxBins: number;
}

export function decode(setup: DecoderSetup, seq: readonly Gene[], from = 0, previous?: Decoded): Decoded {
  const { lib, set, nfps, copies, container, maxBins } = setup;
  const bins: Bin[] = [];
  const steps: Step[] = [];
  let unplacedArea = 0;
  let unplacedCount = 0;
  const openBin = () => {
    const b = new Bin(lib, set, nfps, container);
    bins.push(b);
    return b;
  };
  const start = previous ? Math.min(from, previous.steps.length) : 0;
  for (let i = 0; i < start; i++) {
    const s = previous!.steps[i];
    steps.push(s);
    if (s.bin < 0) {
      unplacedArea += set.itemArea[copies[seq[i].copy].item];
      unplacedCount++;
      continue;
    }
    while (bins.length <= s.bin) openBin();
    bins[s.bin].place(s.shape, s);
  }
  for (let i = start; i < seq.length; i++) {
    const g = seq[i];
    const item = copies[g.copy].item;
    const shape = set.shapeOf[item][g.rot];
    let step: Step = { bin: -1, shape, x: 0, y: 0 };
    for (let b = 0; b <= bins.length && b < maxBins; b++) {
      const bin = b < bins.length ? bins[b] : openBin();
      const at = bin.bestPosition(shape);
      if (at) {
        bin.place(shape, at);
        step = { bin: b, shape, x: at.x, y: at.y };
        break;
      }
      if (bin.placed.length === 0) break; // it does not fit an empty container: no other will do
    }
    while (bins.length && bins[bins.length - 1].placed.length === 0) bins.pop();
    if (step.bin < 0) {
      unplacedArea += set.itemArea[item];
      unplacedCount++;
    }
    steps.push(step);
  }
  return { steps, bins, unplacedArea, unplacedCount };
}
