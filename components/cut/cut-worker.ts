// Builds the cut parts and nests them off the main thread: the page stays responsive through a long
// nest, shows its progress, and can cancel it (the nester then hands back its best layout so far).
// The same lib/track, lib/cut and lib/nest code the server uses to check and store the plan.
import { buildCutParts, isCutError, nestItemsFor, type CutPlanResult } from "@/lib/cut";
import { nestOnSheets } from "@/lib/nest";
import type { NestItem, NestProgress, SheetNestResult } from "@/lib/nest/types";
import { isEngineError, solve, type SolveResult } from "@/lib/track";

export type CutWorkerRequest =
  | { type: "parts"; id: number; spec: unknown; settings: unknown }
  | { type: "nest"; id: number; spec: unknown; settings: unknown; seconds: number; seed?: number }
  | { type: "cancel"; id: number };

export interface PartsPreview {
  plan: CutPlanResult;
  items: NestItem[];
  period?: number;
}

export type CutWorkerReply =
  | { type: "parts"; id: number; preview: PartsPreview }
  | { type: "progress"; id: number; progress: NestProgress }
  | { type: "nested"; id: number; preview: PartsPreview; nest: SheetNestResult }
  | { type: "error"; id: number; message: string; field?: string };

const post = (reply: CutWorkerReply) => (self as unknown as Worker).postMessage(reply);
const running = new Map<number, AbortController>();
let lastSolve: { key: string; result: SolveResult } | undefined;

function solved(spec: unknown): SolveResult {
  const key = JSON.stringify(spec);
  if (lastSolve?.key !== key) lastSolve = { key, result: solve(spec, { deadlineMs: 10_000 }) };
  return lastSolve.result;
}

async function preview(spec: unknown, settings: unknown): Promise<PartsPreview> {
  const result = solved(spec);
  const plan = buildCutParts(spec, result, settings);
  // Labels are engraved inside each part and do not change its outline, so the browser builds the
  // parts without the font; the server adds the labels when it writes the files.
  plan.warnings = plan.warnings.filter((w) => w.code !== "no-font");
  return { plan, items: await nestItemsFor(plan.parts, plan.settings), period: result.period };
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
    const p = await preview(request.spec, request.settings);
    if (request.type === "parts") {
      post({ type: "parts", id: request.id, preview: p });
      return;
    }
    const control = new AbortController();
    running.set(request.id, control);
    const s = p.plan.settings;
    const nest = await nestOnSheets({
      items: p.items,
      sheet: { width: s.sheet.length, height: s.sheet.width },
      margin: s.margin,
      spacing: s.spacing,
      seconds: request.seconds,
      seed: request.seed ?? 1,
      signal: control.signal,
      onProgress: (progress: NestProgress) => post({ type: "progress", id: request.id, progress }),
    });
    running.delete(request.id);
    post({ type: "nested", id: request.id, preview: p, nest });
  } catch (error) {
    running.delete(request.id);
    fail(request.id, error);
  }
};
