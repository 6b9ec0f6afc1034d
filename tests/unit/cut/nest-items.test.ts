// What the nester receives (nestItemsFor) and the fallback shelf layout, checked the way docs/fabrication.md §6.4
// says a nest is checked: every copy placed once, in an allowed rotation, inside the sheet less its
// margin, no two parts overlapping and at least the spacing apart (polyclip-ts, jsts).
import { beforeAll, describe, expect, it } from "vitest";
import type { Pt } from "@/lib/track";
import { buildCutParts, nestItemsFor, type CutPlanResult } from "@/lib/cut/plan";
import { perimeter, ringArea } from "@/lib/geometry/ring";
import { shelfLayout } from "@/lib/cut/shelf-layout";
import { kerfParts, type ToolPath } from "@/lib/cut/kerf";
import type { NestItem } from "@/lib/nest/types";
import { DEMO_SETTINGS, SQUARE_SPEC, squareResult } from "./support/fixtures";
import { jDistance, jRing, pcDifferenceArea, pcIntersectionArea } from "./support/geometry-check";

function placeRing(ring: Pt[], deg: number, x: number, y: number): Pt[] {
  const a = (deg * Math.PI) / 180;
  return ring.map(([px, py]) => [px * Math.cos(a) - py * Math.sin(a) + x, px * Math.sin(a) + py * Math.cos(a) + y]);
}

describe("nest items and the shelf layout", () => {
  let plan: CutPlanResult;
  let items: NestItem[];
  let paths: Map<string, ToolPath>;
  beforeAll(async () => {
    plan = buildCutParts(SQUARE_SPEC, squareResult(), DEMO_SETTINGS);
    items = await nestItemsFor(plan.parts, plan.settings);
    paths = (await kerfParts(plan.parts, plan.settings)).paths;
  });

  it("gives kerf-offset outlines, quantities and the rotations the grain allows", async () => {
    for (const [i, p] of plan.parts.entries()) {
      const it = items[i];
      expect(it.id).toBe(p.id);
      expect(it.quantity).toBe(p.quantity);
      // The nest outline is the whole tool path (checked by polyclip-ts, not by our own code) …
      const tool = paths.get(p.id)!.outer;
      expect(pcDifferenceArea({ outer: tool, holes: [] }, { outer: it.polygon, holes: [] })).toBeLessThan(1e-6);
      expect(pcDifferenceArea({ outer: it.polygon, holes: [] }, { outer: tool, holes: [] })).toBeLessThan(1e-6);
      // … which grows the nominal outline by about perimeter × k/2 (docs/fabrication.md §4.1, k = 6 mm here).
      const grown = (ringArea(it.polygon) - ringArea(p.region.outer)) / perimeter(p.region.outer);
      expect(grown).toBeGreaterThan(3 * 0.98);
      expect(grown).toBeLessThan(3 * 1.02);
      expect(it.rotations).toEqual(p.kind === "track" ? [0, 180] : [0, 90, 180, 270]);
    }
    const noGrain = await nestItemsFor(plan.parts, {
      ...plan.settings,
      sheet: { ...plan.settings.sheet, grain: "none" },
    });
    expect(noGrain[0].rotations).toEqual([0, 90, 180, 270]);
    const fixed = await nestItemsFor(plan.parts, { ...plan.settings, rotations: "none" });
    expect(fixed.every((x) => x.rotations.length === 1 && x.rotations[0] === 0)).toBe(true);
  });

  it("the shelf layout places every copy once, inside the margin, apart by the spacing", () => {
    const sheet = { width: 2440, height: 1220 };
    const margin = 10;
    const spacing = 6;
    const nest = shelfLayout({ items, sheet, margin, spacing });
    expect(nest.unplaced).toEqual([]);
    const byId = new Map(items.map((x) => [x.id, x]));
    for (const it of items) {
      const copies = nest.sheets.flatMap((s) => s.placements.filter((p) => p.id === it.id).map((p) => p.copy)).sort();
      expect(copies).toEqual([...Array(it.quantity).keys()]);
    }
    const inner = {
      outer: [
        [margin, margin],
        [sheet.width - margin, margin],
        [sheet.width - margin, sheet.height - margin],
        [margin, sheet.height - margin],
      ] as Pt[],
      holes: [],
    };
    for (const s of nest.sheets) {
      const placed = s.placements.map((p) => {
        expect(byId.get(p.id)!.rotations).toContain(p.rotation);
        return placeRing(byId.get(p.id)!.polygon, p.rotation, p.x, p.y);
      });
      for (const [i, a] of placed.entries()) {
        expect(pcDifferenceArea({ outer: a, holes: [] }, inner)).toBeLessThan(1e-6);
        for (const b of placed.slice(i + 1)) {
          expect(pcIntersectionArea({ outer: a, holes: [] }, { outer: b, holes: [] })).toBeLessThan(1e-6);
          expect(jDistance(jRing(a), jRing(b))).toBeGreaterThanOrEqual(spacing - 1e-6);
        }
      }
      const area = s.placements.reduce((acc, p) => acc + ringArea(byId.get(p.id)!.polygon), 0);
      expect(s.utilisation).toBeCloseTo(area / (sheet.width * sheet.height), 12);
    }
  });

  it("reports a copy too big for any sheet as unplaced", () => {
    const big: NestItem = {
      id: "X",
      polygon: [
        [0, 0],
        [3000, 0],
        [3000, 10],
        [0, 10],
      ],
      quantity: 2,
      rotations: [0, 90],
    };
    const nest = shelfLayout({ items: [big], sheet: { width: 2440, height: 1220 }, margin: 10, spacing: 6 });
    expect(nest.sheets).toHaveLength(0);
    expect(nest.unplaced.map((u) => u.copy)).toEqual([0, 1]);
  });
});
