// Runs the engine off the main thread, so typing in the form or dragging never freezes the page.
// The same lib/track code the server uses for saved revisions, in three stages so the drawing
// comes back first: the geometry, then the other closure options, then the rolling check. Only
// the newest request counts: the worker gives way between stages, and a request that has been
// overtaken by a newer one is dropped without running its remaining stages.
import { isEngineError, solveInStages, type CheckResult, type SolvedGeometry, type SolveOption, type SolveStages } from "@/lib/track";

export interface SolveRequest {
  id: number;
  spec: unknown;
}

export type SolveStage = "geometry" | "options" | "check";

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
  | { id: number; stage: SolveStage; ok: false; error: SolveFailure };

/** Each stage's own time limit. */
const TIME_LIMIT_MS = 8_000;

interface Job {
  id: number;
  spec: unknown;
  stages?: SolveStages;
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
    } else {
      const check = j.stages!.check({ deadlineMs: TIME_LIMIT_MS });
      job = null;
      post({ id: j.id, stage, ok: true, check, ms: ms() });
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
  job = { id: event.data.id, spec: event.data.spec, next: "geometry" };
  schedule();
};
