// Sheet nesting: parts onto as many stock sheets as needed, each part at least `spacing` from the
// others and `margin` inside the edges. Bottom-left-fill on no-fit polygons places the copies
// sheet by sheet in first-fit order (Burke et al. 2006); late-acceptance hill climbing (Burke &
// Bykov 2017) over the order and the rotations (moves.ts) then looks for a layout on fewer sheets,
// with the last sheet as short as possible so its offcut is as large as possible. The search ends
// as soon as the layout uses as few sheets as the parts' area allows, since none can use fewer.
import type { ClipperLib } from "@/lib/geometry/clipper";
import { fromPath, loadClipper, toPath } from "@/lib/geometry/clipper";
import { bounds, boxHeight, boxWidth } from "@/lib/geometry/box";
import { normaliseRing, ringArea, type Ring } from "@/lib/geometry/ring";
import { Budget } from "./budget";
import { checkItems, expandCopies } from "./copies";
import { decode, type Decoded, type DecoderSetup, type Gene } from "./decoder";
import { fmt } from "./format";
import { greedyLayout } from "./greedy";
import { innerFitRectangle } from "./inner-fit";
import { LateAcceptance } from "./late-acceptance";
import { neighbour } from "./moves";
import { NoFitCache } from "./no-fit-cache";
import { containingOutline } from "./containing-outline";
import { shapesWithinBudget } from "./outline-levels";
import { pairItems, type PairedItems } from "./pairs";
import { seededRandom } from "./random";
import { scaleForExtent } from "./scale";
import type { NestItem, OutlineReport, SheetNestInput, SheetNestResult, SheetPlacement } from "./types";

const HISTORY = 50;

interface Frame {
  lib: ClipperLib;
  width: number;
  height: number;
  margin: number;
  spacing: number;
  units: string;
  maxSheets: number;
  seed: number;
}

/** One search over one list of items: its best layout, in that list's own ids and copies. */
interface SheetRun {
  placements: SheetPlacement[];
  sheetsUsed: number;
  unplaced: SheetNestResult["unplaced"];
  /** Part area placed, units² (the items' own, given with the list). */
  placedArea: number;
  cost: number;
  provedBest: boolean;
  /** This search stopped on its iteration cap. */
  outOfIterations: boolean;
  areaBound: number;
  firstLayout: number;
  noFitSeconds: number;
  outlines: OutlineReport[];
}

function checkFrame(input: SheetNestInput): void {
  const { width, height } = input.sheet ?? ({} as SheetNestInput["sheet"]);
  if (!(width > 0 && height > 0 && Number.isFinite(width) && Number.isFinite(height)))
    throw new Error("The sheet width and height must be positive numbers");
  if (!(input.margin >= 0 && Number.isFinite(input.margin)))
    throw new Error("The edge margin must be zero or a positive number");
  if (!(input.spacing >= 0 && Number.isFinite(input.spacing)))
    throw new Error("The part spacing must be zero or a positive number");
  if (!((input.maxSheets ?? Infinity) >= 1)) throw new Error("maxSheets must be at least 1");
}

async function searchSheets(frame: Frame, items: NestItem[], area: number[], budget: Budget): Promise<SheetRun> {
  const { lib, width, height, margin, spacing, units, maxSheets } = frame;
  const copies = expandCopies(items);
  const S = scaleForExtent(Math.max(width, height) + spacing);
  const { set } = shapesWithinBudget(lib, items, S, spacing, budget.seconds - budget.elapsed(), true);
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
  // No layout can use fewer sheets than the parts' area allows: reaching that ends the search.
  const usableArea = Math.max(0, width - 2 * margin) * Math.max(0, height - 2 * margin);
  // Net of holes: a part nested in another's hole takes none of the sheet's area.
  const netArea = items.map((it, i) => area[i] - (it.holes ?? []).reduce((sum, h) => sum + ringArea(h), 0));
  const activeArea = active.reduce((sum, k) => sum + Math.max(0, netArea[copies[k].item]), 0);
  const areaBound = active.length ? Math.max(1, Math.ceil(activeArea / usableArea - 1e-9)) : 0;
  const provedBest = (d: Decoded) => d.unplacedCount === 0 && d.bins.length <= areaBound;
  const placedAreaOf = (seq: Gene[], d: Decoded) =>
    d.steps.reduce((s, st, k) => (st.bin >= 0 ? s + area[copies[seq[k].copy].item] : s), 0);

  let best: { seq: Gene[]; decoded: Decoded; cost: number } | null = null;
  let firstLayout = 0;
  const order = active.slice().sort((a, b) => area[copies[b].item] - area[copies[a].item] || a - b);
  if (order.length > 0) {
    const first = await greedyLayout(setup, order, rotations, budget);
    best = { ...first, cost: cost(first.decoded) };
    firstLayout = budget.elapsed();
    let cur = best;
    const lahc = new LateAcceptance(HISTORY, cur.cost);
    const rng = seededRandom(frame.seed);
    while (!budget.done() && order.length > 1 && !provedBest(best.decoded)) {
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
        bestUtilisation: placedAreaOf(b.seq, b.decoded) / (Math.max(1, b.decoded.bins.length) * sheetArea),
        placed: b.decoded.steps.length - b.decoded.unplacedCount,
        total: copies.length,
        message: `${b.decoded.bins.length} sheet(s)`,
      }));
    }
  }

  const placements: SheetPlacement[] = [];
  let placedArea = 0;
  if (best) {
    const b = best;
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
      placements.push({
        id: it.id,
        copy: c.index,
        rotation: set.shapes[st.shape].rotation,
        x: st.x / S,
        y: st.y / S,
        sheet: st.bin,
      });
      placedArea += area[c.item];
    });
  }
  return {
    placements,
    sheetsUsed: best ? best.decoded.bins.length : 0,
    unplaced,
    placedArea,
    cost: best ? best.cost : unplaced.length,
    provedBest: best ? provedBest(best.decoded) : unplaced.length === 0,
    outOfIterations: budget.outOfIterations,
    areaBound,
    firstLayout,
    noFitSeconds: nfps.seconds,
    outlines: set.outlines,
  };
}

