// Clipper works in integers (Vatti clipping as implemented in Clipper 6.4.2). The nester picks one
// scale per run so that the largest coordinate stays below 1.07e9, Clipper's fast 64-bit range
// ("loRange", Clipper 6 documentation), while one integer step is as small as it can be: every
// tolerance in the nester is one or two integer steps (shapes.ts, overlap-search.ts).

/** Largest coordinate, in integer steps, that a container may reach. */
const MAX_COORDINATE = 6e8;

/** The largest two-significant-digit scale with extent × scale ≤ MAX_COORDINATE. */
export function scaleForExtent(extent: number): number {
  if (!(extent > 0) || !Number.isFinite(extent)) throw new Error("scaleForExtent: extent must be positive");
  const raw = MAX_COORDINATE / extent;
  const unit = 10 ** (Math.floor(Math.log10(raw)) - 1);
  return Math.max(1, Math.floor(raw / unit)) * unit;
}
