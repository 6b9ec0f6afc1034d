// Minkowski sums and no-fit polygons (Bennell & Oliveira 2008), checked against closed forms and,
// for real benchmark pieces, against jsts: a piece placed on the NFP boundary touches without
// overlapping, inside the NFP it overlaps, outside it is clear.
import { beforeAll, describe, expect, it } from "vitest";
import { clipper, loadClipper, toPath, type ClipperLib } from "@/lib/geometry/clipper";
import { loadInstance } from "@/lib/nest";
import { minkowskiSum, noFitPolygon } from "@/lib/nest/minkowski";
import { NoFitCache } from "@/lib/nest/no-fit-cache";
import { penetrationDepth } from "@/lib/nest/penetration";
import { buildShapes } from "@/lib/nest/shapes";
import { areaOf, distanceBetween, intersectionArea, placedRing, type XY } from "../../support/independent-geometry";
import { readFixture } from "./layout-check";

let lib: ClipperLib;
beforeAll(async () => {
  lib = await loadClipper();
});

const S = 1000; // integer steps per unit in these tests
const sq = (x: number, y: number, s: number): XY[] => [
  [x, y],
  [x + s, y],
  [x + s, y + s],
  [x, y + s],
];
const netArea = (paths: clipper.Paths) => paths.reduce((s, p) => s + lib.area(p), 0) / (S * S);

/** Winding of the NFP at q: +1 inside an outer ring, −1 inside a hole; null on a boundary. */
function inside(paths: clipper.Paths, q: { x: number; y: number }): boolean | null {
  let w = 0;
  for (const p of paths) {
    const r = lib.pointInPolygon(q, p);
    if (r === clipper.PointInPolygonResult.OnBoundary) return null;
    if (r === clipper.PointInPolygonResult.Inside) w += lib.area(p) > 0 ? 1 : -1;
  }
  return w > 0;
}

describe("Minkowski sum", () => {
  it("10 × 10 square ⊕ 5 × 5 square = 15 × 15 = 225 (closed form: sum of convex boxes)", () => {
    const a = toPath(sq(0, 0, 10), S);
    const b = toPath(sq(0, 0, 5), S);
    // Clipper alone returns the swept annulus, outer 225 less a hole of 25 (docs/fabrication.md §6.3).
    expect(netArea(lib.minkowskiSumPath(b, a, true))).toBeCloseTo(200, 9);
    const sum = minkowskiSum(lib, a, b);
    expect(sum).toHaveLength(1);
    expect(netArea(sum)).toBeCloseTo(225, 9);
  });

  it("a × b box ⊕ −(c × d box) has area (a + c)(b + d) (closed form)", () => {
    const nfp = noFitPolygon(
      lib,
      toPath(
        [
          [0, 0],
          [7, 0],
          [7, 3],
          [0, 3],
        ],
        S,
      ),
      toPath(
        [
          [0, 0],
          [2, 0],
          [2, 5],
          [0, 5],
        ],
        S,
      ),
    );
    expect(netArea(nfp)).toBeCloseTo(9 * 8, 9);
  });

  it("keeps a genuine hole: a 4 × 4 square inside the 6 × 6 cavity of a 10 × 10 block has 2 × 2 of free positions", () => {
    // The block's cavity (2..8 × 2..8) opens to the right edge through a slot 1 wide, too narrow for the square.
    const block: XY[] = [
      [0, 0],
      [10, 0],
      [10, 4.5],
      [8, 4.5],
      [8, 2],
      [2, 2],
      [2, 8],
      [8, 8],
      [8, 5.5],
      [10, 5.5],
      [10, 10],
      [0, 10],
    ];
    const nfp = noFitPolygon(lib, toPath(block, S), toPath(sq(0, 0, 4), S));
    const holes = nfp.filter((p) => lib.area(p) < 0);
    expect(holes).toHaveLength(1);
    expect(-lib.area(holes[0]) / (S * S)).toBeCloseTo(4, 9); // reference point in [2, 4] × [2, 4]
    expect(inside(nfp, { x: 3 * S, y: 3 * S })).toBe(false);
    expect(inside(nfp, { x: 5 * S, y: 3 * S })).toBe(true);
  });
});

