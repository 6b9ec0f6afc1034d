// The line at the foot of every page: which job and revision, its sign-off reference (or NOT
// APPROVED, in the caution orange), and "page n of N". Written once every page exists, into the
// buffered pages.
import type { AssemblySheet } from "../sheet";
import type { PageFrame } from "./look";
import { COLOUR } from "./look";
import { STYLE, widthOf, write, writeRight } from "./text";

export function writeFooters(doc: PDFKit.PDFDocument, frame: PageFrame, sheet: AssemblySheet): void {
  const { start, count } = doc.bufferedPageRange();
  const job = `${sheet.project.name}  ·  ${sheet.design.name} R${sheet.design.revision}  ·  `;
  const ref = sheet.approval ? sheet.approval.reference : "NOT APPROVED";
  for (let i = start; i < start + count; i++) {
    doc.switchToPage(i);
    const y = frame.footerY;
    doc
      .save()
      .lineWidth(0.5)
      .strokeColor(COLOUR.inkLine)
      .moveTo(frame.left, y - 4)
      .lineTo(frame.right, y - 4)
      .stroke()
      .restore();
    const page = `page ${i + 1} of ${count}`;
    const room = frame.right - frame.left - widthOf(doc, page, STYLE.footer) - 16 - widthOf(doc, ref, STYLE.footer);
    const jobText = fit(doc, job, room);
    write(doc, jobText, frame.left, y, STYLE.footer);
    write(
      doc,
      ref,
      frame.left + widthOf(doc, jobText, STYLE.footer),
      y,
      sheet.approval ? STYLE.footer : { ...STYLE.footer, color: COLOUR.caution },
    );
    writeRight(doc, page, frame.right, y, STYLE.footer);
  }
}

/** The text cut short with an ellipsis to fit `room` points (a long project name must not run into the page number). */
function fit(doc: PDFKit.PDFDocument, text: string, room: number): string {
  if (widthOf(doc, text, STYLE.footer) <= room) return text;
  let t = text;
  while (t.length > 1 && widthOf(doc, `${t}…  ·  `, STYLE.footer) > room) t = t.slice(0, -1);
  return `${t.trimEnd()}…  ·  `;
}
