// The nesting engine's public types. Coordinates: x along the sheet's or strip's length, y across.
// A placed copy's outline is rotate(item.polygon, rotation° about (0, 0)) and then translate (x, y):
// placeRing in lib/geometry/place.ts. The part builder (lib/cut) imports these types; the nester
// imports nothing from lib/cut.
import type { Pose } from "@/lib/geometry/place";
import type { Ring } from "@/lib/geometry/ring";

export interface NestItem {
  id: string;
  polygon: Ring;
  quantity: number;
  /** Allowed rotations in degrees, e.g. [0, 90, 180, 270]. */
  rotations: number[];
  /**
   * Holes through the part (its own frame), where smaller parts may be nested in sheet mode. Strip
   * mode ignores them.
   */
  holes?: Ring[];
}

export interface NestProgress {
  /** Share of the time budget used, 0..1. */
  fraction: number;
  bestUtilisation: number;
  placed: number;
  total: number;
  message?: string;
}

export interface NestControl {
  seconds: number;
  seed?: number;
  onProgress?: (p: NestProgress) => void;
  signal?: AbortSignal;
  /**
   * Stop after this many search iterations even if time is left. The search visits the same
   * layouts in the same order for a given seed, so a run that stops on this count (rather than on
   * the clock) gives the same result on any machine.
   */
  maxIterations?: number;
}

/** A copy's pose: rotation about the item's own origin first, then the translation. */
export interface Placement extends Pose {
  id: string;
  /** 0-based copy index. */
  copy: number;
}

export interface SheetPlacement extends Placement {
  /** 0-based. */
  sheet: number;
}

export interface SheetNestInput extends NestControl {
  items: NestItem[];
  sheet: { width: number; height: number };
  /** Edge margin. */
  margin: number;
  /** Smallest gap between parts. */
  spacing: number;
  maxSheets?: number;
  /** Unit name used in the plain-English reasons for parts left out; "mm" when not given. */
  units?: string;
}

/** The outline an item was packed as (containing-outline.ts): never smaller than the part. */
export interface OutlineReport {
  id: string;
  /** Vertices of the item's polygon as given, and of the outline packed. */
  vertices: number;
  outlineVertices: number;
  /** Area the outline adds to the part (beyond the spacing), in units², and as a share of the part's area. */
  extraArea: number;
  extraShare: number;
}

/** How a run ended: the best possible reached (sheets = the area bound), the clock, the iteration cap, or a cancel. */
export type NestEnd = "proved-best" | "time" | "iterations" | "cancelled";

/** Where a run's time went, seconds. */
export interface NestTimings {
  firstLayout: number;
  noFitPolygons: number;
}

export interface SheetNestResult {
  sheets: Array<{ index: number; utilisation: number; placements: SheetPlacement[] }>;
  /** Overall: part area / (sheets used × sheet area). */
  utilisation: number;
  unplaced: Array<{ id: string; copy: number; reason: string }>;
  seconds: number;
  cancelled: boolean;
  // The nester always gives these; a layout made elsewhere (the shelf layout) or saved before they
  // existed may lack them.
  ended?: NestEnd;
  /** The fewest sheets the parts' area allows (a lower bound on any layout). */
  areaBound?: number;
  timings?: NestTimings;
  outlines?: OutlineReport[];
}

export interface StripNestInput extends NestControl {
  items: NestItem[];
  height: number;
  spacing?: number;
}

export interface StripNestResult {
  utilisation: number;
  length: number;
  placed: number;
  seconds: number;
  /** Search iterations run: with the seed, this fixes the layout whatever the machine's speed. */
  iterations: number;
  cancelled: boolean;
  ended: Exclude<NestEnd, "proved-best">;
  timings: NestTimings;
  outlines: OutlineReport[];
  placements: Placement[];
}

export interface NestInstance {
  name: string;
  items: NestItem[];
  height: number;
}
