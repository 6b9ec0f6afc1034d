// The demo "Square-wheel trike run" (docs/product.md §3) made into track parts, checked against the engine's
// profile, the closed-form catenary (Hall & Wagon 1992) and an independent polygon library
// (polyclip-ts) for the joints.
import { beforeAll, describe, expect, it } from "vitest";
import { tileRun, type Pt } from "@/lib/track";
import { buildCutParts, type CutPlanResult } from "@/lib/cut/plan";
import { bounds } from "@/lib/geometry/box";
import { translate } from "@/lib/geometry/place";
import { yAt } from "@/lib/geometry/polyline";
import { ringArea, signedArea } from "@/lib/geometry/ring";
import { keyShape } from "@/lib/cut/joints/key";
import { spliceGeometry } from "@/lib/cut/joints/dowel";
import { jointZone } from "@/lib/cut/supports";
import type { Part } from "@/lib/cut/types";
import { DEMO_SETTINGS, font, SQUARE_SPEC, squareResult } from "./support/fixtures";
import { pcIntersectionArea, pcUnionArea } from "./support/geometry-check";

const A = 200;
const P = 2 * A * Math.asinh(1); // Hall & Wagon 1992
/** Vertical reading of the engine's 0.01 mm chord tolerance on slopes up to 1 (see run-length.test.ts). */
const TOL = 0.01 * Math.SQRT2 * (1 + 1e-9);

/** Highest crossing of a ring with the vertical line at x: the rolling surface above the base band. */
function topAt(ring: Pt[], x: number): number {
  let best = -Infinity;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) {
    const [x1, y1] = ring[j];
    const [x2, y2] = ring[i];
    if ((x1 <= x && x <= x2) || (x2 <= x && x <= x1)) {
      if (x1 === x2) best = Math.max(best, y1, y2);
      else best = Math.max(best, y1 + ((y2 - y1) * (x - x1)) / (x2 - x1));
    }
  }
  return best;
}

const inRun = (p: Part): Pt[] => translate(p.region.outer, p.runOffset![0], p.runOffset![1]);

