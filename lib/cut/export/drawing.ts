// The drawing every exporter writes: closed rings, circles and line segments on the five layers of
// docs/fabrication.md §3.2 (CUT_OUTSIDE, CUT_INSIDE, ENGRAVE, DRILL, REFERENCE), in the output unit. Built from
// parts placed by a nest (rotation about the part's own origin first, then the translation — the
// nester's convention) or laid out once each in a row. Cut shops ask for closed contours with no
// duplicate or zero-length lines (docs/fabrication.md §3.2): rings are cleaned of edges under 2 µm, engraving
// strokes and drill holes are de-duplicated on their points rounded to 1 µm, and two identical
// outlines (two parts on top of each other) stop the export.
import type { SheetNestResult, SheetPlacement } from "@/lib/nest/types";
import type { Pt } from "@/lib/geometry/point";
import { bounds, boxRing, boxWidth, type Box } from "@/lib/geometry/box";
import { placer, type Pose } from "@/lib/geometry/place";
import { cleanRing } from "@/lib/geometry/ring";
import type { ToolPath } from "../kerf";
import type { Part, Region } from "../types";
import { fromMm, type OutputUnits } from "../units";

export const LAYERS = ["CUT_OUTSIDE", "CUT_INSIDE", "DRILL", "ENGRAVE", "REFERENCE"] as const;
export type LayerName = (typeof LAYERS)[number];

export interface Drawing {
  units: OutputUnits;
  /** Extent from (0, 0), in the output unit. */
  width: number;
  height: number;
  rings: Array<{ layer: LayerName; points: Pt[] }>;
  circles: Array<{ layer: LayerName; x: number; y: number; r: number }>;
  lines: Array<{ layer: LayerName; a: Pt; b: Pt }>;
  /** Notes on the REFERENCE layer (the approval line), never cut: baseline start and cap height, in the output unit. */
  texts: Array<{ layer: LayerName; x: number; y: number; height: number; text: string }>;
}

/** A part at a pose (rotation about its own origin, then the translation). */
export interface PlacedPart extends Pose {
  part: Part;
}

/** Shortest edge kept, mm: anything shorter is rounding noise (Clipper works on a 1 µm grid). */
const MIN_EDGE = 0.002;
const key = (p: readonly [number, number]) => `${Math.round(p[0] * 1000)},${Math.round(p[1] * 1000)}`;

/**
 * Draws placed parts. With `toolPaths` (kerf in the file) the cut rings are the tool-centre paths,
 * otherwise the nominal outlines. `frames` are sheet outlines (REFERENCE), in mm.
 */
/** Cap height of the REFERENCE notes, mm, and the gap between lines and above the drawing. */
const NOTE_HEIGHT = 10;

