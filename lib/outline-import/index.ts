// Outline import: a wheel outline (a closed curve) or one period of track profile (an open
// polyline) from an uploaded SVG, ASCII DXF or CSV file, as the points the engine takes
// (lib/track/spec.ts: wheel { kind: "outline", points, axle }, track { kind: "profile", points }).
// Pure TypeScript with no DOM, Node or network use, so the studio's Web Worker and the server run
// the same code. importOutline never throws and never fetches, runs or decompresses anything; every
// refusal is { ok: false, error } with a sentence naming the line, element or offset.
//
// Conventions of the result:
// - y is up (the engine's frame); SVG's y-down coordinates are flipped, and the notes say so.
// - wheel: closed: true, the closing point is NOT repeated (points[0] is not appended again; the
//   engine drops such a copy anyway), counter-clockwise, simple, 3 … 20 000 points.
// - track: closed: false, x strictly increasing, last y = first y, 2 … 20 000 points; the notes give
//   the period (last x − first x).
// - units: "mm" or "in" when the file states a physical unit (other units are converted: cm, m → mm;
//   ft, pt, pc → in), else "unknown" (numbers as they stand). opts.units converts known units
//   (mm ↔ in) or labels unknown ones. The tolerance is in the file's units (after that cm → mm style
//   conversion, before any opts.units conversion).

import { fail, ImportFailure, type Pt, type ReadResult, type Units, PointBudget } from "./common";
import { readCsv } from "./csv";
import { readDxf } from "./dxf";
import { finish } from "./finish";
import { centroid, starShapedAbout, type Bounds, type StarResult } from "./geometry";
import { detectKind, readText, type FileInput } from "./sniff";
import { readSvg } from "./svg";

export { MAX_OUTPUT_POINTS } from "./common";
export type { Bounds, FileInput, StarResult };

export interface ImportOptions {
  want: "wheel" | "track";
  /** Chord tolerance for flattening curves, in the file's units; also the gap within which ends join. */
  tolerance: number;
  units?: "mm" | "in";
}

export type ImportResult =
  | {
      ok: true;
      points: [number, number][];
      closed: boolean;
      units: Units;
      source: "svg" | "dxf" | "csv";
      notes: string[];
      bounds: Bounds;
    }
  | { ok: false; error: string };

function checkOptions(opts: unknown): ImportOptions {
  if (typeof opts !== "object" || opts === null) fail("Import options are missing.");
  const o = opts as Record<string, unknown>;
  if (o.want !== "wheel" && o.want !== "track") fail('Say what the file holds: want must be "wheel" or "track".');
  if (typeof o.tolerance !== "number" || !Number.isFinite(o.tolerance) || !(o.tolerance > 0))
    fail("The tolerance must be a positive number.");
  if (o.units !== undefined && o.units !== "mm" && o.units !== "in") fail('units must be "mm" or "in" when given.');
  return { want: o.want, tolerance: o.tolerance, units: o.units as "mm" | "in" | undefined };
}

export function importOutline(file: FileInput, opts: ImportOptions): ImportResult {
  try {
    const o = checkOptions(opts);
    if (typeof file !== "object" || file === null) fail("No file was given.");
    const text = readText(file);
    const kind = detectKind(file.name, file.type, text);
    const budget = new PointBudget();
    const read: ReadResult =
      kind === "svg"
        ? readSvg(text, o.tolerance, budget)
        : kind === "dxf"
          ? readDxf(text, o.tolerance, budget)
          : readCsv(text);
    const f = finish(read, o);
    return {
      ok: true,
      points: f.points,
      closed: f.closed,
      units: f.units,
      source: kind,
      notes: f.notes,
      bounds: f.bounds,
    };
  } catch (e) {
    if (e instanceof ImportFailure) return { ok: false, error: e.message };
    const why = e instanceof Error ? e.message : String(e);
    return { ok: false, error: `The file could not be read (${why}).` };
  }
}

/** Default axle: the area centroid of the outline (the vertex mean if it encloses no area). */
export function placeAxleDefault(points: ReadonlyArray<readonly [number, number]>): { x: number; y: number } {
  return centroid(points.map(([x, y]) => [x, y] as Pt));
}

/**
 * Whether every ray from the axle crosses the outline exactly once (the engine refuses an outline
 * that is not). On failure: the outline point where it first goes wrong and the ray's direction,
 * in radians counter-clockwise from straight down (the engine's body angle), in [0, 2π).
 */
export function isStarShapedAbout(
  points: ReadonlyArray<readonly [number, number]>,
  axle: { x: number; y: number },
): StarResult {
  return starShapedAbout(points, axle);
}
