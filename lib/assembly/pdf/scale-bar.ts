// A scale bar under the scale's designation: a print shrunk by "fit to page" no longer matches
// "SCALE 1 : d", and the bar is how the installer finds out. Its real length is a round 1-2-5 step
// and the note says how long it must measure on paper.
import { COLOUR } from "./look";
import { FONT } from "./fonts";
import { STYLE, widthOf, write } from "./text";

const nice = (maxMm: number) => {
  const p = 10 ** Math.floor(Math.log10(maxMm));
  return [5, 2, 1].map((m) => m * p).find((v) => v <= maxMm) ?? p;
};

/** Height the bar and its figures take. */
export const SCALE_BAR_HEIGHT = 16;

/** Draws the bar at (x, y) with its note starting at noteX (or after the bar). */
export function scaleBar(
  doc: PDFKit.PDFDocument,
  x: number,
  y: number,
  denominator: number,
  ptPerMm: number,
  noteX: number,
  maxPt = 160,
): void {
  const real = nice(maxPt / ptPerMm);
  const lengthPt = real * ptPerMm;
  const cells = String(real)[0] === "2" ? 4 : 5;
  const h = 4;
  doc.save().lineWidth(0.6).strokeColor(COLOUR.ink);
  for (let i = 0; i < cells; i++) {
    const cx = x + (i * lengthPt) / cells;
    doc.rect(cx, y, lengthPt / cells, h);
    if (i % 2 === 0) doc.fillAndStroke(COLOUR.ink, COLOUR.ink);
    else doc.stroke();
  }
  doc.restore();
  const figure = { font: FONT.mono, size: 6.5, color: COLOUR.ink };
  write(doc, "0", x - widthOf(doc, "0", figure) / 2, y + h + 2, figure);
  const end = `${real} mm`;
  write(doc, end, x + lengthPt - widthOf(doc, end, figure) / 2, y + h + 2, figure);
  const onPaper = real / denominator;
  write(
    doc,
    `The bar is ${real} mm of run and measures ${Number(onPaper.toFixed(2))} mm on the print at 100 %.`,
    Math.max(noteX, x + lengthPt + 24),
    y - 1,
    STYLE.small,
  );
}
