// The plan model (../plan-drawing.ts) on a PDF page: makerjs gives each layer's path data, scaled
// to the page (k points per run mm) and placed so run x0 sits at paper x `left` and the datum at
// paper y `datumPt`; each layer is drawn with its own pen. The labels stay with plan-strip.ts,
// set in the shipped faces.
import makerjs from "makerjs";
import { PLAN_LAYER } from "../plan-drawing";
import { COLOUR } from "./look";

type Layer = (typeof PLAN_LAYER)[keyof typeof PLAN_LAYER];

/** The plan's path data by layer, on the page. */
export function planPathData(
  model: makerjs.IModel,
  k: number,
  x0: number,
  left: number,
  datumY: number,
  datumPt: number,
): Partial<Record<Layer, string>> {
  const onPage = makerjs.model.scale(makerjs.cloneObject(model), k);
  return makerjs.exporter.toSVGPathData(onPage, {
    byLayers: true,
    origin: [left - x0 * k, datumPt + datumY * k],
  }) as Record<string, string>;
}

/** One layer's pen: a stroked line, a filled shape, or both. */
function pen(
  doc: PDFKit.PDFDocument,
  d: string | undefined,
  p: { width?: number; stroke?: string; fill?: string; dash?: [number, number]; pattern?: string },
): void {
  if (!d) return;
  doc.save();
  if (p.width !== undefined) doc.lineWidth(p.width);
  if (p.dash) doc.dash(p.dash[0], { space: p.dash[1] });
  // A chain line's two dashes need the PDF "d" operator itself (ISO 32000-1 §8.4.3.6).
  if (p.pattern) doc.addContent(`${p.pattern} 0 d`);
  doc.lineJoin("round").path(d);
  if (p.fill && p.stroke) doc.fillAndStroke(p.fill, p.stroke);
  else if (p.fill) doc.fill(p.fill);
  else doc.stroke(p.stroke);
  doc.restore();
}

/** The track parts and the lines through them (under the parts' ids). */
export function drawParts(doc: PDFKit.PDFDocument, d: Partial<Record<Layer, string>>, bandPt: number): void {
  pen(doc, d[PLAN_LAYER.part], { width: 0.8, fill: COLOUR.paperDeep, stroke: COLOUR.ink });
  // The top of the base band, dashed, where the band is deep enough to show.
  if (bandPt > 2) pen(doc, d[PLAN_LAYER.bandTop], { width: 0.4, stroke: COLOUR.inkSoft, dash: [2, 2] });
  // Joints: the cut through the part, heavy.
  pen(doc, d[PLAN_LAYER.joint], { width: 1.6, stroke: COLOUR.ink });
}

/** The breaks where the run goes on, the datum as a chain line (ISO 128-2, type 04), the supports. */
export function drawDatum(doc: PDFKit.PDFDocument, d: Partial<Record<Layer, string>>): void {
  // Where the run goes on in the next strip, the part's end is a dashed break, not an edge.
  pen(doc, d[PLAN_LAYER.runGoesOn], { width: 1.2, stroke: COLOUR.white });
  pen(doc, d[PLAN_LAYER.runGoesOn], { width: 0.6, stroke: COLOUR.inkSoft, dash: [1.5, 1.5] });
  pen(doc, d[PLAN_LAYER.datum], { width: 0.7, stroke: COLOUR.ink, pattern: "[9 2 1.5 2]" });
  pen(doc, d[PLAN_LAYER.support], { fill: COLOUR.ink });
}
