// The main thread's side of the solve worker (solve-worker.ts), kept out of React: request ids,
// "latest request wins", and ending a worker that is stuck on a stale solve.
import type { LoadsRequest, SolveReply } from "./solve-worker";

/**
 * A worker that has said nothing for this long while a newer request waits is busy with a stale,
 * slow solve (a heavy formula may run for seconds); it is ended and a fresh one takes the request.
 * Short enough not to be felt, long enough that quick typing never pays for a worker's start-up.
 */
export const STALE_WORKER_MS = 300;

export class SolverClient {
  private worker: Worker | null = null;
  private seq = 0;
  /** The request whose last reply is still to come (null while the worker is idle). */
  private waiting: number | null = null;
  /** The newest request that has had any reply. */
  private answered = 0;
  private heardAt = 0;
  private timer: ReturnType<typeof setTimeout> | undefined;
  private listener: ((reply: SolveReply) => void) | null = null;

  constructor(private readonly createWorker: () => Worker) {}

  /**
   * Posts a spec at once. Replies carry their request id and only those for the newest request
   * reach `onReply`: a reply for an older one is stale and dropped.
   */
  request(spec: unknown, onReply: (reply: SolveReply) => void, loads: LoadsRequest | null = null): void {
    const id = ++this.seq;
    this.listener = onReply;
    const busyWithOlder = this.waiting !== null;
    this.waiting = id;
    const w = this.worker ?? this.start();
    w.postMessage({ id, spec, loads });
    clearTimeout(this.timer);
    // The worker gives way to a newer request between stages; a single stage that runs long is
    // watched here instead.
    if (busyWithOlder) this.watch(id, spec, loads, w);
  }

  dispose(): void {
    clearTimeout(this.timer);
    this.worker?.terminate();
    this.worker = null;
    this.waiting = null;
    this.listener = null;
  }

  private start(): Worker {
    const w = this.createWorker();
    w.onmessage = (event: MessageEvent<SolveReply>) => this.receive(event.data);
    w.onerror = () => {
      this.waiting = null;
      this.listener?.({ id: this.seq, stage: "geometry", ok: false, error: { message: "The solver could not start in this browser.", code: "internal" } });
    };
    this.worker = w;
    this.heardAt = performance.now();
    return w;
  }

  private receive(reply: SolveReply): void {
    this.heardAt = performance.now();
    if (reply.id !== this.seq) return;
    this.answered = reply.id;
    if (!reply.ok || reply.stage === "loads") this.waiting = null;
    this.listener?.(reply);
  }

  private watch(id: number, spec: unknown, loads: LoadsRequest | null, w: Worker): void {
    this.timer = setTimeout(() => {
      if (this.answered >= id || this.worker !== w) return;
      if (performance.now() - this.heardAt < STALE_WORKER_MS) return this.watch(id, spec, loads, w);
      w.terminate();
      this.start().postMessage({ id, spec, loads });
    }, STALE_WORKER_MS);
  }
}
