// A ruled table that flows down the pages: rows never split, the last row never stands alone on a
// page, and when a page breaks the header row is drawn again under a "(continued)" caption, so
// every printed page reads on its own.
import type { Flow } from "./flow";
import { COLOUR } from "./look";
import { STYLE, heightOf, write, type TextStyle } from "./text";

export interface Box {
  x: number;
  y: number;
  w: number;
  h: number;
}

/** A cell drawn rather than written (tick boxes, write-in lines). */
export interface DrawnCell<Row> {
  height: (row: Row, width: number) => number;
  paint: (doc: PDFKit.PDFDocument, row: Row, box: Box) => void;
}

export interface Column<Row> {
  header: string;
  /** Share of the table's width (the shares are normalised). */
  share: number;
  align?: "left" | "center" | "right";
  text?: (row: Row) => string;
  style?: TextStyle;
  drawn?: DrawnCell<Row>;
}

export interface TableOptions {
  /** Caption over the header row repeated on a new page, e.g. "Parts (continued)". */
  continued: string;
}

const PAD_X = 4;
const PAD_Y = 3.2;

interface Measured {
  widths: number[];
  headerHeight: number;
  heights: number[];
}

function measure<Row>(doc: PDFKit.PDFDocument, width: number, columns: Column<Row>[], rows: Row[]): Measured {
  const total = columns.reduce((s, c) => s + c.share, 0);
  const widths = columns.map((c) => (c.share / total) * width);
  const inner = (i: number) => widths[i] - 2 * PAD_X;
  const headerHeight =
    Math.max(...columns.map((c, i) => heightOf(doc, c.header, STYLE.cellHead, inner(i)))) + 2 * PAD_Y;
  const rowHeight = (row: Row) =>
    Math.max(
      ...columns.map((c, i) =>
        c.drawn
          ? c.drawn.height(row, inner(i))
          : heightOf(doc, c.text?.(row) ?? "", c.style ?? STYLE.cell, inner(i), 0.5),
      ),
    ) +
    2 * PAD_Y;
  return { widths, headerHeight, heights: rows.map(rowHeight) };
}

/** The height the whole table takes (for keeping it with its heading). */
export function tableHeight<Row>(flow: Flow, columns: Column<Row>[], rows: Row[]): number {
  const m = measure(flow.doc, flow.width, columns, rows);
  return m.headerHeight + m.heights.reduce((a, h) => a + h, 0);
}

export function table<Row>(flow: Flow, columns: Column<Row>[], rows: Row[], opts: TableOptions): void {
  const doc = flow.doc;
  const { widths, headerHeight, heights } = measure(doc, flow.width, columns, rows);
  const xs = widths.map((_, i) => flow.left + widths.slice(0, i).reduce((s, w) => s + w, 0));
  const inner = (i: number) => widths[i] - 2 * PAD_X;

  const rule = (y: number, colour: string, width: number) =>
    doc
      .save()
      .lineWidth(width)
      .strokeColor(colour)
      .moveTo(flow.left, y)
      .lineTo(flow.left + flow.width, y)
      .stroke()
      .restore();
  const verticals = (y0: number, y1: number) => {
    doc.save().lineWidth(0.4).strokeColor(COLOUR.inkLine);
    for (const x of xs.slice(1)) doc.moveTo(x, y0).lineTo(x, y1).stroke();
    doc.restore();
    doc
      .save()
      .lineWidth(0.9)
      .strokeColor(COLOUR.ink)
      .moveTo(flow.left, y0)
      .lineTo(flow.left, y1)
      .moveTo(flow.left + flow.width, y0)
      .lineTo(flow.left + flow.width, y1)
      .stroke()
      .restore();
  };

  const header = () => {
    const y = flow.y;
    doc.save().rect(flow.left, y, flow.width, headerHeight).fill(COLOUR.paperDeep).restore();
    columns.forEach((c, i) =>
      write(doc, c.header, xs[i] + PAD_X, y + PAD_Y, STYLE.cellHead, { width: inner(i), align: c.align }),
    );
    rule(y, COLOUR.ink, 0.9);
    verticals(y, y + headerHeight);
    rule(y + headerHeight, COLOUR.ink, 0.6);
    flow.y += headerHeight;
  };

  flow.need(headerHeight + (heights[0] ?? 0) + 2);
  header();
  const n = rows.length;
  rows.forEach((row, r) => {
    const h = heights[r];
    // A table's last row never goes over a page on its own: the one before it goes with it.
    const lastTwo = r === n - 2 && r > 0 && h + heights[n - 1] > flow.room;
    if (h > flow.room || lastTwo) {
      flow.newPage();
      flow.y += write(doc, opts.continued, flow.left, flow.y, STYLE.small) + 2;
      header();
    }
    const y = flow.y;
    if (r % 2 === 1) doc.save().fillOpacity(0.45).rect(flow.left, y, flow.width, h).fill(COLOUR.paper).restore();
    columns.forEach((c, i) => {
      const box = { x: xs[i] + PAD_X, y: y + PAD_Y, w: inner(i), h: h - 2 * PAD_Y };
      if (c.drawn) c.drawn.paint(doc, row, box);
      else
        write(doc, c.text?.(row) ?? "", box.x, box.y, c.style ?? STYLE.cell, {
          width: box.w,
          align: c.align,
          lineGap: 0.5,
        });
    });
    verticals(y, y + h);
    const last =
      r === n - 1 ||
      heights[r + 1] > flow.room - h ||
      (r + 1 === n - 2 && heights[r + 1] + heights[n - 1] > flow.room - h);
    rule(y + h, last ? COLOUR.ink : COLOUR.inkLine, last ? 0.9 : 0.4);
    flow.y += h;
  });
  if (rows.length === 0) rule(flow.y, COLOUR.ink, 0.9);
}
