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
