// Section 1, the cover: who the job is for and which revision it builds, whether the client has
// signed it off (or the NOT APPROVED mark), the date and the shop's contact, the cautions with their
// signal words, the disclaimer in full, and the list of what follows.
import { NOT_APPROVED } from "@/lib/review/reference";
import type { AssemblySheet } from "../sheet";
import { cautionBox } from "./caution-box";
import { reserveContents, type ContentsSlot } from "./contents";
import { isoDay, isoMinute } from "./figures";
import type { Flow } from "./flow";
import { FONT } from "./fonts";
import { COLOUR, SIZE } from "./look";
import { SECTION } from "./sections";
import { STYLE, heightOf, write, writeRight } from "./text";
import { titleBlock, type TitleCell } from "./title-block";

export const DO_NOT_INSTALL = "Do not install production parts from this sheet.";

const value = { font: FONT.sansMedium, size: 10, color: COLOUR.ink };
const mono = { font: FONT.monoSemibold, size: 10, color: COLOUR.ink };
const orangeBold = { font: FONT.sansBold, size: 10, color: COLOUR.caution };

export function cover(flow: Flow, sheet: AssemblySheet): ContentsSlot {
  const doc = flow.doc;
  flow.sections.push({ ...SECTION.cover, page: flow.page });
  write(doc, "AXLEWRIGHT  ·  FOR THE INSTALLER", flow.left, flow.y, STYLE.label);
  writeRight(doc, sheet.shop.name, flow.frame.right, flow.y, STYLE.label);
  flow.y += 11;
  flow.y +=
    write(
      doc,
      sheet.title,
      flow.left,
      flow.y,
      { font: FONT.sansBold, size: SIZE.title, color: COLOUR.ink },
      { width: flow.width },
    ) + 6;

  const a = sheet.approval;
  const cell = (label: string, share: number, ...lines: TitleCell["lines"]): TitleCell => ({ label, share, lines });
  titleBlock(flow, [
    [
      cell("Project", 62, {
        text: sheet.project.name,
        style: { ...value, font: FONT.sansSemibold, size: SIZE.project },
      }),
      cell("Site", 38, { text: sheet.project.site, style: value }),
    ],
    [
      cell("Client", 62, { text: sheet.project.client ?? "—", style: value }),
      cell("Design and revision", 38, { text: `${sheet.design.name}, R${sheet.design.revision}`, style: value }),
    ],
    [
      a
        ? cell(
            "Sign-off reference",
            62,
            { text: a.reference, style: mono },
            {
              text: `Approved by ${a.typedName}${a.organisation ? `, ${a.organisation}` : ""}, signed ${isoMinute(a.signedAt)}`,
              style: STYLE.small,
            },
          )
        : cell(
            "Sign-off reference",
            62,
            { text: "NOT APPROVED", style: orangeBold },
            { text: "The client has not signed off this revision.", style: STYLE.small },
          ),
      cell("Date of this sheet", 38, { text: isoDay(sheet.date), style: { ...mono, font: FONT.mono } }),
    ],
    [
      cell("Shop", 62, { text: sheet.shop.name, style: value }, { text: sheet.shop.contact, style: STYLE.small }),
      cell("Cut plan", 38, {
        text: `${sheet.cutPlanNumber} of R${sheet.design.revision}`,
        style: { ...mono, font: FONT.mono },
      }),
    ],
    [
      cell("Spec hash (SHA-256 of the signed design)", 1, {
        text: sheet.design.specHash,
        style: { font: FONT.mono, size: SIZE.small, color: COLOUR.inkSoft },
      }),
    ],
  ]);
  flow.gap(10);

  if (!a) notApproved(flow);

  flow.subsection("1.1", "Cautions", 30);
  if (sheet.cautions.length === 0)
    flow.paragraph("No cautions were raised for this design. The disclaimer below still applies.");
  for (const c of sheet.cautions) cautionBox(flow, c);
  flow.gap(6);

  flow.subsection("1.2", "Disclaimer", heightOf(doc, sheet.disclaimer, STYLE.body, flow.width - 12, 1) + 12);
  disclaimer(flow, sheet.disclaimer);
  flow.gap(10);

  flow.subsection("1.3", "In this sheet", 70);
  return reserveContents(flow);
}

function notApproved(flow: Flow): void {
  const doc = flow.doc;
  const h = 52;
  flow.need(h + 10);
  const { left: x, y, width: w } = flow;
  doc.save().rect(x, y, w, h).fill(COLOUR.cautionSoft).restore();
  doc.save().lineWidth(2.2).strokeColor(COLOUR.caution).rect(x, y, w, h).stroke().restore();
  write(
    doc,
    NOT_APPROVED,
    x,
    y + 9,
    { font: FONT.sansBold, size: 17, color: COLOUR.caution },
    { width: w, align: "center" },
  );
  write(
    doc,
    DO_NOT_INSTALL,
    x,
    y + 33,
    { font: FONT.sansSemibold, size: SIZE.body + 0.5, color: COLOUR.ink },
    { width: w, align: "center" },
  );
  flow.y += h + 12;
}

function disclaimer(flow: Flow, text: string): void {
  const doc = flow.doc;
  const pad = 6;
  const h = heightOf(doc, text, STYLE.body, flow.width - 2 * pad, 1) + 2 * pad;
  flow.need(h);
  doc.save().rect(flow.left, flow.y, flow.width, h).fill(COLOUR.paper).restore();
  doc.save().lineWidth(0.5).strokeColor(COLOUR.paperEdge).rect(flow.left, flow.y, flow.width, h).stroke().restore();
  write(doc, text, flow.left + pad, flow.y + pad, STYLE.body, { width: flow.width - 2 * pad, lineGap: 1 });
  flow.y += h;
}
