// One stretch of the layout plan as a makerjs model, in run millimetres (x along the run from the
// datum, y up): each track part as its own closed model built from the run's polyline, named by
// its engraved id (a caption), the joints where two parts meet, the top of the base band, the
// breaks where the run goes on in the next strip, the datum line and the support marks. The
// screen (plan-svg.ts) and the PDF (pdf/plan-strip.ts) draw the same model; makerjs.measure gives
// its extents.
import makerjs from "makerjs";
import type { Pt } from "@/lib/track";
import type { SheetRun } from "./sheet";
import { partOutline, topAt } from "./pdf/run-geometry";

/** Layer names, one per kind of line, so each renderer gives each its own pen. */
export const PLAN_LAYER = {
  part: "part",
  joint: "joint",
  bandTop: "band-top",
  runGoesOn: "run-goes-on",
  datum: "datum",
  support: "support",
} as const;

export interface PlanRange {
  /** Run x at the stretch's left and right ends, mm. */
  x0: number;
  x1: number;
}

/** Sizes of the marks, in run mm (so in paper units divided by the scale). */
export interface PlanMarks {
  /** Half the width, and the height, of the triangle under the datum at each support. */
  supportHalf: number;
  supportHeight: number;
  /** How far the datum line runs past either end. */
  datumOver: number;
  /** Height of a part's id: it sits in the base band when the band has this much room, else over the track. */
  idHeight: number;
}

const line = (a: Pt, b: Pt, layer: string): makerjs.IPath =>
  Object.assign(new makerjs.paths.Line([...a], [...b]), { layer });
const EPS = 1e-6;

/** The part ids the stretch shows, each with the part of its length in the stretch. */
export function partsIn(run: SheetRun, r: PlanRange): Array<{ id: string; a: number; b: number; whole: boolean }> {
  return run.segments.flatMap((g) => {
    const a = Math.max(g.x0, r.x0);
    const b = Math.min(g.x1, r.x1);
    return b - a > EPS ? [{ id: g.id, a, b, whole: g.x0 >= r.x0 - EPS && g.x1 <= r.x1 + EPS }] : [];
  });
}

export function planModel(run: SheetRun, r: PlanRange, marks: PlanMarks): makerjs.IModel {
  const parts: makerjs.IModelMap = {};
  const bandTop = Math.min(...run.profile.map(([, y]) => y));
  const bandRoom = bandTop - run.baseY >= marks.idHeight;
  for (const p of partsIn(run, r)) {
    const part: makerjs.IModel = new makerjs.models.ConnectTheDots(
      true,
      partOutline(run, p.a, p.b).map(([x, y]) => [x, y]),
    );
    part.layer = PLAN_LAYER.part;
    const cx = (p.a + p.b) / 2;
    const y = bandRoom ? (run.baseY + bandTop) / 2 : topAt(run.profile, cx) + marks.idHeight;
    makerjs.model.addCaption(part, p.id, [cx - marks.idHeight, y], [cx + marks.idHeight, y]);
    parts[p.id] = part;
  }

  const paths: makerjs.IPathMap = {};
  const within = (x: number) => x >= r.x0 - EPS && x <= r.x1 + EPS;
  run.segments.slice(0, -1).forEach((g, i) => {
    if (within(g.x1)) paths[`joint-${i}`] = line([g.x1, run.baseY], [g.x1, topAt(run.profile, g.x1)], PLAN_LAYER.joint);
  });
  if (bandTop - run.baseY > EPS) paths.bandTop = line([r.x0, bandTop], [r.x1, bandTop], PLAN_LAYER.bandTop);
  if (r.x0 > EPS) paths.goesOnLeft = line([r.x0, run.baseY], [r.x0, topAt(run.profile, r.x0)], PLAN_LAYER.runGoesOn);
  if (r.x1 < run.length - EPS)
    paths.goesOnRight = line([r.x1, run.baseY], [r.x1, topAt(run.profile, r.x1)], PLAN_LAYER.runGoesOn);
  paths.datum = line([r.x0 - marks.datumOver, run.datumY], [r.x1 + marks.datumOver, run.datumY], PLAN_LAYER.datum);

  const supports: makerjs.IModelMap = {};
  run.supports.forEach((x, i) => {
    if (!within(x)) return;
    const h = marks.supportHeight;
    const mark: makerjs.IModel = new makerjs.models.ConnectTheDots(true, [
      [x, run.datumY],
      [x + marks.supportHalf, run.datumY - h],
      [x - marks.supportHalf, run.datumY - h],
    ]);
    mark.layer = PLAN_LAYER.support;
    supports[`S${i + 1}`] = mark;
  });

  return {
    units: makerjs.unitType.Millimeter,
    models: { parts: { models: parts }, supports: { models: supports } },
    paths,
  };
}

/** The part models of a plan model, by id. */
export const partModels = (m: makerjs.IModel): makerjs.IModelMap => m.models?.parts.models ?? {};

/** Every caption of a model with the centre of its anchor, in the model's units. */
export function captionsOf(m: makerjs.IModel): Array<{ text: string; at: Pt }> {
  return makerjs.model.getAllCaptionsOffset(m).map((c) => ({ text: c.text, at: makerjs.point.middle(c.anchor) as Pt }));
}
