// The WOFF2 decoder behind the PDF's fonts, checked against fontkit's own WOFF2 reader (which reads
// glyph outlines correctly; only its subsetting of WOFF2 is broken, fontkit issue #201): the same
// outline and advance for every glyph of every shipped face, a well-formed sfnt, and every character
// of each face subset by pdfkit and read back by poppler.
import { readdirSync, readFileSync } from "node:fs";
import { createRequire } from "node:module";
import path from "node:path";
import PDFDocument from "pdfkit";
import { describe, expect, it } from "vitest";
import { woff2ToSfnt } from "@/lib/assembly/pdf/woff2";
import { pdftextPages } from "./support/pdf-poppler";

interface Glyph {
  path: { toSVG(): string };
  advanceWidth: number;
}
interface Font {
  type: string;
  numGlyphs: number;
  unitsPerEm: number;
  postscriptName: string;
  characterSet: number[];
  getGlyph(id: number): Glyph;
}
// fontkit comes with pdfkit (it is pdfkit's font reader) and has no types of its own.
const fontkit = createRequire(import.meta.url)("fontkit") as { create(b: Buffer): Font };

const FONTS = ["ibm-plex-sans", "ibm-plex-mono"].flatMap((dir) =>
  readdirSync(path.join("fonts", dir))
    .filter((f) => f.endsWith(".woff2"))
    .map((f) => path.join("fonts", dir, f)),
);

describe.each(FONTS)("%s decoded from WOFF2", (file) => {
  const woff2 = readFileSync(file);
  const ttf = woff2ToSfnt(woff2);

  it("has every glyph's outline and advance as fontkit reads them from the WOFF2", () => {
    const a = fontkit.create(woff2);
    const b = fontkit.create(ttf);
    expect(a.type).toBe("WOFF2");
    expect(b.type).toBe("TTF");
    expect(b.postscriptName).toBe(a.postscriptName);
    expect(b.unitsPerEm).toBe(a.unitsPerEm);
    expect(b.numGlyphs).toBe(a.numGlyphs);
    for (let id = 0; id < a.numGlyphs; id++) {
      expect(b.getGlyph(id).path.toSVG(), `glyph ${id}`).toBe(a.getGlyph(id).path.toSVG());
      expect(b.getGlyph(id).advanceWidth, `glyph ${id}`).toBe(a.getGlyph(id).advanceWidth);
    }
  });

  it("is a well-formed sfnt: the whole font sums to 0xB1B0AFBA (OpenType head.checkSumAdjustment)", () => {
    let sum = 0;
    for (let i = 0; i < ttf.length; i += 4) sum = (sum + ttf.readUInt32BE(i)) >>> 0;
    expect(ttf.length % 4).toBe(0);
    expect(sum).toBe(0xb1b0afba);
  });

  it("subsets through pdfkit with every character it has, composite glyphs included, and reads back", async () => {
    const chars = fontkit
      .create(ttf)
      .characterSet.map((c) => String.fromCodePoint(c))
      // Visible characters only: letters, digits, punctuation and symbols (not spaces, controls or marks).
      .filter((c) => /^[\p{L}\p{N}\p{P}\p{S}]$/u.test(c) && c !== "\uffff");
    const doc = new PDFDocument({ font: "", size: "A4" });
    const chunks: Buffer[] = [];
    doc.on("data", (c: Buffer) => chunks.push(c));
    const done = new Promise<Buffer>((resolve) => doc.on("end", () => resolve(Buffer.concat(chunks))));
    doc.registerFont("face", ttf).font("face").fontSize(9);
    const lines: string[] = [];
    for (let i = 0; i < chars.length; i += 40) lines.push(chars.slice(i, i + 40).join(" "));
    lines.forEach((l, i) => doc.text(l, 40, 40 + i * 14, { lineBreak: false }));
    doc.end();
    const text = pdftextPages(await done).join("").normalize("NFKC");
    for (const c of chars) expect(text, `U+${c.codePointAt(0)!.toString(16)}`).toContain(c.normalize("NFKC"));
  });
});
