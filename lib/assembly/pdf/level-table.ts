// Section 5, level and position: at every support and joint, its station and the height of the
// track's top above the datum, with the tolerance beside it as a ± figure, a space to write the
// figure found on site, and a box to tick. The note under it says what the tolerances protect.
import type { AssemblySheet, LevelRow } from "../sheet";
import { fine, lengthCell, tolerance } from "./figures";
import { oneTickBox, writeInLine } from "./cells";
import type { Flow } from "./flow";
import { SECTION } from "./sections";
import { table, tableHeight, type Column } from "./table";
import { STYLE, heightOf } from "./text";

const INTRO =
  "Heights are of the track's top above the datum (the parts' bottom edge). A joint may sit off its station, and a support off its level, by no more than its row's tolerance. (A support's figure is worked out for it sitting low; hold it within the same band high or low.)";

export function levelTable(flow: Flow, sheet: AssemblySheet): void {
  flow.gap(14);
  if (sheet.levels.length === 0) {
    flow.section(SECTION.levels.number, SECTION.levels.title);
    flow.paragraph("No levels to set: the design has no track run.");
    return;
  }
  const inches = sheet.inches;
  const columns: Column<LevelRow>[] = [
    { header: "At", share: 10, text: (r) => r.label, style: STYLE.partId },
    { header: "What", share: 9, text: (r) => (r.what === "support" ? "Support" : "Joint") },
    { header: "Station from datum", share: 17, text: (r) => lengthCell(r.station, inches), style: STYLE.figure },
    {
      header: "Top of track above datum",
      share: 17,
      text: (r) => lengthCell(r.topHeight, inches),
      style: STYLE.figure,
    },
    { header: "Tolerance", share: 18, text: (r) => tolerance(r.tolerance, inches, true), style: STYLE.figure },
    { header: "Applies to", share: 9, text: (r) => (r.what === "support" ? "level" : "station") },
    { header: "Found on site", share: 13, drawn: writeInLine() },
    { header: "OK", share: 7, drawn: oneTickBox() },
  ];
  // The heading, the note and the table on one page when they fit on one.
  flow.section(
    SECTION.levels.number,
    SECTION.levels.title,
    heightOf(flow.doc, INTRO, STYLE.body, flow.width, 1) + 6 + tableHeight(flow, columns, sheet.levels) + 30,
  );
  flow.paragraph(INTRO, STYLE.body, 0, 6);
  table(flow, columns, sheet.levels, { continued: `${SECTION.levels.number}   ${SECTION.levels.title} (continued)` });
  flow.gap(5);
  flow.paragraph(
    `The tolerances keep the axle's bump under ${fine(sheet.tolerance.bumpLimit, inches)}. How they were found: ${sheet.tolerance.method}`,
    STYLE.small,
  );
}
