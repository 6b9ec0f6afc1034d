// Builds the cut parts and nests them off the main thread: the page stays responsive through a long
// nest, shows its progress, and can cancel it (the nester then hands back its best layout so far).
// The same lib/track, lib/cut and lib/nest code the server uses to check and store the plan. A nest
// may first choose where the joints fall (lib/cut-plan/segment-lengths.ts) in part of its time, then
// nest the chosen segments in the rest.
import { buildCutParts, isCutError, nestItemsFor, type CutPlanResult } from "@/lib/cut";
import { betterNest, chooseSegmentLengths, type SegmentChoice } from "@/lib/cut-plan/segment-lengths";
import { nestOnSheets } from "@/lib/nest";
import type { NestItem, NestProgress, SheetNestResult } from "@/lib/nest/types";
import { isEngineError, solve, type SolveResult } from "@/lib/track";

export type CutWorkerRequest =
  | { type: "parts"; id: number; spec: unknown; settings: unknown }
  | {
      type: "nest";
      id: number;
      spec: unknown;
      settings: unknown;
      seconds: number;
      seed?: number;
      /** Choose the cut stations first (the settings have none): the reply then carries the choice. */
      chooseJoints?: boolean;
    }
  | { type: "cancel"; id: number };

/** What the choice of joints found, for the page's sentence and its cut stations field. */
export interface JointChoiceReport {
  /** True when the chosen stations differ from the usual (greedy) ones: they go into the cut stations field. */
  changed: boolean;
  /** The stations nested, mm (the usual ones when nothing better was found). */
  cuts: number[];
  defaultCuts: number[];
  /** Sheets, parts left out and the last sheet's use of the chosen and the usual joints, in this search. */
  sheets: number;
  defaultSheets: number;
  unplaced: number;
  defaultUnplaced: number;
  segments: number;
  defaultSegments: number;
  lastSheetUse: number;
  defaultLastSheetUse: number;
  sheetsSaved: number;
  /** Other joint choices nested, and how many there were. */
  tried: number;
  candidates: number;
  ended: SegmentChoice["ended"];
}

/** The share of the search time the choice of joints may take; the chosen segments' nest has the rest. */
const JOINT_SHARE = 0.5;

export interface PartsPreview {
  plan: CutPlanResult;
  items: NestItem[];
  period?: number;
}

export type CutWorkerReply =
  | { type: "parts"; id: number; preview: PartsPreview }
  | {
      type: "progress";
      id: number;
      progress: NestProgress;
      /** While the joints are being chosen: choices nested so far, of how many, and the fewest sheets yet. */
      joints?: { tried: number; candidates: number; bestSheets: number | null };
    }
  | { type: "nested"; id: number; preview: PartsPreview; nest: SheetNestResult; joints?: JointChoiceReport }
  | { type: "error"; id: number; message: string; field?: string };

const post = (reply: CutWorkerReply) => (self as unknown as Worker).postMessage(reply);
const running = new Map<number, AbortController>();
let lastSolve: { key: string; result: SolveResult } | undefined;

function solved(spec: unknown): SolveResult {
  const key = JSON.stringify(spec);
  if (lastSolve?.key !== key) lastSolve = { key, result: solve(spec, { deadlineMs: 10_000 }) };
  return lastSolve.result;
}

// Labels are engraved inside each part and do not change its outline, so the browser builds the
// parts without the font; the server adds the labels when it writes the files.
const withoutFontWarning = (plan: CutPlanResult): CutPlanResult => ({
  ...plan,
  warnings: plan.warnings.filter((w) => w.code !== "no-font"),
});

async function preview(spec: unknown, settings: unknown): Promise<PartsPreview> {
  const result = solved(spec);
  const plan = withoutFontWarning(buildCutParts(spec, result, settings));
  return { plan, items: await nestItemsFor(plan.parts, plan.settings), period: result.period };
}

type NestRequest = Extract<CutWorkerRequest, { type: "nest" }>;

function nestParts(
  request: NestRequest,
  p: PartsPreview,
  signal: AbortSignal,
  seconds: number,
  fraction = (f: number) => f,
) {
  const s = p.plan.settings;
  return nestOnSheets({
    items: p.items,
    sheet: { width: s.sheet.length, height: s.sheet.width },
    margin: s.margin,
    spacing: s.spacing,
    seconds,
    seed: request.seed ?? 1,
    signal,
    onProgress: (progress: NestProgress) =>
      post({ type: "progress", id: request.id, progress: { ...progress, fraction: fraction(progress.fraction) } }),
  });
}

