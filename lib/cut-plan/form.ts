// The cut-plan page's form: text as typed (so a half-typed number is kept, not lost), turned into a
// plan choice for the worker and the server. Bad numbers go through as NaN and come back from the
// settings schema with its own message on the right field.
import { DEFAULT_CUT_SETTINGS, type CutSettings } from "@/lib/cut/settings";
import type { PlanChoice } from "./compose";

export interface PlanForm {
  materialId: string;
  stockSheetId: string;
  machineId: string;
  runLength: string;
  endTreatment: CutSettings["endTreatment"];
  baseDepth: string;
  trackLines: string;
  layers: string;
  /** Cut stations, mm along the run, separated by commas or spaces; empty for the default (at crests). */
  cuts: string;
  jointKind: CutSettings["joint"]["kind"];
  keyWidth: string;
  keyDepth: string;
  clearance: string;
  dowelDiameter: string;
  dowelInset: string;
  dowelSpacing: string;
  supportSpacing: string;
  supportHoleDiameter: string;
  wheelCount: string;
  boreDiameter: string;
  lightening: boolean;
  lighteningCount: string;
  lighteningRim: string;
  labelHeight: string;
  margin: string;
  spacing: string;
  rotations: CutSettings["rotations"];
  kerfInFile: boolean;
  outputUnits: CutSettings["outputUnits"];
}

const str = (v: number) => String(Number(v.toPrecision(10)));

/** The form for stored settings (or the defaults) and the chosen library rows. */
export function formFromSettings(
  own: Partial<CutSettings>,
  ids: { materialId: number; stockSheetId: number; machineId: number },
): PlanForm {
  const s = { ...DEFAULT_CUT_SETTINGS, ...own, joint: { ...DEFAULT_CUT_SETTINGS.joint, ...own.joint } };
  return {
    materialId: String(ids.materialId),
    stockSheetId: String(ids.stockSheetId),
    machineId: String(ids.machineId),
    runLength: str(s.runLength),
    endTreatment: s.endTreatment,
    baseDepth: str(s.baseDepth),
    trackLines: str(s.trackLines),
    layers: str(s.layers),
    cuts: s.cuts?.map(str).join(", ") ?? "",
    jointKind: s.joint.kind,
    keyWidth: str(s.joint.keyWidth),
    keyDepth: str(s.joint.keyDepth),
    clearance: str(s.joint.clearance),
    dowelDiameter: str(s.joint.dowelDiameter),
    dowelInset: str(s.joint.dowelInset),
    dowelSpacing: str(s.joint.dowelSpacing),
    supportSpacing: str(s.supportSpacing),
    supportHoleDiameter: str(s.supportHoleDiameter),
    wheelCount: str(s.wheelCount),
    boreDiameter: str(s.boreDiameter),
    lightening: s.lightening !== null,
    lighteningCount: str(s.lightening?.count ?? 4),
    lighteningRim: str(s.lightening?.rim ?? 25),
    labelHeight: str(s.labelHeight),
    margin: str(s.margin),
    spacing: str(s.spacing),
    rotations: s.rotations,
    kerfInFile: s.kerfInFile,
    outputUnits: s.outputUnits,
  };
}

/** The shop library's rows as the starting choice needs them. */
interface StartLibrary {
  materials: { id: number; name: string }[];
  sheets: { id: number; materialId: number; lengthMm: number; widthMm: number }[];
  machines: { id: number; kind: string }[];
}

/** What the project records of its site and stock (null: not set). */
export interface ProjectStart {
  runLengthMm: number | null;
  trackLines: number | null;
  stockSheetId: number | null;
  machineId: number | null;
}

