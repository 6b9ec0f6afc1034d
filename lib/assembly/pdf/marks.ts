// Small drawn marks, so nothing depends on a glyph the shipped faces lack: the empty tick box, an
// arrow, and the safety alert symbol (an equilateral triangle with an exclamation mark, the symbol
// ANSI Z535.4 puts before DANGER, WARNING and CAUTION, never before NOTICE).
import { COLOUR } from "./look";

/** An empty square to tick by hand, top-left at (x, y). */
export function tickBox(doc: PDFKit.PDFDocument, x: number, y: number, size = 7.5): void {
  doc.save().lineWidth(0.75).strokeColor(COLOUR.ink).rect(x, y, size, size).stroke().restore();
}

/** A horizontal arrow from x0 to x1 (head at x1) on the line y. */
export function arrow(doc: PDFKit.PDFDocument, x0: number, x1: number, y: number, color: string = COLOUR.ink): void {
  const dir = Math.sign(x1 - x0) || 1;
  const head = 5.5;
  doc
    .save()
    .lineWidth(1)
    .strokeColor(color)
    .moveTo(x0, y)
    .lineTo(x1 - dir * head, y)
    .stroke();
  doc.polygon([x1, y], [x1 - dir * head, y - 2.6], [x1 - dir * head, y + 2.6]).fill(color);
  doc.restore();
}

/** The safety alert symbol: a triangle of side `size` with its bottom-left corner at (x, y + size·√3/2). */
export function alertSymbol(
  doc: PDFKit.PDFDocument,
  x: number,
  y: number,
  size: number,
  fill: string,
  mark: string,
): void {
  const h = (size * Math.sqrt(3)) / 2;
  doc.save();
  doc.polygon([x + size / 2, y], [x + size, y + h], [x, y + h]).fill(fill);
  const cx = x + size / 2;
  const w = size * 0.11;
  doc.rect(cx - w / 2, y + h * 0.32, w, h * 0.38).fill(mark);
  doc.rect(cx - w / 2, y + h * 0.76, w, w).fill(mark);
  doc.restore();
}
