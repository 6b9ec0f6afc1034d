// Quality targets of the strip nester on two ESICUP instances. The search stops on an iteration count,
// not the clock, so the layout (seed 1) is the same on any machine and the test cannot pass or fail
// with the machine's speed; what 60 s gives on this machine is `npm run bench`'s figure
// (scripts/bench-nest.ts), where speed targets belong. Validity is checked with jsts (layout-check.ts);
// the utilisation is recomputed from the outlines.
import { describe, expect, it } from "vitest";
import { loadInstance, nestStrip } from "@/lib/nest";
import { expectValidStrip, readFixture } from "./layout-check";

/** Iterations of the search: about 75 s of this 2-core machine for jakobs1, 10 s for shapes0. */
const JAKOBS1_ITERATIONS = 80_000;
const SHAPES0_ITERATIONS = 40_000;

describe("strip nesting targets (fixed iteration budget)", () => {
  it("jakobs1 (rotations 0/90/180/270 from the file): utilisation ≥ 85 %", async () => {
    const inst = loadInstance(readFixture("jakobs1"));
    const result = await nestStrip({
      items: inst.items,
      height: inst.height,
      seconds: 600,
      maxIterations: JAKOBS1_ITERATIONS,
      seed: 1,
    });
    const { utilisation } = expectValidStrip(inst.items, result, inst.height);
    // It stopped on the count, not on the (generous) clock: the result does not depend on the machine.
    expect(result.iterations).toBe(JAKOBS1_ITERATIONS);
    expect(result.cancelled).toBe(false);
    // Target 85 %, acceptance requirement. Published best: Gardeyn, Vanden Berghe & Wauters 2025
    // (arXiv:2509.13329), 89.08 % average of 100 runs of 1200 s (the issue text rounds it to 89.1 %).
    expect(utilisation).toBeGreaterThanOrEqual(0.85);
    // Sanity ceiling (docs/fabrication.md §6.4): the best layout known, L = 10.980 at this height (89.25 %,
    // docs/fabrication.md §1.2 A), is below 89.3 %; anything above means an overlap or an area bug.
    expect(utilisation).toBeLessThan(0.893);
  }, 600_000);

  it("shapes0 (rotation 0 only): utilisation ≥ 63 %", async () => {
    const inst = loadInstance(readFixture("shapes0"));
    expect(inst.items.every((it) => it.rotations.length === 1 && it.rotations[0] === 0)).toBe(true);
    const result = await nestStrip({
      items: inst.items,
      height: inst.height,
      seconds: 600,
      maxIterations: SHAPES0_ITERATIONS,
      seed: 1,
    });
    const { utilisation } = expectValidStrip(inst.items, result, inst.height);
    expect(result.iterations).toBe(SHAPES0_ITERATIONS);
    // Target 63 %, acceptance requirement. Published: arXiv:2509.13329, 68.59 % average (issue text 68.6 %).
    expect(utilisation).toBeGreaterThanOrEqual(0.63);
    // Sanity ceiling (docs/fabrication.md §6.4): the best known, 69.98 % (sparrow's record, docs/fabrication.md §1.2 A), is below 70 %.
    expect(utilisation).toBeLessThan(0.7);
  }, 600_000);
});
