// Strip packing: every copy in a strip of fixed height, the strip as short as possible.
//
// 1. A first layout by bottom-left-fill (greedy.ts) in a strip long enough for everything.
// 2. Then a sequence of feasibility problems (Gardeyn, Vanden Berghe & Wauters 2025, "An
//    open-source heuristic to reboot 2D nesting research", arXiv:2509.13329; the same scheme as
//    Egeblad et al. 2007 and Umetani et al. 2009): the strip is cut a little shorter than the best
//    complete layout, the parts beyond the new end are pushed inside, and the guided local search
//    of overlap-search.ts moves parts until no two overlap. Success gives the new best layout and
//    the next cut; after a failure the search starts again from the best layout with a smaller cut.
import { loadClipper } from "@/lib/geometry/clipper";
import { Budget } from "./budget";
import { checkItems, expandCopies } from "./copies";
import { fmt } from "./format";
import type { DecoderSetup } from "./decoder";
import { greedyLayout } from "./greedy";
import { DEFAULT_SEPARATION, OverlapSearch, type Arrangement, type SeparationTuning } from "./overlap-search";
import { seededRandom } from "./random";
import { NoFitCache } from "./no-fit-cache";
import { bounds, boxHeight, boxWidth } from "@/lib/geometry/box";
import { rotateRing } from "@/lib/geometry/place";
import { normaliseRing, ringArea } from "@/lib/geometry/ring";
import { scaleForExtent } from "./scale";
import { shapesWithinBudget } from "./outline-levels";
import type { Placement, StripNestInput, StripNestResult } from "./types";

/** Tuning of the search; the defaults are what the benchmarks were measured with. */
export interface StripTuning {
  /** First cut, as a share of the best length, and the smallest cut. */
  firstShrink: number;
  minShrink: number;
  /** Factor on the cut after a failed attempt. */
  shrinkDecay: number;
  /** Part rotations evaluated without a new lowest overlap before an attempt at a length is given up. */
  maxStall: number;
  separation: SeparationTuning;
  /** After a failed attempt, the next starts from the best layout with this many swaps. */
  swapsAfterFailure: number;
}

export const DEFAULT_STRIP_TUNING: StripTuning = {
  firstShrink: 0.02,
  minShrink: 0.001,
  shrinkDecay: 0.7,
  maxStall: 3000,
  separation: DEFAULT_SEPARATION,
  swapsAfterFailure: 1,
};

/** The overlap search keeps n × n pair tables; above this many copies the first layout is returned. */
const MAX_SEARCH_COPIES = 1500;

