// Pre-paired clusters (lib/nest/pairs.ts, issue 13): a part and its 180° copy interlocked at the
// no-fit-polygon position that minimises their joint bounding box. Checked against closed forms
// (a sawtooth strip, the square wheel's catenary road of docs/math.md §2.1) and, for containment and
// spacing, with jsts (tests/support/independent-geometry.ts: SnapIfNeededOverlayOp, DistanceOp),
// which shares no code with Clipper.
import { beforeAll, describe, expect, it } from "vitest";
import { loadClipper, type ClipperLib } from "@/lib/geometry/clipper";
import { placeRing } from "@/lib/geometry/place";
import type { Pt } from "@/lib/geometry/point";
import { ringArea, type Ring } from "@/lib/geometry/ring";
import type { NestItem, SheetPlacement } from "@/lib/nest";
import { bestPairing, pairItems, pairMembers, PAIR_THRESHOLD, type Pairing } from "@/lib/nest/pairs";
import { differenceArea, distanceBetween } from "../../support/independent-geometry";

let lib: ClipperLib;
beforeAll(async () => {
  lib = await loadClipper();
});

/** Area of `ring` outside `outline` (jsts). */
const outsideArea = (ring: Ring, outline: Ring) => differenceArea(ring, outline);

/** No two edges of the ring cross or touch except neighbours at their shared vertex (all pairs, exact tests). */
function isSimple(ring: Ring): boolean {
  const n = ring.length;
  const cross = (o: Pt, p: Pt, q: Pt) => (p[0] - o[0]) * (q[1] - o[1]) - (p[1] - o[1]) * (q[0] - o[0]);
  const meets = (p1: Pt, p2: Pt, q1: Pt, q2: Pt) => {
    const [d1, d2] = [cross(q1, q2, p1), cross(q1, q2, p2)];
    const [d3, d4] = [cross(p1, p2, q1), cross(p1, p2, q2)];
    if (d1 * d2 > 0 || d3 * d4 > 0) return false;
    if (d1 === 0 && d2 === 0) {
      // Collinear: overlap of their extents.
      const ax = [Math.min(p1[0], p2[0]), Math.max(p1[0], p2[0])];
      const bx = [Math.min(q1[0], q2[0]), Math.max(q1[0], q2[0])];
      const ay = [Math.min(p1[1], p2[1]), Math.max(p1[1], p2[1])];
      const by = [Math.min(q1[1], q2[1]), Math.max(q1[1], q2[1])];
      return ax[0] <= bx[1] && bx[0] <= ax[1] && ay[0] <= by[1] && by[0] <= ay[1];
    }
    return true;
  };
  for (let i = 0; i < n; i++)
    for (let j = i + 2; j < n; j++) {
      if (i === 0 && j === n - 1) continue;
      if (meets(ring[i], ring[(i + 1) % n], ring[j], ring[(j + 1) % n])) return false;
    }
  return true;
}

// ---------------------------------------------------------------------------------------------
// A track segment for the square wheel (docs/math.md §2.1 with n = 4): a straight side at distance
// A from the axle rolls on y = −A cosh(x/A), arc |x| ≤ h with h = A asinh(tan(π/4)) = A asinh(1),
// period 2h; crest at −A, cusp at −A sec(π/4) = −A√2, bump A(√2 − 1). Here A = a = the square's
// half-side. The segment is cut at crests (lib/cut/segments.ts), so it starts and ends on one.
const a = 100; // mm: a square wheel of side 200 mm
const P = 2 * a * Math.asinh(1); // period, 176.27 mm
const periods = 6;
const L = periods * P; // 1057.6 mm
const base = 20; // mm of plywood below the cusps
const spacing = 3;
/** Height of the top edge above the cusps: a(√2 − 1) at the crests (x = kP), 0 at the cusps. */
const hump = (x: number) => a * Math.SQRT2 - a * Math.cosh((x - P * Math.round(x / P)) / a);
/** Mean of the hump over a period: a√2 − (a²/h) sinh(h/a) = a√2 − a/asinh(1), as sinh(h/a) = tan(π/4) = 1. */
const humpMean = a * Math.SQRT2 - a / Math.asinh(1);

