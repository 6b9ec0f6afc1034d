// The layout plan's choice of scale and strips, and where its station labels go: pure functions,
// checked without drawing anything.
import { describe, expect, it } from "vitest";
import { chooseScale, ISO_5455_SCALES, splitRun } from "@/lib/assembly/pdf/drawing-scale";
import { placeLabels } from "@/lib/assembly/pdf/label-rows";

const PT_PER_MM = 72 / 25.4; // 1 pt = 1/72 in, 1 in = 25.4 mm exactly
const WIDTH = 443; // pt a strip may take on A4 between the margins and the label room

describe("ISO 5455 scales", () => {
  it("are full size and the 1-2-5 reductions of ISO 5455:1979 §5", () => {
    expect([...ISO_5455_SCALES]).toEqual([1, 2, 5, 10, 20, 50, 100, 200, 500, 1000, 2000, 5000, 10000]);
  });
});

describe("splitRun", () => {
  it.each([
    [1410.2, 10],
    [5993.4, 20],
    [20095.4, 20],
    [20095.4, 50],
    [333, 1],
  ])("cuts %f mm at 1 : %i into contiguous strips that each fit the width", (length, d) => {
    const strips = splitRun(length, WIDTH, d);
    expect(strips[0].x0).toBe(0);
    expect(strips.at(-1)!.x1).toBeCloseTo(length, 9);
    strips.forEach((s, i) => {
      if (i > 0) expect(s.x0).toBe(strips[i - 1].x1);
      expect(((s.x1 - s.x0) * PT_PER_MM) / d).toBeLessThanOrEqual(WIDTH + 1e-9);
    });
    expect(strips.length).toBe(Math.ceil((length * PT_PER_MM) / d / WIDTH));
  });
});

describe("chooseScale", () => {
  const always = () => ({ legible: true, height: 100 });

  it("takes the largest scale that shows a short run in one strip", () => {
    // 1410.2 mm at 1 : 10 is 400 pt; at 1 : 5 it would need two strips.
    expect(chooseScale({ length: 1410.2, widthPt: WIDTH, pageRoom: 600, measure: always })).toMatchObject({
      denominator: 10,
      strips: [{ x0: 0, x1: 1410.2 }],
    });
  });

  it("prefers strips at 1 : 20 to one strip at a smaller scale", () => {
    // 6 m fits one strip only at 1 : 50; at 1 : 20 it takes two.
    const c = chooseScale({ length: 6000, widthPt: WIDTH, pageRoom: 600, measure: always });
    expect(c.denominator).toBe(20);
    expect(c.strips).toHaveLength(2);
  });

  it("goes down a scale when the labels do not fit, and when the strips overflow the page", () => {
    const illegibleAt20 = (d: number) => ({ legible: d !== 20, height: 100 });
    expect(chooseScale({ length: 6000, widthPt: WIDTH, pageRoom: 600, measure: illegibleAt20 }).denominator).toBe(50);
    const tall = (_d: number, strips: unknown[]) => ({ legible: true, height: 150 * strips.length });
    expect(chooseScale({ length: 20000, widthPt: WIDTH, pageRoom: 600, measure: tall }).denominator).toBe(50);
  });

  it("keeps the largest legible scale over several pages when no scale fits one page", () => {
    const legibleTo20 = (d: number, strips: unknown[]) => ({ legible: d <= 20, height: 150 * strips.length });
    expect(chooseScale({ length: 20000, widthPt: WIDTH, pageRoom: 600, measure: legibleTo20 }).denominator).toBe(20);
  });
});

describe("placeLabels", () => {
  const bounds = { left: 0, right: 1000 };
  const around = ["centre", "end", "start"] as const;

  it("centres labels with room, in the row nearest the drawing", () => {
    const p = placeLabels(
      [
        { x: 100, width: 40, anchors: around },
        { x: 300, width: 40, anchors: around },
      ],
      bounds,
      5,
      3,
    );
    expect(p.map((l) => [l.row, l.anchor, l.left])).toEqual([
      [0, "centre", 80],
      [0, "centre", 280],
    ]);
  });

  it("flags two close labels away from each other rather than stacking them", () => {
    const p = placeLabels(
      [
        { x: 100, width: 40, anchors: around },
        { x: 125, width: 40, anchors: around },
      ],
      bounds,
      5,
      3,
    );
    expect(p.map((l) => [l.row, l.anchor])).toEqual([
      [0, "end"],
      [0, "start"],
    ]);
    expect(p[1].left).toBeGreaterThanOrEqual(p[0].right + 5);
  });

  it("moves a crowded label out a row, never across another's leader, and says when it cannot", () => {
    const items = [100, 110, 120].map((x) => ({ x, width: 40, anchors: around }));
    const p = placeLabels(items, bounds, 5, 3);
    expect(p.map((l) => l.row)).toEqual([0, 1, 0]);
    // The middle label's leader runs through row 0 at x = 110, which neither row-0 label covers.
    for (const o of [p[0], p[2]]) expect(110 < o.left || 110 > o.right).toBe(true);
    const crowded = placeLabels(
      [100, 104, 108, 112, 116].map((x) => ({ x, width: 40, anchors: around })),
      bounds,
      5,
      3,
    );
    expect(crowded.some((l) => l.forced)).toBe(true);
  });

  it("keeps labels inside the bounds", () => {
    const p = placeLabels(
      [
        { x: 3, width: 40, anchors: around },
        { x: 998, width: 40, anchors: around },
      ],
      bounds,
      5,
      3,
    );
    expect(p[0].left).toBeGreaterThanOrEqual(0);
    expect(p[1].right).toBeLessThanOrEqual(1000);
  });
});
