// The animated preview of the review e-mail, read back by libvips through sharp's metadata() and
// decoded page by page (an outside reader of WebP and GIF, not our encoder's own account of itself).
import sharp from "sharp";
import { beforeAll, describe, expect, it } from "vitest";
import { animatedPreview, MAX_PREVIEW_BYTES } from "@/lib/drawing/animated-preview";
import { rollingFrames } from "@/lib/drawing/rolling-frames";
import { poseAt } from "@/lib/studio/motion";
import { solve, type SolveResult } from "@/lib/track";

const SPECS: Record<string, unknown> = {
  square: { mode: "track-for-wheel", units: "mm", wheel: { kind: "polygon", sides: 4, side: 400, cornerRadius: 0 } },
  hexagon: {
    mode: "track-for-wheel",
    units: "mm",
    wheel: { kind: "polygon", sides: 6, inradius: 100, cornerRadius: 0 },
  },
  "sine track": {
    mode: "wheel-for-track",
    units: "mm",
    track: { kind: "sine", amplitude: 15, period: 200 },
    periodsPerTurn: 4,
  },
  twins: { mode: "twin-wheels", units: "mm", track: { kind: "sine", amplitude: 20, period: 300 }, periodsPerTurn: 2 },
  partner: {
    mode: "partner-wheel",
    units: "mm",
    wheel: { kind: "ellipse", semiMajor: 120, semiMinor: 80, axle: "focus" },
    lobes: 1,
  },
};

const results: Record<string, SolveResult> = {};
beforeAll(() => {
  for (const [name, spec] of Object.entries(SPECS)) results[name] = solve(spec);
});

async function pagePixels(data: Buffer, page: number): Promise<Buffer> {
  return sharp(data, { page }).raw().toBuffer();
}

describe("animated preview", () => {
  for (const name of Object.keys(SPECS)) {
    it(`${name}: an animated WebP within 600 px and 1 MiB whose frames move`, async () => {
      const a = await animatedPreview(results[name]);
      const meta = await sharp(a.data, { animated: true }).metadata();
      expect(meta.format).toBe("webp");
      expect(meta.pages).toBe(a.frames);
      expect(a.frames).toBeGreaterThan(1);
      expect(meta.width).toBeLessThanOrEqual(600);
      expect(a.data.length).toBeLessThanOrEqual(MAX_PREVIEW_BYTES);
      expect(meta.loop).toBe(0);
      expect(meta.delay).toHaveLength(a.frames);
      const [first, later] = await Promise.all([pagePixels(a.data, 0), pagePixels(a.data, Math.floor(a.frames / 3))]);
      expect(first.equals(later)).toBe(false);
    });
  }

  it("writes a GIF too, and steps down or refuses plainly when the cap is too small", async () => {
    const gif = await animatedPreview(results.square, { format: "gif", frames: 12, width: 300 });
    const meta = await sharp(gif.data, { animated: true }).metadata();
    expect(meta.format).toBe("gif");
    expect(meta.pages).toBe(12);
    const full = await animatedPreview(results.square);
    const squeezed = await animatedPreview(results.square, { maxBytes: Math.floor(full.bytes * 0.7) });
    expect(squeezed.bytes).toBeLessThanOrEqual(Math.floor(full.bytes * 0.7));
    expect(squeezed.frames * squeezed.width).toBeLessThan(full.frames * full.width);
    await expect(animatedPreview(results.square, { maxBytes: 500 })).rejects.toThrow(/does not fit in 500 bytes/);
  });
});

describe("the frames", () => {
  it("loop seamlessly: the pose after the last frame is the first frame's", () => {
    const r = results.square;
    const { frames } = rollingFrames(r, { frames: 20 });
    expect(frames.map((f) => f.position)).toEqual(Array.from({ length: 20 }, (_, k) => k / 20));
    // Position 1 wraps to 0: the next loop starts where this one began.
    expect(poseAt(r, 1).wheel.angle).toBeCloseTo(poseAt(r, 0).wheel.angle, 12);
  });

  it("draw a square's axle level on its road, in the pictures themselves", () => {
    const r = results.square;
    const { frames } = rollingFrames(r, { frames: 48 });
    // A square of half-side a rolls on its catenary road y = −a·cosh(x/a) with its axle level at
    // y = 0 (L. Hall and S. Wagon, "Roads and Wheels", Mathematics Magazine 65(5), 1992, pp. 283–301);
    // the drawn axle stays on that line to the engine's chord tolerance.
    expect(Math.max(...frames.map((f) => Math.abs(f.wheelAxle[1])))).toBeLessThan(0.05);
    // The axle mark (the first circle of radius 4 px) sits at one height in every frame's SVG, and
    // moves along: the picture shows a level, rolling axle, not a still one.
    const marks = frames.map((f) => /<circle cx="([\d.-]+)" cy="([\d.-]+)" r="4"/.exec(f.svg)!.slice(1).map(Number));
    const ys = marks.map((m) => m[1]);
    expect(Math.max(...ys) - Math.min(...ys)).toBeLessThanOrEqual(0.02);
    expect(new Set(marks.map((m) => m[0])).size).toBe(frames.length);
  });

  it("keep a pair's axles fixed at the centre distance", () => {
    const r = results.partner;
    for (const f of rollingFrames(r, { frames: 24 }).frames) {
      expect(f.wheelAxle).toEqual([0, 0]);
      expect(f.partnerAxle![1]).toBeCloseTo(-r.centreDistance!, 12);
    }
  });
});