/** Flat bottom y = 0, top y = base + hump(x) + lift through `intervals` + 1 samples (crests and cusps included). */
function segment(intervals: number, lift = 0): Ring {
  const ring: Pt[] = [
    [0, 0],
    [L, 0],
  ];
  for (let i = intervals; i >= 0; i--) {
    const x = (i * L) / intervals;
    ring.push([x, base + hump(x) + lift]);
  }
  return ring;
}

/** Largest rise of the hump above the chord between samples (the hump is concave between cusps). */
function chordSag(intervals: number): number {
  let sag = 0;
  for (let i = 0; i < intervals; i++) {
    const [x0, x1] = [(i * L) / intervals, ((i + 1) * L) / intervals];
    for (let k = 1; k < 64; k++) {
      const x = x0 + ((x1 - x0) * k) / 64;
      sag = Math.max(sag, hump(x) - (hump(x0) + ((hump(x1) - hump(x0)) * k) / 64));
    }
  }
  return sag;
}

const FINE = 6 * 66; // 396 intervals: 399 vertices, like our ~400-vertex segments
const COARSE = 6 * 24; // 144 intervals: 147 vertices, within bestPairing's default cap
const ring = segment(FINE);
// A containing outline: the coarse chords lie below the concave humps by at most the sag, so
// lifting them by a little more holds the fine segment.
const lift = 1.1 * chordSag(COARSE) + 1e-6;
const simplified = segment(COARSE, lift);

