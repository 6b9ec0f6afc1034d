// A still picture of a solved design as SVG: the track over a few periods with the wheel standing on
// it (track modes), or the two wheels on their axles (pairs). Pure string building — no markup from
// users ever reaches it, only numbers — so the server can rasterise it with sharp.
import { bounds, boxHeight, boxWidth, emptyBox, union } from "@/lib/geometry/box";
import { translate } from "@/lib/geometry/place";
import type { Pt } from "@/lib/geometry/point";
import type { SolveResult } from "@/lib/track";

const INK = "#1d3557";
const SOFT = "#8da2bb";
const PAPER = "#f6f0e1";

function path(points: Pt[], dx = 0, dy = 0, close = false): string {
  if (points.length === 0) return "";
  const d = points.map(([x, y], i) => `${i ? "L" : "M"}${(x + dx).toFixed(3)} ${(-(y + dy)).toFixed(3)}`).join(" ");
  return close ? `${d} Z` : d;
}

/** SVG of the design at its start pose, width × height pixels, the drawing fitted with a margin. */
export function previewSvg(result: SolveResult, width = 640, height = 360): string {
  let box = emptyBox();
  /** Widens the drawing's box to hold `points` moved by (dx, dy). */
  const grow = (points: Pt[], dx = 0, dy = 0) => {
    box = union(box, bounds(translate(points, dx, dy)));
  };
  const parts: string[] = [];
  const stroke = (d: string, colour = INK, w = 2) =>
    parts.push(
      `<path d="${d}" fill="none" stroke="${colour}" stroke-width="${w}" vector-effect="non-scaling-stroke" stroke-linejoin="round"/>`,
    );

  if (
    result.track &&
    (result.mode === "track-for-wheel" || result.mode === "wheel-for-track" || result.mode === "twin-wheels")
  ) {
    const period = result.period ?? 0;
    const axleY = result.mode === "track-for-wheel" ? 0 : (result.axleHeight ?? 0);
    for (let k = -1; k <= 1; k++) {
      grow(result.track.points, k * period);
      stroke(path(result.track.points, k * period), INK, 1.5);
    }
    grow(result.wheel.points, 0, axleY);
    stroke(path(result.wheel.points, 0, axleY, true));
    stroke(`M${box.minX} ${-axleY} L${box.maxX} ${-axleY}`, SOFT, 1);
    if (result.mode === "twin-wheels" && result.partner) {
      const lower = result.lowerAxleHeight ?? 0;
      grow(result.partner.points, 0, lower);
      stroke(path(result.partner.points, 0, lower, true));
    }
  } else {
    grow(result.wheel.points);
    stroke(path(result.wheel.points, 0, 0, true));
    if (result.partner) {
      const c = -(result.centreDistance ?? 0);
      grow(result.partner.points, 0, c);
      stroke(path(result.partner.points, 0, c, true));
      stroke(`M0 0 L0 ${-c}`, SOFT, 1);
    }
  }
  if (!Number.isFinite(box.minX))
    return `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}"><rect width="100%" height="100%" fill="${PAPER}"/></svg>`;
  const margin = 0.08 * Math.max(boxWidth(box), boxHeight(box));
  const vb = [box.minX - margin, -(box.maxY + margin), boxWidth(box) + 2 * margin, boxHeight(box) + 2 * margin].map(
    (v) => v.toFixed(3),
  );
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="${vb.join(" ")}" preserveAspectRatio="xMidYMid meet">`,
    `<rect x="${vb[0]}" y="${vb[1]}" width="${vb[2]}" height="${vb[3]}" fill="${PAPER}"/>`,
    ...parts,
    `</svg>`,
  ].join("");
}
