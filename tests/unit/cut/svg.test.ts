// SVG export parsed back with plain regular expressions: true-scale width and height (SVG 1.1
// §7.10 units), a viewBox in the same unit, and coordinates equal to the drawing's with y flipped.
import { describe, expect, it } from "vitest";
import { buildCutParts } from "@/lib/cut/plan";
import { buildDrawing, sheetParts } from "@/lib/cut/export/drawing";
import { drawingToSvg, LAYER_COLOUR } from "@/lib/cut/export/svg";
import { DEMO_SETTINGS, font, rowNest, SQUARE_SPEC, squareResult } from "./support/fixtures";

function pathsIn(svg: string, layer: string): string[] {
  const g = svg.match(new RegExp(`<g id="${layer}"[^>]*>([\\s\\S]*?)</g>`))![1];
  return [...g.matchAll(/<path d="([^"]+)"\/>/g)].map((m) => m[1]);
}
const points = (d: string) => [...d.matchAll(/[ML]([-\d.]+) ([-\d.]+)/g)].map((m) => [Number(m[1]), Number(m[2])]);

describe("SVG export", () => {
  const plan = buildCutParts(SQUARE_SPEC, squareResult(), DEMO_SETTINGS, { font: font() });
  const nest = rowNest(plan.parts, { length: 2440, width: 1220 }, 10, 6);
  const frame = [{ minX: 0, minY: 0, maxX: 2440, maxY: 1220 }];

  it("is true scale in mm, with y flipped to read like the DXF", () => {
    const d = buildDrawing(sheetParts(plan.parts, nest.sheets[0].placements), { units: "mm", frames: frame });
    const svg = drawingToSvg(d);
    const head = svg.match(/<svg [^>]*>/)![0];
    expect(head).toMatch(/width="2440mm"/);
    expect(head).toMatch(/height="1220mm"/);
    expect(head).toMatch(/viewBox="0 0 2440 1220"/);
    const outs = pathsIn(svg, "CUT_OUTSIDE");
    const rings = d.rings.filter((r) => r.layer === "CUT_OUTSIDE");
    expect(outs).toHaveLength(rings.length);
    outs.forEach((p, i) => {
      expect(p.endsWith("Z")).toBe(true);
      const pts = points(p);
      expect(pts).toHaveLength(rings[i].points.length);
      pts.forEach(([x, y], j) => {
        expect(x).toBeCloseTo(rings[i].points[j][0], 4);
        expect(y).toBeCloseTo(1220 - rings[i].points[j][1], 4);
      });
    });
    const circles = [...svg.matchAll(/<circle cx="([-\d.]+)" cy="([-\d.]+)" r="([-\d.]+)"\/>/g)];
    expect(circles).toHaveLength(d.circles.length);
    circles.forEach((m, i) => {
      expect(Number(m[2])).toBeCloseTo(1220 - d.circles[i].y, 4);
      expect(Number(m[3])).toBeCloseTo(d.circles[i].r, 4);
    });
    // Each layer its own stroke colour.
    expect(new Set(Object.values(LAYER_COLOUR)).size).toBe(5);
    for (const [layer, colour] of Object.entries(LAYER_COLOUR))
      expect(svg).toContain(`<g id="${layer}" fill="none" stroke="${colour}"`);
  });

  it("is true scale in inches", () => {
    const d = buildDrawing(sheetParts(plan.parts, nest.sheets[0].placements), { units: "in", frames: frame });
    const svg = drawingToSvg(d);
    expect(svg).toMatch(/width="96.06299in"/); // 2440 / 25.4
    expect(svg).toMatch(/height="48.0315in"/); // 1220 / 25.4
    expect(svg).toMatch(/viewBox="0 0 96.06299 48.0315"/);
    const ref = points(pathsIn(svg, "REFERENCE")[0]);
    expect(ref).toEqual([
      [0, 48.0315],
      [96.06299, 48.0315],
      [96.06299, 0],
      [0, 0],
    ]);
  });

  it("the preview adds a paper background and part fills", () => {
    const d = buildDrawing(sheetParts(plan.parts, nest.sheets[0].placements), { units: "mm", frames: frame });
    const svg = drawingToSvg(d, { preview: true });
    expect(svg).toMatch(/<rect x="0" y="0" width="2440" height="1220" fill="#f5efe0"\/>/);
    expect(svg).toMatch(/fill-rule="evenodd"/);
  });
});
