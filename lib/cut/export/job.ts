// Every file of a cut job except the PNG previews (which need sharp: export/zip.ts), from one plan:
// a parts DXF and SVG (each part once, in a row), a DXF and SVG per nested sheet, the bill of
// materials and the README. File names carry the output unit, as shops ask (docs/fabrication.md §3.1).
import { checkLoads, type LoadsReport } from "@/lib/loads";
import { defaultLoadsSettings, loadsInputFor } from "@/lib/loads/settings";
import type { SheetNestResult } from "@/lib/nest/types";
import { approvalLine, type ApprovalStamp } from "@/lib/review/reference";
import type { SolveResult } from "@/lib/track";
import type { ToolPath } from "../kerf";
import { cutFactsOf } from "../load-facts";
import type { CutPlanResult } from "../plan";
import { bomCsv } from "./bom-csv";
import { buildDrawing, partsRow, sheetParts } from "./drawing";
import { drawingToDxf } from "./dxf";
import { jobReadme } from "./readme";
import { drawingToSvg } from "./svg";

export interface JobInput {
  /** File name stem, e.g. "square-wheel-trike-run". */
  baseName: string;
  design?: string;
  revision?: number | string;
  result: SolveResult;
  /** The design spec the result was solved from (the load-path check needs it for its own re-solves). */
  spec?: unknown;
  plan: CutPlanResult;
  /** The revision's load-path check; absent: the README runs it on the library's starting figures. */
  loads?: LoadsReport;
  /** True: `loads` ran on the library's defaults because the revision has no load settings. */
  loadsFromDefaults?: boolean;
  toolPaths: Map<string, ToolPath>;
  nest: SheetNestResult | null;
  nestNote?: string;
  /** The client's approval of the revision; null or absent: the files are marked NOT APPROVED. */
  approval?: ApprovalStamp | null;
  /** Why the shop saved this plan for production without an approval, if it did. */
  unapprovedReason?: string | null;
  /** The saved plan's number within its revision (absent: files made from a spec file). */
  cutPlanNumber?: number;
}

export interface JobFile {
  name: string;
  data: string | Buffer;
}

export interface JobTextFiles {
  files: JobFile[];
  /** Preview SVGs to render as PNG, with the PNG's file name. */
  previews: Array<{ name: string; svg: string }>;
}

/** The revision's load-path check, or (the command-line export) one on the shop library's starting figures. */
export function loadsOf(j: JobInput): LoadsReport {
  return j.loads ?? checkLoads(loadsInputFor(j.spec, defaultLoadsSettings(), undefined, cutFactsOf(j.plan)), j.result);
}

/**
 * The file-name stem of a revision's files: the revision first, so a long project or design name
 * can never cut it off and the files of R1 and R2 never collide ("r12-square-wheel-trike-run-…").
 */
export function revisionBaseName(revision: number, ...names: string[]): string {
  const head = `r${revision}`;
  const rest = slugPart(names.join(" "))
    .slice(0, 60 - head.length - 1)
    .replace(/-+$/, "");
  return rest ? `${head}-${rest}` : head;
}

/** Lower case letters, digits and hyphens from free text (empty if nothing is left). */
function slugPart(text: string): string {
  return text
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "")
    .slice(0, 60)
    .replace(/-+$/, "");
}

/** A file-name stem from free text: lower case letters, digits and hyphens ("job" if none are left). */
export function slug(text: string): string {
  return slugPart(text) || "job";
}

export function jobTextFiles(j: JobInput): JobTextFiles {
  const s = j.plan.settings;
  const u = s.outputUnits;
  const base = j.baseName;
  const toolPaths = s.kerfInFile ? j.toolPaths : undefined;
  const files: JobFile[] = [];
  const previews: JobTextFiles["previews"] = [];
  const stamp = j.approval ?? null;
  const revisionNote = `${j.design ?? "design"}${j.revision !== undefined ? ` R${j.revision}` : ""}, spec ${j.result.specHash.slice(0, 12)}`;
  // Every drawing carries the approval (or its absence) on REFERENCE, which is never cut.
  const notes = [approvalLine(stamp, { ascii: true }), revisionNote];
  const titled = (what: string) => `${s.project ? `${s.project}: ` : ""}${what} — ${approvalLine(stamp)}`;
  const row = buildDrawing(partsRow(j.plan.parts, { gap: 20 + s.machine.kerf, toolPaths: j.toolPaths }), {
    units: u,
    toolPaths,
    notes,
  });
  files.push({ name: `${base}-parts-${u}.dxf`, data: drawingToDxf(row) });
  files.push({ name: `${base}-parts-${u}.svg`, data: drawingToSvg(row, { title: titled("parts") }) });
  previews.push({ name: `${base}-parts-preview.png`, svg: drawingToSvg(row, { preview: true }) });
  for (const sheet of j.nest?.sheets ?? []) {
    const n = sheet.index + 1;
    const d = buildDrawing(sheetParts(j.plan.parts, sheet.placements), {
      units: u,
      toolPaths,
      frames: [{ minX: 0, minY: 0, maxX: s.sheet.length, maxY: s.sheet.width }],
      notes,
    });
    files.push({ name: `${base}-sheet-${n}-${u}.dxf`, data: drawingToDxf(d) });
    files.push({ name: `${base}-sheet-${n}-${u}.svg`, data: drawingToSvg(d, { title: titled(`sheet ${n}`) }) });
    previews.push({ name: `${base}-sheet-${n}-preview.png`, svg: drawingToSvg(d, { preview: true }) });
  }
  files.push({
    name: `${base}-bom.csv`,
    data: bomCsv(j.plan.parts, { material: s.material, thickness: s.sheet.thickness, units: u, nest: j.nest }),
  });
  const names = [...files.map((f) => f.name), ...previews.map((p) => p.name), "README.txt"].sort();
  files.push({
    name: "README.txt",
    data: jobReadme({
      design: j.design,
      revision: j.revision,
      result: j.result,
      settings: s,
      run: j.plan.run,
      parts: j.plan.parts,
      warnings: j.plan.warnings,
      nest: j.nest,
      files: names,
      nestNote: j.nestNote,
      approval: stamp,
      unapprovedReason: j.unapprovedReason ?? null,
      cutPlanNumber: j.cutPlanNumber,
      loads: loadsOf(j),
      loadsFromDefaults: j.loadsFromDefaults ?? !j.loads,
    }),
  });
  return { files, previews };
}
