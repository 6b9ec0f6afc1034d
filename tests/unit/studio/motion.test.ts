// The studio's motion against the engine itself: solve a design, pose it with lib/studio/motion at
// many cycle positions, and check in plain geometry that the drawn outlines really touch where the
// view says they do.

import { beforeAll, describe, expect, it } from "vitest";
import { solve, type SolveResult } from "@/lib/track";
import {
  RUN_PERIODS,
  alongAt,
  axleTrace,
  followerAt,
  frictionLocation,
  interferenceLocation,
  poseAt,
  positionAt,
  restingAxles,
  trackYAtX,
  wheelAngleAt,
  xAtWheelAngle,
} from "@/lib/studio/motion";
import { boundsOf, placeOutline, rayReach, rotateCcw, type Pt } from "@/lib/studio/view-math";

const TOL = 0.01; // the engine's default chord tolerance in mm
const POSITIONS = [0, 0.013, 0.07, 0.1234, 0.25, 0.333, 0.41, 0.5, 0.618, 0.77, 0.9, 0.987];

/** Splits every edge into pieces no longer than `step`, so the gap is not read only at vertices. */
function densify(points: readonly Pt[], step: number): Pt[] {
  const out: Pt[] = [points[0]];
  for (let i = 0; i + 1 < points.length; i++) {
    const [ax, ay] = points[i];
    const [bx, by] = points[i + 1];
    const n = Math.max(1, Math.ceil(Math.hypot(bx - ax, by - ay) / step));
    for (let k = 1; k <= n; k++) out.push([ax + ((bx - ax) * k) / n, ay + ((by - ay) * k) / n]);
  }
  return out;
}

/** The smallest height of the posed wheel above the track, and the x where it happens. */
function gapToTrack(r: SolveResult, position: number) {
  const pose = poseAt(r, position);
  const placed = densify(placeOutline(r.wheel.points, pose.wheel.angle, pose.wheel.x, pose.wheel.y), 0.5);
  let gap = Infinity;
  let at = NaN;
  for (const [x, y] of placed) {
    const g = y - trackYAtX(r, x);
    if (g < gap) [gap, at] = [g, x];
  }
  return { pose, gap, at };
}

