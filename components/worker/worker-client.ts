// The one way the pages talk to a Web Worker (the studio's solver, the cut plan's parts and nester),
// kept out of React so it can be tested with a fake worker. Each request gets an id that the worker
// puts on its replies; only the newest request's replies get through ("the latest request wins").
// A worker that cannot start, dies, or goes silent for too long ends the request with a plain
// message instead of leaving the page waiting.

/** What a request's listener hears: the worker's replies, or one failure in plain words. */
export type WorkerEvent<Reply> = { type: "reply"; reply: Reply } | { type: "failed"; message: string };

export interface WorkerClientOptions<Reply> {
  create: () => Worker;
  /** The last reply of a request: the worker is idle after it. Default: the first reply is the last. */
  isLast?: (reply: Reply) => boolean;
  /**
   * A new request while the worker is still busy with an older one: 0 ends the busy worker at once
   * and starts a fresh one; n > 0 lets the worker go on while it keeps replying, and replaces it
   * once it has said nothing for n ms; absent: the request waits its turn in the worker's queue.
   */
  replaceBusyAfterMs?: number;
  /** A request that hears nothing for this long is given up (the worker is ended). */
  silenceLimitMs?: number;
  /** Said when the worker cannot start or stops on an error. */
  crashMessage: string;
  /** Said when a request goes silent for `silenceLimitMs`. */
  silenceMessage?: string;
}

type Listener<Reply> = (event: WorkerEvent<Reply>) => void;

export class WorkerClient<Request extends object, Reply extends { id: number }> {
  private worker: Worker | null = null;
  private seq = 0;
  /** The request whose last reply is still to come (null while the worker is idle). */
  private waiting: number | null = null;
  /** The newest request that has had any reply. */
  private answered = 0;
  private heardAt = 0;
  private posted: (Request & { id: number }) | null = null;
  private listener: Listener<Reply> | null = null;
  private staleTimer: ReturnType<typeof setTimeout> | undefined;
  private silenceTimer: ReturnType<typeof setTimeout> | undefined;

  constructor(private readonly options: WorkerClientOptions<Reply>) {}

  /** The newest request's id (0 before the first). */
  get current(): number {
    return this.seq;
  }

  /** Posts a request at once; its replies (and nothing older's) reach `listener`. Returns its id. */
  request(body: Request, listener: Listener<Reply>): number {
    const id = ++this.seq;
    const message = { ...body, id };
    this.listener = listener;
    this.posted = message;
    const busyWithOlder = this.waiting !== null;
    this.waiting = id;
    clearTimeout(this.staleTimer);
    const replace = this.options.replaceBusyAfterMs;
    if (busyWithOlder && replace === 0) this.stopWorker();
    const w = this.worker ?? this.startWorker();
    w.postMessage(message);
    if (busyWithOlder && replace !== undefined && replace > 0) this.watchStale(id, w, replace);
    this.armSilence();
    return id;
  }

  /** Posts a message about the current request (e.g. a cancel the worker answers with its best so far). */
  send(message: object): void {
    this.worker?.postMessage(message);
  }

  /** Drops the current request and ends its worker; the next request starts a fresh one. */
  stop(): void {
    this.waiting = null;
    this.listener = null;
    this.stopWorker();
  }

  dispose(): void {
    this.stop();
    this.posted = null;
  }

  private startWorker(): Worker {
    const w = this.options.create();
    w.onmessage = (event: MessageEvent<Reply>) => this.receive(w, event.data);
    w.onerror = (event) => {
      // The page is told in plain words; the browser's own text stays in the console.
      event?.preventDefault?.();
      if (this.worker !== w) return;
      this.fail(this.options.crashMessage);
    };
    this.worker = w;
    this.heardAt = performance.now();
    return w;
  }

  private stopWorker(): void {
    clearTimeout(this.staleTimer);
    clearTimeout(this.silenceTimer);
    this.worker?.terminate();
    this.worker = null;
  }

  private receive(w: Worker, reply: Reply): void {
    if (this.worker !== w) return;
    this.heardAt = performance.now();
    if (reply.id !== this.seq || this.waiting === null) return;
    this.answered = reply.id;
    const last = this.options.isLast ? this.options.isLast(reply) : true;
    if (last) {
      this.waiting = null;
      clearTimeout(this.silenceTimer);
    } else this.armSilence();
    this.listener?.({ type: "reply", reply });
  }

  private fail(message: string): void {
    const listener = this.listener;
    this.stop();
    listener?.({ type: "failed", message });
  }

  // The worker gives way to a newer request between its own steps; a single step that runs long on
  // an overtaken request is watched here instead.
  private watchStale(id: number, w: Worker, ms: number): void {
    this.staleTimer = setTimeout(() => {
      if (this.answered >= id || this.worker !== w) return;
      if (performance.now() - this.heardAt < ms) return this.watchStale(id, w, ms);
      w.terminate();
      this.worker = null;
      this.startWorker().postMessage(this.posted);
    }, ms);
  }

  private armSilence(): void {
    clearTimeout(this.silenceTimer);
    const ms = this.options.silenceLimitMs;
    if (ms === undefined) return;
    this.silenceTimer = setTimeout(() => {
      if (this.waiting === null) return;
      if (performance.now() - this.heardAt < ms) return this.armSilence();
      this.fail(this.options.silenceMessage ?? this.options.crashMessage);
    }, ms);
  }
}
