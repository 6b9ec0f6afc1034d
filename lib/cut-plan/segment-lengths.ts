// Where the joints fall, chosen for the sheet. With no cut stations given, lib/cut/segments.ts cuts
// greedily at the farthest crest that fits: the fewest joints, but segment lengths that may nest
// badly (the demo's 6 + 6 + 5 periods need two sheets where 6 + 6 + 4 + 1 fit on one). Here the
// joints may fall at any crests the joint rules allow, and the lengths that nest best are chosen.
//
// Method: exhaustive enumeration with bounds (branch and bound over a list). The candidates are the
// multisets of segment lengths in whole periods: the integer partitions of the run's periods into
// at most the greedy count + EXTRA_SEGMENTS parts (G. E. Andrews, "The Theory of Partitions", 1976,
// ch. 1), each laid out in one order (longest first, with the run's ends where the rules allow) and
// kept only if planCuts accepts its stations, so every candidate obeys the joint rules exactly as a
// typed list of stations would. They are tried best-first by a level estimate (first-fit decreasing
// of the segments into rows along the sheet, the other parts in the rows' free ends: the level
// packings of Coffman, Garey, Johnson & Tarjan 1980, SIAM J. Computing 9(4):808–826), and each is
// nested cheaply by the nester (nestOnSheets, a few search iterations). Ranking: fewer parts left
// out, fewer sheets, fewer segments (each joint is work on site), then the least used last sheet
// (the largest offcut). A candidate whose bounds (at least one sheet, at least its parts' area)
// cannot beat the best so far is not nested. The greedy default is nested first, with more effort
// than any candidate, and stays unless a candidate beats it. Pure TypeScript: the page runs it in
// its worker, the tests in Node.
import { buildCutParts, isCutError, nestItemsFor, type CutPlanResult, type CutSettings, type RunInfo } from "@/lib/cut";
import { planCuts, segmentCutLength, usableSize } from "@/lib/cut/segments";
import { bounds, boxHeight, boxWidth } from "@/lib/geometry/box";
import { placer } from "@/lib/geometry/place";
import { ringArea } from "@/lib/geometry/ring";
import { nestOnSheets } from "@/lib/nest";
import type { NestItem, NestProgress, SheetNestResult } from "@/lib/nest/types";
import type { SolveResult } from "@/lib/track";

/** Segments allowed beyond the greedy count: each joint costs work on site. */
const EXTRA_SEGMENTS = 2;
/** The most candidates listed, and partitions looked at; beyond them the longest-segment partitions come first. */
const MAX_CANDIDATES = 2000;
const MAX_PARTITIONS = 20_000;
/**
 * A candidate's nest: the nester's first layout and this many search iterations, or this many
 * seconds if they come first. On the demo job a candidate took 0.4–0.8 s (Node, a 2-core machine), and
 * every one-sheet layout we saw there was found within these iterations.
 */
const CANDIDATE_ITERATIONS = 20;
const CANDIDATE_SECONDS = 2;
/** The default's nest gets more, so a saving is never claimed from a default nested too briefly. */
const DEFAULT_ITERATIONS = 3 * CANDIDATE_ITERATIONS;
/** Below this much time left, no candidate is started. */
const MIN_CANDIDATE_SECONDS = 0.3;
/** Last sheets whose use differs by less than this share of a sheet count as equal. */
const USE_TOLERANCE = 0.01;

/** Stations as the cut stations field carries them: to 0.1 mm (0.05 mm from the crest at most). */
export const roundStation = (x: number) => Math.round(x * 10) / 10;

export interface SegmentCandidate {
  /** Cut stations, mm from the run's start, at crests (rounded by roundStation). */
  cuts: number[];
  /** Whole periods in each segment along the run (the flat run-outs and a half period not counted). */
  periods: number[];
}

export interface SegmentLayout extends SegmentCandidate {
  segments: number;
  sheets: number;
  unplaced: number;
  /** The parts' share of the last sheet, 0..1. */
  lastSheetUse: number;
  nest: SheetNestResult;
  plan: CutPlanResult;
  items: NestItem[];
}

