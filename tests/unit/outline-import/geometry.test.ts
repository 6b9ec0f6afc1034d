import { describe, expect, it } from "vitest";
import { importOutline, isStarShapedAbout, placeAxleDefault } from "@/lib/outline-import";
import { endpointToCentre } from "@/lib/outline-import/curves";
import { outlineWheel } from "@/lib/track/wheels/outline";
import { trackSchema, wheelSchema, MAX_POINTS } from "@/lib/track/spec";
import { load, ok } from "./helpers";

describe("SVG 1.1 F.6.5 endpoint-to-centre conversion", () => {
  it("matches a worked case derived by hand: (0,0) → (2,1), rx 2, ry 1, φ 0, fA 0, fS 0", () => {
    // Derived from F.6.5.1–F.6.5.6: x1' = −1, y1' = −0.5; Λ = 1/4 + 1/4 = 0.5 (no F.6.6 scaling);
    // coefficient −√((4 − 1 − 1)/(1 + 1)) = −1 (fA = fS); (cx', cy') = (1, −0.5); centre = (2, 0);
    // θ1 = angle((1,0), (−1, 0)) = π; Δθ = angle((−1,0), (0,1)) = −π/2 after the fS = 0 rule.
    const e = endpointToCentre(0, 0, 2, 1, 0, false, false, 2, 1);
    expect(e.kind).toBe("arc");
    if (e.kind !== "arc") return;
    expect(e.arc.cx).toBeCloseTo(2, 12);
    expect(e.arc.cy).toBeCloseTo(0, 12);
    expect(Math.abs(e.arc.theta1)).toBeCloseTo(Math.PI, 12);
    expect(e.arc.dtheta).toBeCloseTo(-Math.PI / 2, 12);
  });

  it("same ends with the large-arc flag: centre (0, 1), θ1 = −π/2, Δθ = −3π/2 (derived)", () => {
    // Coefficient +1 (fA ≠ fS): (cx', cy') = (−1, 0.5), centre (0, 1); u = (0, −1), v = (1, 0):
    // angle +π/2, made negative by fS = 0: −3π/2.
    const e = endpointToCentre(0, 0, 2, 1, 0, true, false, 2, 1);
    if (e.kind !== "arc") throw new Error("expected an arc");
    expect(e.arc.cx).toBeCloseTo(0, 12);
    expect(e.arc.cy).toBeCloseTo(1, 12);
    expect(e.arc.theta1).toBeCloseTo(-Math.PI / 2, 12);
    expect(e.arc.dtheta).toBeCloseTo((-3 * Math.PI) / 2, 12);
  });

  it("scales radii up when too small (F.6.6) and handles rotation and degenerate cases (F.6.2)", () => {
    // Radii 1 between points 4 apart: Λ = 4, radii ×2, the centre is the midpoint (derived).
    const e = endpointToCentre(0, 0, 1, 1, 0, false, true, 4, 0);
    if (e.kind !== "arc") throw new Error("expected an arc");
    expect(e.arc.rx).toBeCloseTo(2, 12);
    expect(e.arc.cx).toBeCloseTo(2, 12);
    expect(Math.abs(e.arc.dtheta)).toBeCloseTo(Math.PI, 12);
    // φ = 90° swaps the axes: rx 2 along y. From (0,0) to (0,4) with rx 2, ry 1: centre (0, 2), half turn.
    const r = endpointToCentre(0, 0, 2, 1, 90, false, true, 0, 4);
    if (r.kind !== "arc") throw new Error("expected an arc");
    expect(r.arc.cx).toBeCloseTo(0, 12);
    expect(r.arc.cy).toBeCloseTo(2, 12);
    expect(endpointToCentre(1, 1, 5, 5, 0, false, false, 1, 1).kind).toBe("omit");
    expect(endpointToCentre(0, 0, 0, 5, 0, false, false, 1, 1).kind).toBe("line");
  });
});

