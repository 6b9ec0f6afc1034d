// The job README: a plain-text sheet that travels with the cut files, so the shop floor sees the
// design it came from (revision and spec hash), the settings and the kerf mode the files assume,
// the sheets and their utilisation, the parts, the warnings, and the cautions.
import type { SheetNestResult } from "@/lib/nest/types";
import { MODE_NAMES, type SolveResult } from "@/lib/track";
import { bounds } from "@/lib/geometry/box";
import type { RunPlan } from "../plan";
import { insideRadius, ROTATION_LABELS, type CutSettings } from "../settings";
import type { CutWarning, Part } from "../types";
import { fmtLen } from "../units";
import { NOT_APPROVED, approvalLine, type ApprovalStamp } from "@/lib/review/reference";
import { cautionParts, type LoadsReport } from "@/lib/loads";

export interface ReadmeInput {
  design?: string;
  revision?: number | string;
  result: Pick<SolveResult, "mode" | "units" | "specHash" | "engineVersion" | "check" | "warnings" | "period">;
  settings: CutSettings;
  run: RunPlan | null;
  parts: Part[];
  warnings: CutWarning[];
  nest: SheetNestResult | null;
  files: string[];
  /** A note on how the nest was made (the nester, or the simple row layout). */
  nestNote?: string;
  approval?: ApprovalStamp | null;
  unapprovedReason?: string | null;
  /** The saved plan's number within its revision: "Cut plan: 2 of R3". */
  cutPlanNumber?: number;
  /** The load-path check (lib/loads) whose cautions the README lists. */
  loads: LoadsReport;
  /** True: the check ran on the library's starting figures, not the revision's own settings. */
  loadsFromDefaults?: boolean;
}

const pct = (v: number) => `${(100 * v).toFixed(1)} %`;

