// Clipper works in integers (Vatti clipping as implemented in Clipper 6.4.2). The nester picks one
// scale per run so that the largest coordinate stays below 1.07e9, Clipper's fast 64-bit range
// ("loRange", Clipper 6 documentation), while one integer step is as small as it can be.
// Every tolerance in the nester is one integer step: see shapes.ts.

/** Largest coordinate, in integer steps, that a container may reach. */
const MAX_COORDINATE = 6e8;

/** Largest value from the 1-2-5 series with extent × scale ≤ MAX_COORDINATE. */
export function scaleForExtent(extent: number): number {
  if (!(extent > 0) || !Number.isFinite(extent)) throw new Error("scaleForExtent: extent must be positive");
  const raw = MAX_COORDINATE / extent;
  const decade = 10 ** Math.floor(Math.log10(raw));
  for (const m of [5, 2, 1]) if (m * decade <= raw) return m * decade;
  return decade;
}
