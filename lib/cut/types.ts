// What the shop cuts: parts as flat regions with holes, drill points and engraving, in the design's
// units. Shared by the part builders (lib/cut), the nester (lib/nest) and the exporters.
import type { Pt } from "@/lib/track";

/** A closed ring, first point not repeated. Outer rings counter-clockwise, holes clockwise. */
export type Ring = Pt[];

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
}