describe("no-fit polygon of benchmark pieces, checked with jsts", () => {
  const jakobs = loadInstance(readFixture("jakobs1"));
  const shapes = loadInstance(readFixture("shapes0"));
  // Large and small, convex and not: jakobs1 pieces (octagon, L, crosses, small triangles) and all of shapes0.
  const pieces = [...jakobs.items.filter((_, i) => [0, 1, 6, 8, 15, 16, 22, 23].includes(i)), ...shapes.items].map(
    (it) => it.polygon as XY[],
  );

  /** Deterministic pseudo-random pairs and rotations (a fixed linear congruential sequence). */
  // Two fixed big, moving small pairs first: their NFP has an interior the swept boundary alone misses.
  const cases: Array<[number, number, number, number]> = [
    [2, 0, 0, 0],
    [3, 90, 1, 180],
  ];
  let r = 12345;
  const next = (n: number) => ((r = (r * 1103515245 + 12345) % 2147483648), Math.floor((r / 2147483648) * n));
  for (let k = 0; k < 12; k++) cases.push([next(pieces.length), next(4) * 90, next(pieces.length), next(4) * 90]);

  it.each(cases)("piece %i at %i° fixed, piece %i at %i° moving", (ia, ra, ib, rb) => {
    const a = placedRing(pieces[ia], ra, 0, 0).map(([x, y]) => [Math.round(x * S) / S, Math.round(y * S) / S] as XY);
    const b = placedRing(pieces[ib], rb, 0, 0).map(([x, y]) => [Math.round(x * S) / S, Math.round(y * S) / S] as XY);
    const nfp = noFitPolygon(lib, toPath(a, S), toPath(b, S));
    const tiny = 1e-9 * Math.min(areaOf(a), areaOf(b));
    // On the boundary (every vertex of the NFP): touching, not overlapping.
    for (const path of nfp)
      for (const v of path) {
        const moved = b.map(([x, y]) => [x + v.x / S, y + v.y / S] as XY);
        expect(intersectionArea(a, moved)).toBeLessThanOrEqual(tiny);
        expect(distanceBetween(a, moved)).toBeLessThanOrEqual(1e-9);
      }
    // Elsewhere on a grid over the NFP's box: overlap exactly when inside.
    const xs = nfp.flat().map((q) => q.x);
    const ys = nfp.flat().map((q) => q.y);
    const [x0, x1, y0, y1] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
    let tried = 0;
    for (let i = 0; i <= 12; i++)
      for (let j = 0; j <= 12; j++) {
        const q = {
          x: Math.round(x0 + ((x1 - x0) * (i + 0.37)) / 12.5),
          y: Math.round(y0 + ((y1 - y0) * (j + 0.61)) / 12.5),
        };
        const inNfp = inside(nfp, q);
        if (inNfp === null) continue;
        const overlap = intersectionArea(
          a,
          b.map(([x, y]) => [x + q.x / S, y + q.y / S] as XY),
        );
        if (inNfp) expect(overlap).toBeGreaterThan(tiny);
        else expect(overlap).toBeLessThanOrEqual(tiny);
        tried++;
      }
    expect(tried).toBeGreaterThan(100);
  });
});

describe("sliver holes and penetration depth", () => {
  // The fixed polygon is shrunk by one integer step for exact fits; Clipper's mitred offset then
  // leaves one-step edges at its corners (this outline is dagli item 2 turned 180°, shrunk, at 1e6
  // steps per unit, as the nester first built it), and the Minkowski sum gets a sliver hole.
  const M = 1e6;
  const fixed = toPath(
    [
      [-10.999999, -18],
      [-8.999999, -23.999999],
      [-2, -23.999999],
      [0, -18],
      [-0.000001, -18],
      [-0.000001, -6],
      [-2.000001, -0.000001],
      [-9, -0.000001],
      [-11, -6],
      [-10.999999, -6],
    ],
    M,
  );
  const moving: XY[] = [
    [-2, -24],
    [0, -18],
    [0, -6],
    [-2, 0],
    [-9, 0],
    [-11, -6],
    [-11, -18],
    [-9, -24],
  ];

  it("leaves no sliver hole where the parts would overlap; the area stays 4 × the octagon's (closed form for a centrally symmetric convex part)", () => {
    // Clipper's own MinkowskiSum (a quadrilateral per pair of edges) leaves a thin hole here that the
    // no-fit polygon had to fill; the sum of convex pieces has none to begin with.
    const quads = lib.minkowskiSumPath(
      toPath(moving, M).map((q) => ({ x: -q.x, y: -q.y })),
      fixed,
      true,
    );
    const swept = lib.clipToPaths({
      clipType: clipper.ClipType.Union,
      subjectInputs: [{ data: quads, closed: true }],
      subjectFillType: clipper.PolyFillType.NonZero,
    });
    const slivers = swept.filter((p) => lib.area(p) < 0);
    expect(slivers.length).toBeGreaterThan(0);
    // Placed at a sliver's vertex, the part overlaps the fixed one almost entirely (jsts).
    const v = slivers[0][0];
    const fixedRing = fixed.map((q) => [q.x / M, q.y / M] as XY);
    expect(
      intersectionArea(
        fixedRing,
        moving.map(([x, y]) => [x + v.x / M, y + v.y / M] as XY),
      ),
    ).toBeGreaterThan(0.9 * areaOf(moving));
    const raw = minkowskiSum(
      lib,
      fixed,
      toPath(moving, M).map((q) => ({ x: -q.x, y: -q.y })),
    );
    expect(raw.filter((p) => lib.area(p) < 0)).toHaveLength(0);
    const nfp = noFitPolygon(lib, fixed, toPath(moving, M));
    expect(nfp.filter((p) => lib.area(p) < 0)).toHaveLength(0);
    expect(nfp.reduce((s, p) => s + lib.area(p), 0) / (M * M)).toBeCloseTo(4 * areaOf(moving), 3);
  });

  it("penetration depth is the distance to the NFP boundary: 10 × 10 fixed, 5 × 5 moving (closed form)", () => {
    const set = buildShapes(
      lib,
      [
        { id: "a", polygon: sq(0, 0, 10), quantity: 1, rotations: [0] },
        { id: "b", polygon: sq(0, 0, 5), quantity: 1, rotations: [0] },
      ],
      S,
      0,
    );
    const nfp = new NoFitCache(lib, set).get(0, 1); // NFP = [−5, 10] × [−5, 10], less the one-step shrink
    const step = 1 / S;
    expect(penetrationDepth(nfp, 2.5 * S, 2.5 * S) / S).toBeCloseTo(7.5, 2);
    expect(Math.abs(penetrationDepth(nfp, 2.5 * S, 2.5 * S) / S - (7.5 - step))).toBeLessThanOrEqual(2 * step);
    expect(Math.abs(penetrationDepth(nfp, 9 * S, 0) / S - (1 - step))).toBeLessThanOrEqual(2 * step);
    expect(penetrationDepth(nfp, 11 * S, 0)).toBe(0);
    expect(penetrationDepth(nfp, -5.5 * S, 2 * S)).toBe(0);
  });
});
