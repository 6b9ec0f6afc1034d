// The single-stroke font reader and the label layout, against the font file's own numbers
// (fonts/hershey-sans-1/HersheySans1.svg, read here by plain regular expressions).
import { readFileSync } from "node:fs";
import { beforeAll, describe, expect, it } from "vitest";
import { parseStrokePath, type GlyphTable } from "@/lib/cut/labels/font";
import { HERSHEY_SANS_PATH } from "@/lib/cut/labels/font-file";
import { arrowStrokes, layoutLine } from "@/lib/cut/labels/text";
import { buildCutParts } from "@/lib/cut/plan";
import { pointInRing } from "@/lib/geometry/ring";
import { DEMO_SETTINGS, font, SQUARE_SPEC, squareResult } from "./support/fixtures";
import { jDistance, jPoint, jRing } from "./support/geometry-check";

const svg = readFileSync(HERSHEY_SANS_PATH, "utf8");
const glyphTag = (ch: string) => svg.match(new RegExp(`<glyph unicode="${ch}"[^>]*>`))![0];
const adv = (ch: string) => Number(glyphTag(ch).match(/horiz-adv-x="([\d.]+)"/)![1]);

describe("single-stroke labels", () => {
  let f: GlyphTable;
  beforeAll(() => {
    f = font();
  });

  it("reads the font's metrics and glyphs as the file gives them", () => {
    expect(f.unitsPerEm).toBe(Number(svg.match(/units-per-em="(\d+)"/)![1]));
    expect(f.ascent).toBe(800); // font-face ascent="800"
    // 'H' is drawn from y = 0 to 662 (d="M 220 662 L 220 0 …"); its top is the cap height used.
    expect(f.capHeight).toBe(662);
    expect(f.glyphs.get("A")!.strokes).toEqual([
      [
        [378, 662],
        [126, 0],
      ],
      [
        [378, 662],
        [630, 0],
      ],
      [
        [220, 220],
        [536, 220],
      ],
    ]); // glyph A: d="M 378 662 L 126 0 M 378 662 L 630 0 M 220 220 L 536 220"
    expect(f.glyphs.get("A")!.advance).toBe(adv("A"));
    expect(f.glyphs.get('"')).toBeDefined(); // unicode="&#x22;"
    expect(f.skipped).toEqual([]);
  });

  it("flattens the few cubic Béziers, ending each exactly on its end point", () => {
    const s = parseStrokePath("M 0 0 C 0 10 10 10 10 0 L 20 0");
    expect(s).toHaveLength(1);
    expect(s[0][0]).toEqual([0, 0]);
    expect(s[0][16]).toEqual([10, 0]);
    // Bernstein form at u = ½: (p0 + 3p1 + 3p2 + p3)/8 = (5, 7.5).
    expect(s[0][8][0]).toBeCloseTo(5, 12);
    expect(s[0][8][1]).toBeCloseTo(7.5, 12);
    expect(s[0][17]).toEqual([20, 0]);
    expect(() => parseStrokePath("M 0 0 Q 1 1 2 2")).toThrow(/only M, L and C/);
  });

  it("lays text along the advance widths, scaled to the cap height", () => {
    const h = 10;
    const k = h / 662;
    const line = layoutLine(f, "AH", h);
    const Hs = line.strokes.slice(3);
    // H's first stroke "M 220 662 L 220 0", moved right by A's advance.
    expect(Hs[0][0][0]).toBeCloseTo((adv("A") + 220) * k, 12);
    expect(Hs[0][0][1]).toBeCloseTo(662 * k, 12);
    expect(line.box.maxY).toBeCloseTo(h, 12);
    const odd = layoutLine(f, "A\u2603", h);
    expect(odd.missing).toEqual(["\u2603"]);
  });

  it("points the arrow along +x", () => {
    const a = arrowStrokes(20, 10);
    const tip = a[1][1];
    expect(tip).toEqual([20, 5]);
    for (const s of a) for (const p of s) expect(p[0]).toBeLessThanOrEqual(tip[0]);
  });

  it("keeps every part's label inside the part, clear of edges, holes and drill holes", () => {
    const plan = buildCutParts(
      SQUARE_SPEC,
      squareResult(),
      { ...DEMO_SETTINGS, lightening: { count: 4, rim: 25 } },
      { font: f },
    );
    const margin = 6; // max(3, kerf) in lib/cut/track-parts.ts
    for (const p of plan.parts) {
      expect(p.engrave.length).toBeGreaterThan(0);
      const edge = jRing(p.region.outer);
      for (const s of p.engrave)
        for (const q of s) {
          expect(pointInRing(q, p.region.outer)).toBe(true);
          expect(jDistance(jPoint(q), edge)).toBeGreaterThan(margin - 1e-6);
          for (const h of p.region.holes) expect(jDistance(jPoint(q), jRing(h))).toBeGreaterThan(margin - 1e-6);
          for (const d of p.drill)
            expect(Math.hypot(q[0] - d.x, q[1] - d.y)).toBeGreaterThan(d.diameter / 2 + margin - 1e-6);
        }
    }
    expect(plan.warnings.filter((w) => w.code.startsWith("label"))).toEqual([]);
  });

  it("says so when there is no font", () => {
    const plan = buildCutParts(SQUARE_SPEC, squareResult(), DEMO_SETTINGS);
    expect(plan.parts.every((p) => p.engrave.length === 0)).toBe(true);
    expect(plan.warnings.map((w) => w.code)).toContain("no-font");
  });
});