describe("track modes: the posed wheel rests on the track straight below its axle", () => {
  const cases: Array<{ name: string; spec: unknown; check: (r: SolveResult) => void }> = [
    {
      name: "square wheel, side 400 mm",
      spec: { mode: "track-for-wheel", wheel: { kind: "polygon", sides: 4, side: 400 } },
      check: (r) => {
        // Hall & Wagon 1992: the square of inradius a rolls on y = −a·cosh(x/a) arcs, each of
        // length 2a·asinh(1) along x, and turns a quarter turn per arc. a = 200 mm here.
        expect(r.period).toBeCloseTo(400 * Math.asinh(1), 6);
        expect(wheelAngleAt(r, r.period!)).toBeCloseTo(Math.PI / 2, 9);
        expect(wheelAngleAt(r, 2.5 * r.period!)).toBeCloseTo(2 * (Math.PI / 2) + wheelAngleAt(r, 0.5 * r.period!), 9);
      },
    },
    {
      name: "ellipse 100 × 80 mm, axle at a focus",
      spec: { mode: "track-for-wheel", wheel: { kind: "ellipse", semiMajor: 100, semiMinor: 80, axle: "focus" } },
      check: (r) => {
        // An ellipse about a focus, r = p/(1 + e·cos θ) with p = b²/a, rolls one period per turn
        // of length x = ∫ r dθ = 2πp/√(1 − e²) = 2πb (Hall & Wagon 1992); depth rMax − rMin = 2c.
        expect(r.period).toBeCloseTo(2 * Math.PI * 80, 4);
        expect(wheelAngleAt(r, r.period!)).toBeCloseTo(2 * Math.PI, 9);
        expect(r.depth).toBeCloseTo(120, 6);
      },
    },
    {
      name: "wheel for a sine track (amplitude 20, period 200, 4 periods per turn)",
      spec: { mode: "wheel-for-track", track: { kind: "sine", amplitude: 20, period: 200 }, periodsPerTurn: 4 },
      check: (r) => {
        // ∫₀ᴾ dx / (h − A sin(2πx/P)) = P / √(h² − A²) (Gradshteyn & Ryzhik 2.551.3), and closing
        // with k periods per turn needs k·P/√(h² − A²) = 2π (Hall & Wagon 1992): h = √((kP/2π)² + A²).
        expect(r.axleHeight).toBeCloseTo(Math.hypot((4 * 200) / (2 * Math.PI), 20), 6);
      },
    },
  ];

  for (const c of cases) {
    describe(c.name, () => {
      let r: SolveResult;
      beforeAll(() => {
        r = solve(c.spec);
      });

      it("matches the outside check values", () => c.check(r));

      it("never dips below the track, and touches it straight below the axle", () => {
        const size = r.wheel.rMax;
        for (const p of POSITIONS) {
          const { pose, gap, at } = gapToTrack(r, p);
          // The outline and the track are both chords of the exact curves, within TOL each.
          expect(gap).toBeGreaterThan(-3 * TOL);
          expect(gap).toBeLessThan(3 * TOL);
          // A tangent contact leaves a gap of about κd²/2 at distance d, so the lowest point over
          // the track is within a few mm of the axle (for a 200–280 mm wheel).
          expect(Math.abs(at - pose.wheel.x)).toBeLessThan(0.02 * size);
          expect(pose.contact[0]).toBe(pose.wheel.x);
        }
      });

      it("keeps the axle level: the wheel set on the track puts its axle on the axle line", () => {
        for (const p of POSITIONS) {
          const pose = poseAt(r, p);
          expect(Math.abs(restingAxles(r, pose).wheel - pose.wheel.y)).toBeLessThan(3 * TOL);
        }
        const trace = axleTrace(r, 240);
        const ys = trace.map((t) => t.wheel);
        expect(Math.max(...ys) - Math.min(...ys)).toBeLessThan(3 * TOL);
        expect(trace[trace.length - 1].along - trace[0].along).toBeCloseTo(RUN_PERIODS * r.period!, 9);
      });

      it("maps positions to axle x and back", () => {
        for (const p of POSITIONS) expect(positionAt(r, alongAt(r, p))).toBeCloseTo(p, 12);
        const x = 0.37 * r.period!;
        expect(xAtWheelAngle(r, wheelAngleAt(r, x))).toBeCloseTo(x, 4);
      });
    });
  }

  it("the square's lowest point at the start is the middle of its bottom side, straight below the axle", () => {
    const r = solve({ mode: "track-for-wheel", wheel: { kind: "polygon", sides: 4, side: 400 } });
    const pose = poseAt(r, 0);
    const b = boundsOf(placeOutline(r.wheel.points, pose.wheel.angle, pose.wheel.x, pose.wheel.y));
    expect(b.minY).toBeCloseTo(-200, 6);
    expect(pose.contact[1]).toBeCloseTo(-200, 6);
  });
});

describe("a triangle on its own track cuts in, and the view can point at it", () => {
  it("places the interference spot inside the run at the pose where it happens", () => {
    const r = solve({ mode: "track-for-wheel", wheel: { kind: "polygon", sides: 3, side: 300 } });
    // A triangle's corner digs into the next arc of its own road (Hall & Wagon 1992 on n = 3;
    // docs/product.md §2 asks the tool to say so); the engine reports the depth and where.
    expect(r.check.interference.depth).toBeGreaterThan(0);
    const loc = interferenceLocation(r)!;
    expect(loc).not.toBeNull();
    const pose = poseAt(r, loc.position);
    expect(pose.wheel.x).toBeCloseTo(r.check.interference.when!, 6);
    // The spot is a track point, inside the posed wheel by about the reported depth (radially).
    expect(loc.point[1]).toBeCloseTo(trackYAtX(r, loc.point[0]), 1);
    const d: Pt = [loc.point[0] - pose.wheel.x, loc.point[1] - pose.wheel.y];
    const reach = rayReach(r.wheel.points, rotateCcw(d, pose.wheel.angle));
    expect(reach - Math.hypot(d[0], d[1])).toBeCloseTo(r.check.interference.depth, 1);
  });
});

