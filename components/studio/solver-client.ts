// The studio's side of the solve worker (solve-worker.ts), on the shared worker client
// (components/worker/worker-client.ts): every change is posted at once, the latest request wins,
// and a worker stuck on a stale solve is ended and replaced.
import { WorkerClient } from "@/components/worker/worker-client";
import type { SolveReply, SolveRequest } from "./solve-worker";

/**
 * A worker that has said nothing for this long while a newer request waits is busy with a stale,
 * slow solve (a heavy formula may run for seconds); it is ended and a fresh one takes the request.
 * Short enough not to be felt, long enough that quick typing never pays for a worker's start-up.
 */
export const STALE_WORKER_MS = 300;

/** Each stage has its own 8 s limit in the worker; a request silent for far longer is lost. */
const SILENCE_LIMIT_MS = 30_000;

export type SolverClient = WorkerClient<Omit<SolveRequest, "id">, SolveReply>;

export function createSolverClient(create: () => Worker): SolverClient {
  return new WorkerClient({
    create,
    // The loads stage is the last; a failed stage ends the request.
    isLast: (reply: SolveReply) => !reply.ok || reply.stage === "loads",
    replaceBusyAfterMs: STALE_WORKER_MS,
    silenceLimitMs: SILENCE_LIMIT_MS,
    crashMessage: "The solver could not start in this browser.",
    silenceMessage: "The solver stopped answering. Change a value to try again.",
  });
}