export interface SegmentChoiceProgress {
  /** Share of the time budget used, 0..1. */
  fraction: number;
  /** Layouts nested so far (the default included) and the candidates listed. */
  tried: number;
  candidates: number;
  bestSheets: number | null;
  defaultSheets: number | null;
  /** The nest under way, if any. */
  nest?: NestProgress;
}

export interface SegmentChoiceInput {
  /** The design spec the result was solved from (checked by its hash, as buildCutParts does). */
  spec: unknown;
  result: SolveResult;
  /** The cut settings; their cut stations, if any, are ignored: the stations are what is chosen. */
  settings: unknown;
  /** The whole choice's time budget, default and candidates' nests included. */
  seconds: number;
  seed?: number;
  signal?: AbortSignal;
  onProgress?: (p: SegmentChoiceProgress) => void;
}

export interface SegmentChoice {
  chosen: SegmentLayout;
  /** The greedy cuts (planCuts with no stations) and their nest. */
  default: SegmentLayout;
  /** True when the chosen stations differ from the default's: they go into the settings' cut stations. */
  changed: boolean;
  /** The default's sheets less the chosen's, both from the nests of this search. */
  sheetsSaved: number;
  candidates: number;
  /** Layouts nested, the default included. */
  evaluated: number;
  /** "searched": every candidate was nested or ruled out by its bounds. */
  ended: "searched" | "time" | "cancelled";
  seconds: number;
}

const now = () => (typeof performance !== "undefined" ? performance.now() : Date.now());

function obeysRules(run: RunInfo, s: CutSettings, cuts: number[]): boolean {
  try {
    planCuts(run, { ...s, cuts });
    return true;
  } catch (error) {
    if (isCutError(error)) return false;
    throw error;
  }
}

/** Stations for segments of these whole periods, in order along the run: at the crests between them. */
function stationsOf(run: RunInfo, periods: number[]): number[] {
  const cuts: number[] = [];
  let j = 0;
  for (const k of periods.slice(0, -1)) {
    j += k;
    cuts.push(roundStation(run.crests[j]));
  }
  return cuts;
}

/** Non-increasing lists of `parts` whole numbers from 1 to `max` that sum to `n`. */
function* partitions(n: number, parts: number, max: number): Generator<number[]> {
  if (parts === 0) {
    if (n === 0) yield [];
    return;
  }
  for (let k = Math.min(max, n - (parts - 1)); k * parts >= n; k--)
    for (const rest of partitions(n - k, parts - 1, k)) yield [k, ...rest];
}

/**
 * One order of a multiset of segment lengths that the joint rules accept: longest first if it
 * can; otherwise another length at the start or the end (the first segment carries a flat run-out
 * and a key, the last one a run-out and no key), the rest longest first.
 */
function arrange(run: RunInfo, s: CutSettings, parts: number[]): SegmentCandidate | null {
  if (parts.length === 1) return obeysRules(run, s, []) ? { cuts: [], periods: parts } : null;
  const distinct = [...new Set(parts)];
  for (const first of distinct)
    for (const last of [...distinct].reverse()) {
      const rest = [...parts];
      rest.splice(rest.indexOf(first), 1);
      const at = rest.lastIndexOf(last);
      if (at < 0) continue;
      rest.splice(at, 1);
      const periods = [first, ...rest, last];
      const cuts = stationsOf(run, periods);
      if (obeysRules(run, s, cuts)) return { cuts, periods };
    }
  return null;
}

/**
 * Every multiset of segment lengths in whole periods with at most `maxSegments` segments, each in
 * one order the joint rules accept (planCuts's own check), fewest segments first. The cuts fall at
 * crests strictly inside the periodic part of the run.
 */