describe("bestPairing: two catenary track segments, the second turned 180°", () => {
  let pairing: Pairing;
  beforeAll(() => {
    pairing = bestPairing(lib, ring, spacing, { simplified });
  });

  it("builds a segment like ours: ~400 vertices, hump a(√2 − 1), and a containing simplified ring", () => {
    expect(ring).toHaveLength(399);
    const top = ring.slice(2).map(([, y]) => y);
    expect(Math.max(...top) - Math.min(...top)).toBeCloseTo(a * (Math.SQRT2 - 1), 9);
    expect(outsideArea(ring, simplified)).toBeLessThan(1e-9);
    expect(lift).toBeLessThan(0.15); // mm: sag ≈ Δx²/(8a) across, up to √2 times that vertically
  });

  it("refuses a ring over the vertex cap unless given a simplified one", () => {
    expect(() => bestPairing(lib, ring, spacing)).toThrow(/simplified ring/);
  });

  it("interlocks humps in troughs: B shifted half a period, box between the closed-form bounds", () => {
    // B's crests sit over A's cusps when its box is shifted by P/2 (either way).
    const shift = pairing.box.minX < 0 ? -pairing.box.minX : pairing.box.maxX - L;
    expect(shift).toBeCloseTo(P / 2, 3);
    // Height: with B's crests shifted by d, at x = d/2 (or d/2 + P/2) the two humps add up to
    // 2 hump(d/2) (or 2 hump(P/2 − d/2)) and need `spacing` between them; their larger is least at
    // d = P/2, 2 hump(P/4). The box is at least (L + P/2)(2 base + 2 hump(P/4) + spacing).
    const stack = 2 * base + 2 * hump(P / 4);
    const lower = (L + P / 2) * (stack + spacing);
    // And at most that with a vertical gap of spacing·√2 (the edges' slopes are at most 1, so the
    // gap across is at least spacing), plus the simplified ring's lift on both parts.
    const upper = (L + P / 2) * (stack + spacing * Math.SQRT2 + 2 * lift);
    expect(pairing.boxArea).toBeGreaterThanOrEqual(lower * (1 - 1e-9));
    expect(pairing.boxArea).toBeLessThanOrEqual(upper * (1 + 1e-9));
    expect(pairing.separateBoxArea).toBeCloseTo(2 * L * (base + a * (Math.SQRT2 - 1)), 6);
    expect(pairing.saved).toBeGreaterThan(0);
    expect(pairing.partArea).toBeCloseTo(2 * ringArea(ring), 6);
  });

  it("saves less than hump height × length: no pairing of concave humps can (the issue's bound)", () => {
    const top = ring.slice(2).map(([, y]) => y);
    const humpHeight = Math.max(...top) - Math.min(...top);
    const xs = ring.map(([x]) => x);
    const length = Math.max(...xs) - Math.min(...xs);
    // Any pairing: width ≥ L, and where the parts overlap in x the two humps plus the gap must fit,
    // so the height is at least 2 base + max(hump(x) + hump(x − d)) + spacing ≥ 2 base + 2 mean + spacing.
    // Saving ≤ L (2H − 2 mean − spacing); for a concave hump mean ≥ H/2, so that is below H × L.
    const bound = length * (2 * humpHeight - 2 * humpMean - spacing);
    expect(pairing.saved).toBeLessThanOrEqual(bound);
    expect(bound).toBeLessThan(humpHeight * length);
    // Hence also below the 10 % threshold for this segment: pairItems leaves it single.
    expect(pairing.savedShare).toBeLessThan(PAIR_THRESHOLD);
  });

  it("outline: one valid ring holding both parts (jsts), parts at least `spacing` apart", () => {
    const [m0, m1] = pairMembers(ring, pairing);
    expect(isSimple(pairing.outline)).toBe(true);
    const tolerance = 1e-6 * ringArea(ring); // Clipper's integer rounding, here ≈ 4 nm steps
    expect(outsideArea(m0, pairing.outline)).toBeLessThan(tolerance);
    expect(outsideArea(m1, pairing.outline)).toBeLessThan(tolerance);
    expect(distanceBetween(m0, m1)).toBeGreaterThanOrEqual(spacing - 1e-5);
    expect(ringArea(pairing.outline)).toBeLessThan(pairing.boxArea);
  });

  it("pairItems + expand: each member placed as the pair's pose composed with its own", () => {
    const item: NestItem = { id: "seg", polygon: ring, quantity: 4, rotations: [0, 180] };
    const paired = pairItems(lib, [item], spacing, { threshold: 0.05, simplified: new Map([["seg", simplified]]) });
    expect(paired.items).toHaveLength(1);
    const [pairItem] = paired.items;
    expect(pairItem).toMatchObject({ id: "seg×2", quantity: 2, rotations: [0, 180] });
    const members = pairMembers(ring, paired.pairs[0].pairing);
    const placed: SheetPlacement[] = [
      { id: "seg×2", copy: 0, rotation: 0, x: 12.5, y: 40, sheet: 0 },
      { id: "seg×2", copy: 1, rotation: 180, x: 1300, y: 260, sheet: 1 },
    ];
    const expanded = paired.expand(placed);
    expect(expanded.map((p) => [p.id, p.copy, p.sheet])).toEqual([
      ["seg", 0, 0],
      ["seg", 1, 0],
      ["seg", 2, 1],
      ["seg", 3, 1],
    ]);
    expanded.forEach((e, i) => {
      const pair = placed[i >> 1];
      const direct = placeRing(members[i % 2], pair.rotation, pair.x, pair.y);
      const viaExpand = placeRing(item.polygon, e.rotation, e.x, e.y);
      expect(item.rotations).toContain(e.rotation);
      viaExpand.forEach((p, k) => {
        expect(p[0]).toBeCloseTo(direct[k][0], 9);
        expect(p[1]).toBeCloseTo(direct[k][1], 9);
      });
      // The placed member lies inside the placed pair outline.
      const outline = placeRing(pairItem.polygon, pair.rotation, pair.x, pair.y);
      expect(outsideArea(viaExpand, outline)).toBeLessThan(1e-6 * ringArea(ring));
    });
  });
});

