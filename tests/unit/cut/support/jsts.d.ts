// Local types for the few jsts 2.12 modules the cut tests use as an independent geometry checker
// (@types/jsts describes the 1.x global namespace, not these ES module paths).
declare module "jsts/org/locationtech/jts/geom/Coordinate.js" {
  export default class Coordinate {
    constructor(x: number, y: number);
    x: number;
    y: number;
  }
}

declare module "jsts/org/locationtech/jts/geom/Geometry.js" {
  import type Coordinate from "jsts/org/locationtech/jts/geom/Coordinate.js";
  export default interface Geometry {
    getArea(): number;
    getLength(): number;
    getCoordinates(): Coordinate[];
    getExteriorRing(): Geometry;
    getNumInteriorRing(): number;
    getInteriorRingN(n: number): Geometry;
    getNumGeometries(): number;
    getGeometryN(n: number): Geometry;
    isValid(): boolean;
    difference(g: Geometry): Geometry;
    intersection(g: Geometry): Geometry;
    union(g: Geometry): Geometry;
    symDifference(g: Geometry): Geometry;
    distance(g: Geometry): number;
    covers(g: Geometry): boolean;
  }
}

declare module "jsts/org/locationtech/jts/geom/GeometryFactory.js" {
  import type Coordinate from "jsts/org/locationtech/jts/geom/Coordinate.js";
  import type Geometry from "jsts/org/locationtech/jts/geom/Geometry.js";
  export default class GeometryFactory {
    createLinearRing(c: Coordinate[]): Geometry;
    createPolygon(shell: Geometry, holes?: Geometry[]): Geometry;
    createLineString(c: Coordinate[]): Geometry;
    createPoint(c: Coordinate): Geometry;
  }
}

declare module "jsts/org/locationtech/jts/operation/buffer/BufferParameters.js" {
  export default class BufferParameters {
    setQuadrantSegments(n: number): void;
    setJoinStyle(n: number): void;
    static JOIN_ROUND: number;
  }
}

declare module "jsts/org/locationtech/jts/operation/buffer/BufferOp.js" {
  import type Geometry from "jsts/org/locationtech/jts/geom/Geometry.js";
  import type BufferParameters from "jsts/org/locationtech/jts/operation/buffer/BufferParameters.js";
  export default class BufferOp {
    static bufferOp(g: Geometry, distance: number, params?: BufferParameters | number): Geometry;
  }
}

declare module "jsts/org/locationtech/jts/operation/distance/DistanceOp.js" {
  import type Geometry from "jsts/org/locationtech/jts/geom/Geometry.js";
  export default class DistanceOp {
    static distance(a: Geometry, b: Geometry): number;
  }
}

declare module "jsts/org/locationtech/jts/algorithm/distance/DiscreteHausdorffDistance.js" {
  import type Geometry from "jsts/org/locationtech/jts/geom/Geometry.js";
  export default class DiscreteHausdorffDistance {
    static distance(a: Geometry, b: Geometry, densifyFrac?: number): number;
  }
}
