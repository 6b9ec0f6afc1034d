// One strip of the layout plan as the screen and the browser's print show it: the plan model
// (plan-drawing.ts) with the screen's annotations added as makerjs paths and captions — a leader
// and the station over each joint with the two parts' ids, each support's name and station, the
// direction of travel on the first strip — scaled to paper millimetres (1 : scale) and written
// out by makerjs.exporter.toSVG, so the SVG's width is its printed width in mm.
import makerjs from "makerjs";
import type { Pt } from "@/lib/track";
import { PLAN_LAYER, planModel, type PlanRange } from "./plan-drawing";
import type { SheetRun } from "./sheet";
import { topAt } from "./pdf/run-geometry";

const INK = "#1d3557";
const SOFT = "#3d5a80";
const FILL = "#ece3cc";

/** The screen's own layers, beside the plan model's. */
const LAYER = {
  leader: "leader",
  travel: "travel",
  frame: "frame",
  station: "station",
  between: "between",
  supportName: "support-name",
  supportAt: "support-at",
  travelWord: "travel-word",
  partId: "part-id",
} as const;

// Sizes on paper, mm.
const FONT = 2.6;
const FONT_SMALL = 2.2;
const ABOVE = 16;
const BELOW = 14;
const SIDE = 2;

/** Pens by layer, in paper mm (strokes scale with the drawing, as on paper). */
const text = (fill: string, size: number, weight = 400) => ({
  cssStyle: `fill:${fill};stroke:none;font-size:${size}px;font-weight:${weight}`,
});
const pen = (stroke: string, width: number, more = "") => ({
  cssStyle: `stroke:${stroke};stroke-width:${width};fill:none${more}`,
});
const LAYER_OPTIONS: Record<string, makerjs.exporter.ISVGElementRenderOptions> = {
  [PLAN_LAYER.part]: { cssStyle: `stroke:${INK};stroke-width:0.25;fill:${FILL};stroke-linejoin:round` },
  [PLAN_LAYER.joint]: pen(INK, 0.3),
  [PLAN_LAYER.bandTop]: pen(SOFT, 0.15, ";stroke-dasharray:1 1"),
  [PLAN_LAYER.runGoesOn]: pen(SOFT, 0.2, ";stroke-dasharray:0.6 0.6"),
  [PLAN_LAYER.datum]: pen(SOFT, 0.2, ";stroke-dasharray:2 1"),
  [PLAN_LAYER.support]: { cssStyle: `fill:${SOFT};stroke:none` },
  [LAYER.leader]: pen(INK, 0.3),
  [LAYER.travel]: pen(INK, 0.3),
  [LAYER.frame]: { cssStyle: "stroke:none;fill:none" },
  [LAYER.station]: text(INK, FONT),
  [LAYER.between]: text(SOFT, FONT),
  [LAYER.supportName]: text(INK, FONT),
  [LAYER.supportAt]: text(SOFT, FONT_SMALL),
  [LAYER.travelWord]: text(INK, FONT_SMALL),
  [LAYER.partId]: text(INK, FONT, 600),
};

export interface StripSvgInput {
  run: SheetRun;
  joints: Array<{ station: number; between: [string, string] }>;
  range: PlanRange;
  /** 1 : scale. */
  scale: number;
  /** The first strip carries the direction of travel. */
  first: boolean;
  /** Writes a station for the plan ("705.1 mm", with inches when asked). */
  station: (mm: number) => string;
  label: string;
}

/** Advance of one character of the monospaced face, in ems (IBM Plex Mono: 600 units of 1000). */
const MONO_ADVANCE = 0.6;

/** A caption: its text centred on `at` (kept inside lo…hi, run mm), on its own layer. */
function caption(text: string, at: Pt, layer: string, k: number, lo = -Infinity, hi = Infinity): makerjs.IModel {
  const size = layer === LAYER.supportAt || layer === LAYER.travelWord ? FONT_SMALL : FONT;
  const half = (text.length * MONO_ADVANCE * size * k) / 2;
  const x = Math.min(Math.max(at[0], lo + half), hi - half);
  const m: makerjs.IModel = {};
  makerjs.model.addCaption(m, text, [x - half, at[1]], [x + half, at[1]]);
  m.caption!.anchor.layer = layer;
  return m;
}