export async function nestStrip(
  input: StripNestInput,
  tuning: StripTuning = DEFAULT_STRIP_TUNING,
): Promise<StripNestResult> {
  const budget = new Budget(input.seconds, input.signal, input.maxIterations, input.onProgress);
  checkItems(input.items);
  const height = input.height;
  const spacing = input.spacing ?? 0;
  if (!(height > 0) || !Number.isFinite(height)) throw new Error("The strip height must be a positive number");
  if (!(spacing >= 0) || !Number.isFinite(spacing)) throw new Error("The spacing must be zero or a positive number");
  const items = input.items.map((it) => ({ ...it, polygon: normaliseRing(it.polygon) }));
  const copies = expandCopies(items);
  const total = copies.length;
  const boxes = items.map((it) => it.rotations.map((r) => bounds(rotateRing(it.polygon, r))));

  // Rotations that fit across the strip; an item with none cannot be nested at all.
  const usable = items.map((_, i) =>
    boxes[i].map((b, k) => (boxHeight(b) <= height * (1 + 1e-9) ? k : -1)).filter((k) => k >= 0),
  );
  usable.forEach((ks, i) => {
    if (ks.length > 0) return;
    const b = boxes[i][0];
    throw new Error(
      `${items[i].id} is ${fmt(boxWidth(b))} × ${fmt(boxHeight(b))}; it does not fit across the strip (${fmt(height)}) in any allowed rotation`,
    );
  });
  if (total === 0)
    return {
      utilisation: 0,
      length: 0,
      placed: 0,
      seconds: budget.elapsed(),
      iterations: 0,
      cancelled: budget.aborted,
      ended: budget.aborted ? "cancelled" : "time",
      timings: { firstLayout: 0, noFitPolygons: 0 },
      outlines: [],
      placements: [],
    };

  const lib = await loadClipper();
  const area = items.map((it) => ringArea(it.polygon));
  const partArea = copies.reduce((s, c) => s + area[c.item], 0);
  const widthOf = (i: number) => Math.min(...usable[i].map((k) => boxWidth(boxes[i][k]))) + spacing;
  const sumWidths = copies.reduce((s, c) => s + widthOf(c.item), 0);
  // The first layout's strip: long enough in practice, short enough for a fine integer scale.
  // (Bottom-left-fill alone packs well over 2/3 of the area, so 1.5 × area / height plus the widest
  // part is enough; if not, the strip is doubled, then made long enough for anything.)
  const bound = Math.min(sumWidths, (1.5 * partArea) / height + Math.max(...items.map((_, i) => widthOf(i))));
  for (const length of new Set([bound, Math.min(2 * bound, sumWidths), sumWidths])) {
    const S = scaleForExtent(Math.max(height, length) + spacing);
    const { set } = shapesWithinBudget(lib, items, S, spacing, input.seconds);
    const nfps = new NoFitCache(lib, set);
    const half = Math.round((spacing / 2) * S);
    const containerFor = (len: number) => ({
      minX: -half,
      minY: -half,
      maxX: Math.round(len * S) + half,
      maxY: Math.round(height * S) + half,
    });
    const setup: DecoderSetup = { lib, set, nfps, copies, container: containerFor(length), maxBins: 1 };
    const order = copies.map((_, i) => i).sort((a, b) => area[copies[b].item] - area[copies[a].item] || a - b);
    const first = await greedyLayout(setup, order, (copy) => usable[copies[copy].item], budget);
    if (first.decoded.unplacedCount > 0) continue;
    const firstLayout = budget.elapsed();

    const right = set.shapes.map((sh) => boxes[sh.item][items[sh.item].rotations.indexOf(sh.rotation)].maxX);
    const lengthOf = (arr: Arrangement) => Math.max(...arr.shape.map((sh, c) => arr.x[c] / S + right[sh]));
    let best: Arrangement = { shape: new Array(total), x: new Array(total), y: new Array(total) };
    first.decoded.steps.forEach((st, k) => {
      const c = first.seq[k].copy;
      [best.shape[c], best.x[c], best.y[c]] = [st.shape, st.x, st.y];
    });
    let bestLength = lengthOf(best);

    const rng = seededRandom(input.seed ?? 1);
    const shapesOf = items.map((_, i) => usable[i].map((k) => set.shapeOf[i][k]));
    let shrink = tuning.firstShrink;
    let failed = false;
    const pause = () =>
      budget.pause(() => ({
        bestUtilisation: partArea / (height * bestLength),
        placed: total,
        total,
        message: `strip length ${fmt(bestLength)}`,
      }));
    // No layout is shorter than the area over the height, nor than the widest part at its narrowest.
    const lowerBound = Math.max(partArea / height, ...copies.map((c) => widthOf(c.item) - spacing));
    while (!budget.done() && total <= MAX_SEARCH_COPIES && bestLength > lowerBound * (1 + 1e-9)) {
      const target = Math.max(lowerBound, bestLength * (1 - shrink));
      const search = new OverlapSearch(
        { lib, set, nfps, copies, shapesOf, container: containerFor(target), rng },
        best,
        tuning.separation,
      );
      if (failed) for (let k = 0; k < tuning.swapsAfterFailure; k++) search.swapTwo();
      const ok = await search.run(budget, tuning.maxStall, pause);
      failed = !ok;
      if (ok) {
        best = search.a;
        bestLength = lengthOf(best);
      } else shrink = Math.max(tuning.minShrink, shrink * tuning.shrinkDecay);
    }

    const placements: Placement[] = best.shape.map((shape, c) => ({
      id: items[copies[c].item].id,
      copy: copies[c].index,
      rotation: set.shapes[shape].rotation,
      x: best.x[c] / S,
      y: best.y[c] / S,
    }));
    const result: StripNestResult = {
      utilisation: partArea / (height * bestLength),
      length: bestLength,
      placed: total,
      seconds: budget.elapsed(),
      iterations: budget.iterations,
      cancelled: budget.aborted,
      ended: budget.aborted ? "cancelled" : budget.outOfIterations ? "iterations" : "time",
      timings: { firstLayout, noFitPolygons: nfps.seconds },
      outlines: set.outlines,
      placements,
    };
    budget.report({ fraction: 1, bestUtilisation: result.utilisation, placed: total, total, message: "done" });
    return result;
  }
  throw new Error("Internal error: bottom-left-fill left copies out of an unbounded strip");
}
