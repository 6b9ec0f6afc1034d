// The server's check of a nest: hand-made layouts of 100 × 50 rectangles whose gaps are known
// exactly (plain arithmetic on axis-aligned boxes), so each verdict can be worked out by hand.
import { describe, expect, it } from "vitest";
import { checkNest } from "@/lib/cut-plan/verify-nest";
import { placeRing } from "@/lib/geometry/place";
import type { NestItem, SheetPlacement } from "@/lib/nest/types";

const rect: NestItem = {
  id: "T01",
  polygon: [
    [0, 0],
    [100, 0],
    [100, 50],
    [0, 50],
  ],
  quantity: 2,
  rotations: [0, 180],
};
const sheet = { width: 400, height: 200 };

function check(
  placements: SheetPlacement[],
  over: {
    spacing?: number;
    margin?: number;
    items?: NestItem[];
    unplaced?: { id: string; copy: number; reason: string }[];
  } = {},
) {
  return checkNest({
    items: over.items ?? [rect],
    nest: { sheets: [{ index: 0, utilisation: 0, placements }], unplaced: over.unplaced ?? [] },
    sheet,
    margin: over.margin ?? 10,
    spacing: over.spacing ?? 6,
  });
}

const at = (copy: number, x: number, y: number, rotation = 0): SheetPlacement => ({
  id: "T01",
  copy,
  rotation,
  x,
  y,
  sheet: 0,
});

describe("checkNest", () => {
  it("accepts two parts 6 apart with 6 spacing, inside a 10 margin", async () => {
    // Boxes [10,110]×[10,60] and [116,216]×[10,60]: gap 116 − 110 = 6.
    expect(await check([at(0, 10, 10), at(1, 116, 10)])).toEqual([]);
  });

  it("refuses parts 5 apart when the spacing is 6", async () => {
    const problems = await check([at(0, 10, 10), at(1, 115, 10)]);
    expect(problems).toEqual(["T01 (copy 1) and T01 (copy 2) on sheet 1 are closer than the 6 part spacing."]);
  });

  it("measures true distance at sharp corners (no mitre overshoot)", async () => {
    // Two diamonds (squares turned 45°, half-diagonal 50) tip to tip: tips at x = 110 and x = 116,
    // exactly the 6 spacing apart. A mitred growth would reach past the tips and call them too close.
    const diamond: NestItem = {
      id: "D1",
      polygon: [
        [0, -50],
        [50, 0],
        [0, 50],
        [-50, 0],
      ],
      quantity: 2,
      rotations: [0],
    };
    const place = (copy: number, x: number): SheetPlacement => ({ id: "D1", copy, rotation: 0, x, y: 100, sheet: 0 });
    expect(await check([place(0, 60), place(1, 166)], { items: [diamond] })).toEqual([]);
    expect(await check([place(0, 60), place(1, 165)], { items: [diamond] })).toHaveLength(1);
  });

  it("refuses overlapping parts even with no spacing", async () => {
    expect(await check([at(0, 10, 10), at(1, 60, 30)], { spacing: 0 })).toHaveLength(1);
  });

  it("refuses a part over the margin", async () => {
    // x from 5 to 105: 5 < margin 10.
    expect(await check([at(0, 5, 10), at(1, 200, 100)])).toEqual([
      "T01 (copy 1) on sheet 1 is not inside the sheet's 10 margin.",
    ]);
  });

  it("rotates about the part's own origin before moving it", async () => {
    // Turned 180°, the box spans [−100, 0] × [−50, 0]; moved by (110, 60) it is [10, 110] × [10, 60].
    const turned = placeRing(rect.polygon, 180, 110, 60).map(([x, y]) => [Math.round(x) + 0, Math.round(y) + 0]);
    expect(turned).toEqual([
      [110, 60],
      [10, 60],
      [10, 10],
      [110, 10],
    ]);
    expect(await check([at(0, 110, 60, 180), at(1, 116, 10)])).toEqual([]);
  });

  it("refuses a rotation the part may not take, a copy placed twice, and a missing copy", async () => {
    const problems = await check([at(0, 10, 10, 90), at(0, 200, 100)]);
    expect(problems).toContain("T01 (copy 1) is turned 90°, which its grain or the settings do not allow.");
    expect(problems).toContain("T01 (copy 1) is placed twice.");
    expect(problems).toContain("T01 (copy 2) is missing from the nest.");
  });

  it("reports unplaced parts with the nester's reason", async () => {
    const problems = await check([at(0, 10, 10)], {
      unplaced: [{ id: "T01", copy: 1, reason: "too long for the sheet" }],
    });
    expect(problems).toEqual(["T01 (copy 2) is not placed: too long for the sheet"]);
  });
});
