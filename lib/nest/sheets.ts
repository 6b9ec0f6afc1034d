// Sheet nesting: parts onto as many stock sheets as needed, each part at least `spacing` from the
// others and `margin` inside the edges. Bottom-left-fill on no-fit polygons places the copies
// sheet by sheet in first-fit order (Burke et al. 2006); late-acceptance hill climbing (Burke &
// Bykov 2017) over the order and the rotations (moves.ts) then looks for a layout on fewer sheets,
// with the last sheet as short as possible so its offcut is as large as possible.
import { loadClipper } from "@/lib/geometry/clipper";
import { Budget } from "./budget";
import { checkItems, expandCopies } from "./copies";
import { fmt } from "./format";
import { decode, type Decoded, type DecoderSetup, type Gene } from "./decoder";
import { greedyLayout } from "./greedy";
import { innerFitRectangle } from "./inner-fit";
import { LateAcceptance } from "./late-acceptance";
import { neighbour } from "./moves";
import { NoFitCache } from "./no-fit-cache";
import { seededRandom } from "./random";
import { bounds, boxHeight, boxWidth } from "@/lib/geometry/box";
import { normaliseRing } from "@/lib/geometry/ring";
import { scaleForExtent } from "./scale";
import { buildShapes } from "./shapes";
import type { SheetNestInput, SheetNestResult, SheetPlacement } from "./types";

const HISTORY = 50;

