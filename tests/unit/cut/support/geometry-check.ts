// Independent geometry for the cut tests: jsts 2.12 (the JTS Topology Suite port) for areas,
// buffers and distances, polyclip-ts 0.16 (Martinez–Rueda sweep) for booleans. Neither shares code
// with Clipper, which lib/cut uses.
import Coordinate from "jsts/org/locationtech/jts/geom/Coordinate.js";
import type Geometry from "jsts/org/locationtech/jts/geom/Geometry.js";
import GeometryFactory from "jsts/org/locationtech/jts/geom/GeometryFactory.js";
import BufferOp from "jsts/org/locationtech/jts/operation/buffer/BufferOp.js";
import BufferParameters from "jsts/org/locationtech/jts/operation/buffer/BufferParameters.js";
import DistanceOp from "jsts/org/locationtech/jts/operation/distance/DistanceOp.js";
import DiscreteHausdorffDistance from "jsts/org/locationtech/jts/algorithm/distance/DiscreteHausdorffDistance.js";
import * as polyclip from "polyclip-ts";
import type { Pt } from "@/lib/track";
import type { Region } from "@/lib/cut/types";

const gf = new GeometryFactory();
const closed = (ring: readonly Pt[]) => [...ring, ring[0]].map(([x, y]) => new Coordinate(x, y));

export const jRing = (ring: readonly Pt[]): Geometry => gf.createLinearRing(closed(ring));
export const jPoint = (p: readonly [number, number]): Geometry => gf.createPoint(new Coordinate(p[0], p[1]));
export const jPolygon = (r: Pick<Region, "outer" | "holes">): Geometry =>
  gf.createPolygon(jRing(r.outer), r.holes.map(jRing));

export function jBuffer(g: Geometry, d: number, quadSegs = 256): Geometry {
  const p = new BufferParameters();
  p.setQuadrantSegments(quadSegs);
  return BufferOp.bufferOp(g, d, p);
}

export const jDistance = (a: Geometry, b: Geometry) => DistanceOp.distance(a, b);
export const jHausdorff = (a: Geometry, b: Geometry, densify?: number) =>
  DiscreteHausdorffDistance.distance(a, b, densify);

type Poly = [number, number][][];
const pc = (r: Pick<Region, "outer" | "holes">): Poly =>
  [r.outer, ...r.holes].map((ring) => [...ring, ring[0]].map(([x, y]) => [x, y] as [number, number]));

function multiArea(m: [number, number][][][]): number {
  let a = 0;
  for (const poly of m)
    poly.forEach((ring, i) => {
      let s = 0;
      for (let k = 1; k < ring.length; k++) s += ring[k - 1][0] * ring[k][1] - ring[k][0] * ring[k - 1][1];
      a += (i === 0 ? 1 : -1) * Math.abs(s / 2);
    });
  return a;
}

export const pcIntersectionArea = (a: Pick<Region, "outer" | "holes">, b: Pick<Region, "outer" | "holes">) =>
  multiArea(polyclip.intersection(pc(a), pc(b)));
export const pcUnionArea = (rs: Array<Pick<Region, "outer" | "holes">>) =>
  multiArea(polyclip.union(pc(rs[0]), ...rs.slice(1).map(pc)));
export const pcDifferenceArea = (a: Pick<Region, "outer" | "holes">, b: Pick<Region, "outer" | "holes">) =>
  multiArea(polyclip.difference(pc(a), pc(b)));
