// The cover's title block, in the manner of a drawing's title block: a ruled grid of labelled
// cells (small caps label over the value), ink-blue rules, warm paper as the block's light fill.
import type { Flow } from "./flow";
import { COLOUR } from "./look";
import { STYLE, heightOf, write, type TextStyle } from "./text";

export interface TitleCell {
  label: string;
  /** Lines of the value, each with its own style. */
  lines: Array<{ text: string; style: TextStyle }>;
  /** Share of the row's width. */
  share: number;
}

const PAD = 5;

function cellHeight(doc: PDFKit.PDFDocument, c: TitleCell, w: number): number {
  const label = heightOf(doc, c.label.toUpperCase(), STYLE.label, w);
  return PAD + label + 2 + c.lines.reduce((s, l) => s + heightOf(doc, l.text, l.style, w, 0.5), 0) + PAD;
}

/** Draws the block at the cursor: one array of cells a row. */
export function titleBlock(flow: Flow, rows: TitleCell[][]): void {
  const doc = flow.doc;
  const x0 = flow.left;
  const W = flow.width;
  const heights = rows.map((row) => {
    const total = row.reduce((s, c) => s + c.share, 0);
    return Math.max(...row.map((c) => cellHeight(doc, c, (c.share / total) * W - 2 * PAD)));
  });
  const height = heights.reduce((s, h) => s + h, 0);
  flow.need(height);
  const top = flow.y;
  doc.save().rect(x0, top, W, height).fill(COLOUR.paper).restore();
  rows.forEach((row, r) => {
    const total = row.reduce((s, c) => s + c.share, 0);
    let x = x0;
    for (const c of row) {
      const w = (c.share / total) * W;
      let y = flow.y + PAD;
      y += write(doc, c.label.toUpperCase(), x + PAD, y, STYLE.label, { width: w - 2 * PAD }) + 2;
      for (const l of c.lines) y += write(doc, l.text, x + PAD, y, l.style, { width: w - 2 * PAD, lineGap: 0.5 });
      if (x > x0)
        doc
          .save()
          .lineWidth(0.5)
          .strokeColor(COLOUR.ink)
          .moveTo(x, flow.y)
          .lineTo(x, flow.y + heights[r])
          .stroke()
          .restore();
      x += w;
    }
    flow.y += heights[r];
    if (r < rows.length - 1)
      doc
        .save()
        .lineWidth(0.5)
        .strokeColor(COLOUR.ink)
        .moveTo(x0, flow.y)
        .lineTo(x0 + W, flow.y)
        .stroke()
        .restore();
  });
  // The outer frame heavier than the inner rules, as on a drawing sheet.
  doc
    .save()
    .lineWidth(1.4)
    .strokeColor(COLOUR.ink)
    .rect(x0, top, W, flow.y - top)
    .stroke()
    .restore();
}
