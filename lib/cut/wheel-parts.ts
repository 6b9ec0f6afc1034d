// Wheels as parts: the engine's outline in its start pose with the axle at the origin (Hall &
// Wagon 1992 for track modes; Maxwell 1849 / Litvin et al. 2009 for the partner), × the run's scale
// for a scaled design, with an axle bore (a hole ring cut inside), optional lightening holes
// (lightening.ts) and an engraved label. Partner and twin modes give two wheel parts.
import type { SolveResult } from "@/lib/track";
import { CutError } from "./errors";
import { circleRing, cleanRing, orient, type Ring } from "@/lib/geometry/ring";
import { distToRing } from "@/lib/geometry/segment";
import { wheelSurfaceWarnings } from "./inside-corners";
import type { GlyphTable } from "./labels/font";
import { lighteningHoles } from "./lightening";
import type { CutSettings } from "./settings";
import { labelPart } from "./track-parts";
import type { CutWarning, Part, PartKind } from "./types";
import { fmtLen, mmPerUnit } from "./units";

interface Body {
  id: string;
  kind: PartKind;
  name: string;
  points: SolveResult["wheel"]["points"];
}

function bodies(result: SolveResult): Body[] {
  const wheel = result.wheel;
  switch (result.mode) {
    case "track-for-wheel":
    case "wheel-for-track":
      return [{ id: "W1", kind: "wheel", name: "Wheel", points: wheel.points }];
    case "partner-wheel":
      return [
        { id: "W1", kind: "wheel", name: "Driver wheel", points: wheel.points },
        ...(result.partner
          ? [{ id: "P1", kind: "partner" as const, name: "Partner wheel", points: result.partner.points }]
          : []),
      ];
    case "twin-wheels":
      return [
        { id: "W1", kind: "wheel", name: "Upper twin wheel", points: wheel.points },
        ...(result.partner
          ? [{ id: "P1", kind: "partner" as const, name: "Lower twin wheel", points: result.partner.points }]
          : []),
      ];
  }
}

/** The wheel outline in mm, counter-clockwise, axle at the origin. */
export function wheelRing(points: SolveResult["wheel"]["points"], k: number): Ring {
  return orient(
    cleanRing(
      points.map(([x, y]) => [x * k, y * k]),
      1e-6,
    ),
    true,
  );
}

export function buildWheelParts(
  result: SolveResult,
  s: CutSettings,
  scale: number,
  font?: GlyphTable,
): { parts: Part[]; warnings: CutWarning[] } {
  if (!result.wheel?.points?.length) throw new CutError("no-wheel", "The solve result has no wheel outline.");
  const warnings: CutWarning[] = [];
  const parts: Part[] = [];
  if (s.wheelCount === 0) return { parts, warnings };
  const k = mmPerUnit(result.units) * scale;
  for (const b of bodies(result)) {
    const outer = wheelRing(b.points, k);
    const rin = distToRing([0, 0], outer);
    const bore = s.boreDiameter / 2;
    const wall = Math.max(s.machine.kerf, 5);
    if (bore > 0 && bore + wall > rin)
      throw new CutError(
        "invalid-settings",
        `The ${fmtLen(s.boreDiameter)} axle bore does not fit in ${b.name.toLowerCase()} ${b.id}: the outline comes within ${fmtLen(rin)} of the axle, so the bore can be at most ${fmtLen(2 * Math.max(0, rin - wall))} across.`,
        "boreDiameter",
      );
    const holes: Ring[] = bore > 0 ? [orient(circleRing(0, 0, bore), false)] : [];
    if (s.lightening) {
      const l = lighteningHoles(outer, s, Math.max(2 * s.machine.kerf, 10));
      if ("reason" in l)
        warnings.push({
          code: "lightening-skipped",
          partId: b.id,
          message: `No lightening holes in ${b.id}: ${l.reason}.`,
        });
      else holes.push(...l.holes);
    }
    const part: Part = {
      id: b.id,
      kind: b.kind,
      name: b.name,
      quantity: s.wheelCount,
      region: { outer, holes },
      drill: [],
      engrave: [],
      grainAlongX: false,
    };
    labelPart(part, [s.project, b.id], [0, -(bore + rin) / 2], s, font, warnings);
    warnings.push(...wheelSurfaceWarnings(b.id, outer, s));
    parts.push(part);
  }
  return { parts, warnings };
}
