// The shipped IBM Plex faces for print (fonts/ibm-plex-print: IBM's complete WOFF 1.0 files, SIL
// Open Font License 1.1), registered with pdfkit, which embeds the glyphs used as subsets so the
// text stays real, extractable text. (pdfkit's font reader cannot read the subset WOFF2 files the web
// pages use.) printable() spells the few characters our wording may carry that a sheet should not
// depend on (→, ≥, μ) in plain ones, rather than let a blank box (the .notdef glyph) reach the shop floor.
import { existsSync } from "node:fs";
import path from "node:path";

export const FONT = {
  sans: "plex-sans",
  sansMedium: "plex-sans-medium",
  sansSemibold: "plex-sans-semibold",
  sansBold: "plex-sans-bold",
  mono: "plex-mono",
  monoMedium: "plex-mono-medium",
  monoSemibold: "plex-mono-semibold",
} as const;

export type FontName = (typeof FONT)[keyof typeof FONT];

const FILES: Record<FontName, string> = {
  [FONT.sans]: "ibm-plex-print/IBMPlexSans-Regular.woff",
  [FONT.sansMedium]: "ibm-plex-print/IBMPlexSans-Medium.woff",
  [FONT.sansSemibold]: "ibm-plex-print/IBMPlexSans-SemiBold.woff",
  [FONT.sansBold]: "ibm-plex-print/IBMPlexSans-Bold.woff",
  [FONT.mono]: "ibm-plex-print/IBMPlexMono-Regular.woff",
  [FONT.monoMedium]: "ibm-plex-print/IBMPlexMono-Medium.woff",
  [FONT.monoSemibold]: "ibm-plex-print/IBMPlexMono-SemiBold.woff",
};

/** The font files by name, resolved under `fontsDir`; throws naming the first one missing. */
export function fontFiles(fontsDir: string): Record<FontName, string> {
  const out = {} as Record<FontName, string>;
  for (const [name, rel] of Object.entries(FILES) as Array<[FontName, string]>) {
    const file = path.join(fontsDir, rel);
    if (!existsSync(file)) throw new Error(`assembly sheet PDF: font file missing: ${file}`);
    out[name] = file;
  }
  return out;
}

export function registerFonts(doc: PDFKit.PDFDocument, files: Record<FontName, string>): void {
  for (const [name, file] of Object.entries(files)) doc.registerFont(name, file);
}

// Characters the sheet prints as they are: printable ASCII, Latin-1, ı Œ œ, – — ‘ ’ ‚ “ ” „ • … ′ ″ ‹ › ⁄ € ™ ↑ ↓ − ∕
// (every IBM Plex face has them); anything else is spelled out below.
const HAS_GLYPH =
  /[\u0020-\u007e\u00a0-\u00ff\u0131\u0152\u0153\u2013\u2014\u2018-\u201a\u201c-\u201e\u2022\u2026\u2032\u2033\u2039\u203a\u2044\u20ac\u2122\u2191\u2193\u2212\u2215]/u;

const SPELLED: Record<string, string> = {
  "→": "->",
  "←": "<-",
  "≥": ">=",
  "≤": "<=",
  "≈": "~",
  "≠": "!=",
  μ: "µ",
  π: "pi",
  Δ: "delta ",
  θ: "theta",
  "✓": "yes",
  "⌀": "Ø",
  "\u2009": " ",
  "\u202f": " ",
  "\u2011": "-",
  "\u2010": "-",
};

/** The text with every character the faces lack spelled out (or "?"), so no blank boxes print. */
export function printable(text: string): string {
  let out = "";
  for (const ch of text.normalize("NFC")) {
    if (ch === "\n" || HAS_GLYPH.test(ch)) out += ch;
    else out += SPELLED[ch] ?? "?";
  }
  return out;
}
