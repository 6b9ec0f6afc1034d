// The figures the cut plan page shows of a nest, from the parts the worker built: sizes, the share
// of stock used, and each sheet's parts placed for drawing.
import { bounds } from "@/lib/geometry/box";
import { placeRing } from "@/lib/geometry/place";
import { ringArea } from "@/lib/geometry/ring";
import type { SheetNestResult } from "@/lib/nest/types";
import type { JointChoiceReport, PartsPreview } from "./cut-worker";
import type { SheetViewPart } from "./sheet-view";

export const pct = (v: number) => `${(v * 100).toFixed(1)} %`;

export function bbox(ring: [number, number][]) {
  const b = bounds(ring);
  return { length: b.maxX - b.minX, width: b.maxY - b.minY };
}

/**
 * Stock used: the parts' own (nominal) area over the sheets' area — the figure the server saves,
 * so the page and the saved plan never disagree.
 */
export function usedShare(preview: PartsPreview, placements: { id: string }[], sheetArea: number): number {
  const area = new Map(
    preview.plan.parts.map((p) => [
      p.id,
      ringArea(p.region.outer) - p.region.holes.reduce((a, h) => a + ringArea(h), 0),
    ]),
  );
  return placements.reduce((sum, pl) => sum + (area.get(pl.id) ?? 0), 0) / sheetArea;
}

export function sheetParts(
  preview: PartsPreview,
  placements: SheetNestResult["sheets"][number]["placements"],
): SheetViewPart[] {
  const byId = new Map(preview.plan.parts.map((p) => [p.id, p]));
  return placements.flatMap((pl) => {
    const part = byId.get(pl.id);
    if (!part) return [];
    return [
      {
        key: `${pl.id}-${pl.copy}`,
        label: pl.id,
        kind: part.kind,
        outer: placeRing(part.region.outer, pl.rotation, pl.x, pl.y),
        holes: part.region.holes.map((h) => placeRing(h, pl.rotation, pl.x, pl.y)),
      },
    ];
  });
}

/** A finished nest's sheets in use, its sheet area and the stock used overall. */
export function nestFigures(nest: { nest: SheetNestResult; preview: PartsPreview }) {
  const sheet = nest.preview.plan.settings.sheet;
  const sheetArea = sheet.length * sheet.width;
  const usedSheets = nest.nest.sheets.filter((sh) => sh.placements.length > 0);
  const overall = usedShare(
    nest.preview,
    usedSheets.flatMap((sh) => sh.placements),
    sheetArea * Math.max(1, usedSheets.length),
  );
  return { sheetArea, usedSheets, overall };
}

/** How the search ended, in the shop's words. */
export function nestEnding(nest: SheetNestResult): string {
  const bound = nest.areaBound;
  switch (nest.ended) {
    case "proved-best":
      return `the best possible: the parts' area needs at least ${bound} sheet(s)`;
    case "cancelled":
      return "stopped early: the best layout found so far";
    case "time":
    case "iterations":
      return bound
        ? `the search time ran out; the parts' area needs at least ${bound} sheet(s)`
        : "the search time ran out";
    default:
      return nest.cancelled ? "stopped early: the best layout found so far" : "";
  }
}

const sheetsWord = (n: number) => `${n} ${n === 1 ? "sheet" : "sheets"}`;
const stations = (cuts: number[]) => cuts.map((c) => String(Number(c.toFixed(1)))).join(", ");

/** What the choice of joints found, in one plain sentence (two when it points to the cut stations field). */
export function jointSentence(j: JointChoiceReport): string {
  const choices = (n: number) => `${n} other ${n === 1 ? "choice" : "choices"}`;
  const looked =
    j.candidates === 0
      ? " (no other choice keeps to the joint rules)"
      : j.ended === "searched"
        ? ` (${choices(j.candidates)} looked at, ${j.tried} nested)`
        : ` (stopped early, after nesting ${j.tried} of ${choices(j.candidates)})`;
  if (!j.changed) {
    const usual = j.defaultCuts.length
      ? `the usual ${j.defaultCuts.length === 1 ? "joint" : "joints"} at ${stations(j.defaultCuts)} mm`
      : "the run in one piece";
    if (j.tried === 0 && j.candidates > 0 && j.ended !== "searched")
      return j.ended === "cancelled"
        ? `The choice of joints was stopped before any other was nested: ${usual}, ${sheetsWord(j.defaultSheets)}.`
        : `The search time ran out before any other joints were nested: ${usual}, ${sheetsWord(j.defaultSheets)}. Give the search more time to choose them.`;
    return `No other joints ${j.ended === "searched" ? "nest" : "nested so far"} better than ${usual}: ${sheetsWord(j.defaultSheets)}${looked}.`;
  }
  const at = `${j.cuts.length === 1 ? "Joint" : "Joints"} at ${stations(j.cuts)} mm`;
  const gain =
    j.unplaced < j.defaultUnplaced
      ? `${j.unplaced === 0 ? "every part placed" : `${j.unplaced} parts left out`}, where the usual joints leave ${j.defaultUnplaced} out (${sheetsWord(j.sheets)})`
      : j.sheetsSaved > 0
        ? `${sheetsWord(j.sheets)} instead of ${j.defaultSheets} (${sheetsWord(j.sheetsSaved)} saved)`
        : j.segments < j.defaultSegments
          ? `${sheetsWord(j.sheets)} as with the usual joints, in ${j.segments} segments instead of ${j.defaultSegments}`
          : `${sheetsWord(j.sheets)} as with the usual joints, with more of the last sheet left whole (${pct(j.lastSheetUse)} used instead of ${pct(j.defaultLastSheetUse)})`;
  return `${at}: ${gain}${j.ended === "searched" ? "" : looked}. ${j.cuts.length === 1 ? "It is" : "They are"} in the cut stations field now; empty it to choose again.`;
}
