// Section 4, how it goes together: the numbered order of assembly with a box per step, the joint
// schedule (what holds each joint, keys or dowels, at which station), the fasteners and the tools.
import type { AssemblySheet, SheetJoint } from "../sheet";
import { lengthCell } from "./figures";
import type { Flow } from "./flow";
import { COLOUR } from "./look";
import { oneTickBox } from "./cells";
import { SECTION } from "./sections";
import { table, tableHeight, type Column } from "./table";
import { STYLE, heightOf, write } from "./text";

const KIND: Record<SheetJoint["kind"], string> = { key: "Key", dowel: "Dowels" };

export function assemblyOrder(flow: Flow, sheet: AssemblySheet): void {
  flow.gap(10);
  const steps = sheet.steps.map((text, i) => ({ n: i + 1, text }));
  const stepColumns: Column<(typeof steps)[number]>[] = [
    { header: "Step", share: 7, align: "right", text: (s) => `${s.n}.`, style: STYLE.figure },
    { header: "What to do", share: 85, text: (s) => s.text },
    { header: "Done", share: 8, drawn: oneTickBox() },
  ];
  // The section's heading stays with 4.1's heading and its table.
  const firstTable = tableHeight(flow, stepColumns, steps);
  flow.section(SECTION.assembly.number, SECTION.assembly.title, 26 + firstTable);
  flow.subsection("4.1", "Order of assembly", firstTable);
  if (steps.length === 0) flow.paragraph("No steps are listed.");
  else table(flow, stepColumns, steps, { continued: "4.1   Order of assembly (continued)" });
  flow.gap(12);

  const jointColumns: Column<SheetJoint>[] = [
    { header: "Station from datum", share: 21, text: (j) => lengthCell(j.station, sheet.inches), style: STYLE.figure },
    { header: "Between", share: 14, text: (j) => `${j.between[0]} and ${j.between[1]}`, style: STYLE.partId },
    { header: "Held by", share: 10, text: (j) => KIND[j.kind] },
    { header: "Detail", share: 47, text: (j) => j.detail },
    { header: "Done", share: 8, drawn: oneTickBox() },
  ];
  flow.subsection("4.2", "Joint schedule", tableHeight(flow, jointColumns, sheet.joints));
  if (sheet.joints.length === 0) flow.paragraph("No joints: the track is one piece, or the design has no track.");
  else table(flow, jointColumns, sheet.joints, { continued: "4.2   Joint schedule (continued)" });
  flow.gap(12);

  list(flow, "4.3", "Fasteners", sheet.fasteners, "No fasteners are listed.");
  flow.gap(8);
  list(flow, "4.4", "Tools", sheet.tools, "No tools are listed.");
}

/** A bulleted list, each item kept whole on a page. */
function list(flow: Flow, number: string, title: string, items: string[], none: string): void {
  const doc = flow.doc;
  const indent = 12;
  const w = flow.width - indent;
  flow.subsection(number, title, items.length ? heightOf(doc, items[0], STYLE.body, w, 1) : 12);
  if (items.length === 0) return flow.paragraph(none);
  for (const item of items) {
    flow.need(heightOf(doc, item, STYLE.body, w, 1));
    doc
      .save()
      .circle(flow.left + 3.5, flow.y + 5.6, 1.5)
      .fill(COLOUR.ink)
      .restore();
    flow.y += write(doc, item, flow.left + indent, flow.y, STYLE.body, { width: w, lineGap: 1 }) + 3;
  }
}
