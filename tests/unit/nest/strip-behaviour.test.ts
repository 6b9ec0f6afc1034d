// The strip nester's contract: valid layouts, spacing, same seed and iteration cap → same layout,
// cancelling returns promptly with a complete valid layout, progress a few times per second.
import { describe, expect, it } from "vitest";
import { loadInstance, nestStrip, type NestProgress } from "@/lib/nest";
import { expectValidLayout, expectValidStrip, readFixture } from "./layout-check";

const fu = loadInstance(readFixture("fu"));
const jakobs2 = loadInstance(readFixture("jakobs2"));

describe("nestStrip", () => {
  it("fu: every copy once, in its allowed rotations, inside the strip, no overlaps", async () => {
    const result = await nestStrip({ items: fu.items, height: fu.height, seconds: 3, seed: 3 });
    const { utilisation } = expectValidStrip(fu.items, result, fu.height);
    // Ceiling: the best fu layout known is 92.40 % (arXiv:2509.13329 logs, docs/fabrication.md §1.2 A).
    expect(utilisation).toBeLessThan(0.925);
    expect(result.placed).toBe(12);
  });

  it("keeps parts `spacing` apart and inside [0, height]", async () => {
    const spacing = 0.5;
    const result = await nestStrip({ items: fu.items, height: fu.height, spacing, seconds: 2, seed: 1 });
    const { report } = expectValidLayout(
      fu.items,
      result.placements,
      { minX: 0, minY: 0, maxX: result.length, maxY: fu.height },
      2 * spacing,
    );
    // The gap may fall short of `spacing` by the nester's integer step (≤ 1e-6 of the height here; common practice).
    expect(report.minGap).toBeGreaterThanOrEqual(spacing - 1e-6 * fu.height);
  });

  it("gives the same layout for the same seed and iteration cap", async () => {
    const run = () => nestStrip({ items: fu.items, height: fu.height, seconds: 60, seed: 7, maxIterations: 400 });
    const [a, b] = [await run(), await run()];
    expect(a.seconds).toBeLessThan(60); // stopped on the iteration cap, not on the clock
    expect(b.placements).toEqual(a.placements);
    expect(b.length).toBe(a.length);
  });

  it("returns promptly with a complete, valid layout when cancelled", async () => {
    for (const after of [0, 1500]) {
      const controller = new AbortController();
      const started = performance.now();
      const timer = setTimeout(() => controller.abort(), after);
      const result = await nestStrip({
        items: jakobs2.items,
        height: jakobs2.height,
        seconds: 60,
        seed: 1,
        signal: controller.signal,
      });
      clearTimeout(timer);
      const waited = performance.now() - started - after;
      expect(result.cancelled).toBe(true);
      expect(waited).toBeLessThan(1500); // "promptly": well under the 60 s budget
      expectValidStrip(jakobs2.items, result, jakobs2.height);
    }
  });

  it("reports progress a few times a second, with the fraction of the budget rising to 1", async () => {
    const seen: NestProgress[] = [];
    const seconds = 2;
    await nestStrip({ items: fu.items, height: fu.height, seconds, seed: 1, onProgress: (p) => seen.push(p) });
    expect(seen.length).toBeGreaterThanOrEqual(3 * seconds);
    for (let k = 1; k < seen.length; k++) expect(seen[k].fraction).toBeGreaterThanOrEqual(seen[k - 1].fraction);
    expect(seen[seen.length - 1].fraction).toBe(1);
    expect(seen.every((p) => p.total === 12 && p.fraction >= 0 && p.fraction <= 1)).toBe(true);
  });

  it("names an item that is wider than the strip in every allowed rotation", async () => {
    const items = [
      {
        id: "W7",
        polygon: [
          [0, 0],
          [50, 0],
          [50, 45],
          [0, 45],
        ] as [number, number][],
        quantity: 1,
        rotations: [0, 90],
      },
    ];
    await expect(nestStrip({ items, height: 40, seconds: 1 })).rejects.toThrow(
      /W7 is 50 × 45; it does not fit across the strip \(40\)/,
    );
  });
});
