// The client's mock-up geometry (lib/review/run-scene.ts) against closed forms and the engine's own
// tiling: the run is the one the cut files get, the wheel's own outline keeps the axle on its line
// over the whole roll, and a pair keeps its centre distance.
import { describe, expect, it } from "vitest";
import { PERSON_HEIGHT_MM, personOutline } from "@/lib/review/person";
import {
  placeOfPosition,
  poseOnRun,
  positionOfPlace,
  runScene,
  type RunChoice,
  type RunLayout,
} from "@/lib/review/run-scene";
import { solve, tileRun, type Pt } from "@/lib/track";

const SQUARE = {
  mode: "track-for-wheel",
  units: "mm",
  wheel: { kind: "polygon", sides: 4, side: 400, cornerRadius: 0 },
};

/** The profile's height at x, read straight off its polyline. */
function profileY(profile: Pt[], x: number): number {
  let j = 1;
  while (j < profile.length - 1 && profile[j][0] < x) j++;
  const [a, b] = [profile[j - 1], profile[j]];
  return a[1] + ((x - a[0]) / (b[0] - a[0])) * (b[1] - a[1]);
}

function worstOffLine(spec: unknown, run: RunChoice | null, samples = 1500) {
  const r = solve(spec);
  const scene = runScene(r, run);
  let off = 0;
  let onTrack = 0;
  for (let i = 0; i <= samples; i++) {
    const pose = poseOnRun(r, scene, i / samples);
    off = Math.max(off, Math.abs(pose.offLine));
    if (scene.kind === "run")
      onTrack = Math.max(onTrack, Math.abs(profileY(scene.profile, pose.contact[0]) - pose.contact[1]));
  }
  return { r, scene, off, onTrack };
}

describe("the run as built", () => {
  // A square of half-side a = 200 mm on its catenary road y = −a·cosh(x/a): period 2a·asinh(1) =
  // 352.549 mm, hump (crest to trough) a(√2 − 1) = 82.843 mm, axle a above the crest (L. Hall and
  // S. Wagon, "Roads and Wheels", Mathematics Magazine 65(5), 1992, pp. 283–301).
  const a = 200;
  for (const endTreatment of ["flat", "half", "scale"] as const) {
    it(`${endTreatment}: is 6000 mm long, tiles the engine's periods, and keeps the axle on its line`, () => {
      const { scene, off, onTrack } = worstOffLine(SQUARE, { runLength: 6000, endTreatment });
      const s = scene as RunLayout;
      expect(s.kind).toBe("run");
      expect(s.runLength).toBe(6000);
      expect(s.profile[0][0]).toBe(0);
      expect(s.profile[s.profile.length - 1][0]).toBeCloseTo(6000, 9);
      const tile = tileRun({ runLength: 6000, period: 2 * a * Math.asinh(1) });
      const expected = { flat: tile.flatRunOut.periods, half: tile.halfPeriod.periods, scale: tile.scaled.periods }[
        endTreatment
      ];
      expect(s.periods).toBe(expected);
      const scale = endTreatment === "scale" ? tile.scaled.scale : 1;
      expect(s.period).toBeCloseTo(2 * a * Math.asinh(1) * scale, 6);
      expect(s.dims.humpHeight).toBeCloseTo(a * (Math.SQRT2 - 1) * scale, 2);
      expect(s.axleY - s.crestY).toBeCloseTo(a * scale, 2);
      expect(s.dims.wheelAcross).toBeCloseTo(2 * a * Math.SQRT2 * scale, 3);
      // The resting axle, from the outline itself, within the engine's chord tolerance (0.01 mm) and a hair.
      expect(off).toBeLessThan(0.02);
      expect(onTrack).toBeLessThan(1e-6);
      if (endTreatment === "flat") expect(s.eachEnd).toBeCloseTo(tile.flatRunOut.eachEnd, 9);
      if (endTreatment === "scale") expect(s.eachEnd).toBe(0);
    });
  }

  it("rolls only over the profiled part, from crest to crest, with the flats drawn at both ends", () => {
    const { r, scene } = worstOffLine(SQUARE, { runLength: 6000, endTreatment: "flat" });
    const s = scene as RunLayout;
    expect(s.rollStart).toBeCloseTo(s.eachEnd, 9);
    expect(s.rollEnd - s.rollStart).toBeCloseTo(s.periods * s.period, 6);
    expect(poseOnRun(r, s, 0).contact[1]).toBeCloseTo(s.crestY, 6);
    expect(poseOnRun(r, s, 1).contact[1]).toBeCloseTo(s.crestY, 6);
    // Per whole period the square turns a quarter turn (2π / 4).
    const perPeriod = poseOnRun(r, s, 1 / s.periods).wheelAngle - poseOnRun(r, s, 0).wheelAngle;
    expect(perPeriod).toBeCloseTo(Math.PI / 2, 6);
  });

  it("lays an inch design out in millimetres (25.4 mm to the inch, by definition)", () => {
    const inch = {
      mode: "track-for-wheel",
      units: "in",
      wheel: { kind: "polygon", sides: 4, side: 400 / 25.4, cornerRadius: 0 },
    };
    const { scene, off } = worstOffLine(inch, { runLength: 6000, endTreatment: "flat" });
    const mm = runScene(solve(SQUARE), { runLength: 6000, endTreatment: "flat" }) as RunLayout;
    expect((scene as RunLayout).period).toBeCloseTo(mm.period, 3);
    expect((scene as RunLayout).periods).toBe(mm.periods);
    expect(off).toBeLessThan(0.03);
  });

  it("keeps an ellipse's axle (at a focus) level on its road, and a wheel made for a sine track on it", () => {
    expect(
      worstOffLine(
        {
          mode: "track-for-wheel",
          units: "mm",
          wheel: { kind: "ellipse", semiMajor: 150, semiMinor: 100, axle: "focus" },
        },
        { runLength: 3000, endTreatment: "half" },
      ).off,
    ).toBeLessThan(0.05);
    const sine = worstOffLine(
      { mode: "wheel-for-track", units: "mm", track: { kind: "sine", amplitude: 15, period: 200 }, periodsPerTurn: 4 },
      { runLength: 2000, endTreatment: "flat" },
    );
    expect(sine.off).toBeLessThan(0.03);
    expect(sine.onTrack).toBeLessThan(1e-6);
    // A sine track of amplitude 15 mm has humps 30 mm from crest to trough.
    expect(sine.scene.dims.humpHeight).toBeCloseTo(30, 6);
  });

  it("rolls twin wheels on both sides of their track, each axle on its line", () => {
    const spec = {
      mode: "twin-wheels",
      units: "mm",
      track: { kind: "sine", amplitude: 20, period: 300 },
      periodsPerTurn: 2,
    };
    const r = solve(spec);
    const s = runScene(r, { runLength: 1500, endTreatment: "flat" }) as RunLayout;
    expect(s.periods).toBe(5);
    let worst = 0;
    for (let i = 0; i <= 1000; i++) {
      const p = poseOnRun(r, s, i / 1000);
      worst = Math.max(worst, Math.abs(p.offLine), Math.abs(p.partnerAxle![1] - s.lowerAxleY!));
    }
    expect(worst).toBeLessThan(0.03);
    expect(s.axleY).toBeCloseTo(r.axleHeight!, 9);
    expect(s.lowerAxleY).toBeCloseTo(r.lowerAxleHeight!, 9);
  });

  it("turns a partner pair on fixed axles that stay the centre distance apart", () => {
    const r = solve({
      mode: "partner-wheel",
      units: "mm",
      wheel: { kind: "ellipse", semiMajor: 120, semiMinor: 80, axle: "focus" },
      lobes: 1,
    });
    const s = runScene(r, null);
    expect(s.kind).toBe("pair");
    // Two equal ellipses turning about their foci mesh at a centre distance of the major axis, 2a = 240 mm
    // (the classical pair of elliptical gears; F. L. Litvin et al., "Noncircular Gears", 2009).
    expect(s.kind === "pair" && s.centreDistance).toBeCloseTo(240, 6);
    let worst = 0;
    for (let i = 0; i <= 720; i++) worst = Math.max(worst, Math.abs(poseOnRun(r, s, i / 720).offLine));
    expect(worst).toBeLessThan(0.05);
  });
});