describe("placeAxleDefault and isStarShapedAbout", () => {
  it("puts the axle at the area centroid", () => {
    // Triangle: the centroid is the mean of the vertices (classical result).
    expect(
      placeAxleDefault([
        [0, 0],
        [6, 0],
        [0, 3],
      ]),
    ).toEqual({ x: 2, y: 1 });
    // L shape of a 2×1 and a 1×1 square: centroid ((2·1)(1, 0.5) + (1)(0.5, 1.5)) / 3 = (5/6, 5/6), derived.
    const c = placeAxleDefault([
      [0, 0],
      [2, 0],
      [2, 1],
      [1, 1],
      [1, 2],
      [0, 2],
    ]);
    expect(c.x).toBeCloseTo(5 / 6, 12);
    expect(c.y).toBeCloseTo(5 / 6, 12);
    // Far from the origin, where a naive formula loses digits.
    const far = placeAxleDefault([
      [1e8, 1e8],
      [1e8 + 6, 1e8],
      [1e8, 1e8 + 3],
    ]);
    expect(far.x - 1e8).toBeCloseTo(2, 6);
  });

  // A C-shaped outline (counter-clockwise): the notch makes rays from some points cross three times.
  const C: [number, number][] = [
    [0, 0],
    [10, 0],
    [10, 3],
    [3, 3],
    [3, 7],
    [10, 7],
    [10, 10],
    [0, 10],
  ];

  // A square with a triangular notch cut into its left side, tip at (3, 5): star-shaped about (7, 5)
  // (every ray from there meets the outline once), not about (1, 8) (straight down it crosses the
  // notch's two edges and the bottom: three times).
  const N: [number, number][] = [
    [0, 0],
    [10, 0],
    [10, 10],
    [0, 10],
    [0, 6],
    [3, 5],
    [0, 4],
  ];

  it("says where a ray from the axle crosses more than once", () => {
    expect(isStarShapedAbout(N, { x: 7, y: 5 })).toEqual({ ok: true });
    const bad = isStarShapedAbout(N, { x: 1, y: 8 });
    expect(bad.ok).toBe(false);
    if (bad.ok) return;
    expect(N.some(([x, y]) => x === bad.at.x && y === bad.at.y)).toBe(true);
    // The angle is the ray's direction, counter-clockwise from straight down, in [0, 2π).
    const expected =
      (((Math.atan2(bad.at.y - 8, bad.at.x - 1) + Math.PI / 2) % (2 * Math.PI)) + 2 * Math.PI) % (2 * Math.PI);
    expect(bad.angle).toBeCloseTo(expected, 12);
    expect(isStarShapedAbout(N, { x: 20, y: 5 }).ok).toBe(false); // outside
    expect(isStarShapedAbout(N, { x: 0, y: 0 }).ok).toBe(false); // on the outline
    expect(isStarShapedAbout(C, { x: 1.5, y: 5 }).ok).toBe(false); // a C has no point that sees all of it
    // Clockwise input is judged the same as counter-clockwise.
    expect(
      isStarShapedAbout(
        [
          [0, 0],
          [0, 1],
          [1, 1],
          [1, 0],
        ],
        { x: 0.5, y: 0.5 },
      ).ok,
    ).toBe(true);
  });

  it("agrees with the engine's own outline check (lib/track/wheels/outline.ts)", () => {
    const shapes: [number, number][][] = [
      C,
      N,
      [
        [0, 0],
        [4, 0],
        [4, 4],
        [0, 4],
      ],
    ];
    const axles = [
      { x: 1.5, y: 5 },
      { x: 8, y: 1.5 },
      { x: 2, y: 2 },
      { x: 7, y: 5 },
      { x: 1, y: 8 },
      { x: 20, y: 5 },
      { x: 5, y: 8 },
    ];
    let agreed = 0;
    let accepted = 0;
    for (const s of shapes)
      for (const a of axles) {
        let engine = true;
        try {
          outlineWheel(s, a);
        } catch {
          engine = false;
        }
        expect(isStarShapedAbout(s, a).ok).toBe(engine);
        agreed++;
        if (engine) accepted++;
      }
    expect(agreed).toBe(21);
    expect(accepted).toBeGreaterThan(1); // both answers occur
    expect(accepted).toBeLessThan(20);
  });
});

describe("results fit the engine's schema (lib/track/spec.ts)", () => {
  it("an imported wheel and track pass wheelSchema / trackSchema and the engine's own checks", () => {
    const w = ok(load("stadium-lwpolyline.dxf", { want: "wheel", tolerance: 0.01 }));
    const axle = placeAxleDefault(w.points);
    expect(wheelSchema.safeParse({ kind: "outline", points: w.points, axle }).success).toBe(true);
    expect(isStarShapedAbout(w.points, axle).ok).toBe(true);
    expect(() => outlineWheel(w.points, axle)).not.toThrow();
    const t = ok(load("track-polyline.svg", { want: "track", tolerance: 0.01 }));
    expect(trackSchema.safeParse({ kind: "profile", points: t.points }).success).toBe(true);
    expect(MAX_POINTS).toBe(20000);
    // A result straight from a circle file goes to the engine unchanged.
    const c = ok(
      importOutline(
        { name: "c.svg", text: '<svg xmlns="http://www.w3.org/2000/svg"><circle cx="3" cy="4" r="10"/></svg>' },
        { want: "wheel", tolerance: 0.001 },
      ),
    );
    expect(() => outlineWheel(c.points, placeAxleDefault(c.points))).not.toThrow();
  });
});
