// Cut-ready parts and export files from a solved design (see README.md for the module map). Pure
// TypeScript like lib/track: Node-only pieces are imported by path — labels/font-file.ts (reads the
// font), export/png.ts (sharp) and export/zip.ts (archiver).
export type { Part, PartKind, Region, DrillHole, CutWarning, CutWarningCode } from "./types";
export { CutError, isCutError, type CutErrorCode } from "./errors";
export {
  cutSettingsSchema,
  parseCutSettings,
  DEFAULT_CUT_SETTINGS,
  insideRadius,
  type CutSettings,
  type CutSettingsInput,
} from "./settings";
export { buildRun, hasTrack, type RunInfo } from "./run-length";
export { buildCutParts, nestItemsFor, type CutPlanResult, type RunPlan } from "./plan";
export { kerfRegion, kerfParts, type ToolPath } from "./kerf";
export { concaveCorners, jointNeedsRelief } from "./inside-corners";
export { allowedRotations } from "./rotations";
export { shelfLayout } from "./shelf-layout";
export { parseSvgFont, type GlyphTable } from "./labels/font";
export {
  buildDrawing,
  partsRow,
  sheetParts,
  stackedSheets,
  LAYERS,
  type Drawing,
  type LayerName,
  type PlacedPart,
} from "./export/drawing";
export { drawingToDxf } from "./export/dxf";
export { drawingToSvg } from "./export/svg";
export { bomCsv, csvField } from "./export/bom-csv";
export { jobReadme } from "./export/readme";
export { jobTextFiles, revisionBaseName, slug, type JobInput, type JobFile } from "./export/job";
