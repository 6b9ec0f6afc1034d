// Which rotations the nester may use for a part: the user's choice, narrowed to 0° and 180° for a
// part whose x axis must follow the sheet's grain (plywood face veneers run along the sheet's
// length; a track segment is strongest with them along the track).
import type { CutSettings } from "./settings";
import type { Part } from "./types";

const SETS: Record<CutSettings["rotations"], number[]> = {
  free: [0, 45, 90, 135, 180, 225, 270, 315],
  "90": [0, 90, 180, 270],
  "180": [0, 180],
  none: [0],
};

export function allowedRotations(
  part: Pick<Part, "grainAlongX">,
  s: Pick<CutSettings, "rotations" | "sheet">,
): number[] {
  const set = SETS[s.rotations];
  if (part.grainAlongX && s.sheet.grain === "length") return set.filter((r) => r % 180 === 0);
  return set;
}