// ---------------------------------------------------------------------------------------------
// A sawtooth strip: teeth of height H and period Q on a base b, notches at both ends (so no corner
// is sharper than a right angle, where the mitred inflation would be conservative). Its 180° copy
// shifted by Q/2 fits tooth in notch, the faces (slope m = 2H/Q) `spacing` apart across, so
// `spacing`·√(1 + m²) apart vertically: joint box (L + Q/2)(2b + H + spacing·√(1 + m²)).
function sawtooth(teeth: number, Q: number, H: number, b: number): Ring {
  const ring: Pt[] = [
    [0, 0],
    [teeth * Q, 0],
  ];
  for (let i = 2 * teeth; i >= 0; i--) ring.push([(i * Q) / 2, i % 2 === 0 ? b : b + H]);
  return ring;
}

describe("bestPairing: closed form for a sawtooth strip", () => {
  it.each([
    [10, 40, 20, 10, 2],
    [8, 30, 10, 5, 0],
    [12, 50, 15, 8, 4],
  ])("%i teeth of period %d and height %d, base %d, spacing %d", (teeth, Q, H, b, s) => {
    const saw = sawtooth(teeth, Q, H, b);
    const r = bestPairing(lib, saw, s);
    const m = (2 * H) / Q;
    const Ls = teeth * Q;
    expect(r.boxArea / ((Ls + Q / 2) * (2 * b + H + s * Math.sqrt(1 + m * m))) - 1).toBeCloseTo(0, 6);
    expect(r.separateBoxArea).toBeCloseTo(2 * Ls * (b + H), 9);
    const [m0, m1] = pairMembers(saw, r);
    expect(outsideArea(m0, r.outline) + outsideArea(m1, r.outline)).toBeLessThan(1e-6 * ringArea(saw));
    expect(distanceBetween(m0, m1)).toBeGreaterThanOrEqual(s - 1e-5);
    expect(isSimple(r.outline)).toBe(true);
  });

  it("accepts a clockwise ring with a repeated closing point", () => {
    const saw = sawtooth(10, 40, 20, 10);
    const r1 = bestPairing(lib, saw, 2);
    const r2 = bestPairing(lib, [...saw, saw[0]].reverse(), 2);
    expect(r2.boxArea).toBeCloseTo(r1.boxArea, 6);
  });
});

// ---------------------------------------------------------------------------------------------
const tri: Ring = [
  [0, 0],
  [10, 0],
  [0, 5],
];
const rect: Ring = [
  [0, 0],
  [10, 0],
  [10, 5],
  [0, 5],
];

