// Placing an uploaded outline's axle on the canvas (lib/studio/axle-placement.ts): screen points
// map back to the outline's own frame whatever the wheel's turn, drags place no finer than a pixel,
// and a refusal is the engine's own message.
import { describe, expect, it } from "vitest";
import { axleRefusal, dragStep, nudgeStep, outlinePointAt, snap } from "@/lib/studio/axle-placement";
import { placeOutline, toScreen, type Pt, type View } from "@/lib/studio/view-math";
import { solve } from "@/lib/track";
import { engineError } from "../track/engine-error";

// A 200 mm square with a triangular notch in its left side, tip at (60, 100): star-shaped about
// (140, 100) but not about (140, 40) (the kernel is 360 − x ≤ 3y ≤ x + 240, from the notch's edges).
const NOTCHED: [number, number][] = [
  [0, 0],
  [200, 0],
  [200, 200],
  [0, 200],
  [0, 120],
  [60, 100],
  [0, 80],
];

describe("axle placement", () => {
  it("finds the outline point under a screen point, for a turned and moved wheel", () => {
    const view: View = { scale: 1.7, ox: 320, oy: 240 };
    const axle = { x: 102.5, y: 100 };
    const body = { axleAt: [35, -12] as Pt, angleCw: 0.7, axle };
    // Draw an outline point the way the canvas does (engine outline = points less the axle), then read it back.
    const p: Pt = [150, 30];
    const [drawn] = placeOutline([[p[0] - axle.x, p[1] - axle.y]], body.angleCw, body.axleAt[0], body.axleAt[1]);
    const back = outlinePointAt(toScreen(view, drawn), view, body);
    expect(back[0]).toBeCloseTo(p[0], 9);
    expect(back[1]).toBeCloseTo(p[1], 9);
    // The drawn axle itself reads back as the axle.
    const a = outlinePointAt(toScreen(view, body.axleAt), view, body);
    expect(a[0]).toBeCloseTo(axle.x, 9);
    expect(a[1]).toBeCloseTo(axle.y, 9);
  });

  it("places no finer than a pixel can show, and nudges by whole steps", () => {
    expect(dragStep(1.7)).toBe(0.1); // 1 px = 0.59 mm
    expect(dragStep(0.5)).toBe(1); // 1 px = 2 mm
    expect(dragStep(40)).toBe(0.01);
    expect(snap(0.1 + 0.2, 0.1)).toBe(0.3);
    expect(snap(132.46, 0.1)).toBe(132.5);
    expect(nudgeStep("mm", false)).toBe(1);
    expect(nudgeStep("mm", true)).toBe(10);
    expect(nudgeStep("in", false)).toBe(0.05);
  });

  it("refuses with the engine's own words, and only what the engine refuses", () => {
    expect(axleRefusal(NOTCHED, { x: 140, y: 100 })).toBeUndefined();
    const refusal = axleRefusal(NOTCHED, { x: 140, y: 40 });
    expect(refusal).toMatch(/not star-shaped about the axle/);
    const engine = engineError(() =>
      solve({ mode: "track-for-wheel", wheel: { kind: "outline", points: NOTCHED, axle: { x: 140, y: 40 } } }),
    );
    expect(refusal).toBe(engine.message);
    expect(axleRefusal(NOTCHED, { x: 260, y: 100 })).toMatch(/outside the outline/);
    expect(() =>
      solve({ mode: "track-for-wheel", wheel: { kind: "outline", points: NOTCHED, axle: { x: 140, y: 100 } } }),
    ).not.toThrow();
  });
});
