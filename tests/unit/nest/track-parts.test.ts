// The nester on this product's own kind of parts (scripts/nest-fixtures/track-parts.ts): long track
// segments whose top edge is a catenary row of hundreds of vertices, square and elliptical wheels.
// Every layout is checked with the independent geometry of layout-check.ts (jsts, polyclip-ts), and
// every packed outline is checked to contain its part with jsts, not with the nester's Clipper.
import { describe, expect, it } from "vitest";
import { loadClipper, toPath, fromPath } from "@/lib/geometry/clipper";
import { ringArea } from "@/lib/geometry/ring";
import { containingOutline } from "@/lib/nest/containing-outline";
import { loadInstance, nestStrip } from "@/lib/nest";
import { trackPartsInstance } from "../../../scripts/nest-fixtures/track-parts";
import { differenceArea, type XY } from "../../support/independent-geometry";
import { expectValidStrip } from "./layout-check";

describe("containing outlines", () => {
  it("contain their part (jsts), with fewer vertices and at most 0.5 % of its area added", async () => {
    const lib = await loadClipper();
    const inst = loadInstance(trackPartsInstance());
    const scale = 1e4; // integer steps per mm, as the nester would choose for a 2.4 m strip (scale.ts)
    for (const item of inst.items.filter((it) => it.polygon.length > 100)) {
      const path = toPath(item.polygon, scale);
      if (lib.area(path) < 0) path.reverse();
      const area = ringArea(item.polygon);
      const o = containingOutline(lib, path, { maxExtra: 0.005 * area * scale * scale });
      const ring = fromPath(o.path, scale) as XY[];
      // Nothing of the part outside its outline (polyclip-ts difference, an independent boolean).
      expect(differenceArea(item.polygon as XY[], ring), item.id).toBeLessThan(1e-6 * area);
      const extra = ringArea(ring) - area;
      expect(extra, `${item.id} extra area`).toBeGreaterThanOrEqual(-1e-6 * area);
      expect(extra / area, `${item.id} extra share`).toBeLessThanOrEqual(0.005);
      expect(o.extra / (scale * scale)).toBeCloseTo(extra, 0);
      expect(ring.length, `${item.id} vertices`).toBeLessThan(item.polygon.length / 3);
    }
  });

  it("still contain their part when capped to a few vertices, and say how much they add", async () => {
    const lib = await loadClipper();
    const item = loadInstance(trackPartsInstance()).items.find((it) => it.id === "square-track-6")!;
    const scale = 1e4;
    const path = toPath(item.polygon, scale);
    if (lib.area(path) < 0) path.reverse();
    const o = containingOutline(lib, path, { maxExtra: 0, maxVertices: 24 });
    const ring = fromPath(o.path, scale) as XY[];
    expect(ring.length).toBeLessThanOrEqual(24);
    expect(differenceArea(item.polygon as XY[], ring)).toBeLessThan(1e-6 * ringArea(item.polygon));
    expect(o.extra / (scale * scale)).toBeCloseTo(ringArea(ring) - ringArea(item.polygon), 0);
  });
});

describe("the time budget", () => {
  it("holds on 2000-vertex parts: 3 s asked, a complete valid layout back within 4 s", async () => {
    const inst = loadInstance(trackPartsInstance(2000));
    expect(Math.min(...inst.items.map((it) => it.polygon.length))).toBeGreaterThanOrEqual(1900);
    const t0 = performance.now();
    const r = await nestStrip({ items: inst.items, height: inst.height, seconds: 3, seed: 1 });
    const wall = (performance.now() - t0) / 1000;
    // The acceptance figure: the budget bounds the whole run, no-fit polygons included.
    expect(wall).toBeLessThan(4);
    expect(r.ended).toBe("time");
    expectValidStrip(inst.items, r, inst.height);
    for (const o of r.outlines) expect(o.extraArea).toBeGreaterThanOrEqual(0);
    expect(r.timings.noFitPolygons).toBeLessThan(3);
  });
});
