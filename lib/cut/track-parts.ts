// The run's rolling surface made into solid track parts: each segment is the profile on top, a
// straight bottom edge at the run's lowest point less the base depth, and its two ends: a plain
// vertical cut at the run's ends, a joint (neck-and-head key or spliced butt, lib/cut/joints) at
// each cut station. Support holes and dowel holes sit on the base band's centre line; the label is
// engraved where the part has room. Parts are in their own coordinates (x from the segment's
// start, y from the bottom edge); runOffset puts each back in the run.
import type { Pt } from "@/lib/geometry/point";
import type { Box } from "@/lib/geometry/box";
import { translate } from "@/lib/geometry/place";
import { sliceByX } from "@/lib/geometry/polyline";
import { cleanRing, orient, type Ring } from "@/lib/geometry/ring";
import { relieveJointCorners } from "./inside-corners";
import { jointHoles, splicePlate } from "./joints/dowel";
import { keyShape, keySlot, keyTongue } from "./joints/key";
import type { GlyphTable } from "./labels/font";
import { placeLabel } from "./labels/label";
import type { RunInfo } from "./run-length";
import { planCuts } from "./segments";
import type { CutSettings } from "./settings";
import { supportStations } from "./supports";
import type { CutWarning, DrillHole, Part } from "./types";

export interface TrackParts {
  parts: Part[];
  cuts: number[];
  segments: Array<{ id: string; x0: number; x1: number }>;
  /** Run x of every support hole. */
  supports: number[];
  /** Run y of the parts' bottom edge and of the base band's centre line. */
  baseY: number;
  centreY: number;
  warnings: CutWarning[];
}

const pad = (i: number) => String(i).padStart(2, "0");

/** One segment's outline in run coordinates, with the joints' corners relieved. */
function segmentRing(
  run: RunInfo,
  a: number,
  b: number,
  left: boolean,
  right: boolean,
  yb: number,
  yc: number,
  s: CutSettings,
): Ring {
  const key = s.joint.kind === "key" ? keyShape(s.joint) : null;
  const start: Pt[] = [
    [a, yb],
    [b, yb],
  ];
  const rightEnd = right && key ? keyTongue(b, yc, key) : [];
  const top = sliceByX(run.profile, a, b).reverse();
  const leftEnd = left && key ? keySlot(a, yc, key) : [];
  let ring: Ring = [...start, ...rightEnd, ...top, ...leftEnd];
  // Relieve the later stretch first, so the earlier one's indices still hold.
  const leftFrom = start.length + rightEnd.length + top.length;
  if (leftEnd.length) ring = relieveJointCorners(ring, leftFrom - 1, leftFrom + leftEnd.length, s);
  if (rightEnd.length) ring = relieveJointCorners(ring, start.length - 1, start.length + rightEnd.length, s);
  return orient(cleanRing(ring, 1e-6), true);
}

export function buildTrackParts(run: RunInfo, s: CutSettings, font?: GlyphTable): TrackParts {
  const plan = planCuts(run, s);
  const warnings: CutWarning[] = [...plan.warnings];
  const yb = run.minY - s.baseDepth;
  const yc = yb + s.baseDepth / 2;
  const sup = supportStations(run.runLength, plan.cuts, s);
  warnings.push(...sup.warnings);
  const n = plan.segments.length;
  const parts: Part[] = [];
  const segments: TrackParts["segments"] = [];
  plan.segments.forEach(({ x0: a, x1: b }, i) => {
    const id = `T${pad(i + 1)}`;
    const left = i > 0;
    const right = i < n - 1;
    const ring = segmentRing(run, a, b, left, right, yb, yc, s);
    const drill: DrillHole[] = sup.xs
      .filter((x) => x > a && x < b)
      .map((x) => ({ x, y: yc, diameter: s.supportHoleDiameter }));
    if (s.joint.kind === "dowel") {
      if (left) drill.push(...jointHoles(a, yc, s).right);
      if (right) drill.push(...jointHoles(b, yc, s).left);
    }
    drill.sort((p, q) => p.x - q.x);
    const part: Part = {
      id,
      kind: "track",
      name: `Track segment ${i + 1} of ${n}`,
      quantity: s.trackLines * s.layers,
      region: { outer: translate(ring, -a, -yb), holes: [] },
      drill: drill.map((d) => ({ ...d, x: d.x - a, y: d.y - yb })),
      engrave: [],
      grainAlongX: true,
      runOffset: [a, yb],
      station: { x0: a, x1: b },
    };
    // In the base band, below the rolling surface.
    const band = { minX: 0, minY: 0, maxX: b - a, maxY: s.baseDepth };
    labelPart(part, [s.project, `${id}  ${i + 1}/${n}`], [(b - a) / 2, s.baseDepth / 2], s, font, warnings, true, band);
    parts.push(part);
    segments.push({ id, x0: a, x1: b });
  });
  if (s.joint.kind === "dowel" && n > 1) {
    const plate = splicePlate(s, "S01", 2 * s.trackLines * (n - 1));
    plate.name = `Splice plate (two per joint, one each face)`;
    const b = plate.region.outer[2];
    labelPart(plate, [plate.id], [b[0] / 2, b[1] / 2], s, font, warnings, false);
    parts.push(plate);
  }
  return { parts, cuts: plan.cuts, segments, supports: sup.xs, baseY: yb, centreY: yc, warnings };
}

/** Engraves a label on a part, or notes why not. */
export function labelPart(
  part: Part,
  lines: string[],
  prefer: Pt,
  s: CutSettings,
  font: GlyphTable | undefined,
  warnings: CutWarning[],
  arrow = true,
  within?: Box,
): void {
  if (!font) return;
  const text = lines.filter((l) => l.trim().length > 0);
  const placed = placeLabel(font, part.region, part.drill, {
    lines: text,
    arrow,
    maxHeight: s.labelHeight,
    minHeight: 3,
    prefer,
    margin: Math.max(3, s.machine.kerf),
    within,
  });
  if (!placed) {
    warnings.push({
      code: "label-skipped",
      partId: part.id,
      message: `There is no room on part ${part.id} for a label 3 mm high or more: it is not engraved. Mark it by hand.`,
    });
    return;
  }
  if (!placed.full)
    warnings.push({
      code: "label-shortened",
      partId: part.id,
      message: `Part ${part.id} has room only for its id and arrow: the project name is left off its label.`,
    });
  if (placed.missing.length)
    warnings.push({
      code: "label-shortened",
      partId: part.id,
      message: `The engraving font has no glyph for ${[...new Set(placed.missing)].map((c) => `"${c}"`).join(", ")}: drawn as "?" on part ${part.id}.`,
    });
  part.engrave = placed.strokes;
}
