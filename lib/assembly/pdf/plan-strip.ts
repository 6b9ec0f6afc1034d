// One strip of the layout plan drawn to scale in x and y: the track parts (profile over the base
// band) standing on the datum line, a heavy line at each joint with its station above, the
// segments' ids, the supports under the datum line with S1…Sn and their stations, and the
// direction of travel. The lines and shapes are the makerjs plan model (plan-paths.ts);
// strip-layout.ts decides where the labels go.
import { partsIn, planModel } from "../plan-drawing";
import type { SheetRun } from "../sheet";
import { FONT } from "./fonts";
import { COLOUR, SIZE } from "./look";
import { arrow } from "./marks";
import { drawDatum, drawParts, planPathData } from "./plan-paths";
import { topAt } from "./run-geometry";
import {
  HEADER,
  LEADER,
  LINE,
  NAME,
  SYMBOL,
  type PlacedLabel,
  type StripLayout,
  type StripPlace,
} from "./strip-layout";
import { STYLE, widthOf, write, writeCentred, writeRight, type TextStyle } from "./text";

const SEGMENT: TextStyle = { font: FONT.monoSemibold, size: SIZE.small, color: COLOUR.ink };
/** A part id's line height, pt: it goes in the base band when the band is this deep. */
const ID_HEIGHT = SIZE.small * 1.3;

export function drawStrip(doc: PDFKit.PDFDocument, run: SheetRun, s: StripLayout, top: number): void {
  const { range, k, origin } = s;
  const X = (x: number) => origin + (x - range.x0) * k;
  const datumPt = top + HEADER + s.aboveRows * s.row + LEADER + s.trackPt;
  const Y = (y: number) => datumPt - (y - run.datumY) * k;
  const xa = X(range.x0);

  // Header: which stretch this is, and the way the wheel goes.
  write(
    doc,
    `Strip ${s.index + 1} of ${s.count}   ·   x = ${range.x0.toFixed(1)} to ${range.x1.toFixed(1)} mm`,
    s.bounds.left,
    top,
    STYLE.bodyStrong,
  );
  writeRight(doc, "direction of travel", s.bounds.right - 46, top + 1, STYLE.small);
  arrow(doc, s.bounds.right - 40, s.bounds.right, top + 5.5);

  // The drawing itself is the plan model (../plan-drawing.ts), the same the screen shows.
  const model = planModel(run, range, {
    supportHalf: 3.6 / k,
    supportHeight: SYMBOL / k,
    datumOver: 12 / k,
    idHeight: ID_HEIGHT / k,
  });
  const paths = planPathData(model, k, range.x0, xa, run.datumY, datumPt);
  const bandTop = Math.min(...run.profile.map(([, y]) => y));
  const band = Y(run.baseY) - Y(bandTop);
  drawParts(doc, paths, band);
  segmentIds(doc, run, s, band, X, Y);
  drawDatum(doc, paths);
  writeRight(doc, "DATUM", xa - 14, datumPt - 3.5, { ...NAME, color: COLOUR.inkSoft });

  // Stations above: a leader from each label down to the track's top.
  for (const l of s.above) {
    const labelTop = datumPt - s.trackPt - LEADER - (l.row + 1) * s.row;
    const onTrack = Y(topAt(run.profile, l.at));
    leader(doc, l.x, labelTop + l.lines.length * LINE + 0.5, onTrack - 0.5);
    drawLabel(doc, l, labelTop, s.bounds);
  }

  // Supports below: the triangle under the datum (in the model), a leader to the label.
  for (const l of s.below) {
    const labelTop = datumPt + SYMBOL + 3 + l.row * s.row;
    if (l.row > 0) leader(doc, l.x, datumPt + SYMBOL, labelTop - 0.5);
    drawLabel(doc, l, labelTop, s.bounds);
  }
}

function leader(doc: PDFKit.PDFDocument, x: number, y0: number, y1: number): void {
  if (y1 - y0 > 0.5)
    doc.save().lineWidth(0.4).strokeColor(COLOUR.inkSoft).moveTo(x, y0).lineTo(x, y1).stroke().restore();
}

/**
 * The first line (the name: S3, T01/T02) centred on the station so it reads as the station's own;
 * the figures under it run the way the label was placed. A label that may only start or end at
 * its station (the datum, the end of the run) has every line aligned there.
 */
function drawLabel(doc: PDFKit.PDFDocument, l: PlacedLabel, top: number, b: StripPlace["bounds"]): void {
  const flagOnly = l.anchors.length === 1;
  l.lines.forEach((line, i) => {
    const y = top + i * LINE;
    if (i === 0 && !flagOnly) writeCentred(doc, line.text, l.x, y, line.style, b.left, b.right);
    else if (l.anchor === "end") writeRight(doc, line.text, Math.min(l.x + 1, b.right), y, line.style);
    else if (l.anchor === "start") write(doc, line.text, Math.max(l.x - 1, b.left), y, line.style);
    else writeCentred(doc, line.text, l.x, y, line.style, b.left, b.right);
  });
}

/** Segment ids centred in the part of each segment this strip shows: in the base band when it has room, else over the track. */
function segmentIds(
  doc: PDFKit.PDFDocument,
  run: SheetRun,
  s: StripLayout,
  band: number,
  X: (x: number) => number,
  Y: (y: number) => number,
): void {
  for (const { id, a, b, whole } of partsIn(run, s.range)) {
    // A sliver of a segment at a strip's end goes unnamed: the next strip names it in full.
    if (!whole && (b - a) * s.k < widthOf(doc, id, SEGMENT) + 6) continue;
    const cx = X((a + b) / 2);
    const h = ID_HEIGHT;
    const y = band >= h ? Y(run.baseY) - band / 2 - h / 2 : Y(topAt(run.profile, (a + b) / 2)) - h - 2;
    writeCentred(doc, id, cx, y, SEGMENT);
  }
}
