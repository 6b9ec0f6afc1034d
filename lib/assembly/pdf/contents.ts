// The cover's list of sections with the page each begins on. The pages are known only once every
// section is laid out, so the cover keeps a slot and the list is written into it at the end.
import type { Flow, SectionStart } from "./flow";
import { COLOUR } from "./look";
import { SECTION_COUNT } from "./sections";
import { STYLE, widthOf, write, writeRight } from "./text";

export interface ContentsSlot {
  page: number;
  x: number;
  y: number;
  width: number;
}

const LINE = 12.5;

export function reserveContents(flow: Flow): ContentsSlot {
  flow.need(SECTION_COUNT * LINE);
  const slot = { page: flow.page, x: flow.left, y: flow.y, width: flow.width };
  flow.y += SECTION_COUNT * LINE;
  return slot;
}

export function writeContents(doc: PDFKit.PDFDocument, slot: ContentsSlot, sections: SectionStart[]): void {
  doc.switchToPage(slot.page);
  sections.forEach((s, i) => {
    const y = slot.y + i * LINE;
    const title = `${s.number}   ${s.title}`;
    const page = `page ${s.page + 1}`;
    write(doc, title, slot.x, y, STYLE.body);
    writeRight(doc, page, slot.x + slot.width, y, STYLE.figure);
    // A dotted leader from the title to the page number.
    const x0 = slot.x + widthOf(doc, title, STYLE.body) + 6;
    const x1 = slot.x + slot.width - widthOf(doc, page, STYLE.figure) - 6;
    if (x1 > x0)
      doc
        .save()
        .lineWidth(0.6)
        .strokeColor(COLOUR.inkFaint)
        .dash(0.6, { space: 2.4 })
        .moveTo(x0, y + 8)
        .lineTo(x1, y + 8)
        .stroke()
        .undash()
        .restore();
  });
}
