// The joints chosen for the sheet (lib/cut-plan/segment-lengths.ts) on the demo job: 6.0 m of track
// for a 400 mm square wheel, two track lines, 18 mm plywood on 2440 × 1220 mm sheets, the default
// 10 mm margin and 6 mm part spacing, a 6 mm router. The joint rules are worked out here again from
// the settings and the published period, not read from lib/cut's own helpers; the nests are checked
// by the server's check and by the independent geometry of tests/unit/nest/layout-check.ts (jsts).
import { describe, expect, it } from "vitest";
import { buildCutParts, nestItemsFor, parseCutSettings } from "@/lib/cut";
import { chooseSegmentLengths, segmentCandidates, type SegmentChoice } from "@/lib/cut-plan/segment-lengths";
import { checkNest } from "@/lib/cut-plan/verify-nest";
import { bounds } from "@/lib/geometry/box";
import { DEMO_SETTINGS, SQUARE_SPEC, squareResult } from "../cut/support/fixtures";
import { expectValidLayout } from "../nest/layout-check";

const s = parseCutSettings(DEMO_SETTINGS);
const L = DEMO_SETTINGS.runLength;
// The square wheel of side 2a = 400 mm rolls on catenary arcs of period 2a·asinh(1) (Hall & Wagon
// 1992, "Roads and Wheels", Math. Magazine 65(5):283–301): 352.549 mm.
const P = 2 * 200 * Math.asinh(1);
const N = Math.floor(L / P); // 17 whole periods
const X0 = (L - N * P) / 2; // the flat run-out at each end; the crests are at X0 + kP
// The sheet less its margin on both ends (the 2500 mm bed is longer, so the sheet binds).
const usable = Math.min(s.sheet.length - 2 * s.margin, s.machine.bed.length);
// The key reaches its depth past the station, the slot that and the clearance: a segment with a joint
// at its right end is that much longer, and every cut adds the kerf.
const reach = s.joint.keyDepth + s.joint.clearance;
const kerf = s.machine.kerf;
// A segment holds a key at each end with material to spare: twice (reach, two kerfs, 10 mm), at least 100 mm.
const minSegment = Math.max(100, 2 * (reach + 2 * kerf + 10));
// The greedy default: 6 + 6 + 5 periods (6P + reach + kerf = 2169 mm fits 2420 mm, 7P = 2468 mm does not).
const GREEDY_SEGMENTS = 3;

function expectObeysJointRules(cuts: number[], periods: number[]) {
  const xs = [0, ...cuts, L];
  // Covering the run: increasing stations strictly inside it, one segment between each pair.
  for (let i = 1; i < xs.length; i++) expect(xs[i], `station ${i} of ${cuts.join(", ")}`).toBeGreaterThan(xs[i - 1]);
  expect(periods).toHaveLength(cuts.length + 1);
  expect(periods.reduce((a, b) => a + b, 0)).toBe(N);
  for (const c of cuts) {
    // At a crest, as the cut stations field carries it (0.1 mm).
    const k = Math.round((c - X0) / P);
    expect(k).toBeGreaterThanOrEqual(1);
    expect(k).toBeLessThanOrEqual(N - 1);
    expect(Math.abs(c - (X0 + k * P)), `station ${c} off the crest`).toBeLessThanOrEqual(0.05 + 1e-9);
  }
  for (let i = 1; i < xs.length; i++) {
    const last = i === xs.length - 1;
    const length = xs[i] - xs[i - 1];
    expect(length + (last ? 0 : reach) + kerf, `segment ${i} of ${cuts.join(", ")}`).toBeLessThanOrEqual(usable);
    expect(length).toBeGreaterThanOrEqual(minSegment);
    expect(Math.round((xs[i] - Math.max(X0, xs[i - 1])) / P)).toBe(periods[i - 1]);
  }
}

/** Partitions of n into at most `parts` parts of at most `max`: a plain count, for the list's size. */
function partitionCount(n: number, parts: number, max: number): number {
  if (n === 0) return 1;
  if (parts === 0 || max === 0) return 0;
  let count = 0;
  for (let k = Math.min(n, max); k >= 1; k--) count += partitionCount(n - k, parts - 1, k);
  return count;
}

let choice: SegmentChoice | undefined;
async function demoChoice(): Promise<SegmentChoice> {
  // A generous budget: the search ends once no candidate left can beat the best (it took about 2 s here).
  choice ??= await chooseSegmentLengths({
    spec: SQUARE_SPEC,
    result: squareResult(),
    settings: DEMO_SETTINGS,
    seconds: 120,
  });
  return choice;
}

