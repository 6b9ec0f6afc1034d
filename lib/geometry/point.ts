// Points of the plane as [x, y] pairs, and the Euclidean distance between two of them (common
// practice). The engine (lib/track) uses the same pair for every sampled curve; the part builder,
// the nester and the drawings for every outline.

/** A point or a vector: x, then y. */
export type Pt = [number, number];

/** Euclidean distance between a and b. */
export function distance(a: readonly [number, number], b: readonly [number, number]): number {
  return Math.hypot(a[0] - b[0], a[1] - b[1]);
}