const lineOn = (a: Pt, b: Pt, layer: string): makerjs.IPath =>
  Object.assign(new makerjs.paths.Line([...a], [...b]), { layer });

/** The strip as an SVG document whose width is its printed width at 1 : scale. */
export function stripSvg({ run, joints, range, scale: k, first, station, label }: StripSvgInput): string {
  const top = Math.max(...run.profile.map(([, y]) => y));
  const model = planModel(run, range, {
    supportHalf: 1.5 * k,
    supportHeight: 3 * k,
    datumOver: SIDE * k,
    idHeight: 3.2 * k,
  });
  for (const part of Object.values(model.models!.parts.models!)) part.caption!.anchor.layer = LAYER.partId;

  const notes: makerjs.IModelMap = {};
  const paths: makerjs.IPathMap = {};
  const inRange = (x: number) => x >= range.x0 - 1e-6 && x <= range.x1 + 1e-6;
  // Labels stay on the strip's paper, however near its ends their stations are.
  const [lo, hi] = [range.x0 - SIDE * k, range.x1 + SIDE * k];
  joints
    .filter((j) => inRange(j.station))
    .forEach((j, i) => {
      const x = j.station;
      paths[`leader-${i}`] = lineOn([x, topAt(run.profile, x)], [x, top + 6 * k], LAYER.leader);
      notes[`station-${i}`] = caption(station(x), [x, top + 9 * k], LAYER.station, k, lo, hi);
      notes[`between-${i}`] = caption(j.between.join(" | "), [x, top + 13.5 * k], LAYER.between, k, lo, hi);
    });
  run.supports.forEach((x, n) => {
    if (!inRange(x)) return;
    notes[`support-${n}`] = caption(`S${n + 1}`, [x, run.datumY - 5.6 * k], LAYER.supportName, k, lo, hi);
    notes[`support-at-${n}`] = caption(x.toFixed(0), [x, run.datumY - 9.2 * k], LAYER.supportAt, k, lo, hi);
  });
  if (first) {
    // An arrow pointing the way the wheel travels, with the word after it.
    const y = top + 3 * k;
    const [a, b] = [range.x0 + 4 * k, range.x0 + 18 * k];
    paths.travel = lineOn([a, y], [b, y], LAYER.travel);
    paths.travelUp = lineOn([b - 2 * k, y + 1.2 * k], [b, y], LAYER.travel);
    paths.travelDown = lineOn([b - 2 * k, y - 1.2 * k], [b, y], LAYER.travel);
    notes.travel = caption("travel", [range.x0 + 20 * k, y], LAYER.travelWord, k, range.x0 + 20 * k);
  }
  // The paper the strip takes: room above for the station labels and below for the supports'.
  notes.frame = Object.assign(
    new makerjs.models.Rectangle(range.x1 - range.x0 + 2 * SIDE * k, top - run.datumY + (ABOVE + BELOW) * k),
    {
      origin: [range.x0 - SIDE * k, run.datumY - BELOW * k] as Pt,
      layer: LAYER.frame,
    },
  );

  const whole: makerjs.IModel = {
    units: makerjs.unitType.Millimeter,
    models: { plan: model, notes: { models: notes, paths } },
  };
  const onPaper = makerjs.model.scale(whole, 1 / k);
  const svg = makerjs.exporter.toSVG(onPaper, {
    units: makerjs.unitType.Millimeter,
    scalingStroke: true,
    fontSize: `${FONT}px`,
    layerOptions: LAYER_OPTIONS,
    svgAttrs: {
      role: "img",
      "aria-label": label,
      style: "max-width:100%;height:auto;font-family:var(--font-plex-mono),monospace",
    },
  });
  // makerjs names each layer's group by an id; a page shows several strips, and ids must be unique
  // in a page (HTML, "The id attribute"), so the layer names become data attributes.
  return svg.replace(/ id="([^"]*)"/g, ' data-layer="$1"');
}