export async function nestOnSheets(input: SheetNestInput): Promise<SheetNestResult> {
  const budget = new Budget(input.seconds, input.signal, input.maxIterations, input.onProgress);
  checkItems(input.items);
  const { width, height } = input.sheet ?? ({} as SheetNestInput["sheet"]);
  const { margin, spacing } = input;
  const units = input.units ?? "mm";
  if (!(width > 0 && height > 0 && Number.isFinite(width) && Number.isFinite(height)))
    throw new Error("The sheet width and height must be positive numbers");
  if (!(margin >= 0 && Number.isFinite(margin))) throw new Error("The edge margin must be zero or a positive number");
  if (!(spacing >= 0 && Number.isFinite(spacing)))
    throw new Error("The part spacing must be zero or a positive number");
  const maxSheets = input.maxSheets ?? Infinity;
  if (!(maxSheets >= 1)) throw new Error("maxSheets must be at least 1");

  const items = input.items.map((it) => ({ ...it, polygon: normaliseRing(it.polygon) }));
  const copies = expandCopies(items);
  const lib = await loadClipper();
  const S = scaleForExtent(Math.max(width, height) + spacing);
  const set = buildShapes(lib, items, S, spacing);
  const nfps = new NoFitCache(lib, set);
  // The inflated collision shapes may reach spacing/2 past the margin line; the parts themselves stay inside it.
  const half = Math.round((spacing / 2) * S);
  const container = {
    minX: Math.round(margin * S) - half,
    minY: Math.round(margin * S) - half,
    maxX: Math.round((width - margin) * S) + half,
    maxY: Math.round((height - margin) * S) + half,
  };
  const fitting = items.map((_, i) =>
    set.shapeOf[i].map((sh, k) => (innerFitRectangle(container, set.shapes[sh].box) ? k : -1)).filter((k) => k >= 0),
  );

  const unplaced: SheetNestResult["unplaced"] = [];
  const usableW = fmt(Math.max(0, width - 2 * margin));
  const usableH = fmt(Math.max(0, height - 2 * margin));
  const active: number[] = [];
  copies.forEach((c, k) => {
    if (fitting[c.item].length > 0) return active.push(k);
    const b = bounds(items[c.item].polygon);
    unplaced.push({
      id: items[c.item].id,
      copy: c.index,
      reason: `${items[c.item].id} is ${fmt(boxWidth(b))} × ${fmt(boxHeight(b))} ${units}; the sheet's usable area is ${usableW} × ${usableH} ${units} in every allowed rotation`,
    });
  });

  const setup: DecoderSetup = {
    lib,
    set,
    nfps,
    copies,
    container,
    maxBins: Number.isFinite(maxSheets) ? maxSheets : Math.max(1, active.length),
  };
  const sheetArea = width * height;
  const rotations = (copy: number) => fitting[copies[copy].item];
  const itemOf = (copy: number) => copies[copy].item;
  // Fewer sheets first, then the last sheet as short as possible; a copy left out costs more than a sheet.
  const cost = (d: Decoded) => {
    const last = d.bins[d.bins.length - 1];
    const lastUse = last ? (last.extentX - container.minX) / boxWidth(container) : 0;
    return d.unplacedArea / sheetArea + d.unplacedCount + Math.max(0, d.bins.length - 1) + lastUse;
  };

  const order = active.slice().sort((a, b) => set.itemArea[copies[b].item] - set.itemArea[copies[a].item] || a - b);
  let best: { seq: Gene[]; decoded: Decoded; cost: number } | null = null;
  if (order.length > 0) {
    const first = await greedyLayout(setup, order, rotations, budget);
    best = { ...first, cost: cost(first.decoded) };
    let cur = best;
    const lahc = new LateAcceptance(HISTORY, cur.cost);
    const rng = seededRandom(input.seed ?? 1);
    const placedArea = (seq: Gene[], d: Decoded) =>
      d.steps.reduce((s, st, k) => (st.bin >= 0 ? s + set.itemArea[copies[seq[k].copy].item] : s), 0);
    while (!budget.done() && order.length > 1) {
      const mv = neighbour(cur.seq, cur.decoded, rotations, itemOf, rng);
      const d = decode(setup, mv.seq, mv.from, cur.decoded);
      const c = cost(d);
      budget.iterations++;
      if (lahc.accept(c, cur.cost)) {
        cur = { seq: mv.seq, decoded: d, cost: c };
        if (c < best.cost) best = cur;
      }
      const b = best;
      await budget.pause(() => ({
        bestUtilisation: placedArea(b.seq, b.decoded) / (Math.max(1, b.decoded.bins.length) * sheetArea),
        placed: b.decoded.steps.length - b.decoded.unplacedCount,
        total: copies.length,
        message: `${b.decoded.bins.length} sheet(s)`,
      }));
    }
  }

  const sheets: SheetNestResult["sheets"] = [];
  let placedArea = 0;
  if (best) {
    const b = best;
    b.decoded.bins.forEach((_, index) => sheets.push({ index, utilisation: 0, placements: [] }));
    b.decoded.steps.forEach((st, k) => {
      const c = copies[b.seq[k].copy];
      const it = items[c.item];
      if (st.bin < 0) {
        unplaced.push({
          id: it.id,
          copy: c.index,
          reason: `${it.id} (copy ${c.index + 1}) found no room on the ${maxSheets} sheet(s) allowed`,
        });
        return;
      }
      const p: SheetPlacement = {
        id: it.id,
        copy: c.index,
        rotation: set.shapes[st.shape].rotation,
        x: st.x / S,
        y: st.y / S,
        sheet: st.bin,
      };
      sheets[st.bin].placements.push(p);
      sheets[st.bin].utilisation += set.itemArea[c.item] / sheetArea;
      placedArea += set.itemArea[c.item];
    });
  }
  for (const sh of sheets) sh.placements.sort((a, b) => (a.id < b.id ? -1 : a.id > b.id ? 1 : a.copy - b.copy));
  unplaced.sort((a, b) => (a.id < b.id ? -1 : a.id > b.id ? 1 : a.copy - b.copy));
  const result: SheetNestResult = {
    sheets,
    utilisation: sheets.length ? placedArea / (sheets.length * sheetArea) : 0,
    unplaced,
    seconds: budget.elapsed(),
    cancelled: budget.aborted,
  };
  budget.report({
    fraction: 1,
    bestUtilisation: result.utilisation,
    placed: copies.length - unplaced.length,
    total: copies.length,
    message: "done",
  });
  return result;
}