export function segmentCandidates(run: RunInfo, s: CutSettings, maxSegments: number): SegmentCandidate[] {
  const whole = Math.max(0, run.crests.length - 1);
  const out: SegmentCandidate[] = [];
  if (whole === 0) return out;
  // No segment of more periods fits anywhere: even the last one (no key) is its periods and the kerf long.
  const maxPeriods = Math.min(whole, Math.floor((usableSize(s).length - s.machine.kerf) / run.period + 1e-9));
  let looked = 0;
  for (let m = 1; m <= Math.min(maxSegments, whole); m++) {
    if (m * maxPeriods < whole) continue;
    for (const parts of partitions(whole, m, maxPeriods)) {
      const c = arrange(run, s, parts);
      if (c) out.push(c);
      if (out.length >= MAX_CANDIDATES || ++looked >= MAX_PARTITIONS) return out;
    }
  }
  return out;
}

/** Whole periods between stations (fractions where a station is off the crests, as a greedy slope cut can be). */
function periodsOf(run: RunInfo, cuts: number[]): number[] {
  const at = (x: number) => (x - (run.crests[0] ?? 0)) / run.period;
  const whole = Math.max(0, run.crests.length - 1);
  const xs = [0, ...cuts.map(at), whole];
  return xs.slice(1).map((x, i) => Number((Math.max(0, Math.min(whole, x)) - xs[i]).toFixed(2)));
}

const key = (periods: number[]) => [...periods].sort((a, b) => b - a).join("+");

// ---- The level estimate: only the order in which candidates are nested. ----

interface Frame {
  length: number;
  width: number;
  spacing: number;
  sheetArea: number;
  usableArea: number;
}

interface OtherPart {
  /** Box sizes in each allowed quarter-turn. */
  sizes: Array<{ w: number; h: number }>;
  /** Copies for the default's joints count, and per joint (splice plates) or not. */
  quantity: number;
  perJoint: boolean;
}

interface EstimateModel {
  frame: Frame;
  trackHeight: number;
  copiesPerSegment: number;
  others: OtherPart[];
  defaultJoints: number;
}

function estimateModel(plan: CutPlanResult, items: NestItem[], frame: Frame): EstimateModel {
  const kindOf = new Map(plan.parts.map((p) => [p.id, p.kind]));
  const tracks = items.filter((it) => kindOf.get(it.id) === "track");
  const joints = Math.max(0, tracks.length - 1);
  return {
    frame,
    trackHeight: Math.max(0, ...tracks.map((it) => boxHeight(bounds(it.polygon)))),
    copiesPerSegment: tracks[0]?.quantity ?? 0,
    defaultJoints: joints,
    others: items
      .filter((it) => kindOf.get(it.id) !== "track")
      .map((it) => ({
        sizes: it.rotations
          .filter((r) => r % 90 === 0)
          .map((r) => {
            const b = bounds(it.polygon.map(placer(r, 0, 0)));
            return { w: boxWidth(b), h: boxHeight(b) };
          }),
        quantity: it.quantity,
        perJoint: kindOf.get(it.id) === "splice",
      })),
  };
}

