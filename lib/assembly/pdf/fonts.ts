// The shipped IBM Plex faces (fonts/, SIL Open Font License 1.1), registered with pdfkit from their
// WOFF2 files, decoded to TrueType first (see woff2.ts for why), so they are embedded as subsets
// and the text stays real, extractable text.
// The files are fontsource's "latin" subsets, so a few characters our wording may carry (→, ≥, μ)
// have no glyph; printable() spells those in characters the faces do have, rather than let a blank
// box (the .notdef glyph) reach the shop floor.
import { existsSync, readFileSync } from "node:fs";
import path from "node:path";
import { woff2ToSfnt } from "./woff2";

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
  [FONT.sans]: "ibm-plex-sans/ibm-plex-sans-latin-400-normal.woff2",
  [FONT.sansMedium]: "ibm-plex-sans/ibm-plex-sans-latin-500-normal.woff2",
  [FONT.sansSemibold]: "ibm-plex-sans/ibm-plex-sans-latin-600-normal.woff2",
  [FONT.sansBold]: "ibm-plex-sans/ibm-plex-sans-latin-700-normal.woff2",
  [FONT.mono]: "ibm-plex-mono/ibm-plex-mono-latin-400-normal.woff2",
  [FONT.monoMedium]: "ibm-plex-mono/ibm-plex-mono-latin-500-normal.woff2",
  [FONT.monoSemibold]: "ibm-plex-mono/ibm-plex-mono-latin-600-normal.woff2",
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

// Decoded once per file for the life of the process: the files ship with the app and do not change.
const decoded = new Map<string, Buffer>();

export function registerFonts(doc: PDFKit.PDFDocument, files: Record<FontName, string>): void {
  for (const [name, file] of Object.entries(files)) {
    let ttf = decoded.get(file);
    if (!ttf) decoded.set(file, (ttf = woff2ToSfnt(readFileSync(file))));
    doc.registerFont(name, ttf);
  }
}

// Every face ships these beyond printable ASCII (checked against each file's cmap): Latin-1, ı Œ œ,
// a few modifier letters, – — ‘ ’ ‚ “ ” „ • … ′ ″ ‹ › ⁄ € ™ ↑ ↓ − ∕.
const HAS_GLYPH = /[\u0020-\u007e\u00a0-\u00ff\u0131\u0152\u0153\u2013\u2014\u2018-\u201a\u201c-\u201e\u2022\u2026\u2032\u2033\u2039\u203a\u2044\u20ac\u2122\u2191\u2193\u2212\u2215]/u;

const SPELLED: Record<string, string> = {
  "→": "->",
  "←": "<-",
  "≥": ">=",
  "≤": "<=",
  "≈": "~",
  "≠": "!=",
  "μ": "µ",
  "π": "pi",
  "Δ": "delta ",
  "θ": "theta",
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
