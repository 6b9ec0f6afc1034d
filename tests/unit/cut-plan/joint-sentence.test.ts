// The sentence the cut-plan page shows after choosing the joints (components/cut/nest-figures.ts):
// the figures the worker reports, said plainly, with the stations as the cut stations field holds them.
import { describe, expect, it } from "vitest";
import type { JointChoiceReport } from "@/components/cut/cut-worker";
import { jointSentence } from "@/components/cut/nest-figures";

const demo: JointChoiceReport = {
  changed: true,
  cuts: [2118.6, 4233.9, 5644.1],
  defaultCuts: [2118.6264129804567, 4233.923021827361],
  sheets: 1,
  defaultSheets: 2,
  unplaced: 0,
  defaultUnplaced: 0,
  segments: 4,
  defaultSegments: 3,
  lastSheetUse: 0.689,
  defaultLastSheetUse: 0.055,
  sheetsSaved: 1,
  tried: 1,
  candidates: 29,
  ended: "searched",
};

describe("the joint choice's sentence", () => {
  it("names the stations and the sheets saved", () => {
    expect(jointSentence(demo)).toBe(
      "Joints at 2118.6, 4233.9, 5644.1 mm: 1 sheet instead of 2 (1 sheet saved). They are in the cut stations field now; empty it to choose again.",
    );
  });

  it("says plainly when the usual joints stay", () => {
    const kept = { ...demo, changed: false, cuts: demo.defaultCuts, sheets: 2, sheetsSaved: 0, tried: 29 };
    expect(jointSentence(kept)).toBe(
      "No other joints nest better than the usual joints at 2118.6, 4233.9 mm: 2 sheets (29 other choices looked at, 29 nested).",
    );
    expect(jointSentence({ ...kept, tried: 0, ended: "time" })).toMatch(
      /^The search time ran out before any other joints were nested: the usual joints at 2118\.6, 4233\.9 mm, 2 sheets\./,
    );
    expect(jointSentence({ ...kept, tried: 3, ended: "cancelled" })).toBe(
      "No other joints nested so far better than the usual joints at 2118.6, 4233.9 mm: 2 sheets (stopped early, after nesting 3 of 29 other choices).",
    );
  });

  it("tells a larger offcut from a saved sheet", () => {
    const offcut = { ...demo, sheets: 2, sheetsSaved: 0, segments: 3, lastSheetUse: 0.136, defaultLastSheetUse: 0.193 };
    expect(jointSentence(offcut)).toMatch(
      /^Joints at .* mm: 2 sheets as with the usual joints, with more of the last sheet left whole \(13\.6 % used instead of 19\.3 %\)\./,
    );
  });
});
