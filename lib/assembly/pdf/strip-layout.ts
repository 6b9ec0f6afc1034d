// One strip of the layout plan, laid out before anything is drawn (so the scale can be chosen by
// the height the strips take and whether their labels find room): which stations it shows, their
// labels and the rows those take, and the strip's height. plan-strip.ts draws it.
import type { AssemblySheet, SheetRun } from "../sheet";
import type { StripRange } from "./drawing-scale";
import { lengthParts } from "./figures";
import { FONT } from "./fonts";
import { placeLabels, rowCount, type Placed, type RowItem } from "./label-rows";
import { COLOUR, SIZE } from "./look";
import { topRange } from "./run-geometry";
import { widthOf, type TextStyle } from "./text";

export const NAME: TextStyle = { font: FONT.sansSemibold, size: SIZE.label, color: COLOUR.ink };
const FIGURE: TextStyle = { font: FONT.mono, size: SIZE.plan, color: COLOUR.ink };
/** Line pitch of a label, pt. */
export const LINE = 7.2;
/** The strip's title line; the gap between the lowest label row and the track; the support symbol's height. */
export const HEADER = 13;
export const LEADER = 6;
export const SYMBOL = 6;
const AFTER = 16;
const MAX_ROWS = 3;
const GAP = 5;

/** A station's label: a RowItem (x on paper, widths, where it may sit) with its run x and lines. */
export interface Label extends RowItem {
  at: number;
  lines: Array<{ text: string; style: TextStyle }>;
}

export type PlacedLabel = Label & Placed;

export interface StripPlace {
  index: number;
  count: number;
  range: StripRange;
  /** Points on paper per mm of run. */
  k: number;
  /** Paper x of run x = range.x0. */
  origin: number;
  bounds: { left: number; right: number };
}

export interface StripLayout extends StripPlace {
  above: PlacedLabel[];
  below: PlacedLabel[];
  aboveRows: number;
  belowRows: number;
  /** Points a label row takes (two or three lines). */
  row: number;
  /** Every label found a place of its own. */
  legible: boolean;
  /** Height of the track's highest top above the datum, on paper. */
  trackPt: number;
  height: number;
}

const AROUND = ["centre", "end", "start"] as const;

export const within = (x: number, r: StripRange) => x >= r.x0 - 1e-6 && x <= r.x1 + 1e-6;

export function layoutStrip(
  doc: PDFKit.PDFDocument,
  sheet: AssemblySheet,
  run: SheetRun,
  place: StripPlace,
): StripLayout {
  const { range, k, origin, bounds } = place;
  const label = (at: number, name: string, anchors: Label["anchors"]): Label => {
    // Dual dimensions stacked, the inches in brackets under the millimetres: narrow labels crowd less.
    const p = lengthParts(at);
    const lines = [
      { text: name, style: NAME },
      { text: p.mm, style: FIGURE },
      ...(sheet.inches ? [{ text: `(${p.inches})`, style: FIGURE }] : []),
    ];
    const widths = lines.map((l) => widthOf(doc, l.text, l.style));
    // A label that may run either way keeps its name centred on the station (see plan-strip.ts).
    const head = anchors.length > 1 ? widths[0] : undefined;
    return {
      at,
      x: origin + (at - range.x0) * k,
      lines,
      anchors,
      head,
      width: Math.max(...(head === undefined ? widths : widths.slice(1))),
    };
  };

  const above: Label[] = [];
  if (range.x0 === 0) above.push(label(0, "DATUM  x = 0", ["start"]));
  for (const j of sheet.joints)
    if (within(j.station, range) && j.station > 0 && j.station < run.length)
      above.push(label(j.station, `${j.between[0]}/${j.between[1]}`, AROUND));
  if (Math.abs(range.x1 - run.length) < 1e-6) above.push(label(run.length, "END OF RUN", ["end"]));
  above.sort((a, b) => a.x - b.x);
  const below = run.supports.flatMap((s, i) => (within(s, range) ? [label(s, `S${i + 1}`, AROUND)] : []));

  const abovePlaced = placeLabels(above, bounds, GAP, MAX_ROWS);
  const belowPlaced = placeLabels(below, bounds, GAP, MAX_ROWS);
  const trackPt = topRange(run).highest * k;
  const aboveRows = Math.max(1, rowCount(abovePlaced));
  const belowRows = Math.max(1, rowCount(belowPlaced));
  const row = (sheet.inches ? 3 : 2) * LINE + 3;
  return {
    ...place,
    above: above.map((l, i) => ({ ...l, ...abovePlaced[i] })),
    below: below.map((l, i) => ({ ...l, ...belowPlaced[i] })),
    aboveRows,
    belowRows,
    row,
    legible: ![...abovePlaced, ...belowPlaced].some((p) => p.forced),
    trackPt,
    height: HEADER + aboveRows * row + LEADER + trackPt + SYMBOL + 3 + belowRows * row + AFTER,
  };
}
