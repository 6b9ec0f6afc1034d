// A standing person drawn to scale beside the mock-up, so a client sees the piece's size at a
// glance: an outline of our own drawing, 1700 mm from the soles to the top of the head, facing the
// viewer. The proportions (head about an eighth of the stature, shoulders about a quarter of it
// across, hips at about half) are the usual figure-drawing canon, from memory; only the stature is
// a figure the drawing states, and it is exact.
import type { Pt } from "@/lib/track";

export const PERSON_HEIGHT_MM = 1700;

// Right half of the outline, from the sole at the centre line up to the crown: [half-width, height] in
// shares of the stature.
const RIGHT_HALF: Pt[] = [
  [0.0, 0.0],
  [0.085, 0.0],
  [0.085, 0.012],
  [0.05, 0.04],
  [0.055, 0.28],
  [0.07, 0.46],
  [0.11, 0.52],
  [0.115, 0.6],
  [0.1, 0.64],
  [0.14, 0.66],
  [0.16, 0.7],
  [0.15, 0.8],
  [0.13, 0.82],
  [0.05, 0.84],
  [0.035, 0.855],
];

/** The head: a circle of radius 0.06 of the stature sitting on the neck, its top at the full stature. */
function head(): Pt[] {
  const r = 0.06;
  const cy = 1 - r;
  const pts: Pt[] = [];
  // From the neck on the right, over the crown, to the neck on the left.
  const start = -Math.PI / 2 + Math.asin(0.035 / r);
  const end = (3 * Math.PI) / 2 - Math.asin(0.035 / r);
  for (let i = 0; i <= 24; i++) {
    const a = start + ((end - start) * i) / 24;
    pts.push([r * Math.cos(a), cy + r * Math.sin(a)]);
  }
  return pts;
}

/** The closed outline, mm, feet on y = 0 and centred on x = 0. */
export function personOutline(height = PERSON_HEIGHT_MM): Pt[] {
  const right = RIGHT_HALF.slice(1);
  const left = [...right].reverse().map(([x, y]): Pt => [-x, y]);
  const crown = head();
  // Between the feet, up to the crotch, so the legs read as two.
  const legs: Pt[] = [
    [-0.012, 0],
    [0, 0.45],
    [0.012, 0],
  ];
  return [...right, ...crown, ...left, ...legs].map(([x, y]): Pt => [x * height, y * height]);
}
