// Reads an SVG font (W3C SVG 1.1, §20 "Fonts": <font horiz-adv-x>, <font-face units-per-em ascent
// descent>, <glyph unicode horiz-adv-x d>) whose glyph paths are single strokes of absolute moveto
// and lineto commands, as the Hershey Sans 1-stroke font in fonts/hershey-sans-1 is (A. V.
// Hershey's fonts, U.S. National Bureau of Standards; see that folder's NOTICE.md). A few accented
// glyphs of that file add absolute cubic Béziers (C), flattened here into 16 chords by evaluating
// the Bernstein form; a glyph with any other command is left out. Pure: it takes
// the file's text, so the browser and the tests can use it; lib/cut/labels/font-file.ts reads the
// file in Node. Glyph coordinates are font units with y up, as SVG fonts define them.
import type { Pt } from "@/lib/geometry/point";

export interface Glyph {
  advance: number;
  /** Open polylines in font units, y up. */
  strokes: Pt[][];
}

export interface GlyphTable {
  unitsPerEm: number;
  ascent: number;
  descent: number;
  /** Measured: the top of "H" (the font-face's cap-height attribute is not what this font draws). */
  capHeight: number;
  defaultAdvance: number;
  glyphs: Map<string, Glyph>;
  /** Characters whose glyph path could not be read (left out). */
  skipped: string[];
}

function attrs(tag: string): Record<string, string> {
  const out: Record<string, string> = {};
  for (const m of tag.matchAll(/([A-Za-z_:][-\w:.]*)\s*=\s*"([^"]*)"/g)) out[m[1]] = m[2];
  return out;
}

function decodeEntities(s: string): string {
  return s
    .replace(/&#x([0-9a-fA-F]+);/g, (_, h: string) => String.fromCodePoint(parseInt(h, 16)))
    .replace(/&#([0-9]+);/g, (_, d: string) => String.fromCodePoint(Number(d)))
    .replace(/&quot;/g, '"')
    .replace(/&apos;/g, "'")
    .replace(/&lt;/g, "<")
    .replace(/&gt;/g, ">")
    .replace(/&amp;/g, "&");
}

/** Strokes of a path of absolute M, L and C commands. Anything else throws, so no glyph is read wrong. */
export function parseStrokePath(d: string): Pt[][] {
  const tokens = d.match(/[A-Za-z]|[-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?/g) ?? [];
  const strokes: Pt[][] = [];
  let cmd = "";
  let i = 0;
  const num = () => {
    const v = Number(tokens[i++]);
    if (!Number.isFinite(v)) throw new Error(`Bad glyph path: "${d.slice(0, 60)}".`);
    return v;
  };
  const current = () => {
    const s = strokes[strokes.length - 1];
    if (!s?.length) throw new Error(`A glyph path draws before its first moveto: "${d.slice(0, 60)}".`);
    return s;
  };
  while (i < tokens.length) {
    const t = tokens[i];
    if (/[A-Za-z]/.test(t)) {
      if (t !== "M" && t !== "L" && t !== "C")
        throw new Error(`The font's glyph paths may hold only M, L and C commands, not "${t}".`);
      cmd = t;
      i++;
      continue;
    }
    if (cmd === "M") {
      strokes.push([[num(), num()]]);
      cmd = "L"; // coordinates after a moveto are implicit linetos (SVG 1.1 §8.3.2)
    } else if (cmd === "L") {
      current().push([num(), num()]);
    } else if (cmd === "C") {
      const s = current();
      const p0 = s[s.length - 1];
      const p1: Pt = [num(), num()];
      const p2: Pt = [num(), num()];
      const p3: Pt = [num(), num()];
      for (let j = 1; j <= 16; j++) {
        const u = j / 16;
        const v = 1 - u;
        const b = [v * v * v, 3 * v * v * u, 3 * v * u * u, u * u * u];
        s.push([
          b[0] * p0[0] + b[1] * p1[0] + b[2] * p2[0] + b[3] * p3[0],
          b[0] * p0[1] + b[1] * p1[1] + b[2] * p2[1] + b[3] * p3[1],
        ]);
      }
    } else throw new Error(`Bad glyph path: "${d.slice(0, 60)}".`);
  }
  return strokes.filter((s) => s.length >= 2);
}

export function parseSvgFont(svg: string): GlyphTable {
  const fontTag = svg.match(/<font\b[^>]*>/)?.[0];
  const faceTag = svg.match(/<font-face\b[^>]*>/)?.[0];
  if (!fontTag || !faceTag) throw new Error("Not an SVG font: no <font> or <font-face>.");
  const font = attrs(fontTag);
  const face = attrs(faceTag);
  const defaultAdvance = Number(font["horiz-adv-x"]);
  const unitsPerEm = Number(face["units-per-em"] ?? 1000);
  const glyphs = new Map<string, Glyph>();
  const skipped: string[] = [];
  for (const m of svg.matchAll(/<glyph\b[^>]*>/g)) {
    const a = attrs(m[0]);
    if (a.unicode === undefined) continue;
    const ch = decodeEntities(a.unicode);
    try {
      glyphs.set(ch, { advance: Number(a["horiz-adv-x"] ?? defaultAdvance), strokes: a.d ? parseStrokePath(a.d) : [] });
    } catch {
      skipped.push(ch);
    }
  }
  const H = glyphs.get("H");
  const capHeight = H ? Math.max(...H.strokes.flat().map((p) => p[1])) : Number(face["cap-height"] ?? 0.7 * unitsPerEm);
  return {
    unitsPerEm,
    ascent: Number(face.ascent ?? 0.8 * unitsPerEm),
    descent: Number(face.descent ?? -0.2 * unitsPerEm),
    capHeight,
    defaultAdvance,
    glyphs,
    skipped,
  };
}