/** Sheets and rows a level layout needs: segments first fit decreasing into rows, other parts in the rows' free ends. */
function levelEstimate(m: EstimateModel, run: RunInfo, s: CutSettings, c: SegmentCandidate) {
  const { length, width, spacing: g } = m.frame;
  const cap = length + g;
  const rowH = m.trackHeight + g;
  const perSheet = Math.max(1, Math.floor((width + g) / rowH));
  const xs = [0, ...c.cuts, run.runLength];
  const lengths: number[] = [];
  xs.slice(1).forEach((x1, i) => {
    const l = segmentCutLength(xs[i], x1, i === xs.length - 2, s);
    for (let q = 0; q < m.copiesPerSegment; q++) lengths.push(l + g);
  });
  const rows: number[] = [];
  for (const l of lengths.sort((a, b) => b - a)) {
    const i = rows.findIndex((used) => used + l <= cap + 1e-9);
    if (i >= 0) rows[i] += l;
    else rows.push(l);
  }
  rows.sort((a, b) => b - a);
  const sheets: number[][] = [];
  for (let i = 0; i < rows.length; i += perSheet) sheets.push(rows.slice(i, i + perSheet));
  for (const sh of sheets) while (sh.length < perSheet) sh.push(0);
  const joints = c.cuts.length;
  const copies: OtherPart["sizes"][] = [];
  for (const o of m.others) {
    const n = o.perJoint ? Math.round((o.quantity / Math.max(1, m.defaultJoints)) * joints) : o.quantity;
    for (let q = 0; q < n; q++) copies.push(o.sizes);
  }
  copies.sort((a, b) => b[0].w * b[0].h - a[0].w * a[0].h);
  for (const sizes of copies) {
    let placed = false;
    for (let si = 0; si <= sheets.length && !placed; si++) {
      if (si === sheets.length) sheets.push(Array.from({ length: perSheet }, () => 0));
      const sh = sheets[si];
      for (const { w, h } of sizes) {
        const k = Math.ceil((h + g) / rowH);
        if (k > perSheet) continue;
        for (let r = 0; r + k <= perSheet && !placed; r++) {
          const window = sh.slice(r, r + k);
          if (window.every((used) => used + w + g <= cap + 1e-9)) {
            for (let q = r; q < r + k; q++) sh[q] += w + g;
            placed = true;
          }
        }
        if (placed) break;
      }
      // A part taller than the sheet's rows holds a sheet of its own.
      if (!placed && !sh.some((used) => used > 0)) {
        sh[0] = cap;
        placed = true;
      }
    }
  }
  return { sheets: sheets.filter((sh) => sh.some((used) => used > 0)).length, rows: rows.length };
}

// ---- Ranking ----

interface Score {
  unplaced: number;
  sheets: number;
  segments: number;
  lastSheetUse: number;
}

function better(a: Score, b: Score): boolean {
  if (a.unplaced !== b.unplaced) return a.unplaced < b.unplaced;
  if (a.sheets !== b.sheets) return a.sheets < b.sheets;
  if (a.segments !== b.segments) return a.segments < b.segments;
  return a.lastSheetUse < b.lastSheetUse - USE_TOLERANCE;
}

/** True when nest `a` of the same parts is better than `b`: fewer parts left out, fewer sheets, a less used last sheet. */
export function betterNest(a: SheetNestResult, b: SheetNestResult): boolean {
  return better(scoreOf(a, 0), scoreOf(b, 0));
}

function scoreOf(nest: SheetNestResult, segments: number): Score {
  const used = nest.sheets.filter((sh) => sh.placements.length > 0);
  return {
    unplaced: nest.unplaced.length,
    sheets: used.length,
    segments,
    lastSheetUse: used.length ? used[used.length - 1].utilisation : 0,
  };
}

/**
 * Chooses the cut stations (at crests, within the joint rules) whose segments nest on the fewest
 * sheets, within `seconds`. Never returns a layout the ranking puts below the greedy default's.
 * Throws CutError for settings the parts cannot be built from, as buildCutParts does.
 */
