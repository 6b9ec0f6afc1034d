// From a solved design to cut-ready parts: the run (run-length.ts), the track segments with their
// joints, supports and labels (track-parts.ts), the wheels (wheel-parts.ts), the check that each
// part fits the sheet and the bed (fit.ts), and the warnings for corners the cutter rounds
// (inside-corners.ts). Pure: the font comes in parsed. nestItemsFor gives the nester each part's
// kerf-offset outline and its allowed rotations; the app runs nestOnSheets itself.
import type { NestItem } from "@/lib/nest/types";
import { specHash, type SolveResult } from "@/lib/track";
import { CutError } from "./errors";
import { checkPartsFit } from "./fit";
import { trackSurfaceWarnings } from "./inside-corners";
import { kerfParts, type ToolPath } from "./kerf";
import type { GlyphTable } from "./labels/font";
import { allowedRotations } from "./rotations";
import { buildRun, hasTrack, type RunInfo } from "./run-length";
import { parseCutSettings, type CutSettings } from "./settings";
import { buildTrackParts, type TrackParts } from "./track-parts";
import type { CutWarning, Part } from "./types";
import { buildWheelParts } from "./wheel-parts";

export type RunPlan = RunInfo & Omit<TrackParts, "parts" | "warnings">;

export interface CutPlanResult {
  parts: Part[];
  /** Null for the partner and twin modes, which have no track. */
  run: RunPlan | null;
  warnings: CutWarning[];
  /** The settings as used, every default filled in. */
  settings: CutSettings;
}

/**
 * Builds the parts for a solved design. `spec` is the design the result was solved from (checked
 * by its hash); `settings` is validated here. Without a font no labels are engraved (a "no-font"
 * warning says so). Throws CutError for bad settings, a run shorter than a period, bad cut
 * stations and parts that do not fit the sheet or the bed.
 */
export function buildCutParts(
  spec: unknown,
  result: SolveResult,
  settings: unknown,
  opts: { font?: GlyphTable } = {},
): CutPlanResult {
  const s = parseCutSettings(settings);
  if (spec !== undefined && spec !== null && specHash(spec) !== result.specHash)
    throw new CutError(
      "invalid-settings",
      "The solve result does not belong to this design spec (their hashes differ): solve the spec again.",
      "spec",
    );
  const warnings: CutWarning[] = [];
  if (!opts.font)
    warnings.push({ code: "no-font", message: "No engraving font was given, so the parts carry no labels." });
  const parts: Part[] = [];
  let run: RunPlan | null = null;
  let scale = 1;
  if (hasTrack(result)) {
    const built = buildRun(result, s);
    warnings.push(...built.warnings);
    scale = built.run.scale;
    const track = buildTrackParts(built.run, s, opts.font);
    warnings.push(...track.warnings);
    warnings.push(...trackSurfaceWarnings(built.run.profile, s, scale === 1 ? result : undefined));
    parts.push(...track.parts);
    run = {
      ...built.run,
      cuts: track.cuts,
      segments: track.segments,
      supports: track.supports,
      baseY: track.baseY,
      centreY: track.centreY,
    };
  }
  const wheels = buildWheelParts(result, s, scale, opts.font);
  parts.push(...wheels.parts);
  warnings.push(...wheels.warnings);
  checkPartsFit(parts, s);
  return { parts, run, warnings, settings: s };
}

/**
 * What the nester packs: each part's tool-centre outline (the nominal outline grown by half the
 * kerf, so parts spaced `spacing` apart keep that much stock between their cuts) and the rotations
 * its grain allows. The nester itself packs containing outlines of fewer vertices
 * (lib/nest/containing-outline.ts). Pass the tool paths if they are already computed.
 */
export async function nestItemsFor(
  parts: Part[],
  settings: CutSettings,
  toolPaths?: Map<string, ToolPath>,
): Promise<NestItem[]> {
  const paths = toolPaths ?? (await kerfParts(parts, settings)).paths;
  const items: NestItem[] = [];
  for (const p of parts)
    items.push({
      id: p.id,
      polygon: paths.get(p.id)!.outer,
      // The tool path's holes (each shrunk by half the kerf): smaller parts may be nested in them.
      holes: paths.get(p.id)!.holes,
      quantity: p.quantity,
      rotations: allowedRotations(p, settings),
    });
  return items;
}