describe("the candidate cut stations", () => {
  const plan = buildCutParts(SQUARE_SPEC, squareResult(), DEMO_SETTINGS);
  const candidates = segmentCandidates(plan.run!, plan.settings, GREEDY_SEGMENTS + 2);

  it("each obey the joint rules, cut at crests and cover the run", () => {
    expect(plan.run!.cuts).toHaveLength(GREEDY_SEGMENTS - 1);
    expect(candidates.length).toBeGreaterThan(0);
    for (const c of candidates) {
      expect(c.periods.length).toBeLessThanOrEqual(GREEDY_SEGMENTS + 2);
      expectObeysJointRules(c.cuts, c.periods);
    }
  });

  it("are every multiset of segment lengths the rules allow, once each", () => {
    const keys = candidates.map((c) => [...c.periods].sort((a, b) => b - a).join("+"));
    expect(new Set(keys).size).toBe(keys.length);
    // Every length from 1 period (352.5 mm ≥ the 140.4 mm least segment) to 6 fits anywhere on the run, so
    // the multisets are the partitions of 17 into at most 5 parts of at most 6.
    expect(candidates).toHaveLength(partitionCount(N, GREEDY_SEGMENTS + 2, 6));
    expect(keys).toContain("6+4+4+3"); // the layout worked by hand: seven rows and the wheels beside four of them
  });

  it("build into parts that fit the sheet, one track part per segment between its stations", () => {
    for (const c of candidates) {
      const built = buildCutParts(SQUARE_SPEC, squareResult(), { ...DEMO_SETTINGS, cuts: c.cuts });
      const tracks = built.parts.filter((p) => p.kind === "track");
      expect(tracks.map((p) => [p.station!.x0, p.station!.x1])).toEqual(
        [0, ...c.cuts].map((x0, i) => [x0, [...c.cuts, L][i]]),
      );
      for (const p of tracks) {
        const b = bounds(p.region.outer);
        expect(b.maxX - b.minX + kerf).toBeLessThanOrEqual(usable);
      }
    }
  });
});

describe("the joints chosen for the demo job", () => {
  it("never use more sheets than the greedy default, and keep its cuts when nothing beats them", async () => {
    const c = await demoChoice();
    const greedy = buildCutParts(SQUARE_SPEC, squareResult(), DEMO_SETTINGS).run!.cuts;
    expect(c.default.cuts).toEqual(greedy);
    expect(c.default.periods).toEqual([6, 6, 5]);
    expect(c.chosen.unplaced).toBeLessThanOrEqual(c.default.unplaced);
    expect(c.chosen.sheets).toBeLessThanOrEqual(c.default.sheets);
    expect(c.sheetsSaved).toBe(c.default.sheets - c.chosen.sheets);
    expect(c.changed).toBe(c.chosen.cuts.join() !== c.default.cuts.join());
    expect(c.evaluated).toBeGreaterThanOrEqual(1);
    expect(c.evaluated).toBeLessThanOrEqual(c.candidates + 1);
  });

  it("find one sheet: the parts' area needs one and the hand-worked rows show one holds them", async () => {
    const c = await demoChoice();
    expect(c.chosen.nest.areaBound).toBe(1);
    expect(c.chosen.sheets).toBe(1);
    expect(c.chosen.unplaced).toBe(0);
    expect(c.changed).toBe(true);
    expect(c.ended).toBe("searched");
    expectObeysJointRules(c.chosen.cuts, c.chosen.periods);
    // Each joint is work on site: no more than two beyond the greedy count.
    expect(c.chosen.segments).toBeLessThanOrEqual(GREEDY_SEGMENTS + 2);
  });

  it("nest validly: the parts rebuilt from the settings with the chosen stations, as the server does", async () => {
    const c = await demoChoice();
    const plan = buildCutParts(SQUARE_SPEC, squareResult(), { ...DEMO_SETTINGS, cuts: c.chosen.cuts });
    expect(plan.run!.cuts).toEqual(c.chosen.cuts);
    const items = await nestItemsFor(plan.parts, plan.settings);
    const frame = { sheet: { width: s.sheet.length, height: s.sheet.width }, margin: s.margin, spacing: s.spacing };
    expect(await checkNest({ items, nest: c.chosen.nest, ...frame })).toEqual([]);
    const inner = { minX: s.margin, minY: s.margin, maxX: s.sheet.length - s.margin, maxY: s.sheet.width - s.margin };
    let placed = 0;
    for (const sheet of c.chosen.nest.sheets) {
      const { report } = expectValidLayout(items, sheet.placements, inner, 2 * s.spacing);
      // Spacing may fall short by the nester's integer step (≤ 1e-5 mm), far below any cutter's tolerance.
      if (sheet.placements.length > 1) expect(report.minGap).toBeGreaterThanOrEqual(s.spacing - 1e-5);
      placed += sheet.placements.length;
    }
    expect(placed).toBe(items.reduce((n, it) => n + it.quantity, 0));
  });

  it("stops at once when cancelled, keeping the default", async () => {
    const control = new AbortController();
    control.abort();
    const c = await chooseSegmentLengths({
      spec: SQUARE_SPEC,
      result: squareResult(),
      settings: DEMO_SETTINGS,
      seconds: 120,
      signal: control.signal,
    });
    expect(c.ended).toBe("cancelled");
    expect(c.changed).toBe(false);
    expect(c.chosen).toBe(c.default);
    expect(c.evaluated).toBe(1);
    expect(c.default.nest.unplaced).toEqual([]);
  });
});
