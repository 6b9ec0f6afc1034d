// What the shop cuts: parts as flat regions with holes, drill points and engraving. lib/cut builds
// every part in millimetres (a design in inches is converted ×25.4 first); the exporters convert to
// the chosen output unit. Shared by the part builders and the exporters; rings, boxes and
// placements are lib/geometry's, and the nester (lib/nest) never imports from here.
import type { Pt } from "@/lib/geometry/point";
import type { Ring } from "@/lib/geometry/ring";

/** An outline with holes: the outer ring counter-clockwise, the holes clockwise. */
export interface Region {
  outer: Ring;
  holes: Ring[];
}

export interface DrillHole {
  x: number;
  y: number;
  diameter: number;
}

export type PartKind = "track" | "wheel" | "partner" | "splice";

export interface Part {
  /** Short, unique within a cut plan: "T01", "W1", "S01". */
  id: string;
  kind: PartKind;
  /** Plain description for the bill of materials and the labels. */
  name: string;
  quantity: number;
  /** The nominal (as-designed) outline, before any kerf offset, in the part's own coordinates. */
  region: Region;
  drill: DrillHole[];
  /** Engraving as open single-stroke polylines. */
  engrave: Pt[][];
  /** True when the part's x axis must follow the sheet's grain (rotations then limited to 0/180°). */
  grainAlongX: boolean;
  /**
   * Track parts: the translation that puts the part back in the run's coordinates (run x from the
   * run's start, y as the engine's profile), so the segments rejoin into the whole run.
   */
  runOffset?: Pt;
  /** Track parts: the stretch of the run [x0, x1] between the part's two cut stations. */
  station?: { x0: number; x1: number };
}

export type CutWarningCode =
  | "inside-corner" // the cutter leaves a radius in a concave corner of a rolling surface
  | "no-crest-cut" // no crest within reach: a segment is cut on a slope
  | "support-moved" // a support hole was moved clear of a joint
  | "lightening-skipped" // no room for lightening holes with the asked rim
  | "label-skipped" // no room for an engraved label
  | "label-shortened" // the label was cut down to fit
  | "no-font" // no glyph table was given, so no labels were engraved
  | "hole-too-small" // a hole is smaller than the cutter
  | "scaled" // the design was scaled to fit the run
  | "engine"; // a warning of the solve result, passed on

export interface CutWarning {
  code: CutWarningCode;
  message: string;
  partId?: string;
  /** Where, in run x (track parts) or the part's own coordinates, in mm. */
  at?: number[];
}
