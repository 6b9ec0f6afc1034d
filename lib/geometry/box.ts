// Axis-aligned bounding boxes: the smallest box holding a set of points (a running minimum and
// maximum per axis, common practice), of [x, y] pairs or of Clipper's {x, y} integer points, their
// union and intersection, width, height and the box as a ring. The same Box serves in millimetres
// (lib/cut), in the nester's integer steps (lib/nest) and in drawing units (lib/drawing).
import type { Pt } from "./point";
import type { Ring } from "./ring";

export interface Box {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

/** The box of no points: every union with it gives the other box back. */
export function emptyBox(): Box {
  return { minX: Infinity, minY: Infinity, maxX: -Infinity, maxY: -Infinity };
}

/** Bounds of [x, y] points; the empty box when there are none. */
export function bounds(points: Iterable<readonly [number, number]>): Box {
  let minX = Infinity,
    minY = Infinity,
    maxX = -Infinity,
    maxY = -Infinity;
  for (const [x, y] of points) {
    if (x < minX) minX = x;
    if (y < minY) minY = y;
    if (x > maxX) maxX = x;
    if (y > maxY) maxY = y;
  }
  return { minX, minY, maxX, maxY };
}

/** Bounds of {x, y} points (Clipper's paths); the empty box when there are none. */
export function boundsOfXY(points: Iterable<{ readonly x: number; readonly y: number }>): Box {
  let minX = Infinity,
    minY = Infinity,
    maxX = -Infinity,
    maxY = -Infinity;
  for (const p of points) {
    if (p.x < minX) minX = p.x;
    if (p.y < minY) minY = p.y;
    if (p.x > maxX) maxX = p.x;
    if (p.y > maxY) maxY = p.y;
  }
  return { minX, minY, maxX, maxY };
}

/** The smallest box holding both. */
export function union(a: Box, b: Box): Box {
  return {
    minX: Math.min(a.minX, b.minX),
    minY: Math.min(a.minY, b.minY),
    maxX: Math.max(a.maxX, b.maxX),
    maxY: Math.max(a.maxY, b.maxY),
  };
}

/** The part both share; its width or height is negative when they do not meet. */
export function intersection(a: Box, b: Box): Box {
  return {
    minX: Math.max(a.minX, b.minX),
    minY: Math.max(a.minY, b.minY),
    maxX: Math.min(a.maxX, b.maxX),
    maxY: Math.min(a.maxY, b.maxY),
  };
}

/** The box grown by `d` on every side (shrunk when d is negative). */
export function inflate(b: Box, d: number): Box {
  return { minX: b.minX - d, minY: b.minY - d, maxX: b.maxX + d, maxY: b.maxY + d };
}

export const boxWidth = (b: Box): number => b.maxX - b.minX;
export const boxHeight = (b: Box): number => b.maxY - b.minY;

/** The box's corners as a counter-clockwise ring, from (minX, minY). */
export function boxRing(b: Box): Ring {
  return [
    [b.minX, b.minY],
    [b.maxX, b.minY],
    [b.maxX, b.maxY],
    [b.minX, b.maxY],
  ] as Pt[];
}