describe("places along the run", () => {
  it("goes from a pinned place to a roll position and back", () => {
    const r = solve(SQUARE);
    const s = runScene(r, { runLength: 6000, endTreatment: "flat" });
    for (const at of [500, 1500, 3000.5, 5900]) expect(placeOfPosition(s, positionOfPlace(s, at))).toBeCloseTo(at, 6);
    // Off the rolled span the position holds at its ends.
    expect(positionOfPlace(s, 0)).toBe(0);
    expect(positionOfPlace(s, 6000)).toBe(1);
    const pair = runScene(
      solve({
        mode: "partner-wheel",
        units: "mm",
        wheel: { kind: "ellipse", semiMajor: 120, semiMinor: 80, axle: "focus" },
        lobes: 1,
      }),
      null,
    );
    expect(placeOfPosition(pair, positionOfPlace(pair, 90))).toBeCloseTo(90, 9);
    expect(positionOfPlace(pair, 450)).toBeCloseTo(0.25, 12);
  });
});

describe("the person for scale", () => {
  it("is exactly 1.7 m from the soles to the crown, standing on the floor beside the run", () => {
    const pts = personOutline();
    expect(Math.min(...pts.map((p) => p[1]))).toBe(0);
    expect(Math.max(...pts.map((p) => p[1]))).toBeCloseTo(PERSON_HEIGHT_MM, 9);
    expect(PERSON_HEIGHT_MM).toBe(1700);
    const s = runScene(solve(SQUARE), { runLength: 6000, endTreatment: "flat" });
    const ys = s.person.map((p) => p[1]);
    expect(Math.min(...ys)).toBeCloseTo(s.floorY, 9);
    expect(Math.max(...ys) - Math.min(...ys)).toBeCloseTo(1700, 9);
    expect(Math.max(...s.person.map((p) => p[0]))).toBeLessThan(0);
  });
});
