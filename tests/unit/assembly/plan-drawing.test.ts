// The layout plan as a makerjs model and as the screen's SVG: every track part is a model of its
// own whose extents are the part's own bounds (its stretch of the run, from the bottom edge to the
// highest point of its profile), the whole drawing spans the run, and every part's engraved id is
// in the drawing.
import makerjs from "makerjs";
import { describe, expect, it } from "vitest";
import { captionsOf, partModels, planModel, type PlanMarks } from "@/lib/assembly/plan-drawing";
import { stripSvg } from "@/lib/assembly/plan-svg";
import { planLayout } from "@/lib/assembly/plan-scale";
import type { SheetRun } from "@/lib/assembly/sheet";
import { longRun, trikeSheet } from "./support/pdf-sheets";

const MARKS: PlanMarks = { supportHalf: 15, supportHeight: 30, datumOver: 20, idHeight: 32 };

/** A part's bounds worked out from the run itself: its profile points and the top at its two ends. */
function ownBounds(run: SheetRun, x0: number, x1: number) {
  const inside = run.profile.filter(([x]) => x >= x0 && x <= x1).map(([, y]) => y);
  const at = (x: number) => {
    const found = run.profile.findIndex(([px]) => px >= x);
    const i = found < 0 ? run.profile.length - 1 : found;
    const [a, b] = [run.profile[Math.max(i - 1, 0)], run.profile[i]];
    return b[0] === a[0] ? b[1] : a[1] + ((b[1] - a[1]) * (x - a[0])) / (b[0] - a[0]);
  };
  return { low: [x0, run.baseY], high: [x1, Math.max(...inside, at(x0), at(x1))] };
}

describe.each([
  { name: "the fixture's run", run: trikeSheet.run! },
  { name: "a long run", run: longRun(9000).run! },
])("the plan model of $name", ({ run }) => {
  const whole = planModel(run, { x0: 0, x1: run.length }, MARKS);

  it("has one model per track part, each measuring its own bounds", () => {
    const parts = partModels(whole);
    expect(Object.keys(parts)).toEqual(run.segments.map((g) => g.id));
    for (const g of run.segments) {
      const e = makerjs.measure.modelExtents(parts[g.id])!;
      const own = ownBounds(run, g.x0, g.x1);
      expect(e.low[0]).toBeCloseTo(own.low[0], 6);
      expect(e.low[1]).toBeCloseTo(own.low[1], 6);
      expect(e.high[0]).toBeCloseTo(own.high[0], 6);
      expect(e.high[1]).toBeCloseTo(own.high[1], 6);
    }
  });

  it("spans the run, with the datum line past both ends and the supports under it", () => {
    const e = makerjs.measure.modelExtents(whole)!;
    const top = Math.max(...run.profile.map(([, y]) => y));
    expect(e.low[0]).toBeCloseTo(-MARKS.datumOver, 6);
    expect(e.high[0]).toBeCloseTo(run.length + MARKS.datumOver, 6);
    expect(e.high[1]).toBeCloseTo(top, 6);
    expect(e.low[1]).toBeCloseTo(run.datumY - MARKS.supportHeight, 6);
    expect(Object.keys(whole.models!.supports.models!)).toHaveLength(run.supports.length);
  });

  it("names every part by its engraved id, inside the part", () => {
    const captions = captionsOf(whole);
    for (const g of run.segments) {
      const c = captions.find((x) => x.text === g.id);
      expect(c, g.id).toBeDefined();
      expect(c!.at[0]).toBeGreaterThan(g.x0);
      expect(c!.at[0]).toBeLessThan(g.x1);
    }
  });

  it("in strips, shows every part in some strip and only the parts of each strip", () => {
    const { strips } = planLayout(run.length, 180);
    const seen = new Set<string>();
    for (const s of strips) {
      const m = planModel(run, { x0: s.from, x1: s.to }, MARKS);
      const e = makerjs.measure.modelExtents({ models: partModels(m) })!;
      expect(e.low[0]).toBeCloseTo(s.from, 6);
      expect(e.high[0]).toBeCloseTo(s.to, 6);
      for (const id of Object.keys(partModels(m))) seen.add(id);
    }
    expect([...seen].sort()).toEqual(run.segments.map((g) => g.id).sort());
  });
});

describe("the screen's strip SVG", () => {
  const run = trikeSheet.run!;
  const { scale, strips } = planLayout(run.length, 180);
  const svgs = strips.map((s, i) =>
    stripSvg({
      run,
      joints: trikeSheet.joints,
      range: { x0: s.from, x1: s.to },
      scale,
      first: i === 0,
      station: (mm) => `${mm.toFixed(1)} mm`,
      label: `Layout plan <strip ${i + 1}>`,
    }),
  );
  const svg = svgs[0];

  it("is as wide in mm as the strip at 1 : scale, with the side margins", () => {
    const width = Number(svg.match(/^<svg width="([\d.]+)mm"/)![1]);
    expect(width).toBeCloseTo((strips[0].to - strips[0].from) / scale + 4, 2);
  });

  it("writes every part's id, every joint's station and every support's name, escaping the label", () => {
    const texts = svgs.flatMap((one) => [...one.matchAll(/<text[^>]*>([^<]*)<\/text>/g)].map((m) => m[1]));
    for (const g of run.segments) expect(texts).toContain(g.id);
    for (const j of trikeSheet.joints) expect(texts).toContain(`${j.station.toFixed(1)} mm`);
    run.supports.forEach((_, i) => expect(texts).toContain(`S${i + 1}`));
    expect(texts).toContain("travel");
    expect(svg).toContain('aria-label="Layout plan &lt;strip 1&gt;"');
  });
});
