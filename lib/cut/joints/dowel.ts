// A spliced butt joint: the two segments meet on a straight vertical cut; a splice plate is bolted
// or dowelled across the joint on each face. Holes lie on one horizontal centre line through the
// base band, at the inset and inset + spacing from the cut on each side; the plate carries the same
// pattern about its middle, so plate and segments are drilled from one layout (a fish-plate joint,
// as in timber and rail practice).
import type { DrillHole, Part, Region } from "../types";
import type { CutSettings } from "../settings";

export function spliceGeometry(settings: CutSettings) {
  const { dowelDiameter: d, dowelInset: a, dowelSpacing: p } = settings.joint;
  const edge = Math.max(2 * d, 20);
  const half = a + p + edge;
  return { length: 2 * half, height: 0.8 * settings.baseDepth, half, offsets: [a, a + p], diameter: d };
}

/** Holes for a joint at station s on centre line yc: those on the left segment and those on the right. */
export function jointHoles(s: number, yc: number, settings: CutSettings): { left: DrillHole[]; right: DrillHole[] } {
  const g = spliceGeometry(settings);
  return {
    left: g.offsets.map((o) => ({ x: s - o, y: yc, diameter: g.diameter })),
    right: g.offsets.map((o) => ({ x: s + o, y: yc, diameter: g.diameter })),
  };
}

export function splicePlate(settings: CutSettings, id: string, quantity: number): Part {
  const g = spliceGeometry(settings);
  const region: Region = {
    outer: [
      [0, 0],
      [g.length, 0],
      [g.length, g.height],
      [0, g.height],
    ],
    holes: [],
  };
  const yc = g.height / 2;
  const drill: DrillHole[] = [];
  for (const o of [...g.offsets].reverse()) drill.push({ x: g.half - o, y: yc, diameter: g.diameter });
  for (const o of g.offsets) drill.push({ x: g.half + o, y: yc, diameter: g.diameter });
  return { id, kind: "splice", name: "Splice plate", quantity, region, drill, engrave: [], grainAlongX: true };
}