export function buildDrawing(
  placed: PlacedPart[],
  opts: { units: OutputUnits; toolPaths?: Map<string, ToolPath>; frames?: Box[]; notes?: string[] },
): Drawing {
  const u = (v: number) => fromMm(v, opts.units);
  const U = (p: Pt): Pt => [u(p[0]), u(p[1])];
  const rings: Drawing["rings"] = [];
  const circles: Drawing["circles"] = [];
  const lines: Drawing["lines"] = [];
  const seenRings = new Set<string>();
  const seenCircles = new Set<string>();
  const seenLines = new Set<string>();
  const all: Pt[] = [];
  const addRing = (layer: LayerName, ring: Pt[]) => {
    const r = cleanRing(ring, MIN_EDGE);
    if (r.length < 3) return;
    const k = r.map(key).sort().join(";");
    // Two identical outlines mean two copies drawn on top of each other: a nesting fault to stop
    // on, not to hide by dropping one.
    if (seenRings.has(k))
      throw new Error(
        `Two ${layer} outlines lie exactly on top of each other near (${r[0][0].toFixed(1)}, ${r[0][1].toFixed(1)}) mm: the layout overlaps two parts.`,
      );
    seenRings.add(k);
    all.push(...r);
    rings.push({ layer, points: r.map(U) });
  };
  for (const frame of opts.frames ?? []) addRing("REFERENCE", boxRing(frame));
  for (const { part, rotation, x, y } of placed) {
    const T = placer(rotation, x, y);
    const region: Region = opts.toolPaths?.get(part.id) ?? part.region;
    addRing("CUT_OUTSIDE", region.outer.map(T));
    for (const h of region.holes) addRing("CUT_INSIDE", h.map(T));
    for (const d of part.drill) {
      const c = T([d.x, d.y]);
      const k = `${key(c)},${Math.round(d.diameter * 500)}`;
      if (seenCircles.has(k)) continue;
      seenCircles.add(k);
      all.push([c[0] - d.diameter / 2, c[1] - d.diameter / 2], [c[0] + d.diameter / 2, c[1] + d.diameter / 2]);
      circles.push({ layer: "DRILL", x: u(c[0]), y: u(c[1]), r: u(d.diameter / 2) });
    }
    for (const stroke of part.engrave) {
      const pts = stroke.map(T);
      for (let i = 1; i < pts.length; i++) {
        const a = pts[i - 1];
        const b = pts[i];
        if (Math.hypot(b[0] - a[0], b[1] - a[1]) < MIN_EDGE) continue;
        const ka = key(a);
        const kb = key(b);
        const k = ka < kb ? `${ka}|${kb}` : `${kb}|${ka}`;
        if (seenLines.has(k)) continue;
        seenLines.add(k);
        lines.push({ layer: "ENGRAVE", a: U(a), b: U(b) });
      }
    }
  }
  const b = all.length ? bounds(all) : { minX: 0, minY: 0, maxX: 0, maxY: 0 };
  // Notes sit above everything drawn, one line each, so they never touch a part.
  const texts: Drawing["texts"] = [];
  let top = Math.max(0, b.maxY);
  for (const text of [...(opts.notes ?? [])].reverse()) {
    const y = top + NOTE_HEIGHT;
    texts.push({ layer: "REFERENCE", x: u(Math.max(0, b.minX)), y: u(y), height: u(NOTE_HEIGHT), text });
    top = y + NOTE_HEIGHT;
  }
  texts.reverse();
  // The notes' width, estimated at 0.6 cap heights a character (common practice for a monospace face).
  const notesWidth = Math.max(0, ...texts.map((t) => t.x + 0.6 * t.height * t.text.length));
  return {
    units: opts.units,
    width: Math.max(u(Math.max(0, b.maxX)), notesWidth),
    height: u(top),
    rings,
    circles,
    lines,
    texts,
  };
}

/** Each part once, left to right along one row, `gap` mm apart, all above y = 0. */
export function partsRow(parts: Part[], opts: { gap: number; toolPaths?: Map<string, ToolPath> }): PlacedPart[] {
  const out: PlacedPart[] = [];
  let x = opts.gap;
  for (const part of parts) {
    const b = bounds((opts.toolPaths?.get(part.id) ?? part.region).outer);
    out.push({ part, rotation: 0, x: x - b.minX, y: opts.gap - b.minY });
    x += boxWidth(b) + opts.gap;
  }
  return out;
}

/** The parts a nest put on one sheet, at their placements. */
export function sheetParts(parts: Part[], placements: SheetPlacement[], offset: Pt = [0, 0]): PlacedPart[] {
  const byId = new Map(parts.map((p) => [p.id, p]));
  return placements.map((pl) => {
    const part = byId.get(pl.id);
    if (!part) throw new Error(`The nest places a part "${pl.id}" that the plan does not have.`);
    return { part, rotation: pl.rotation, x: pl.x + offset[0], y: pl.y + offset[1] };
  });
}

/** Every sheet of a nest stacked one above the other, `gap` mm apart, with their outlines. */
export function stackedSheets(
  parts: Part[],
  nest: Pick<SheetNestResult, "sheets">,
  sheet: { length: number; width: number },
  gap: number,
): { placed: PlacedPart[]; frames: Box[] } {
  const placed: PlacedPart[] = [];
  const frames: Box[] = [];
  nest.sheets.forEach((s, i) => {
    const dy = i * (sheet.width + gap);
    frames.push({ minX: 0, minY: dy, maxX: sheet.length, maxY: dy + sheet.width });
    placed.push(...sheetParts(parts, s.placements, [0, dy]));
  });
  return { placed, frames };
}
