// Bad settings and designs that cannot be cut as asked: each a CutError with the field to fix and a
// message that says what is wrong and by how much.
import { describe, expect, it } from "vitest";
import { buildCutParts } from "@/lib/cut/plan";
import { CutError } from "@/lib/cut/errors";
import { DEFAULT_CUT_SETTINGS, parseCutSettings } from "@/lib/cut/settings";
import { DEMO_SETTINGS, SQUARE_SPEC, squareResult } from "./support/fixtures";

function cutError(f: () => unknown): CutError {
  try {
    f();
  } catch (e) {
    if (e instanceof CutError) return e;
    throw e;
  }
  throw new Error("expected a CutError");
}

const build = (settings: object) => () => buildCutParts(SQUARE_SPEC, squareResult(), { ...DEMO_SETTINGS, ...settings });

describe("bad input", () => {
  it("has sensible defaults (docs/fabrication.md §4: 2440 × 1220 sheets, a 6 mm router cutter, 10 mm margin)", () => {
    expect(DEFAULT_CUT_SETTINGS.sheet).toEqual({ length: 2440, width: 1220, thickness: 18, grain: "length" });
    expect(DEFAULT_CUT_SETTINGS.machine.kerf).toBe(6);
    expect(DEFAULT_CUT_SETTINGS.margin).toBe(10);
    expect(DEFAULT_CUT_SETTINGS.trackLines).toBe(2); // a trike's two rear wheels
    expect(DEFAULT_CUT_SETTINGS.layers).toBe(1);
    expect(DEFAULT_CUT_SETTINGS.outputUnits).toBe("mm");
    expect(DEFAULT_CUT_SETTINGS.kerfInFile).toBe(false);
  });

  it.each([0, -1.5])("refuses a kerf of %f mm", (kerf) => {
    const e = cutError(() => parseCutSettings({ machine: { kerf } }));
    expect(e.code).toBe("invalid-settings");
    expect(e.field).toBe("machine.kerf");
    expect(e.message).toMatch(/kerf must be more than 0 mm/);
  });

  it("refuses a cutter wider than the key's slot", () => {
    const e = cutError(build({ joint: { kind: "key", keyWidth: 5 } }));
    expect(e.field).toBe("joint.keyWidth");
    expect(e.message).toMatch(/5 mm wide, narrower than the 6 mm kerf/);
    // The same key is fine on a laser.
    expect(() => build({ joint: { kind: "key", keyWidth: 5 }, machine: { kind: "laser", kerf: 0.2 } })()).not.toThrow();
  });

  it("refuses a run shorter than one period", () => {
    const e = cutError(build({ runLength: 350 }));
    expect(e.code).toBe("run-too-short");
    expect(e.field).toBe("runLength");
    expect(e.message).toMatch(/350 mm.*352\.5 mm/); // P = 400·asinh(1) = 352.55 mm (Hall & Wagon 1992)
  });

  it("refuses a part bigger than the sheet, naming it and by how much", () => {
    // The track parts are 162.84 mm tall (crest to base: 200(√2 − 1) + 80); a 170 mm sheet less
    // 2 × 10 mm margins leaves 150 mm, and the kerf adds 6 mm: 18.84 mm too wide.
    const e = cutError(build({ sheet: { length: 2440, width: 170 } }));
    expect(e.code).toBe("part-too-big");
    expect(e.field).toBe("sheet");
    expect(e.message).toMatch(/Part T01 \(Track segment 1 of 3\)/);
    expect(e.message).toMatch(/18\.84 mm too wide/);
    // The machine bed binds when it is the smaller: the 400 mm square wheel (406 mm with the kerf) on a 300 mm wide bed.
    const b = cutError(build({ machine: { bed: { length: 3000, width: 300 } } }));
    expect(b.field).toBe("machine.bed");
    expect(b.message).toMatch(/Part W1/);
  });

  it("checks user cut stations", () => {
    expect(cutError(build({ cuts: [3000, 2000] })).field).toBe("cuts.1");
    expect(cutError(build({ cuts: [7000] })).field).toBe("cuts.0");
    const long = cutError(build({ cuts: [3000] }));
    expect(long.code).toBe("bad-cuts");
    expect(long.message).toMatch(/Segment 1 .* more than the usable sheet length/);
    const ok = buildCutParts(SQUARE_SPEC, squareResult(), { ...DEMO_SETTINGS, cuts: [2000, 4000] });
    expect(ok.run!.cuts).toEqual([2000, 4000]);
    expect(ok.parts.filter((p) => p.kind === "track").map((p) => p.station)).toEqual([
      { x0: 0, x1: 2000 },
      { x0: 2000, x1: 4000 },
      { x0: 4000, x1: 6000 },
    ]);
  });

  it("names unknown and mistyped settings", () => {
    expect(cutError(() => parseCutSettings({ sheet: { colour: "red" } })).field).toBe("sheet.colour");
    const e = cutError(() => parseCutSettings({ runLength: "long" }));
    expect(e.field).toBe("runLength");
    expect(e.message).toBe("The run length must be a number of millimetres.");
    expect(cutError(() => parseCutSettings({ rotations: "45" })).message).toMatch(/one of "free", "90", "180", "none"/);
  });

  it("refuses a solve result that is not the spec's", () => {
    const e = cutError(() =>
      buildCutParts({ ...SQUARE_SPEC, wheel: { ...SQUARE_SPEC.wheel, side: 300 } }, squareResult(), DEMO_SETTINGS),
    );
    expect(e.field).toBe("spec");
  });
});