export async function chooseSegmentLengths(input: SegmentChoiceInput): Promise<SegmentChoice> {
  const t0 = now();
  const elapsed = () => (now() - t0) / 1000;
  const remaining = () => input.seconds - elapsed();
  const seed = input.seed ?? 1;
  const own = { ...(input.settings as Record<string, unknown>) };
  delete own.cuts;
  const base = buildCutParts(input.spec, input.result, own);
  const s = base.settings;
  const frame: Frame = {
    length: s.sheet.length - 2 * s.margin,
    width: s.sheet.width - 2 * s.margin,
    spacing: s.spacing,
    sheetArea: s.sheet.length * s.sheet.width,
    usableArea: (s.sheet.length - 2 * s.margin) * (s.sheet.width - 2 * s.margin),
  };
  let evaluated = 0;
  let candidatesListed = 0;
  let best: SegmentLayout | null = null;
  let defaultLayout: SegmentLayout | null = null;
  const report = (nest?: NestProgress) =>
    input.onProgress?.({
      fraction: input.seconds > 0 ? Math.min(1, elapsed() / input.seconds) : 1,
      tried: evaluated,
      candidates: candidatesListed,
      bestSheets: best?.sheets ?? null,
      defaultSheets: defaultLayout?.sheets ?? null,
      nest,
    });

  const nest = (items: NestItem[], seconds: number, maxIterations: number) => {
    // nestOnSheets handed a signal that is already aborted may have no layout to give back, so a
    // choice stopped before a nest starts asks for the first layout alone, with no search.
    const stopped = input.signal?.aborted ?? false;
    return nestOnSheets({
      items,
      sheet: { width: s.sheet.length, height: s.sheet.width },
      margin: s.margin,
      spacing: s.spacing,
      seconds: stopped ? 0.05 : Math.max(0.05, seconds),
      seed,
      maxIterations: stopped ? 0 : maxIterations,
      signal: stopped ? undefined : input.signal,
      onProgress: (p) => report(p),
    });
  };

  const baseItems = await nestItemsFor(base.parts, base.settings);
  const baseCuts = base.run?.cuts ?? [];
  const baseNest = await nest(
    baseItems,
    Math.min(remaining(), Math.max(CANDIDATE_SECONDS, input.seconds / 4)),
    DEFAULT_ITERATIONS,
  );
  evaluated++;
  defaultLayout = {
    cuts: baseCuts,
    periods: base.run ? periodsOf(base.run, baseCuts) : [],
    ...scoreOf(baseNest, base.run ? baseCuts.length + 1 : 0),
    nest: baseNest,
    plan: base,
    items: baseItems,
  };
  best = defaultLayout;
  report();

  let ended: SegmentChoice["ended"] = "searched";
  if (base.run) {
    const run = base.run;
    const model = estimateModel(base, baseItems, frame);
    const defaultKey = key(defaultLayout.periods);
    const list = segmentCandidates(run, s, baseCuts.length + 1 + EXTRA_SEGMENTS)
      .filter((c) => key(c.periods) !== defaultKey)
      .map((c) => ({ c, est: levelEstimate(model, run, s, c) }))
      .sort(
        (a, b) =>
          a.est.sheets - b.est.sheets ||
          a.c.periods.length - b.c.periods.length ||
          a.est.rows - b.est.rows ||
          key(b.c.periods).localeCompare(key(a.c.periods)),
      );
    candidatesListed = list.length;
    for (const { c } of list) {
      if (input.signal?.aborted) {
        ended = "cancelled";
        break;
      }
      if (remaining() < MIN_CANDIDATE_SECONDS) {
        ended = "time";
        break;
      }
      const segments = c.periods.length;
      // Any layout takes at least one sheet and leaves nothing out at best.
      if (!better({ unplaced: 0, sheets: 1, segments, lastSheetUse: 0 }, best)) continue;
      let plan: CutPlanResult;
      try {
        plan = buildCutParts(input.spec, input.result, { ...s, cuts: c.cuts });
      } catch (error) {
        if (isCutError(error)) continue;
        throw error;
      }
      const items = await nestItemsFor(plan.parts, plan.settings);
      // And at least as many sheets as its parts' area needs, the last one holding what the others cannot.
      const area = items.reduce((sum, it) => sum + ringArea(it.polygon) * it.quantity, 0);
      const bound = Math.max(1, Math.ceil(area / frame.usableArea - 1e-9));
      const lastUse = Math.max(0, area - (bound - 1) * frame.usableArea) / frame.sheetArea;
      if (!better({ unplaced: 0, sheets: bound, segments, lastSheetUse: lastUse }, best)) continue;
      const n = await nest(items, Math.min(CANDIDATE_SECONDS, remaining()), CANDIDATE_ITERATIONS);
      evaluated++;
      const layout: SegmentLayout = { ...c, ...scoreOf(n, segments), nest: n, plan, items };
      if (better(layout, best)) best = layout;
      report();
    }
    if (input.signal?.aborted) ended = "cancelled";
  } else if (input.signal?.aborted) ended = "cancelled";

  return {
    chosen: best,
    default: defaultLayout,
    changed: best !== defaultLayout,
    sheetsSaved: defaultLayout.sheets - best.sheets,
    candidates: candidatesListed,
    evaluated,
    ended,
    seconds: elapsed(),
  };
}
