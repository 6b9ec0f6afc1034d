// Late acceptance hill climbing (Burke & Bykov 2017, "The late acceptance hill-climbing
// heuristic", EJOR 258(1):70–78): a candidate is accepted when it is no worse than the current
// solution or than the solution that was current `length` iterations ago. One parameter, no
// temperature to tune against each instance's cost scale.
export class LateAcceptance {
  private readonly history: number[];
  private k = 0;

  constructor(length: number, initialCost: number) {
    this.history = new Array(Math.max(1, length)).fill(initialCost);
  }

  /** Decides on a candidate and records the current cost after the decision. */
  accept(candidate: number, current: number): boolean {
    const slot = this.k % this.history.length;
    const ok = candidate <= current || candidate <= this.history[slot];
    this.history[slot] = ok ? candidate : current;
    this.k++;
    return ok;
  }

  reset(cost: number): void {
    this.history.fill(cost);
  }
}