describe("partner wheel: identical ellipses about their foci", () => {
  let r: SolveResult;
  beforeAll(() => {
    r = solve({
      mode: "partner-wheel",
      wheel: { kind: "ellipse", semiMajor: 100, semiMinor: 80, axle: "focus" },
      lobes: 1,
    });
  });

  it("has the textbook centre distance and speed-ratio range", () => {
    // Two equal ellipses turning about a focus each roll on each other at a = 2 × semi-major
    // (Litvin et al. 2009, §3): 200 mm. Speed ratio r₁/(a − r₁) runs from 40/160 to 160/40.
    expect(r.centreDistance).toBeCloseTo(200, 6);
    expect(r.check.speedRatio!.min).toBeCloseTo(0.25, 6);
    expect(r.check.speedRatio!.max).toBeCloseTo(4, 6);
  });

  it("touches on the line of centres: r_driver + r_partner = centre distance at every position", () => {
    for (const p of POSITIONS) {
      const pose = poseAt(r, p);
      const rest = restingAxles(r, pose);
      // Pitch curves about fixed centres: r₁ + r₂ = a (Litvin et al. 2009).
      expect(Math.abs(-rest.partner! - r.centreDistance!)).toBeLessThan(3 * TOL);
      // The contact is on the line of centres, r₁ below the driver's axle.
      expect(pose.contact[0]).toBe(0);
      expect(pose.contact[1]).toBeLessThan(0);
      expect(pose.contact[1]).toBeGreaterThan(-r.centreDistance!);
    }
  });

  it("turns the partner the other way, and extends the follower by whole sectors", () => {
    const sector = (2 * Math.PI) / r.wheel.symmetry;
    const turn = followerAt(r, sector);
    expect(turn).toBeCloseTo((2 * Math.PI) / 1, 9); // lobes 1: one partner turn per driver sector
    expect(followerAt(r, sector + 1.1)).toBeCloseTo(turn + followerAt(r, 1.1), 9);
    // No slip: equal arc lengths r₁ dθ₁ = r₂ dθ₂ (Litvin et al. 2009), so near the start the
    // follower's rate is r₁/r₂ = 40/160.
    expect(followerAt(r, 1e-3) / 1e-3).toBeCloseTo(0.25, 2);
  });

  it("has the partner's outline touch the driver's at the contact point", () => {
    for (const p of [0.1, 0.45, 0.8]) {
      const pose = poseAt(r, p);
      const partner = pose.partner!;
      // The partner's point straight above its axle, in the world frame.
      const up = rayReach(r.partner!.points, rotateCcw([0, 1], -partner.angle));
      expect(Math.abs(partner.y + up - pose.contact[1])).toBeLessThan(3 * TOL);
    }
  });

  it("reports the friction spot as a driver angle", () => {
    const loc = frictionLocation(r);
    expect(loc.position * 2 * Math.PI).toBeCloseTo(r.check.frictionDemand.at, 9);
  });
});

describe("twin wheels on a sine track", () => {
  let r: SolveResult;
  beforeAll(() => {
    r = solve({ mode: "twin-wheels", track: { kind: "sine", amplitude: 20, period: 200 }, periodsPerTurn: 4 });
  });

  it("both wheels rest on the track at the same x, their axles level", () => {
    // A sine track is point-symmetric, so the twins are the same wheel at ±h (Hall & Wagon 1992 h).
    expect(r.lowerAxleHeight).toBeCloseTo(-r.axleHeight!, 6);
    for (const p of POSITIONS) {
      const pose = poseAt(r, p);
      const rest = restingAxles(r, pose);
      expect(Math.abs(rest.wheel - r.axleHeight!)).toBeLessThan(3 * TOL);
      expect(Math.abs(rest.partner! - r.lowerAxleHeight!)).toBeLessThan(3 * TOL);
      expect(pose.partner!.x).toBe(pose.wheel.x);
      expect(pose.partner!.sense).toBe("ccw");
    }
  });
});
