// The installer's assembly sheet as data: everything the printed page and the PDF show, in the
// installer's order of work, built once from a stored cut plan so the two never disagree. Lengths
// are millimetres; the renderers show inches beside them when the sheet's units say so.
import type { Pt } from "@/lib/track";

export type SignalWord = "DANGER" | "WARNING" | "CAUTION" | "NOTICE";

export interface SheetCaution {
  signal: SignalWord;
  text: string;
}

export interface SheetApproval {
  /** e.g. "3f9a1c0d2b4e/2026-12-02". */
  reference: string;
  typedName: string;
  organisation: string | null;
  signedAt: string;
}

export interface SheetRun {
  length: number;
  periods: number;
  period: number;
  endTreatment: "flat" | "half" | "scale";
  /** Flat at each end, mm. */
  eachEnd: number;
  /** The rolling surface from x = 0 (the datum end) to x = length; y as the track's top, the datum line at y = datumY. */
  profile: Pt[];
  /** y of the parts' bottom edge: the level every support holds. */
  baseY: number;
  /** The datum: x = 0 at the start of the run, heights above the parts' bottom edge (y = baseY). */
  datumY: number;
  /** Each segment as cut, with its engraved id. */
  segments: Array<{ id: string; x0: number; x1: number }>;
  /** Run x of every support (a hole in the base band, drilled for the support's fixing). */
  supports: number[];
  /** The wheel travels from x = 0 towards x = length. */
  direction: "start-to-end";
}

export interface SheetPart {
  /** As engraved on the part, e.g. "T01", "W1". */
  id: string;
  name: string;
  material: string;
  quantity: number;
  /** 1-based sheet numbers the part's copies were cut from (empty when not nested). */
  sheets: number[];
}

export interface SheetJoint {
  /** Distance from the datum, mm. */
  station: number;
  between: [string, string];
  kind: "key" | "dowel";
  /** e.g. "neck-and-head key, neck 24 mm" or "2 × Ø10 mm dowels each side, splice plate". */
  detail: string;
}

export interface LevelRow {
  what: "support" | "joint";
  /** "S3" for the third support, the joint's "T02/T03". */
  label: string;
  station: number;
  /** Height of the track's top above the datum at this station, mm. */
  topHeight: number;
  /** How far this may sit off its station (joints), or sit low (supports), before the axle bumps by more than the limit, mm (±). */
  tolerance: number;
}

export interface AssemblySheet {
  title: string;
  project: { name: string; site: string; client: string | null };
  design: { name: string; revision: number; specHash: string };
  /** The client's approval, or null: the sheet says NOT APPROVED. */
  approval: SheetApproval | null;
  /** When the sheet was made, ISO. */
  date: string;
  shop: { name: string; contact: string };
  cutPlanId: number;
  /** The plan's number within its revision: the sheet names it "cut plan 2 of R3". */
  cutPlanNumber: number;
  cautions: SheetCaution[];
  disclaimer: string;
  /** Show inches beside millimetres. */
  inches: boolean;
  /** Null for a pair of wheels (no track to lay out). */
  run: SheetRun | null;
  parts: SheetPart[];
  /** Order of assembly, one instruction a line. */
  steps: string[];
  joints: SheetJoint[];
  fasteners: string[];
  tools: string[];
  levels: LevelRow[];
  /** The bump the tolerances are worked out for, and how the engine worked them out. */
  tolerance: { bumpLimit: number; method: string };
}

export const PAPER_SIZES = {
  a4: { name: "A4", widthPt: 595.28, heightPt: 841.89 },
  letter: { name: "US Letter", widthPt: 612, heightPt: 792 },
} as const;
export type Paper = keyof typeof PAPER_SIZES;
