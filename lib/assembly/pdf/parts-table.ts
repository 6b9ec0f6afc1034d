// Section 3, the parts: every part by the id engraved on it, what it is, its material, how many,
// which stock sheet(s) it was cut from, and a box per copy to tick as it goes in.
import type { AssemblySheet, SheetPart } from "../sheet";
import type { Flow } from "./flow";
import { tickBoxes } from "./cells";
import { SECTION } from "./sections";
import { table } from "./table";
import { STYLE } from "./text";

export function partsTable(flow: Flow, sheet: AssemblySheet): void {
  // The plan has its page to itself; with no plan (a pair of wheels) the parts follow its note.
  if (sheet.run) flow.newPage();
  flow.section(SECTION.parts.number, SECTION.parts.title);
  flow.paragraph(
    "Check each part against its engraved id before it goes in, and tick one box per copy as it is fitted.",
    STYLE.body,
    0,
    6,
  );
  if (sheet.parts.length === 0) {
    flow.paragraph("No parts are listed for this cut plan.");
    return;
  }
  table<SheetPart>(
    flow,
    [
      { header: "Part id", share: 12, text: (p) => p.id, style: STYLE.partId },
      { header: "Name", share: 34, text: (p) => p.name },
      { header: "Material", share: 22, text: (p) => p.material },
      { header: "Qty", share: 7, align: "right", text: (p) => String(p.quantity), style: STYLE.figure },
      {
        header: "Cut from sheet",
        share: 12,
        text: (p) => (p.sheets.length ? p.sheets.join(", ") : "not nested"),
        style: STYLE.figure,
      },
      { header: "Fitted (one box a copy)", share: 17, drawn: tickBoxes((p) => p.quantity) },
    ],
    sheet.parts,
    { continued: `${SECTION.parts.number}   ${SECTION.parts.title} (continued)` },
  );
  const total = sheet.parts.reduce((s, p) => s + p.quantity, 0);
  flow.gap(4);
  flow.paragraph(
    `${sheet.parts.length} part id${sheet.parts.length === 1 ? "" : "s"}, ${total} piece${total === 1 ? "" : "s"} in all.`,
    STYLE.small,
    0,
    10,
  );
}
