// solve(spec, { check: false }) and solveInStages: the studio draws the geometry before the rolling
// check has run, so the stages must add up to exactly what one solve(spec) returns.
import { describe, expect, it } from "vitest";
import { PRESETS } from "@/lib/studio/presets";
import { solve, solveInStages } from "@/lib/track";
import { engineError } from "./engine-error";

describe("solving in stages", () => {
  it.each(PRESETS.map((p) => [p.id, p.spec] as const))("%s: the stages together equal one full solve", (_, spec) => {
    const full = solve(spec);
    const staged = solveInStages(spec);
    const options = staged.options();
    expect(staged.geometry).not.toHaveProperty("check");
    expect(staged.geometry).not.toHaveProperty("options");
    expect(options).toEqual(full.options);
    expect({ ...staged.geometry, ...(options ? { options } : {}), ...staged.check() }).toEqual(full);
  });

  it("check: false gives the geometry with its options, without the check or warnings", () => {
    const spec = PRESETS.find((p) => p.id === "ellipse-pair")!.spec;
    const full = solve(spec);
    const geometry = solve(spec, { check: false });
    expect(geometry).not.toHaveProperty("check");
    expect(geometry).not.toHaveProperty("warnings");
    const { check, warnings, ...rest } = full;
    expect(check.closureError).toBeDefined();
    expect(warnings).toBeInstanceOf(Array);
    expect(geometry).toEqual(rest);
  });

  it("each stage keeps its own time limit", () => {
    const staged = solveInStages({
      mode: "twin-wheels",
      track: { kind: "sine", amplitude: 10, period: 100 },
      periodsPerTurn: 3,
    });
    expect(engineError(() => staged.check({ deadlineMs: 0 })).code).toBe("timeout");
    // A stage that ran out of time can be asked again with more.
    expect(staged.check().check.closureError).toBeLessThan(1e-9);
  });
});
