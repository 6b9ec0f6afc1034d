// Sheet nesting: as many sheets as needed, oversize parts named with their reason, spacing and
// margin held, rotations kept to the allowed set. Checked with jsts (layout-check.ts).
import { describe, expect, it } from "vitest";
import { loadInstance, nestOnSheets, type NestItem, type SheetNestResult } from "@/lib/nest";
import { expectValidLayout, readFixture } from "./layout-check";

const sheet = { width: 2440, height: 1220 }; // 8 × 4 ft plywood (docs/fabrication.md §4.3)
const rect = (id: string, w: number, h: number, quantity: number, rotations = [0, 90]): NestItem => ({
  id,
  polygon: [
    [0, 0],
    [w, 0],
    [w, h],
    [0, h],
  ],
  quantity,
  rotations,
});

/** Validity of every sheet, spacing and margin included; returns how many copies were placed. */
function expectValidSheets(items: NestItem[], result: SheetNestResult, margin: number, spacing: number): number {
  const inner = { minX: margin, minY: margin, maxX: sheet.width - margin, maxY: sheet.height - margin };
  let placed = 0;
  result.sheets.forEach((s, k) => {
    expect(s.index).toBe(k);
    expect(s.placements.every((p) => p.sheet === k)).toBe(true);
    const { report } = expectValidLayout(items, s.placements, inner, 2 * spacing);
    // Spacing may fall short by the nester's integer step, here ≤ 1e-5 mm (common practice: far below a laser's 0.1 mm).
    if (s.placements.length > 1) expect(report.minGap).toBeGreaterThanOrEqual(spacing - 1e-5);
    placed += s.placements.length;
  });
  const keys = result.sheets
    .flatMap((s) => s.placements.map((p) => `${p.id}#${p.copy}`))
    .concat(result.unplaced.map((u) => `${u.id}#${u.copy}`));
  expect(new Set(keys).size).toBe(keys.length); // each copy once, placed or not
  expect(keys.length).toBe(items.reduce((s, it) => s + it.quantity, 0));
  return placed;
}

