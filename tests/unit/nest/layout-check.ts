// Checks a nester result against the items it was given, with the independent geometry of
// tests/support/independent-geometry.ts (jsts, polyclip-ts), never with the nester's own bookkeeping.
import { readFileSync } from "node:fs";
import { expect } from "vitest";
import type { NestItem, Placement } from "@/lib/nest";
import { checkLayout, placedRing, type Box, type LayoutReport, type XY } from "../../support/independent-geometry";

/**
 * Overlap and containment tolerance, as a share of the smaller part's area: far below any cutting
 * tolerance, far above floating-point noise (common practice for a floating-point geometry check).
 */
export const AREA_TOLERANCE = 1e-6;

export function readFixture(name: string): unknown {
  return JSON.parse(readFileSync(new URL(`../../fixtures/nesting/${name}.json`, import.meta.url), "utf8"));
}

export interface Checked {
  report: LayoutReport;
  /** Σ part area / (height × used length), with the length read off the placed outlines. */
  utilisation: number;
}

/** Every copy once, rotations from the allowed set, no overlaps, inside `container`. */
export function expectValidLayout(
  items: readonly NestItem[],
  placements: readonly Placement[],
  container: Box,
  gapOfInterest = 0,
): Checked {
  const byId = new Map(items.map((it) => [it.id, it]));
  const seen = new Set<string>();
  for (const p of placements) {
    const it = byId.get(p.id);
    expect(it, `placement of unknown item ${p.id}`).toBeDefined();
    const key = `${p.id}#${p.copy}`;
    expect(seen.has(key), `${key} placed twice`).toBe(false);
    seen.add(key);
    expect(p.copy).toBeGreaterThanOrEqual(0);
    expect(p.copy).toBeLessThan(it!.quantity);
    expect(it!.rotations, `${key} rotation ${p.rotation}`).toContain(p.rotation);
    expect(Number.isFinite(p.x) && Number.isFinite(p.y)).toBe(true);
  }
  const parts = placements.map((p) => ({
    label: `${p.id}#${p.copy}`,
    ring: placedRing(byId.get(p.id)!.polygon as XY[], p.rotation, p.x, p.y),
  }));
  const report = checkLayout(parts, container, gapOfInterest);
  expect(report.worstOverlap, `overlap ${report.worstOverlapPair?.join(" / ")}`).toBeLessThanOrEqual(AREA_TOLERANCE);
  expect(report.worstOutside, `outside the container: ${report.worstOutsidePart}`).toBeLessThanOrEqual(AREA_TOLERANCE);
  return { report, utilisation: report.area / ((container.maxY - container.minY) * report.maxX) };
}

/** Strip layouts: every copy of every item placed exactly once, inside [0, length] × [0, height]. */
export function expectValidStrip(
  items: readonly NestItem[],
  result: { placements: Placement[]; length: number; utilisation: number },
  height: number,
): Checked {
  const copies = items.reduce((s, it) => s + it.quantity, 0);
  expect(result.placements.length).toBe(copies);
  const checked = expectValidLayout(items, result.placements, { minX: 0, minY: 0, maxX: result.length, maxY: height });
  // The reported length is where the parts end, and the utilisation follows from the outlines.
  expect(Math.abs(checked.report.maxX - result.length)).toBeLessThanOrEqual(1e-9 * result.length);
  expect(Math.abs(checked.utilisation - result.utilisation)).toBeLessThanOrEqual(1e-9);
  return checked;
}
