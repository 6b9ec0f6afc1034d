// Section 6, the installer's sign-off: the lines the crew fills in when the run is up, kept
// together on one page, with the revision and reference the work was done to printed above them.
import { NOT_APPROVED } from "@/lib/review/reference";
import type { AssemblySheet } from "../sheet";
import type { Flow } from "./flow";
import { COLOUR } from "./look";
import { SECTION } from "./sections";
import { STYLE, write } from "./text";

export const SIGN_OFF_LINES = ["Installed by", "Date", "Checked level (max deviation found)", "Signature"] as const;

const LINE_H = 30;
const PAD = 8;

export function signOff(flow: Flow, sheet: AssemblySheet): void {
  const doc = flow.doc;
  flow.gap(14);
  const h = 2 * PAD + 16 + SIGN_OFF_LINES.length * LINE_H;
  flow.section(SECTION.signOff.number, SECTION.signOff.title, h);
  const { left: x, y, width: w } = flow;
  doc.save().lineWidth(1.2).strokeColor(COLOUR.ink).rect(x, y, w, h).stroke().restore();
  const rev = `${sheet.design.name} R${sheet.design.revision}`;
  const said = sheet.approval
    ? `Installed to ${rev}, sign-off reference ${sheet.approval.reference}.`
    : `${rev} is ${NOT_APPROVED}. Sign below for a trial or review build only.`;
  write(
    doc,
    said,
    x + PAD,
    y + PAD,
    { ...STYLE.bodyStrong, color: sheet.approval ? COLOUR.ink : COLOUR.caution },
    { width: w - 2 * PAD },
  );
  const labelW = 180;
  SIGN_OFF_LINES.forEach((label, i) => {
    const ly = y + PAD + 16 + i * LINE_H;
    write(doc, label, x + PAD, ly + LINE_H - 14, STYLE.body);
    doc
      .save()
      .lineWidth(0.6)
      .strokeColor(COLOUR.ink)
      .moveTo(x + PAD + labelW, ly + LINE_H - 4)
      .lineTo(x + w - PAD, ly + LINE_H - 4)
      .stroke()
      .restore();
  });
  flow.y += h;
}
