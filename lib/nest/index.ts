// The nesting engine's public entry: parts onto stock sheets (nestOnSheets) or onto a strip of
// fixed height, as short as possible (nestStrip), and a reader for the ESICUP benchmark JSON
// (loadInstance). Pure TypeScript on Clipper (lib/geometry/clipper): it runs the same in Node, in
// the Next.js server and in a browser Web Worker. lib/nest/README.md maps each module to its method.
//
// Conventions: x runs along the sheet's or strip's length, y across. A placed copy's outline is the
// item's polygon rotated by `rotation` degrees about the item's own origin, then translated by
// (x, y). Sheets: 0 ≤ x ≤ width, 0 ≤ y ≤ height, parts at least `margin` inside each edge and at
// least `spacing` apart. Strip: 0 ≤ y ≤ height, length measured from x = 0.
export type {
  NestItem,
  NestProgress,
  NestControl,
  Placement,
  SheetPlacement,
  SheetNestInput,
  SheetNestResult,
  StripNestInput,
  StripNestResult,
  NestInstance,
} from "./types";
export { nestOnSheets } from "./sheets";
export { nestStrip } from "./strip";
export { loadInstance, MAX_TOTAL_COPIES } from "./instance";
