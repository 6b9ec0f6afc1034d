// Table cells for the installer's pen: tick boxes (one per copy, wrapped to the cell) and an empty
// line to write a measured figure on.
import { COLOUR } from "./look";
import { tickBox } from "./marks";
import type { DrawnCell } from "./table";

const BOX = 7.5;
const BOX_GAP = 3.5;

export function tickBoxes<Row>(count: (row: Row) => number): DrawnCell<Row> {
  const perLine = (w: number) => Math.max(1, Math.floor((w + BOX_GAP) / (BOX + BOX_GAP)));
  return {
    height: (row, w) => Math.ceil(Math.max(1, count(row)) / perLine(w)) * (BOX + BOX_GAP) - BOX_GAP + 1,
    paint: (doc, row, box) => {
      const n = Math.max(1, count(row));
      const per = perLine(box.w);
      for (let i = 0; i < n; i++)
        tickBox(doc, box.x + (i % per) * (BOX + BOX_GAP), box.y + 0.5 + Math.floor(i / per) * (BOX + BOX_GAP), BOX);
    },
  };
}

export const oneTickBox = <Row>() => tickBoxes<Row>(() => 1);

export function writeInLine<Row>(): DrawnCell<Row> {
  return {
    height: () => 12,
    paint: (doc, _row, box) => {
      doc
        .save()
        .lineWidth(0.5)
        .strokeColor(COLOUR.inkFaint)
        .moveTo(box.x, box.y + box.h - 1)
        .lineTo(box.x + box.w, box.y + box.h - 1)
        .stroke()
        .restore();
    },
  };
}
