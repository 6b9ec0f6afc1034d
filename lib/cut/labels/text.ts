// Lays out single-stroke text: each glyph's strokes scaled so the font's cap height is the asked
// height, placed along a baseline at y = 0 by the glyphs' advance widths (SVG 1.1 §20.5). A
// character the font lacks is drawn as "?" and reported.
import type { Pt } from "@/lib/geometry/point";
import { bounds, boxHeight, boxWidth, type Box } from "@/lib/geometry/box";
import type { GlyphTable } from "./font";

export interface TextBlock {
  strokes: Pt[][];
  /** The extent of the drawn strokes. */
  box: Box;
  missing: string[];
}

export function layoutLine(font: GlyphTable, text: string, capHeight: number): TextBlock {
  const k = capHeight / font.capHeight;
  const strokes: Pt[][] = [];
  const missing: string[] = [];
  let x = 0;
  for (const ch of text) {
    let g = font.glyphs.get(ch);
    if (!g) {
      missing.push(ch);
      g = font.glyphs.get("?");
    }
    if (!g) continue;
    for (const s of g.strokes) strokes.push(s.map(([gx, gy]) => [x + gx * k, gy * k]));
    x += g.advance * k;
  }
  const box = strokes.length ? bounds(strokes.flat()) : { minX: 0, minY: 0, maxX: 0, maxY: 0 };
  return { strokes, box, missing };
}

/** An arrow pointing along +x (the direction of travel), as three strokes, `height` tall. */
export function arrowStrokes(length: number, height: number): Pt[][] {
  const y = height / 2;
  const head = Math.min(height / 2, length / 3);
  return [
    [
      [0, y],
      [length, y],
    ],
    [
      [length - head, y + head],
      [length, y],
      [length - head, y - head],
    ],
  ];
}

/**
 * Lines stacked top to bottom (baseline to baseline 1.6 cap heights), each centred, an arrow
 * after the last line if asked. Coordinates: the block's drawn extent starts at (0, 0).
 */
export function layoutBlock(font: GlyphTable, lines: string[], capHeight: number, arrow: boolean): TextBlock {
  const strokes: Pt[][] = [];
  const missing: string[] = [];
  const laid = lines.map((l) => layoutLine(font, l, capHeight));
  if (arrow) {
    const last = laid[laid.length - 1];
    const gap = last.strokes.length ? last.box.maxX + 0.6 * capHeight : 0;
    for (const s of arrowStrokes(2 * capHeight, capHeight)) last.strokes.push(s.map(([x, y]) => [x + gap, y]));
    last.box = bounds(last.strokes.flat());
  }
  const width = Math.max(...laid.map((l) => boxWidth(l.box)));
  laid.forEach((l, i) => {
    const dy = -i * 1.6 * capHeight;
    const dx = (width - boxWidth(l.box)) / 2 - l.box.minX;
    for (const s of l.strokes) strokes.push(s.map(([x, y]) => [x + dx, y + dy]));
    missing.push(...l.missing);
  });
  const b = bounds(strokes.flat());
  const moved = strokes.map((s) => s.map(([x, y]): Pt => [x - b.minX, y - b.minY]));
  return { strokes: moved, box: { minX: 0, minY: 0, maxX: boxWidth(b), maxY: boxHeight(b) }, missing };
}
