// The time budget of a run: the clock, the caller's AbortSignal, an optional iteration cap, progress
// reports a few times a second, and a pause now and then so that the event loop (a Web Worker's
// message queue in the browser) can deliver a cancel request.
import type { NestProgress } from "./types";

const YIELD_EVERY_MS = 40;
const REPORT_EVERY_MS = 200;

const now = () => (typeof performance !== "undefined" ? performance.now() : Date.now());

export class Budget {
  private t0 = now();
  private lastYield = this.t0;
  private lastReport = -Infinity;
  /** The whole run's length, for progress, when this budget is one phase of it (see `phase`). */
  private total: number;
  iterations = 0;

  constructor(
    readonly seconds: number,
    private readonly signal?: AbortSignal,
    private readonly maxIterations?: number,
    private readonly onProgress?: (p: NestProgress) => void,
  ) {
    this.total = seconds;
  }

  /**
   * A phase of this run that must end `seconds` after the run began (the same clock, cancel and
   * progress; its own iteration count).
   */
  phase(seconds: number): Budget {
    const b = new Budget(Math.min(seconds, this.seconds), this.signal, this.maxIterations, this.onProgress);
    b.t0 = this.t0;
    b.lastYield = this.lastYield;
    b.total = this.seconds;
    return b;
  }

  elapsed(): number {
    return (now() - this.t0) / 1000;
  }

  fraction(): number {
    return this.total > 0 ? Math.min(1, this.elapsed() / this.total) : 1;
  }

  get aborted(): boolean {
    return this.signal?.aborted ?? false;
  }

  get outOfIterations(): boolean {
    return this.maxIterations !== undefined && this.iterations >= this.maxIterations;
  }

  /** True when the search must stop: cancelled, out of time or out of iterations. */
  done(): boolean {
    return (
      this.aborted ||
      this.elapsed() >= this.seconds ||
      (this.maxIterations !== undefined && this.iterations >= this.maxIterations)
    );
  }

  /** Lets the event loop run if the last pause was long enough ago, and reports progress. */
  async pause(progress: () => Omit<NestProgress, "fraction">): Promise<void> {
    const t = now();
    if (this.onProgress && t - this.lastReport >= REPORT_EVERY_MS) {
      this.lastReport = t;
      this.onProgress({ fraction: this.fraction(), ...progress() });
    }
    if (t - this.lastYield >= YIELD_EVERY_MS) {
      await new Promise<void>((resolve) => setTimeout(resolve, 0));
      this.lastYield = now();
    }
  }

  report(progress: NestProgress): void {
    this.lastReport = now();
    this.onProgress?.(progress);
  }
}
