// The worker thread's entry (bundled by scripts/build-worker.mjs; run by piscina from lib/server/pool.ts).
// A refusal travels back as data (errors.ts), so the server maps it exactly as on the main thread.
import { sendError, TaskCancelled, type SentError } from "./errors";
import { tasks, type TaskName, type TaskRun } from "./tasks";

export interface WorkerMessage {
  task: TaskName;
  input: unknown;
  /** When the task must be done (epoch ms, the same clock on every thread of the process). */
  deadlineAt: number;
  /** Set to 1 by the pool when the caller has gone away or the deadline has passed (shared memory). */
  cancel: Int32Array;
}

export type WorkerReply = { ok: true; value: unknown } | { ok: false; error: SentError };

export default async function run(message: WorkerMessage): Promise<WorkerReply> {
  try {
    const task = tasks[message.task] as (input: unknown, run: TaskRun) => Promise<unknown>;
    if (typeof task !== "function") throw new Error(`No such task: ${String(message.task)}`);
    const stopIfCancelled = () => {
      if (Atomics.load(message.cancel, 0) === 1) throw new TaskCancelled();
    };
    stopIfCancelled();
    // The engine stops itself at its deadline (a "timeout" refusal); the time spent queued counts.
    const value = await task(message.input, {
      deadlineMs: Math.max(1, message.deadlineAt - Date.now()),
      stopIfCancelled,
    });
    return { ok: true, value };
  } catch (error) {
    return { ok: false, error: sendError(error) };
  }
}