/** The joints chosen in the first part of the time, then the chosen segments nested in the rest. */
async function chooseAndNest(
  request: NestRequest,
  signal: AbortSignal,
): Promise<{ preview: PartsPreview; nest: SheetNestResult; joints: JointChoiceReport }> {
  const t0 = performance.now();
  const elapsed = () => (performance.now() - t0) / 1000;
  const result = solved(request.spec);
  const choice = await chooseSegmentLengths({
    spec: request.spec,
    result,
    settings: request.settings,
    seconds: request.seconds * JOINT_SHARE,
    seed: request.seed ?? 1,
    signal,
    onProgress: (p) =>
      post({
        type: "progress",
        id: request.id,
        progress: {
          fraction: p.fraction * JOINT_SHARE,
          bestUtilisation: p.nest?.bestUtilisation ?? 0,
          placed: p.nest?.placed ?? 0,
          total: p.nest?.total ?? 0,
        },
        joints: { tried: Math.max(0, p.tried - 1), candidates: p.candidates, bestSheets: p.bestSheets },
      }),
  });
  const { chosen, default: usual } = choice;
  const preview = { plan: withoutFontWarning(chosen.plan), items: chosen.items, period: result.period };
  let nest = chosen.nest;
  const left = request.seconds - elapsed();
  const provedBest = nest.unplaced.length === 0 && nest.sheets.length <= (nest.areaBound ?? 0);
  if (!signal.aborted && !provedBest && left > 0.5) {
    const start = elapsed() / request.seconds;
    const more = await nestParts(request, preview, signal, left, (f) => start + (1 - start) * f);
    // The longer search keeps the choice's layout unless it finds a better one; how it ended is its own.
    nest = betterNest(more, nest) ? more : { ...nest, cancelled: more.cancelled, ended: more.ended };
  } else if (signal.aborted) nest = { ...nest, cancelled: true, ended: "cancelled" };
  nest = { ...nest, seconds: elapsed() };
  return {
    preview,
    nest,
    joints: {
      changed: choice.changed,
      cuts: chosen.cuts,
      defaultCuts: usual.cuts,
      sheets: chosen.sheets,
      defaultSheets: usual.sheets,
      unplaced: chosen.unplaced,
      defaultUnplaced: usual.unplaced,
      segments: chosen.segments,
      defaultSegments: usual.segments,
      lastSheetUse: chosen.lastSheetUse,
      defaultLastSheetUse: usual.lastSheetUse,
      sheetsSaved: choice.sheetsSaved,
      tried: Math.max(0, choice.evaluated - 1),
      candidates: choice.candidates,
      ended: choice.ended,
    },
  };
}

function fail(id: number, error: unknown) {
  if (isCutError(error)) post({ type: "error", id, message: error.message, field: error.field });
  else if (isEngineError(error)) post({ type: "error", id, message: error.message });
  // The nester's own refusals (bad sheet, too many copies) are plain errors with plain words.
  else if (error instanceof Error && error.message) post({ type: "error", id, message: error.message });
  else post({ type: "error", id, message: "Building the parts stopped on an unexpected error." });
}

self.onmessage = async (event: MessageEvent<CutWorkerRequest>) => {
  const request = event.data;
  if (request.type === "cancel") {
    running.get(request.id)?.abort();
    return;
  }
  try {
    if (request.type === "parts") {
      post({ type: "parts", id: request.id, preview: await preview(request.spec, request.settings) });
      return;
    }
    const control = new AbortController();
    running.set(request.id, control);
    if (request.chooseJoints) {
      const chosen = await chooseAndNest(request, control.signal);
      running.delete(request.id);
      post({ type: "nested", id: request.id, ...chosen });
      return;
    }
    const p = await preview(request.spec, request.settings);
    const nest = await nestParts(request, p, control.signal, request.seconds);
    running.delete(request.id);
    post({ type: "nested", id: request.id, preview: p, nest });
  } catch (error) {
    running.delete(request.id);
    fail(request.id, error);
  }
};
