// Independent checks for nesting results. Nothing here uses lib/nest or Clipper: areas,
// intersections, differences and distances come from jsts 2.12 (the JavaScript port of the Java
// Topology Suite), with polyclip-ts 0.16 (Martínez–Rueda sweep line) as a second engine when JTS's
// overlay throws on nearly coincident edges, which touching parts produce on purpose.
import Coordinate from "jsts/org/locationtech/jts/geom/Coordinate.js";
import GeometryFactory from "jsts/org/locationtech/jts/geom/GeometryFactory.js";
import DistanceOp from "jsts/org/locationtech/jts/operation/distance/DistanceOp.js";
import SnapIfNeededOverlayOp from "jsts/org/locationtech/jts/operation/overlay/snap/SnapIfNeededOverlayOp.js";
import * as polyclip from "polyclip-ts";

export type XY = [number, number];

interface JstsGeometry {
  getArea(): number;
  getEnvelopeInternal(): { getMinX(): number; getMinY(): number; getMaxX(): number; getMaxY(): number };
}

const factory = new GeometryFactory();

function closed(ring: readonly XY[]): XY[] {
  const r = ring.map(([x, y]) => [x, y] as XY);
  const [a, b] = [r[0], r[r.length - 1]];
  if (a[0] !== b[0] || a[1] !== b[1]) r.push([a[0], a[1]]);
  return r;
}

export function jstsPolygon(ring: readonly XY[]): JstsGeometry {
  const coords = closed(ring).map(([x, y]) => new Coordinate(x, y));
  return factory.createPolygon(factory.createLinearRing(coords), []) as unknown as JstsGeometry;
}

/** Area of a simple ring (jsts). */
export function areaOf(ring: readonly XY[]): number {
  return jstsPolygon(ring).getArea();
}

/** Area of a polyclip-ts result, each ring's area through jsts (outer minus holes). */
function multiPolygonArea(mp: polyclip.Geom): number {
  let a = 0;
  for (const poly of mp as XY[][][]) poly.forEach((ring, k) => (a += (k === 0 ? 1 : -1) * areaOf(ring)));
  return a;
}

function overlay(op: "intersection" | "difference", a: readonly XY[], b: readonly XY[]): number {
  try {
    return (SnapIfNeededOverlayOp[op](jstsPolygon(a), jstsPolygon(b)) as JstsGeometry).getArea();
  } catch {
    return multiPolygonArea(polyclip[op]([closed(a)], [closed(b)]));
  }
}

export const intersectionArea = (a: readonly XY[], b: readonly XY[]) => overlay("intersection", a, b);
export const differenceArea = (a: readonly XY[], b: readonly XY[]) => overlay("difference", a, b);

/** Shortest distance between two polygons (jsts DistanceOp); 0 when they touch or overlap. */
export function distanceBetween(a: readonly XY[], b: readonly XY[]): number {
  return DistanceOp.distance(jstsPolygon(a) as never, jstsPolygon(b) as never) as number;
}

/** rotate(ring, degrees about the origin), then translate; written out here, not taken from lib/nest. */
export function placedRing(ring: readonly XY[], degrees: number, x: number, y: number): XY[] {
  const t = (degrees * Math.PI) / 180;
  const [c, s] = [Math.cos(t), Math.sin(t)];
  return ring.map(([px, py]) => [c * px - s * py + x, s * px + c * py + y] as XY);
}

export interface Box {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

const rect = (b: Box): XY[] => [
  [b.minX, b.minY],
  [b.maxX, b.minY],
  [b.maxX, b.maxY],
  [b.minX, b.maxY],
];

function envelope(ring: readonly XY[]): Box {
  const xs = ring.map((p) => p[0]);
  const ys = ring.map((p) => p[1]);
  return { minX: Math.min(...xs), minY: Math.min(...ys), maxX: Math.max(...xs), maxY: Math.max(...ys) };
}

export interface LayoutReport {
  parts: number;
  /** Sum of part areas. */
  area: number;
  /** Largest pairwise intersection area divided by the smaller part's area, and that pair. */
  worstOverlap: number;
  worstOverlapPair: [string, string] | null;
  /** Largest part area outside the container divided by the part's area, and that part. */
  worstOutside: number;
  worstOutsidePart: string | null;
  /** Smallest distance between two parts among pairs closer than `gapOfInterest` (Infinity if none). */
  minGap: number;
  /** Largest x of any part vertex. */
  maxX: number;
}

/**
 * Checks placed parts: pairwise overlap, containment in `container`, and the smallest gap among
 * pairs whose envelopes come within `gapOfInterest` of each other.
 */
export function checkLayout(
  parts: Array<{ label: string; ring: XY[] }>,
  container: Box,
  gapOfInterest = 0,
): LayoutReport {
  const env = parts.map((p) => envelope(p.ring));
  const areas = parts.map((p) => areaOf(p.ring));
  const report: LayoutReport = {
    parts: parts.length,
    area: areas.reduce((s, a) => s + a, 0),
    worstOverlap: 0,
    worstOverlapPair: null,
    worstOutside: 0,
    worstOutsidePart: null,
    minGap: Infinity,
    maxX: Math.max(...env.map((e) => e.maxX)),
  };
  const box = rect(container);
  parts.forEach((p, i) => {
    const e = env[i];
    if (e.minX >= container.minX && e.minY >= container.minY && e.maxX <= container.maxX && e.maxY <= container.maxY)
      return;
    const out = differenceArea(p.ring, box) / areas[i];
    if (out > report.worstOutside) [report.worstOutside, report.worstOutsidePart] = [out, p.label];
  });
  for (let i = 0; i < parts.length; i++)
    for (let j = i + 1; j < parts.length; j++) {
      const [a, b] = [env[i], env[j]];
      const apart = Math.max(a.minX - b.maxX, b.minX - a.maxX, a.minY - b.maxY, b.minY - a.maxY);
      if (apart > gapOfInterest) continue;
      if (apart < 0) {
        const o = intersectionArea(parts[i].ring, parts[j].ring) / Math.min(areas[i], areas[j]);
        if (o > report.worstOverlap)
          [report.worstOverlap, report.worstOverlapPair] = [o, [parts[i].label, parts[j].label]];
      }
      if (gapOfInterest > 0) report.minGap = Math.min(report.minGap, distanceBetween(parts[i].ring, parts[j].ring));
    }
  return report;
}
