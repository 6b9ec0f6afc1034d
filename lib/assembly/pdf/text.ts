// One way to set type on the sheet: a style (face, size, colour) and helpers that measure and
// write with it, always through printable() so every character has a glyph in the shipped faces.
import { COLOUR, SIZE } from "./look";
import { FONT, printable, type FontName } from "./fonts";

export interface TextStyle {
  font: FontName;
  size: number;
  color: string;
}

export const STYLE = {
  body: { font: FONT.sans, size: SIZE.body, color: COLOUR.ink },
  bodyStrong: { font: FONT.sansSemibold, size: SIZE.body, color: COLOUR.ink },
  small: { font: FONT.sans, size: SIZE.small, color: COLOUR.inkSoft },
  label: { font: FONT.sansMedium, size: SIZE.label, color: COLOUR.inkSoft },
  heading: { font: FONT.sansSemibold, size: SIZE.heading, color: COLOUR.ink },
  subheading: { font: FONT.sansSemibold, size: SIZE.subheading, color: COLOUR.ink },
  cell: { font: FONT.sans, size: SIZE.table, color: COLOUR.ink },
  cellHead: { font: FONT.sansSemibold, size: SIZE.label + 0.5, color: COLOUR.ink },
  figure: { font: FONT.mono, size: SIZE.table, color: COLOUR.ink },
  partId: { font: FONT.monoSemibold, size: SIZE.table, color: COLOUR.ink },
  footer: { font: FONT.sans, size: SIZE.footer, color: COLOUR.inkSoft },
} satisfies Record<string, TextStyle>;

export interface WriteOptions {
  /** Wrap to this width; without it the text is one line. */
  width?: number;
  align?: "left" | "center" | "right";
  lineGap?: number;
}

function setStyle(doc: PDFKit.PDFDocument, s: TextStyle): void {
  doc.font(s.font).fontSize(s.size).fillColor(s.color);
}

/** Writes the text with its top at y; returns the height it took. */
export function write(
  doc: PDFKit.PDFDocument,
  text: string,
  x: number,
  y: number,
  s: TextStyle,
  o: WriteOptions = {},
): number {
  setStyle(doc, s);
  const t = printable(text);
  if (o.width === undefined) {
    doc.text(t, x, y, { lineBreak: false });
    return doc.currentLineHeight(true);
  }
  const opts = { width: o.width, align: o.align ?? "left", lineGap: o.lineGap ?? 0 };
  const h = doc.heightOfString(t, opts);
  doc.text(t, x, y, opts);
  return h;
}

export function widthOf(doc: PDFKit.PDFDocument, text: string, s: TextStyle): number {
  setStyle(doc, s);
  return doc.widthOfString(printable(text));
}

export function heightOf(doc: PDFKit.PDFDocument, text: string, s: TextStyle, width: number, lineGap = 0): number {
  setStyle(doc, s);
  return doc.heightOfString(printable(text), { width, lineGap });
}

/** Writes one line centred on x, kept between lo and hi; returns the left edge it used. */
export function writeCentred(
  doc: PDFKit.PDFDocument,
  text: string,
  x: number,
  y: number,
  s: TextStyle,
  lo = -Infinity,
  hi = Infinity,
): number {
  const w = widthOf(doc, text, s);
  const left = Math.min(Math.max(x - w / 2, lo), hi - w);
  write(doc, text, left, y, s);
  return left;
}

/** One line with the text's right edge at x. */
export function writeRight(doc: PDFKit.PDFDocument, text: string, x: number, y: number, s: TextStyle): void {
  write(doc, text, x - widthOf(doc, text, s), y, s);
}
