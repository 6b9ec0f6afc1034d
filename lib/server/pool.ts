import "server-only";
// The server's heavy work — solves, cut files, assembly sheets, pictures — runs on a pool of worker
// threads (piscina), so one user's solve never stalls another's page, sign-in or download. The pool
// has one thread per core (AXLEWRIGHT_POOL_THREADS), lowered in priority so the event loop always
// answers first, and a bounded queue: when it is full the answer is 503 with Retry-After, never a
// hang. Every task has a deadline (the time queued counts) and ends when the request that asked
// for it goes away. The worker's code is bundled beside the build by scripts/build-worker.mjs.
import { availableParallelism } from "node:os";
import path from "node:path";
import Piscina from "piscina";
// sharp is loaded here first so its libraries stay open while worker threads come and go (sharp's
// documented requirement for worker threads on glibc).
import "sharp";
import type { TaskInput, TaskName, TaskOutput } from "@/lib/work/tasks";
import type { WorkerMessage, WorkerReply } from "@/lib/work/worker";
import { receivedError, TaskCancelled } from "@/lib/work/errors";
import { POOL_GRACE_MS, POOL_NICE, POOL_QUEUE_PER_THREAD } from "@/lib/validation/limits";
import { AppError, toAppError, type ErrorPlace } from "./errors";

/**
 * Tasks that may be ended mid-run by ending their thread: pure computation. The others render with
 * sharp, which must not be torn down mid-picture; they are cancelled while queued and before they
 * render, never mid-render.
 */
const ENDED_MID_RUN: ReadonlySet<TaskName> = new Set([
  "solve",
  "revisionLoads",
  "checkCutPlan",
  "cutFileNames",
  "cutPage",
  "tickItems",
  "assemblySheet",
]);

const envInt = (name: string, fallback: number, least = 1) => {
  const v = Number(process.env[name] || NaN);
  return Number.isInteger(v) && v >= least ? v : fallback;
};

/** The worker bundle: AXLEWRIGHT_WORKER_FILE, else DIST/worker/pool-worker.cjs beside the app's build. */
function workerFile(): string {
  return (
    process.env.AXLEWRIGHT_WORKER_FILE ??
    path.join(process.cwd(), process.env.NEXT_DIST_DIR || ".next", "worker", "pool-worker.cjs")
  );
}

// One pool per process, kept across hot reloads in development, and the tasks it holds (running or waiting).
const slot = globalThis as unknown as {
  __axlewrightPool?: Piscina;
  __axlewrightTasks?: number;
  __axlewrightReady?: Promise<unknown>;
};

export function poolSize() {
  const threads = envInt("AXLEWRIGHT_POOL_THREADS", availableParallelism());
  return { threads, queue: threads * envInt("AXLEWRIGHT_POOL_QUEUE_PER_THREAD", POOL_QUEUE_PER_THREAD) };
}

function pool(): Piscina {
  if (!slot.__axlewrightPool) {
    const { threads, queue } = poolSize();
    const p = new Piscina({
      filename: workerFile(),
      minThreads: threads,
      maxThreads: threads,
      maxQueue: queue + threads,
      idleTimeout: 60_000,
      niceIncrement: Math.min(19, envInt("AXLEWRIGHT_POOL_NICE", POOL_NICE, 0)),
    });
    slot.__axlewrightPool = p;
    // Loading a thread's code takes a second or two: wait for it before any deadline starts counting.
    const ping: WorkerMessage = { task: "ping", input: null, deadlineAt: Infinity, cancel: new Int32Array(1) };
    slot.__axlewrightReady = Promise.all(Array.from({ length: threads }, () => p.run(ping))).catch(() => null);
  }
  return slot.__axlewrightPool;
}

/** Starts the pool's threads (at server start, instrumentation.ts), so the first request finds them ready. */
export function warmPool(): Promise<unknown> {
  pool();
  return slot.__axlewrightReady!;
}

/** The pool's figures for the logs and the tests: its threads' ids, tasks waiting, tasks done. */
export function poolState() {
  const p = slot.__axlewrightPool;
  return p
    ? { threadIds: p.threads.map((t) => t.threadId), tasks: slot.__axlewrightTasks ?? 0, completed: p.completed }
    : null;
}

/** Ends the pool's threads (a clean shutdown, the tests); the next task starts a new pool. */
export async function closePool(): Promise<void> {
  const p = slot.__axlewrightPool;
  slot.__axlewrightPool = undefined;
  await p?.close({ force: true });
}

/** The message of a task dropped because its caller went away (nobody reads it but a joined waiter). */
export const CANCELLED = "The request was cancelled.";

export interface RunOptions {
  /** The whole time allowed, ms, counted from now (queueing included). */
  deadlineMs: number;
  /** The request's own signal: when the caller goes away, the task is dropped or ended. */
  signal?: AbortSignal;
  /** Where the request carries what a refusal points at (lib/server/errors.ts). */
  place?: ErrorPlace;
}

/**
 * Runs one task on the pool. A full queue is a 503 (kind "busy", Retry-After); past the deadline a
 * 408; a refusal from the work (the engine's, the cut code's) the AppError it maps to.
 */
export async function runTask<K extends TaskName>(
  task: K,
  input: TaskInput<K>,
  { deadlineMs, signal, place }: RunOptions,
): Promise<TaskOutput<K>> {
  // The queue's bound is kept here: piscina's own maxQueue does not count tasks that carry a signal.
  const { threads, queue } = poolSize();
  if ((slot.__axlewrightTasks ?? 0) >= threads + queue) throw new AppError("busy");
  // The place is taken at once (before any await), so callers arriving together cannot overfill the queue.
  slot.__axlewrightTasks = (slot.__axlewrightTasks ?? 0) + 1;
  try {
    return await runOnPool(task, input, { deadlineMs, signal, place });
  } finally {
    slot.__axlewrightTasks = (slot.__axlewrightTasks ?? 1) - 1;
  }
}

async function runOnPool<K extends TaskName>(
  task: K,
  input: TaskInput<K>,
  { deadlineMs, signal, place }: RunOptions,
): Promise<TaskOutput<K>> {
  await warmPool();
  const deadlineAt = Date.now() + deadlineMs;
  const cancel = new Int32Array(new SharedArrayBuffer(4));
  // The engine stops itself at its deadline; the thread is ended only if it has not stopped a little after.
  const late = AbortSignal.timeout(deadlineMs + POOL_GRACE_MS);
  const stop = signal ? AbortSignal.any([signal, late]) : late;
  const onStop = () => Atomics.store(cancel, 0, 1);
  stop.addEventListener("abort", onStop, { once: true });
  const message: WorkerMessage = { task, input, deadlineAt, cancel };
  try {
    const reply: WorkerReply = await pool().run(message, {
      // Rendering tasks are never ended mid-run (sharp), only skipped: the worker reads `cancel`.
      signal: ENDED_MID_RUN.has(task) ? stop : undefined,
    });
    if (!reply.ok) throw toAppError(receivedError(reply.error), place);
    return reply.value as TaskOutput<K>;
  } catch (error) {
    if (error instanceof TaskCancelled || (error instanceof Error && error.name === "AbortError")) {
      if (signal?.aborted) {
        // One line per task dropped: the operator sees work given up for callers that went away.
        console.info(`[axlewright] ${task} ended: its caller went away`);
        throw new AppError("bad_request", CANCELLED);
      }
      throw new AppError(
        "timeout",
        "The work took too long and was stopped. Try a coarser tolerance or a simpler shape.",
      );
    }
    throw toAppError(error, place);
  } finally {
    stop.removeEventListener("abort", onStop);
  }
}
