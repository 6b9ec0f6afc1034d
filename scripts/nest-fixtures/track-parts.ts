// `npx tsx scripts/nest-fixtures/track-parts.ts [--vertices N]` prints (JSON, ESICUP snake_case keys)
// the nesting instance made of this product's own kind of parts, for the nester's benchmark and tests:
// track segments of 3 and 6 periods for a square wheel (side 300 mm) and a hexagon (side 200 mm),
// each a flat-bottomed strip whose top edge is the engine's own track (catenary arcs, docs/math.md
// §3), 0°/180° only (the grain runs along a segment); square wheels and elliptical wheels (any
// quarter turn); on a 1220 mm strip, the width of a plywood sheet. With --vertices, every outline is
// resampled to about N vertices (the budget test's heavy instance).
import { solve, type DesignSpecInput } from "../../lib/track";
import type { Pt } from "../../lib/geometry/point";

const BASE = 80; // mm of board below a trough

interface Item {
  id: string;
  demand: number;
  allowed_orientations: number[];
  shape: { type: "simple_polygon"; data: Pt[] };
}

function profile(spec: DesignSpecInput): { period: number; points: Pt[] } {
  const r = solve(spec);
  if (!r.track || !r.period) throw new Error("the engine gave no track");
  return { period: r.period, points: r.track.points };
}

/** n periods of the track as one board: the top edge the engine's profile, the bottom flat. */
function segment(p: { period: number; points: Pt[] }, n: number): Pt[] {
  const top: Pt[] = [];
  for (let k = 0; k < n; k++)
    for (const [i, [x, y]] of p.points.entries()) if (k === 0 || i > 0) top.push([x + k * p.period, y]);
  const low = Math.min(...top.map(([, y]) => y));
  const lifted = top.map(([x, y]): Pt => [x, y - low + BASE]);
  const length = n * p.period;
  // Counter-clockwise: along the bottom left to right, then back along the top.
  return [[0, 0], [length, 0], ...lifted.reverse()];
}

function ellipse(a: number, b: number, n: number): Pt[] {
  return Array.from({ length: n }, (_, k): Pt => {
    const t = (2 * Math.PI * k) / n;
    return [a * Math.cos(t), b * Math.sin(t)];
  });
}

const square = (s: number): Pt[] => [
  [0, 0],
  [s, 0],
  [s, s],
  [0, s],
];

/** About n vertices by linear interpolation along the ring (every original corner is kept). */
function resample(ring: Pt[], n: number): Pt[] {
  if (ring.length >= n) return ring;
  const out: Pt[] = [];
  let perim = 0;
  for (let i = 0; i < ring.length; i++) {
    const [a, b] = [ring[i], ring[(i + 1) % ring.length]];
    perim += Math.hypot(b[0] - a[0], b[1] - a[1]);
  }
  const step = perim / n;
  for (let i = 0; i < ring.length; i++) {
    const [a, b] = [ring[i], ring[(i + 1) % ring.length]];
    const parts = Math.max(1, Math.round(Math.hypot(b[0] - a[0], b[1] - a[1]) / step));
    for (let k = 0; k < parts; k++) out.push([a[0] + ((b[0] - a[0]) * k) / parts, a[1] + ((b[1] - a[1]) * k) / parts]);
  }
  return out;
}

export function trackPartsInstance(vertices?: number) {
  const sq = profile({
    mode: "track-for-wheel",
    units: "mm",
    wheel: { kind: "polygon", sides: 4, side: 300, cornerRadius: 0 },
  });
  const hex = profile({
    mode: "track-for-wheel",
    units: "mm",
    wheel: { kind: "polygon", sides: 6, side: 200, cornerRadius: 0 },
  });
  const along = [0, 180];
  const any = [0, 90, 180, 270];
  const shapes: Array<[string, number, number[], Pt[]]> = [
    ["square-track-3", 4, along, segment(sq, 3)],
    ["square-track-6", 4, along, segment(sq, 6)],
    ["hexagon-track-3", 4, along, segment(hex, 3)],
    ["hexagon-track-6", 2, along, segment(hex, 6)],
    ["square-wheel", 4, any, square(300)],
    ["hexagon-wheel", 2, any, ellipse(200, 200, 6)],
    ["ellipse-wheel", 4, any, ellipse(160, 110, 256)],
  ];
  const items: Item[] = shapes.map(([id, demand, rot, ring]) => {
    const data = vertices ? resample(ring, vertices) : ring;
    return { id, demand, allowed_orientations: rot, shape: { type: "simple_polygon", data: [...data, data[0]] } };
  });
  return { name: vertices ? `track-parts-${vertices}` : "track-parts", items, strip_height: 1220 };
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const i = process.argv.indexOf("--vertices");
  const vertices = i >= 0 ? Number(process.argv[i + 1]) : undefined;
  process.stdout.write(JSON.stringify(trackPartsInstance(vertices)) + "\n");
}
