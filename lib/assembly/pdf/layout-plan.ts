// Section 2, the layout plan: the whole run to one ISO 5455 scale (in strips when it is long),
// with the scale stated and a bar to check the print by, the run's figures, and the datum.
import type { AssemblySheet, SheetRun } from "../sheet";
import { chooseScale, ptPerMm, type StripRange } from "./drawing-scale";
import { length } from "./figures";
import type { Flow } from "./flow";
import { FONT } from "./fonts";
import { COLOUR, SIZE } from "./look";
import { drawStrip } from "./plan-strip";
import { layoutStrip } from "./strip-layout";
import { SCALE_BAR_HEIGHT, scaleBar } from "./scale-bar";
import { SECTION } from "./sections";
import { STYLE, write } from "./text";

/** Room kept at each side of a strip for labels centred on the first and last stations. */
const SIDE = 34;
/** Height the scale's line and its bar take over the strips. */
const SCALE_LINES = 17 + SCALE_BAR_HEIGHT + 8;

export const NO_RUN =
  "This design has no track run (a pair of wheels), so there is no layout plan. Set the wheels up by the parts list and the order of assembly.";

export function layoutPlan(flow: Flow, sheet: AssemblySheet): void {
  flow.newPage();
  flow.section(SECTION.plan.number, SECTION.plan.title, 40);
  const run = sheet.run;
  if (!run) {
    flow.paragraph(NO_RUN);
    flow.gap(8);
    return;
  }
  const doc = flow.doc;
  const bounds = { left: flow.left, right: flow.frame.right };
  const origin = flow.left + SIDE;
  const widthPt = flow.width - 2 * SIDE;
  const layouts = (k: number, strips: StripRange[]) =>
    strips.map((range, index) =>
      layoutStrip(doc, sheet, run, { index, count: strips.length, range, k, origin, bounds }),
    );
  runNotes(flow, sheet, run);
  const scale = chooseScale({
    length: run.length,
    widthPt,
    pageRoom: flow.room - SCALE_LINES,
    measure: (d, strips) => {
      const ls = layouts(ptPerMm(d), strips);
      return { legible: ls.every((l) => l.legible), height: ls.reduce((s, l) => s + l.height, 0) };
    },
  });

  scaleLines(flow, scale.denominator, scale.ptPerMm);
  for (const strip of layouts(scale.ptPerMm, scale.strips)) {
    if (flow.need(strip.height)) {
      flow.y +=
        write(
          doc,
          `${SECTION.plan.number}   ${SECTION.plan.title} (continued)   ·   SCALE 1 : ${scale.denominator}`,
          flow.left,
          flow.y,
          STYLE.small,
        ) + 8;
    }
    drawStrip(doc, run, strip, flow.y);
    flow.y += strip.height;
  }
  flow.paragraph(
    "Shaded: the track parts, the profile over the base band (the band's top dashed). Heavy lines: the joints between segments. Triangles under the datum line: the supports. Stations are distances from the datum along the run.",
    STYLE.small,
  );
}

/** The run's figures and the datum, which do not depend on the scale. */
function runNotes(flow: Flow, sheet: AssemblySheet, run: SheetRun): void {
  const mm = (v: number) => length(v, sheet.inches);
  const ends =
    run.endTreatment === "flat"
      ? run.eachEnd > 0
        ? `flat run-out of ${mm(run.eachEnd)} at each end`
        : "whole periods end to end"
      : run.endTreatment === "half"
        ? `half-period ends, ${mm(run.eachEnd)} flat at each end`
        : "the wheel scaled so whole periods fill the run";
  flow.paragraph(
    `Run ${mm(run.length)}: ${run.periods} periods of ${mm(run.period)}, ${ends}; ${run.segments.length} segment${run.segments.length === 1 ? "" : "s"}, ${run.supports.length} support${run.supports.length === 1 ? "" : "s"}.`,
    STYLE.body,
  );
  flow.paragraph(
    "Datum: x = 0 at the start of the run; every height is measured up from the parts' bottom edge, the level every support holds. The wheel travels from x = 0 towards the end of the run.",
    STYLE.body,
    0,
    8,
  );
}

/** "SCALE 1 : d" as ISO 5455 §3 designates it, and the bar to check the print by. */
function scaleLines(flow: Flow, denominator: number, k: number): void {
  const doc = flow.doc;
  const top = flow.y;
  write(doc, `SCALE 1 : ${denominator}`, flow.left, flow.y, {
    font: FONT.monoSemibold,
    size: SIZE.subheading + 1,
    color: COLOUR.ink,
  });
  const noteX = flow.left + 180;
  write(
    doc,
    'ISO 5455, the same along and up the run. Print at actual size (100 %), not "fit to page".',
    noteX,
    flow.y + 2,
    STYLE.small,
  );
  scaleBar(doc, flow.left + 4, top + 17, denominator, k, noteX);
  flow.y = top + SCALE_LINES;
}
