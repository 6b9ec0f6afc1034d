// The installer's assembly sheet as a PDF, made on the server with pdfkit and the shipped IBM Plex
// faces embedded (real text a reader can search and copy, not a picture of a page). The sections
// follow the installer's order of work: cover, layout plan, parts, order of assembly with the joints,
// fasteners and tools, level and position, sign-off; a footer on every page. The same sheet gives
// the same bytes: the PDF's dates and its file id come from the sheet's own date.
import path from "node:path";
import PDFDocument from "pdfkit";
import { NOT_APPROVED } from "@/lib/review/reference";
import { PAPER_SIZES, type AssemblySheet, type Paper } from "./sheet";
import { assemblyOrder } from "./pdf/assembly-order";
import { writeContents } from "./pdf/contents";
import { cover } from "./pdf/cover";
import { Flow } from "./pdf/flow";
import { FONT, fontFiles, registerFonts } from "./pdf/fonts";
import { writeFooters } from "./pdf/footer";
import { layoutPlan } from "./pdf/layout-plan";
import { levelTable } from "./pdf/level-table";
import { pageFrame } from "./pdf/look";
import { partsTable } from "./pdf/parts-table";
import { signOff } from "./pdf/sign-off";

export interface AssemblySheetPdfOptions {
  paper: Paper;
  /** The folder holding ibm-plex-sans/ and ibm-plex-mono/; the project's fonts/ by default. */
  fontsDir?: string;
}

export async function assemblySheetPdf(sheet: AssemblySheet, opts: AssemblySheetPdfOptions): Promise<Buffer> {
  const files = fontFiles(opts.fontsDir ?? path.join(process.cwd(), "fonts"));
  const frame = pageFrame(opts.paper);
  const { widthPt, heightPt } = PAPER_SIZES[opts.paper];
  const when = new Date(sheet.date);
  const doc = new PDFDocument({
    size: [widthPt, heightPt],
    // pdfkit's own margins sit outside our frame, so its automatic page breaks never fire first.
    margins: {
      top: frame.top,
      left: frame.left,
      right: frame.width - frame.right,
      bottom: frame.height - frame.bottom - 1,
    },
    bufferPages: true,
    // No starting face: pdfkit would otherwise load (and embed) its built-in Helvetica.
    font: "",
    lang: "en",
    displayTitle: true,
    info: {
      Title: `${sheet.title}: ${sheet.project.name}, ${sheet.design.name} R${sheet.design.revision}`,
      Author: sheet.shop.name,
      Subject: `Assembly sheet for the installer. Site: ${sheet.project.site}. Sign-off: ${sheet.approval ? sheet.approval.reference : NOT_APPROVED}.`,
      Keywords: [
        "assembly sheet",
        sheet.project.name,
        `R${sheet.design.revision}`,
        sheet.approval?.reference ?? "not approved",
      ].join(", "),
      Creator: "Axlewright",
      CreationDate: when,
      ModDate: when,
    },
  });
  const chunks: Buffer[] = [];
  doc.on("data", (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
  });

  registerFonts(doc, files);
  doc.font(FONT.sans);
  const flow = new Flow(doc, frame);
  const contents = cover(flow, sheet);
  layoutPlan(flow, sheet);
  partsTable(flow, sheet);
  assemblyOrder(flow, sheet);
  levelTable(flow, sheet);
  signOff(flow, sheet);

  writeContents(doc, contents, flow.sections);
  writeFooters(doc, frame, sheet);
  doc.end();
  return done;
}
