// A cooperative time limit: long loops call check() and the work stops with EngineError "timeout"
// instead of running on. performance.now() exists in browsers, Web Workers and Node.

import { EngineError } from "./errors";

const now = (): number => globalThis.performance.now();

export class Deadline {
  private readonly end: number;
  private calls = 0;

  constructor(ms?: number) {
    this.end = ms === undefined || !Number.isFinite(ms) ? Infinity : now() + Math.max(0, ms);
  }

  /** Cheap enough for inner loops: reads the clock once every 64 calls. */
  check(): void {
    if (this.end === Infinity) return;
    if ((++this.calls & 63) !== 0) return;
    if (now() > this.end) throw new EngineError("timeout", "The computation ran past its time limit.");
  }

  /** Reads the clock now (for the start of each stage). */
  checkNow(): void {
    if (this.end !== Infinity && now() > this.end)
      throw new EngineError("timeout", "The computation ran past its time limit.");
  }
}

export const NO_DEADLINE = new Deadline();