export function jobReadme(j: ReadmeInput): string {
  const s = j.settings;
  const u = s.outputUnits;
  const L = (mm: number) => fmtLen(mm, u);
  const out: string[] = [];
  const title = `AXLEWRIGHT CUT JOB: ${s.project}`;
  out.push(title, "=".repeat(title.length), "");
  if (j.approval) {
    out.push(`Approval:    ${approvalLine(j.approval)}`);
    out.push(
      `             signed ${j.approval.signedAt.replace("T", " ").slice(0, 19)} UTC; the reference is the spec hash's first 12 digits and the date`,
    );
  } else {
    const banner = `*** ${NOT_APPROVED} ***`;
    out.push(banner, "The client has not approved this revision. Do not cut production parts from these files.");
    if (j.unapprovedReason) out.push(`Saved for production without approval; the shop's reason: ${j.unapprovedReason}`);
  }
  out.push("");
  out.push(
    `Design:      ${j.design ?? "(unnamed)"}; ${MODE_NAMES[j.result.mode].toLowerCase()}, drawn in ${j.result.units === "in" ? "inches" : "millimetres"}`,
  );
  out.push(`Revision:    ${j.revision ?? "not saved (made from a spec file)"}`);
  if (j.cutPlanNumber !== undefined) out.push(`Cut plan:    ${j.cutPlanNumber} of R${j.revision}`);
  out.push(`Spec hash:   ${j.result.specHash} (SHA-256 of the canonical spec)`);
  out.push(`Engine:      ${j.result.engineVersion}`);
  out.push(`Files in:    ${u === "mm" ? "millimetres ($INSUNITS 4)" : "inches ($INSUNITS 1)"}`, "");

  out.push("SETTINGS", "--------");
  out.push(`Material:    ${s.material}, ${L(s.sheet.thickness)} thick`);
  out.push(
    `Sheet:       ${L(s.sheet.length)} × ${L(s.sheet.width)}, grain ${s.sheet.grain === "length" ? "along the length" : "none"}, margin ${L(s.margin)}, part spacing ${L(s.spacing)}, rotations: ${ROTATION_LABELS[s.rotations].toLowerCase()}`,
  );
  out.push(
    `Machine:     ${s.machine.kind}, kerf ${L(s.machine.kerf)}${s.machine.kind === "router" ? " (cutter diameter)" : ""}, bed ${L(s.machine.bed.length)} × ${L(s.machine.bed.width)}, leaves ${L(insideRadius(s))} in inside corners`,
  );
  out.push(
    s.kerfInFile
      ? `Kerf mode:   TOOL-CENTRE PATHS. Outlines are already offset ${L(s.machine.kerf / 2)} outwards and holes ${L(s.machine.kerf / 2)} inwards: cut ON the line, with no further compensation.`
      : `Kerf mode:   NOMINAL OUTLINES. The CAM must offset ${L(s.machine.kerf / 2)} (half the kerf): outside on CUT_OUTSIDE, inside on CUT_INSIDE.`,
  );
  if (j.run) {
    const r = j.run;
    const treat =
      r.endTreatment === "flat"
        ? `flat run-out: ${r.periods} periods of ${L(r.period)}, ${L(r.eachEnd)} flat at crest level at each end (${L(r.residual)} in all)`
        : r.endTreatment === "half"
          ? `half period: ${r.periods} periods of ${L(r.period)}, ${L(r.eachEnd)} flat at each end`
          : `scaled ×${r.scale.toFixed(5)}: ${r.periods} periods of ${L(r.period)}; wheel size (largest radius) ${L(r.wheelSize.before)} → ${L(r.wheelSize.after)}`;
    out.push(`Run:         ${L(r.runLength)}, ${treat}`);
    if (r.endTreatment !== "scale")
      out.push(`             one more whole period would need ${L(r.extraForNextPeriod)} more run`);
    out.push(
      `Track:       ${s.trackLines} track line(s) × ${s.layers} layer(s), base ${L(s.baseDepth)} below the lowest point`,
    );
    out.push(
      `Joints:      ${s.joint.kind === "key" ? `neck-and-head keys (neck ${L(s.joint.keyWidth)}, depth ${L(s.joint.keyDepth)}, clearance ${L(s.joint.clearance)})` : `spliced butt joints, ${L(s.joint.dowelDiameter)} dowel holes at ${L(s.joint.dowelInset)} and ${L(s.joint.dowelInset + s.joint.dowelSpacing)} from each cut`}`,
    );
    out.push(
      `Cuts at:     ${r.cuts.length ? r.cuts.map((c) => L(c)).join(", ") : "none (one piece)"} from the run's start`,
    );
    out.push(
      `Supports:    ${r.supports.length} holes of ${L(s.supportHoleDiameter)} at ${r.supports.map((x) => Number(x.toFixed(1))).join(", ")} mm from the run's start`,
    );
  }
  out.push(
    `Wheels:      ${s.wheelCount} of each wheel part, bore ${s.boreDiameter ? L(s.boreDiameter) : "none"}${s.lightening ? `, ${s.lightening.count} lightening holes (rim ${L(s.lightening.rim)})` : ""}`,
    "",
  );

  out.push("SHEETS", "------");
  if (j.nest) {
    for (const sh of j.nest.sheets) {
      const counts = new Map<string, number>();
      for (const p of sh.placements) counts.set(p.id, (counts.get(p.id) ?? 0) + 1);
      out.push(
        `Sheet ${sh.index + 1}: ${pct(sh.utilisation)} used; ${[...counts].map(([id, n]) => `${id} × ${n}`).join(", ")}`,
      );
    }
    out.push(`Overall: ${j.nest.sheets.length} sheet(s), ${pct(j.nest.utilisation)} used.`);
    if (j.nest.unplaced.length)
      out.push(`NOT PLACED: ${j.nest.unplaced.map((p) => `${p.id} copy ${p.copy + 1} (${p.reason})`).join("; ")}`);
  } else out.push("Not nested: the parts are laid out once each in the parts file.");
  if (j.nestNote) out.push(j.nestNote);
  out.push("");

  out.push("PARTS", "-----");
  out.push(`${"id".padEnd(5)}${"qty".padStart(4)}  ${"size L × W".padEnd(26)}name`);
  for (const p of j.parts) {
    const b = bounds(p.region.outer);
    const size = `${L(b.maxX - b.minX)} × ${L(b.maxY - b.minY)}`;
    out.push(`${p.id.padEnd(5)}${String(p.quantity).padStart(4)}  ${size.padEnd(26)}${p.name}`);
  }
  out.push("");

  out.push("WARNINGS", "--------");
  const all = [
    ...j.warnings.map((w) => `${w.partId ? `[${w.partId}] ` : ""}${w.message}`),
    ...j.result.warnings.map((w) => `[design] ${w.message}`),
  ];
  out.push(...(all.length ? all.map((w) => `- ${w}`) : ["none"]), "");

  out.push("CAUTIONS", "--------");
  // The same load-path check as the studio and the review page (lib/loads).
  const loads = j.loads;
  if (j.loadsFromDefaults)
    out.push(
      "Load settings: the shop library's starting figures (pushed by hand); set the real use and load in the studio.",
    );
  out.push(`Wheel load ${loads.wheelLoadN.toFixed(0)} N (${loads.loadBasis}).`);
  for (const p of loads.cautions.map(cautionParts))
    out.push(`${p.signal.padEnd(9)}${p.text}`, `${" ".repeat(9)}${p.detail}`);
  out.push("", "Loads for the engineer (inputs, not a structural design):");
  for (const l of loads.engineerLoads) out.push(`- ${l.what}: ${l.value} (${l.source})`);
  out.push("", loads.disclaimer, "");

  out.push("FILES", "-----", ...j.files.map((f) => `- ${f}`), "");
  out.push(
    "Layers: CUT_OUTSIDE (outlines, cut outside), CUT_INSIDE (holes, cut inside), DRILL (circles: drill at the centre),",
  );
  out.push(
    "ENGRAVE (single-stroke labels; the arrow points the way the wheel travels), REFERENCE (sheet outline, not cut).",
  );
  return out.join("\n") + "\n";
}
