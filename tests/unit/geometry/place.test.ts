// Rotate-and-place against the rotation matrix worked by hand: (x, y) turned θ counter-clockwise
// is (x cos θ − y sin θ, x sin θ + y cos θ) (common practice; any linear-algebra text).
import { describe, expect, it } from "vitest";
import { cosSin, placeRing, placer, rotateRing, translate } from "@/lib/geometry/place";
import type { Pt } from "@/lib/geometry/point";

describe("cosSin", () => {
  it("is exact on quarter turns, in and out of [0°, 360°)", () => {
    expect(cosSin(0)).toEqual([1, 0]);
    expect(cosSin(90)).toEqual([0, 1]);
    expect(cosSin(180)).toEqual([-1, 0]);
    expect(cosSin(270)).toEqual([0, -1]);
    expect(cosSin(-90)).toEqual([0, -1]);
    expect(cosSin(450)).toEqual([0, 1]);
    expect(cosSin(720)).toEqual([1, 0]);
  });

  it("is cos and sin of the angle otherwise", () => {
    for (const d of [30, 45, 123.4, -30, 400]) {
      const [c, s] = cosSin(d);
      expect(c).toBeCloseTo(Math.cos((d * Math.PI) / 180), 14);
      expect(s).toBeCloseTo(Math.sin((d * Math.PI) / 180), 14);
    }
    expect(cosSin(30)[1]).toBeCloseTo(0.5, 15); // sin 30° = 1/2
    expect(cosSin(45)[0]).toBeCloseTo(Math.SQRT1_2, 15); // cos 45° = 1/√2
  });
});

describe("rotate, then translate", () => {
  it("turns (1, 0) to (0, 1) exactly by a quarter turn, straight edges staying straight", () => {
    expect(
      rotateRing(
        [
          [1, 0],
          [2, 3],
        ],
        90,
      ),
    ).toEqual([
      [0, 1],
      [-3, 2],
    ]);
    const square = rotateRing(
      [
        [0, 0],
        [10, 0],
        [10, 5],
        [0, 5],
      ],
      270,
    );
    expect(square).toEqual([
      [0, 0],
      [0, -10],
      [5, -10],
      [5, 0],
    ]);
  });

  it("turns by hand-worked values at 30°: (2, 0) → (√3, 1)", () => {
    const [[x, y]] = rotateRing([[2, 0]], 30);
    expect(x).toBeCloseTo(Math.sqrt(3), 14);
    expect(y).toBeCloseTo(1, 14);
  });

  it("rotates about the part's own origin first, then moves (not the other way round)", () => {
    const ring: Pt[] = [
      [1, 0],
      [1, 1],
    ];
    expect(placeRing(ring, 90, 10, 20)).toEqual([
      [10, 21],
      [9, 21],
    ]);
    expect(placeRing(ring, 90, 10, 20)).toEqual(translate(rotateRing(ring, 90), 10, 20));
    expect(ring.map(placer(180, -1, 1))).toEqual([
      [-2, 1],
      [-2, 0],
    ]);
  });
});