/**
 * Where a revision's first cut plan starts: the settings and the library rows before anyone edits
 * them. The project's figures win wherever it has them (and its sheet and machine are still in the
 * library); then the run the client's review showed (its end treatment, and its length when the
 * project records none: a sign-off is of the spec, not of the mock-up's run, so the site's own
 * measure comes first); then the settings' defaults.
 *
 * Without a sheet from the project, the largest plywood sheet, and only failing any plywood the
 * largest sheet of all. The largest of everything is mild steel (2500 × 1250), which the default
 * machine (a router) cannot cut and which most of this trade's work (plywood tracks and wheels, the
 * demo's 18 mm birch) never uses, so a new plan would start wrong for nearly everyone.
 */
export function startingChoice(
  library: StartLibrary,
  project: ProjectStart | null,
  reviewed: Pick<Partial<CutSettings>, "runLength" | "endTreatment"> = {},
): { settings: Partial<CutSettings>; ids: { materialId: number; stockSheetId: number; machineId: number } } {
  // A sheet is offered only with its material (a retired material hides its sheets).
  const usable = library.sheets.filter((s) => library.materials.some((m) => m.id === s.materialId));
  const plywood = usable.filter((s) =>
    /plywood/i.test(library.materials.find((m) => m.id === s.materialId)?.name ?? ""),
  );
  const largest = (rows: typeof usable) =>
    rows.reduce<(typeof usable)[number] | undefined>(
      (best, s) => (!best || s.lengthMm * s.widthMm > best.lengthMm * best.widthMm ? s : best),
      undefined,
    );
  const sheet = usable.find((s) => s.id === project?.stockSheetId) ?? largest(plywood.length ? plywood : usable);
  const machine =
    library.machines.find((m) => m.id === project?.machineId) ??
    library.machines.find((m) => m.kind === "router") ??
    library.machines[0];

  const settings: Partial<CutSettings> = { ...reviewed };
  if (project?.runLengthMm != null) settings.runLength = project.runLengthMm;
  if (project?.trackLines != null) settings.trackLines = project.trackLines;
  return {
    settings,
    ids: {
      materialId: sheet?.materialId ?? library.materials[0]?.id ?? 0,
      stockSheetId: sheet?.id ?? 0,
      machineId: machine?.id ?? 0,
    },
  };
}

/** A number as typed; blank or junk is NaN, which the schema refuses with the field's message. */
export function typedNumber(text: string): number {
  const t = text.trim().replace(",", ".");
  return t === "" || !/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(t) ? NaN : Number(t);
}

export function parseStations(text: string): number[] | undefined {
  const parts = text.split(/[\s;,]+/).filter(Boolean);
  return parts.length ? parts.map((p) => typedNumber(p)) : undefined;
}

export function formToChoice(f: PlanForm): PlanChoice {
  const n = typedNumber;
  const settings: Record<string, unknown> = {
    runLength: n(f.runLength),
    endTreatment: f.endTreatment,
    baseDepth: n(f.baseDepth),
    trackLines: n(f.trackLines),
    layers: n(f.layers),
    joint: {
      kind: f.jointKind,
      keyWidth: n(f.keyWidth),
      keyDepth: n(f.keyDepth),
      clearance: n(f.clearance),
      dowelDiameter: n(f.dowelDiameter),
      dowelInset: n(f.dowelInset),
      dowelSpacing: n(f.dowelSpacing),
    },
    supportSpacing: n(f.supportSpacing),
    supportHoleDiameter: n(f.supportHoleDiameter),
    wheelCount: n(f.wheelCount),
    boreDiameter: n(f.boreDiameter),
    lightening: f.lightening ? { count: n(f.lighteningCount), rim: n(f.lighteningRim) } : null,
    labelHeight: n(f.labelHeight),
    margin: n(f.margin),
    spacing: n(f.spacing),
    rotations: f.rotations,
    kerfInFile: f.kerfInFile,
    outputUnits: f.outputUnits,
  };
  const cuts = parseStations(f.cuts);
  if (cuts) settings.cuts = cuts;
  return {
    materialId: Number(f.materialId),
    stockSheetId: Number(f.stockSheetId),
    machineId: Number(f.machineId),
    settings,
  };
}
