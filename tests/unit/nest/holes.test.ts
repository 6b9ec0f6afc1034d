// Small parts nested in the holes of a big one (sheet mode): a 600 mm frame with a 400 mm square hole
// and 150 mm squares on a 700 mm sheet. Outside the frame only an 80 mm band is left, so a square can
// only share the frame's sheet from inside its hole. Checked with polyclip-ts (areas with holes) and
// jsts (distances), never with the nester's own Clipper bookkeeping.
import { describe, expect, it } from "vitest";
import type { Pt } from "@/lib/geometry/point";
import { placeRing } from "@/lib/geometry/place";
import { loadClipper, toPath } from "@/lib/geometry/clipper";
import { holeFit } from "@/lib/nest/hole-fit";
import { nestOnSheets, type NestItem } from "@/lib/nest";
import { checkNest } from "@/lib/cut-plan/verify-nest";
import { jDistance, jPolygon, pcDifferenceArea, pcIntersectionArea } from "../cut/support/geometry-check";

const square = (x: number, y: number, s: number): Pt[] => [
  [x, y],
  [x + s, y],
  [x + s, y + s],
  [x, y + s],
];
const frame: NestItem = {
  id: "F",
  polygon: square(0, 0, 600),
  holes: [square(100, 100, 400).reverse()],
  quantity: 1,
  rotations: [0],
};
const small: NestItem = { id: "S", polygon: square(0, 0, 150), quantity: 8, rotations: [0, 90] };
const sheet = { width: 700, height: 700 };
const margin = 10;
const spacing = 5;

describe("holes of big parts", () => {
  it("the fit inside a 400 mm square hole of a 150 mm square is the 250 mm square of reference points (closed form)", async () => {
    const lib = await loadClipper();
    const S = 1000;
    const fit = holeFit(lib, toPath(square(100, 100, 400), S), toPath(square(0, 0, 150), S));
    const area = fit.reduce((s, p) => s + lib.area(p), 0) / (S * S);
    expect(area).toBeCloseTo(250 * 250, 0);
  });

  it("take small parts on the big part's sheet, clear of it by the spacing", async () => {
    const items = [frame, small];
    const result = await nestOnSheets({ items, sheet, margin, spacing, seconds: 2, seed: 1 });
    // Net of the hole the parts' area fits one sheet, but outside the frame only an 80 mm band is left.
    expect(result.areaBound).toBe(1);
    expect(result.unplaced).toEqual([]);
    expect(result.sheets).toHaveLength(2);
    const first = result.sheets.find((s) => s.placements.some((p) => p.id === "F"))!;
    const inside = first.placements.filter((p) => p.id === "S");
    // 5 + 150 + 5 + 150 + 5 = 315 ≤ 400 across the hole, three would need 470: four fit.
    expect(inside).toHaveLength(4);
    const host = first.placements.find((p) => p.id === "F")!;
    const hostRegion = {
      outer: placeRing(frame.polygon, host.rotation, host.x, host.y),
      holes: frame.holes!.map((h) => placeRing(h, host.rotation, host.x, host.y)),
    };
    const rings = inside.map((p) => placeRing(small.polygon, p.rotation, p.x, p.y));
    const sheetInner = { outer: square(margin, margin, 700 - 2 * margin), holes: [] };
    for (const [i, r] of rings.entries()) {
      expect(pcIntersectionArea({ outer: r, holes: [] }, hostRegion)).toBeLessThan(1e-6);
      expect(pcDifferenceArea({ outer: r, holes: [] }, sheetInner)).toBeLessThan(1e-6);
      expect(jDistance(jPolygon({ outer: r, holes: [] }), jPolygon(hostRegion))).toBeGreaterThanOrEqual(spacing - 1e-4);
      for (const q of rings.slice(i + 1))
        expect(jDistance(jPolygon({ outer: r, holes: [] }), jPolygon({ outer: q, holes: [] }))).toBeGreaterThanOrEqual(
          spacing - 1e-4,
        );
    }
    // The server's own check agrees.
    expect(await checkNest({ items, nest: result, sheet, margin, spacing })).toEqual([]);
  });

  it("are not used when the parts come without them", async () => {
    const items = [{ ...frame, holes: undefined }, small];
    const result = await nestOnSheets({ items, sheet, margin, spacing, seconds: 2, seed: 1 });
    const first = result.sheets.find((s) => s.placements.some((p) => p.id === "F"))!;
    expect(first.placements).toHaveLength(1);
  });
});
