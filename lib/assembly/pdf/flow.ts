// The cursor that runs down the pages: where the next thing goes, when a page must break, and
// which page each numbered section began on (for the cover's contents). Sections lay themselves
// out against it rather than against pdfkit's own text flow, so nothing lands in the footer band.
import { COLOUR } from "./look";
import type { PageFrame } from "./look";
import { STYLE, heightOf, write, type TextStyle } from "./text";

export interface SectionStart {
  number: string;
  title: string;
  /** 0-based page index. */
  page: number;
}

export class Flow {
  y: number;
  readonly sections: SectionStart[] = [];

  constructor(
    readonly doc: PDFKit.PDFDocument,
    readonly frame: PageFrame,
  ) {
    this.y = frame.top;
  }

  get left(): number {
    return this.frame.left;
  }

  get width(): number {
    return this.frame.right - this.frame.left;
  }

  /** Height left on this page. */
  get room(): number {
    return this.frame.bottom - this.y;
  }

  /** 0-based index of the page being written. */
  get page(): number {
    const r = this.doc.bufferedPageRange();
    return r.start + r.count - 1;
  }

  newPage(): void {
    this.doc.addPage();
    this.y = this.frame.top;
  }

  /** Breaks to a new page unless `h` points still fit; says whether it broke. */
  need(h: number): boolean {
    if (h <= this.room || this.y === this.frame.top) return false;
    this.newPage();
    return true;
  }

  gap(h: number): void {
    this.y = Math.min(this.y + h, this.frame.bottom);
  }

  /** Height of a page's content area. */
  get pageHeight(): number {
    return this.frame.bottom - this.frame.top;
  }

  /**
   * A numbered section heading with a rule under it, kept with the `keep` points that follow it
   * (a whole short table, say); what cannot fit on any page is kept with its first 80 points only.
   */
  section(number: string, title: string, keep = 80): void {
    this.need(28 + (keep + 28 <= this.pageHeight ? keep : 80));
    this.sections.push({ number, title, page: this.page });
    this.heading(number, title, STYLE.heading);
  }

  /** A sub-heading (4.1, 4.2 …) kept with what follows, on the same terms as section(). */
  subsection(number: string, title: string, keep = 50): void {
    this.need(20 + (keep + 20 <= this.pageHeight ? keep : 50));
    this.heading(number, title, STYLE.subheading);
  }

  private heading(number: string, title: string, style: TextStyle): void {
    const doc = this.doc;
    const h = write(doc, `${number}   ${title}`, this.left, this.y, style);
    this.y += h + 2;
    doc
      .save()
      .lineWidth(style === STYLE.heading ? 1 : 0.5)
      .strokeColor(COLOUR.ink)
      .moveTo(this.left, this.y)
      .lineTo(this.frame.right, this.y)
      .stroke()
      .restore();
    this.y += style === STYLE.heading ? 9 : 6;
  }

  /** A wrapped paragraph at the cursor (kept whole on one page). */
  paragraph(text: string, style: TextStyle = STYLE.body, indent = 0, after = 4): void {
    const w = this.width - indent;
    this.need(heightOf(this.doc, text, style, w, 1));
    this.y += write(this.doc, text, this.left + indent, this.y, style, { width: w, lineGap: 1 }) + after;
  }
}