describe("square-wheel trike run: track parts", () => {
  let plan: CutPlanResult;
  let track: Part[];
  beforeAll(() => {
    plan = buildCutParts(SQUARE_SPEC, squareResult(), DEMO_SETTINGS, { font: font() });
    track = plan.parts.filter((p) => p.kind === "track");
  });

  it("rejoined at their stations, the top edges reproduce the engine's profile and the catenary", () => {
    const r = squareResult();
    const run = plan.run!;
    const period = r.track!.points;
    let vsEngine = 0;
    let vsClosed = 0;
    for (const p of track) {
      const ring = inRun(p);
      const { x0, x1 } = p.station!;
      for (let x = x0 + 0.05; x < x1 - 0.05; x += 0.7) {
        const top = topAt(ring, x);
        const u = x - run.eachEnd;
        const inFlat = u < 0 || u > run.periods * P;
        // The engine's own polyline for one period, repeated (its x runs 0..P from a crest).
        const engine = inFlat ? r.track!.points[0][1] : yAt(period, u - P * Math.floor(u / P));
        const w = u - P * Math.round(u / P);
        const closed = inFlat ? -A : -A * Math.cosh(w / A);
        vsEngine = Math.max(vsEngine, Math.abs(top - engine));
        vsClosed = Math.max(vsClosed, Math.abs(top - closed));
      }
    }
    expect(vsEngine).toBeLessThan(1e-9);
    expect(vsClosed).toBeLessThan(TOL);
  });

  it("splits at crests into segments that fit the sheet, with tileRun's period count", () => {
    const run = plan.run!;
    const tile = tileRun({ runLength: 6000, period: P });
    expect(run.periods).toBe(tile.periods);
    expect(run.residual).toBeCloseTo(tile.residual, 9);
    expect(run.cuts.length).toBeGreaterThan(0);
    for (const c of run.cuts) {
      const k = (c - run.eachEnd) / P;
      expect(Math.abs(k - Math.round(k))).toBeLessThan(1e-9); // every default cut is on a crest x = kP
    }
    const usable = Math.min(2440 - 2 * 10, 2500); // sheet less the default 10 mm margins; default bed 2500 mm
    for (const p of track) {
      const b = bounds(p.region.outer);
      expect(b.maxX - b.minX + 6).toBeLessThanOrEqual(usable); // + the 6 mm kerf
      expect(b.maxY - b.minY).toBeCloseTo(A * Math.SQRT2 - A + 80, 9); // crest to bottom: depth A(√2 − 1) + the 80 mm base
    }
    // Greedy: no segment could have reached the next crest.
    const reach = keyShape(plan.settings.joint).reach + 6;
    for (let i = 0; i + 1 < track.length; i++)
      expect(track[i].station!.x1 + P - track[i].station!.x0 + reach).toBeGreaterThan(usable);
    expect(track.map((p) => p.station!.x0)).toEqual([0, ...run.cuts]);
    expect(track[track.length - 1].station!.x1).toBe(6000);
  });

  it("makes trackLines × layers of each segment, counter-clockwise, with labels inside", () => {
    for (const p of track) {
      expect(p.quantity).toBe(2); // 2 track lines × 1 layer (the defaults)
      expect(signedArea(p.region.outer)).toBeGreaterThan(0);
      expect(p.grainAlongX).toBe(true);
      expect(p.engrave.length).toBeGreaterThan(0);
      const b = bounds(p.region.outer);
      for (const s of p.engrave)
        for (const [x, y] of s) {
          expect(y).toBeLessThan(80); // inside the base band
          expect(x).toBeGreaterThan(0);
          expect(x).toBeLessThan(p.station!.x1 - p.station!.x0);
        }
      expect(b.minY).toBe(0);
    }
  });

  it("keys mate: tongue and slot do not overlap, and the pieces cover the run less clearance and dogbones", () => {
    const run = plan.run!;
    const ringsRun = track.map((p) => ({ outer: inRun(p), holes: [] as Pt[][] }));
    for (let i = 0; i + 1 < ringsRun.length; i++)
      expect(pcIntersectionArea(ringsRun[i], ringsRun[i + 1])).toBeLessThan(1e-6);
    // The whole band under the engine's profile, as one polygon.
    const band: Pt[] = [[0, run.baseY], [6000, run.baseY], ...run.profile.slice().reverse()];
    const k = keyShape(plan.settings.joint);
    const { w, n, H, h, c } = k;
    const tongue = n * w + h * H;
    const slot = (n - c) * (w + 2 * c) + (h + 2 * c) * (H + 2 * c);
    const r = 3; // the 6 mm cutter's radius
    // A dogbone at a 90° corner removes the two circular segments outside the corner's edges, each
    // with a 90° central angle: 2 · r²/2 · (π/2 − 1) (circle-segment area, any geometry handbook).
    const dogbone = r * r * (Math.PI / 2 - 1);
    const joints = run.cuts.length;
    const expected = ringArea(band) - joints * (slot - tongue) - joints * 8 * dogbone;
    const sum = track.reduce((a, p) => a + ringArea(p.region.outer), 0);
    // Each dogbone's arc (the half circle through the corner, length πr) is drawn with chords within
    // 0.005 mm of it; a chord of sagitta s cuts off at most (2/3)·s·(its length), and the chords lie
    // inside the circle, so slightly less is removed than the exact circle would.
    const chordSlack = joints * 8 * (2 / 3) * 0.005 * Math.PI * r;
    expect(sum - expected).toBeGreaterThanOrEqual(-1e-6);
    expect(sum - expected).toBeLessThan(chordSlack);
    // And the union (independent library) equals the sum: no overlaps anywhere.
    expect(Math.abs(pcUnionArea(ringsRun) - sum)).toBeLessThan(1e-3);
  });

  it("keeps support holes clear of the joints and on the base band's centre line", () => {
    const run = plan.run!;
    for (const x of run.supports)
      for (const c of run.cuts) {
        const [a, b] = jointZone(c, plan.settings);
        expect(x <= a || x >= b).toBe(true);
      }
    const spans = run.supports.slice(1).map((x, i) => x - run.supports[i]);
    expect(Math.max(...spans)).toBeLessThanOrEqual(600 + 1e-9); // the default support spacing
    for (const p of track) for (const d of p.drill) expect(d.y).toBeCloseTo(40, 9); // 80 mm base band / 2
  });

  it("dowel joints: holes on a shared centre line, matching the splice plate", () => {
    const d = buildCutParts(
      SQUARE_SPEC,
      squareResult(),
      { ...DEMO_SETTINGS, joint: { kind: "dowel" } },
      { font: font() },
    );
    const plate = d.parts.find((p) => p.kind === "splice")!;
    const segs = d.parts.filter((p) => p.kind === "track");
    expect(plate.quantity).toBe(2 * 2 * d.run!.cuts.length); // two faces × two track lines × joints
    const g = spliceGeometry(d.settings);
    d.run!.cuts.forEach((cut, i) => {
      // Holes of both segments near the joint, in run coordinates.
      const near = [segs[i], segs[i + 1]]
        .flatMap((p) => p.drill.map((h) => [h.x + p.runOffset![0], h.y + p.runOffset![1]] as Pt))
        .filter(([x]) => Math.abs(x - cut) < g.half);
      const plateHoles = plate.drill.map((h) => [h.x - g.half + cut, h.y] as Pt);
      expect(near.map((p) => p[0]).sort((a, b) => a - b)).toEqual(
        plateHoles
          .map((p) => p[0])
          .sort((a, b) => a - b)
          .map((x) => expect.closeTo(x, 9)),
      );
      for (const [, y] of near) expect(y).toBeCloseTo(d.run!.centreY, 9);
    });
    // Straight vertical ends: each segment is exactly the band between its stations.
    for (const p of segs) {
      const b = bounds(p.region.outer);
      expect(b.maxX - b.minX).toBeCloseTo(p.station!.x1 - p.station!.x0, 9);
    }
  });
});