export async function nestOnSheets(input: SheetNestInput): Promise<SheetNestResult> {
  const budget = new Budget(input.seconds, input.signal, input.maxIterations, input.onProgress);
  checkItems(input.items);
  checkFrame(input);
  const frame: Frame = {
    lib: await loadClipper(),
    width: input.sheet.width,
    height: input.sheet.height,
    margin: input.margin,
    spacing: input.spacing,
    units: input.units ?? "mm",
    maxSheets: input.maxSheets ?? Infinity,
    seed: input.seed ?? 1,
  };
  const items = input.items.map((it) => ({ ...it, polygon: normaliseRing(it.polygon) }));
  const area = items.map((it) => ringArea(it.polygon));
  // First the parts with track segments paired head to tail (pairs.ts), if any pairing is worth it,
  // in half the time; then the parts as they are, in what is left; the better layout wins.
  const paired = pairsFor(frame, items);
  let run: SheetRun | undefined;
  if (paired) {
    const pairedArea = paired.items.map((it) => paired.partArea.get(it.id) ?? ringArea(it.polygon));
    const r = await searchSheets(frame, paired.items, pairedArea, budget.phase(budget.seconds / 2));
    run = {
      ...r,
      placements: paired.expand(r.placements),
      unplaced: paired.expandCopies(r.unplaced),
      outlines: r.outlines.filter((o) => items.some((it) => it.id === o.id)),
    };
  }
  if (!run || (!run.provedBest && !budget.aborted)) {
    const single = await searchSheets(frame, items, area, budget.phase(budget.seconds));
    if (!run || single.cost < run.cost) run = single;
  }
  return resultOf(items, area, frame, run!, budget);
}

/** Vertex cap of the containing rings a pairing is computed on: its no-fit polygon must stay cheap. */
const PAIRING_VERTICES = 48;

function pairsFor(frame: Frame, items: NestItem[]): PairedItems | null {
  const S = scaleForExtent(Math.max(frame.width, frame.height) + frame.spacing);
  const simplified = new Map<string, Ring>();
  for (const it of items) {
    if (it.quantity < 2 || it.polygon.length <= PAIRING_VERTICES) continue;
    const path = toPath(it.polygon, S);
    const o = containingOutline(frame.lib, path, { maxExtra: 0, maxVertices: PAIRING_VERTICES });
    simplified.set(it.id, fromPath(o.path, S));
  }
  const paired = pairItems(frame.lib, items, frame.spacing, { simplified, maxVertices: PAIRING_VERTICES + 16 });
  return paired.pairs.length ? paired : null;
}

function resultOf(items: NestItem[], area: number[], frame: Frame, run: SheetRun, budget: Budget): SheetNestResult {
  const sheetArea = frame.width * frame.height;
  const areaOf = new Map(items.map((it, i) => [it.id, area[i]]));
  const sheets: SheetNestResult["sheets"] = Array.from({ length: run.sheetsUsed }, (_, index) => ({
    index,
    utilisation: 0,
    placements: [],
  }));
  for (const p of run.placements) {
    sheets[p.sheet].placements.push(p);
    sheets[p.sheet].utilisation += areaOf.get(p.id)! / sheetArea;
  }
  for (const sh of sheets) sh.placements.sort((a, b) => (a.id < b.id ? -1 : a.id > b.id ? 1 : a.copy - b.copy));
  const unplaced = run.unplaced.slice().sort((a, b) => (a.id < b.id ? -1 : a.id > b.id ? 1 : a.copy - b.copy));
  const total = items.reduce((s, it) => s + it.quantity, 0);
  const result: SheetNestResult = {
    sheets,
    utilisation: sheets.length ? run.placedArea / (sheets.length * sheetArea) : 0,
    unplaced,
    seconds: budget.elapsed(),
    cancelled: budget.aborted,
    ended: budget.aborted ? "cancelled" : run.provedBest ? "proved-best" : run.outOfIterations ? "iterations" : "time",
    areaBound: run.areaBound,
    timings: { firstLayout: run.firstLayout, noFitPolygons: run.noFitSeconds },
    outlines: run.outlines,
  };
  budget.report({
    fraction: 1,
    bestUtilisation: result.utilisation,
    placed: total - unplaced.length,
    total,
    message: "done",
  });
  return result;
}