describe("nestOnSheets", () => {
  it("uses several sheets when the parts need them", async () => {
    // 12 parts of 1000 × 500 with 5 mm spacing: a 2420 × 1200 usable area holds a 2 × 2 grid
    // (2005 × 1005) and no fifth part in either rotation, so exactly 3 sheets (closed form;
    // the area alone already rules out 2: 12 × 0.5 m² > 2 × 2.904 m²).
    const items = [rect("P", 1000, 500, 12)];
    const result = await nestOnSheets({ items, sheet, margin: 10, spacing: 5, seconds: 3, seed: 1 });
    expect(result.sheets).toHaveLength(3);
    expect(result.unplaced).toEqual([]);
    expect(expectValidSheets(items, result, 10, 5)).toBe(12);
    // Overall utilisation: part area / (sheets × sheet area), recomputed from the sizes.
    expect(result.utilisation).toBeCloseTo((12 * 1000 * 500) / (3 * sheet.width * sheet.height), 9);
  });

  it("names a part too long for the sheet, with its size and the usable area, and places the rest", async () => {
    const items = [rect("T03", 2650, 143, 1, [0, 180]), rect("T04", 2000, 143, 2, [0, 180])];
    const result = await nestOnSheets({ items, sheet, margin: 10, spacing: 6, seconds: 1 });
    expect(result.unplaced).toHaveLength(1);
    expect(result.unplaced[0]).toMatchObject({ id: "T03", copy: 0 });
    expect(result.unplaced[0].reason).toBe(
      "T03 is 2650 × 143 mm; the sheet's usable area is 2420 × 1200 mm in every allowed rotation",
    );
    expect(expectValidSheets(items, result, 10, 6)).toBe(2);
  });

  it("keeps spacing and margin for irregular parts, in the allowed rotations 0° and 180° only", async () => {
    // The jakobs1 pieces (Jakobs 1996), scaled to 25 mm per unit, 3 copies of each.
    const items: NestItem[] = loadInstance(readFixture("jakobs1")).items.map((it) => ({
      id: `J${it.id}`,
      polygon: it.polygon.map(([x, y]) => [25 * x, 25 * y] as [number, number]),
      quantity: 3,
      rotations: [0, 180],
    }));
    const result = await nestOnSheets({ items, sheet, margin: 12, spacing: 6, seconds: 4, seed: 2 });
    expect(result.unplaced).toEqual([]);
    expect(expectValidSheets(items, result, 12, 6)).toBe(75);
    const rotations = new Set(result.sheets.flatMap((s) => s.placements.map((p) => p.rotation)));
    expect([...rotations].every((r) => r === 0 || r === 180)).toBe(true);
    // Per-sheet utilisation is that sheet's part area over the sheet area.
    const area = new Map(
      items.map((it) => [
        it.id,
        it.polygon.reduce(
          (s, [x, y], k, r) => s + (x * r[(k + 1) % r.length][1] - r[(k + 1) % r.length][0] * y) / 2,
          0,
        ),
      ]),
    );
    for (const s of result.sheets)
      expect(s.utilisation).toBeCloseTo(
        s.placements.reduce((t, p) => t + area.get(p.id)!, 0) / (sheet.width * sheet.height),
        9,
      );
  });

  it("stops at maxSheets and says which copies found no room", async () => {
    const items = [rect("P", 1000, 500, 6)];
    const result = await nestOnSheets({ items, sheet, margin: 10, spacing: 5, seconds: 1, maxSheets: 1 });
    expect(result.sheets).toHaveLength(1);
    expect(expectValidSheets(items, result, 10, 5)).toBe(4); // the 2 × 2 grid of the first test
    expect(result.unplaced).toHaveLength(2);
    expect(result.unplaced[0].reason).toMatch(/^P \(copy \d\) found no room on the 1 sheet\(s\) allowed$/);
  });

  it("stops as soon as it uses as few sheets as the area allows, and says so", async () => {
    const items = [rect("A", 300, 200, 20), rect("B", 450, 120, 20, [0, 180])];
    const result = await nestOnSheets({ items, sheet, margin: 10, spacing: 5, seconds: 60 });
    // 20 × 0.06 + 20 × 0.054 m² = 2.28 m² on a 2.42 × 1.20 m usable sheet: one sheet is the bound.
    expect(result.areaBound).toBe(1);
    expect(result.sheets).toHaveLength(1);
    expect(result.ended).toBe("proved-best");
    expect(result.seconds).toBeLessThan(60);
    expect(expectValidSheets(items, result, 10, 5)).toBe(40);
  });

  it("answers an already cancelled run with a complete first layout, and says so", async () => {
    const items = [rect("A", 700, 700, 12), rect("B", 450, 120, 20, [0, 180])];
    const controller = new AbortController();
    controller.abort();
    const result = await nestOnSheets({ items, sheet, margin: 10, spacing: 5, seconds: 60, signal: controller.signal });
    expect(result.ended).toBe("cancelled");
    expect(expectValidSheets(items, result, 10, 5)).toBe(32);
  });

  it("says it stopped on the iteration cap when it did", async () => {
    const items = [rect("A", 700, 700, 12), rect("B", 450, 120, 20, [0, 180])];
    const result = await nestOnSheets({ items, sheet, margin: 10, spacing: 5, seconds: 60, maxIterations: 20 });
    expect(result.ended).toBe("iterations");
  });

  it("returns a valid layout promptly when cancelled", async () => {
    // 700 mm squares go three to a sheet, so the area bound (3 sheets) is never reached: only the cancel stops it.
    const items = [rect("A", 700, 700, 12), rect("B", 450, 120, 20, [0, 180])];
    const controller = new AbortController();
    setTimeout(() => controller.abort(), 300);
    const started = performance.now();
    const result = await nestOnSheets({ items, sheet, margin: 10, spacing: 5, seconds: 60, signal: controller.signal });
    expect(performance.now() - started).toBeLessThan(2000);
    expect(result.cancelled).toBe(true);
    expect(result.ended).toBe("cancelled");
    expect(expectValidSheets(items, result, 10, 5)).toBe(32);
  });
});
