// Runs the engine off the main thread, so typing in the form or dragging never freezes the page.
// The same lib/track code the server uses for saved revisions, in three stages so the drawing
// comes back first: the geometry, then the other closure options, then the rolling check. Only
// the newest request counts: the worker gives way between stages, and a request that has been
// overtaken by a newer one is dropped without running its remaining stages.
// A fourth stage runs the load-path check (lib/loads) on the checked design, with the helper's
// suggestions, when the studio sends load settings.
import { checkLoads, suggestFixes, type LoadsReport, type Suggestion } from "@/lib/loads";
import {
  isEngineError,
  solveInStages,
  type CheckResult,
  type SolvedGeometry,
  type SolveOption,
  type SolveStages,
} from "@/lib/track";
import { loadsInputSchema, type LoadsSettings, type TreadOption } from "@/lib/validation/loads";

/** The studio's load settings and the library's treads for the helper. */
export interface LoadsRequest {
  settings: LoadsSettings;
  treads: TreadOption[];
}

export interface SolveRequest {
  id: number;
  spec: unknown;
  loads?: LoadsRequest | null;
}

export type SolveStage = "geometry" | "options" | "check" | "loads";

export interface SolveFailure {
  message: string;
  code: string;
  where?: string;
}

/** One message per stage of a request; `ms` is the stage's own time in the worker. */
export type SolveReply =
  | { id: number; stage: "geometry"; ok: true; geometry: SolvedGeometry; ms: number }
  | { id: number; stage: "options"; ok: true; options: SolveOption[] | undefined; ms: number }
  | { id: number; stage: "check"; ok: true; check: CheckResult; ms: number }
  | {
      id: number;
      stage: "loads";
      ok: true;
      loads: { report: LoadsReport; suggestions: Suggestion[] } | null;
      ms: number;
    }
  | { id: number; stage: SolveStage; ok: false; error: SolveFailure };

/** Each stage's own time limit. */
const TIME_LIMIT_MS = 8_000;

interface Job {
  id: number;
  spec: unknown;
  loads?: LoadsRequest | null;
  stages?: SolveStages;
  checked?: CheckResult;
  next: SolveStage;
}

let job: Job | null = null;
let scheduled = false;

const post = (reply: SolveReply) => (self as unknown as Worker).postMessage(reply);

function failure(error: unknown): SolveFailure {
  return isEngineError(error)
    ? { message: error.message, code: error.code, where: error.where }
    : { message: "The engine stopped on an unexpected error.", code: "internal" };
}

/** Runs one stage of the current job and posts its reply. */
function step(j: Job): void {
  const started = performance.now();
  const ms = () => performance.now() - started;
  const stage = j.next;
  try {
    if (stage === "geometry") {
      j.stages = solveInStages(j.spec, { deadlineMs: TIME_LIMIT_MS });
      j.next = "options";
      post({ id: j.id, stage, ok: true, geometry: j.stages.geometry, ms: ms() });
    } else if (stage === "options") {
      const options = j.stages!.options({ deadlineMs: TIME_LIMIT_MS });
      j.next = "check";
      post({ id: j.id, stage, ok: true, options, ms: ms() });
    } else if (stage === "check") {
      const check = j.stages!.check({ deadlineMs: TIME_LIMIT_MS });
      j.checked = check;
      j.next = "loads";
      post({ id: j.id, stage, ok: true, check, ms: ms() });
    } else {
      job = null;
      if (!j.loads) return post({ id: j.id, stage, ok: true, loads: null, ms: ms() });
      const parsed = loadsInputSchema.safeParse({ ...j.loads.settings, spec: j.spec, treads: j.loads.treads });
      if (!parsed.success) {
        const issue = parsed.error.issues[0];
        return post({
          id: j.id,
          stage,
          ok: false,
          error: { message: issue.message, code: "invalid-loads", where: issue.path.join(".") },
        });
      }
      const report = checkLoads(parsed.data, { ...j.stages!.geometry, ...j.checked! });
      post({ id: j.id, stage, ok: true, loads: { report, suggestions: suggestFixes(parsed.data, report) }, ms: ms() });
    }
  } catch (error) {
    job = null;
    post({ id: j.id, stage, ok: false, error: failure(error) });
  }
}

// Between stages the worker yields to its message queue, so a newer request waiting there
// replaces the job before the old one's next stage starts.
function schedule(): void {
  if (scheduled) return;
  scheduled = true;
  setTimeout(() => {
    scheduled = false;
    if (!job) return;
    step(job);
    if (job) schedule();
  }, 0);
}

self.onmessage = (event: MessageEvent<SolveRequest>) => {
  job = { id: event.data.id, spec: event.data.spec, loads: event.data.loads, next: "geometry" };
  schedule();
};