describe("pairItems", () => {
  it("q = 5: two pairs and one single; items without 180° or with quantity 1 pass unchanged", () => {
    const items: NestItem[] = [
      { id: "t", polygon: tri, quantity: 5, rotations: [0, 90, 180, 270] },
      { id: "no180", polygon: tri, quantity: 4, rotations: [0, 90] },
      { id: "one", polygon: tri, quantity: 1, rotations: [0, 180] },
      { id: "box", polygon: rect, quantity: 4, rotations: [0, 180] }, // two boxes side by side save nothing
    ];
    const paired = pairItems(lib, items, 1);
    expect(paired.items.map((it) => [it.id, it.quantity])).toEqual([
      ["t×2", 2],
      ["t", 1],
      ["no180", 4],
      ["one", 1],
      ["box", 4],
    ]);
    expect(paired.items[2]).toBe(items[1]);
    expect(paired.items[3]).toBe(items[2]);
    expect(paired.items[4]).toBe(items[3]);
    expect(paired.items[0].rotations).toEqual([0, 90, 180, 270]);
    expect(paired.pairs).toHaveLength(1);
    expect(paired.pairs[0]).toMatchObject({ pairId: "t×2", itemId: "t", pairs: 2, singles: 1 });
    expect(paired.pairs[0].pairing.savedShare).toBeGreaterThan(0.3);
    expect(paired.partArea.get("t×2")).toBeCloseTo(2 * ringArea(tri), 12);
    expect(paired.partArea.get("t")).toBeCloseTo(ringArea(tri), 12);
    expect(paired.skipped).toEqual([]);
  });

  it("expand: copies 0..q−1 once each, other fields kept; unplaced records expand too", () => {
    const items: NestItem[] = [
      { id: "t", polygon: tri, quantity: 5, rotations: [0, 180] },
      { id: "r", polygon: rect, quantity: 2, rotations: [0] },
    ];
    const paired = pairItems(lib, items, 1);
    expect(paired.items.map((it) => it.id)).toEqual(["t×2", "t", "r"]);
    const placed: SheetPlacement[] = [
      { id: "t", copy: 0, rotation: 180, x: 50, y: 50, sheet: 1 },
      { id: "t×2", copy: 1, rotation: 180, x: 30, y: 10, sheet: 0 },
      { id: "r", copy: 1, rotation: 0, x: 0, y: 30, sheet: 0 },
      { id: "t×2", copy: 0, rotation: 0, x: 5, y: 5, sheet: 0 },
      { id: "r", copy: 0, rotation: 0, x: 0, y: 40, sheet: 1 },
    ];
    const expanded = paired.expand(placed);
    expect(expanded).toHaveLength(7);
    const copies = expanded
      .filter((p) => p.id === "t")
      .map((p) => p.copy)
      .sort();
    expect(copies).toEqual([0, 1, 2, 3, 4]);
    expect(expanded[0]).toEqual({ id: "t", copy: 4, rotation: 180, x: 50, y: 50, sheet: 1 });
    expect(expanded.filter((p) => p.id === "r")).toEqual([placed[2], placed[4]]);
    expect(expanded.filter((p) => p.id === "t").every((p) => p.rotation === 0 || p.rotation === 180)).toBe(true);
    expect(expanded.filter((p) => p.id === "t" && p.copy < 4).map((p) => p.sheet)).toEqual([0, 0, 0, 0]);
    const unplaced = paired.expandCopies([{ id: "t×2", copy: 1, reason: "too big" }]);
    expect(unplaced).toEqual([
      { id: "t", copy: 2, reason: "too big" },
      { id: "t", copy: 3, reason: "too big" },
    ]);
  });

  it("expand follows placeRing: member (r_k, o_k) in a pair placed at (R, T) → R + r_k, rotate(o_k, R) + T", () => {
    const item: NestItem = { id: "t", polygon: tri, quantity: 2, rotations: [0, 90, 180, 270] };
    const paired = pairItems(lib, [item], 0.5);
    const members = pairMembers(tri, paired.pairs[0].pairing);
    for (const R of [0, 90, 180, 270]) {
      const pair = { id: "t×2", copy: 0, rotation: R, x: -3.25, y: 17 };
      const expanded = paired.expand([pair]);
      expect(expanded.map((e) => e.rotation)).toEqual([R, (R + 180) % 360]);
      expanded.forEach((e, k) => {
        const direct = placeRing(members[k], R, pair.x, pair.y);
        placeRing(tri, e.rotation, e.x, e.y).forEach((p, i) => {
          expect(p[0]).toBeCloseTo(direct[i][0], 12);
          expect(p[1]).toBeCloseTo(direct[i][1], 12);
        });
      });
    }
  });

  it("pair rotations: R allowed only with R + 180°; rings over the vertex cap are skipped", () => {
    const paired = pairItems(lib, [{ id: "t", polygon: tri, quantity: 2, rotations: [0, 90, 180] }], 1);
    expect(paired.items[0]).toMatchObject({ id: "t×2", rotations: [0, 180] });
    const big = pairItems(lib, [{ id: "seg", polygon: ring, quantity: 2, rotations: [0, 180] }], 1);
    expect(big.items).toEqual([{ id: "seg", polygon: ring, quantity: 2, rotations: [0, 180] }]);
    expect(big.skipped).toEqual([{ id: "seg", reason: expect.stringMatching(/399 vertices, more than 150/) }]);
  });

  it("refuses a pair id that an item already has", () => {
    const items: NestItem[] = [
      { id: "t", polygon: tri, quantity: 2, rotations: [0, 180] },
      { id: "t×2", polygon: rect, quantity: 1, rotations: [0] },
    ];
    expect(() => pairItems(lib, items, 1)).toThrow(/already called/);
  });
});
