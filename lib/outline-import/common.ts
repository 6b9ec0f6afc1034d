// Shared pieces of the outline importer: the limits, the internal failure that every reader throws
// (importOutline turns it into { ok: false, error }), the point budget that keeps flattening bounded,
// and small formatting helpers for messages.

export type Pt = [number, number];
export type Units = "mm" | "in" | "unknown";

/** The engine's limit on outline and profile points (lib/track/spec.ts MAX_POINTS). */
export const MAX_OUTPUT_POINTS = 20000;
/** Largest accepted file: 2 MB (2 × 1024 × 1024 bytes). */
export const MAX_FILE_BYTES = 2 * 1024 * 1024;
/** Points produced while reading (all shapes of a file together), before one shape is chosen. */
export const MAX_WORK_POINTS = 200000;
/** SVG path commands over all paths, SVG elements, DXF entities, CSV rows. */
export const MAX_PATH_COMMANDS = 100000;
export const MAX_SVG_ELEMENTS = 50000;
export const MAX_SVG_DEPTH = 256;
export const MAX_DXF_ENTITIES = 100000;

/** A refusal: importOutline turns it into { ok: false, error: message }. */
export class ImportFailure extends Error {
  constructor(message: string) {
    super(message);
    this.name = "ImportFailure";
  }
}

export function fail(message: string): never {
  throw new ImportFailure(message);
}

/** Six significant figures, no trailing noise: for numbers quoted in messages and notes. */
export function fmt(v: number): string {
  if (!Number.isFinite(v)) return String(v);
  const r = Number(v.toPrecision(6));
  return String(Object.is(r, -0) ? 0 : r);
}

export function fmtPt(p: Pt): string {
  return `(${fmt(p[0])}, ${fmt(p[1])})`;
}

/**
 * Counts the points made while reading a file, so a tiny tolerance or a huge file cannot make the
 * importer allocate without bound: a curve asks for its point count before making any.
 */
export class PointBudget {
  used = 0;
  constructor(readonly max: number = MAX_WORK_POINTS) {}
  take(n: number, where: () => string): void {
    if (!(n >= 0) || !Number.isFinite(n) || this.used + n > this.max)
      fail(
        `${where()} would need ${Number.isFinite(n) ? Math.ceil(n).toLocaleString("en-US") : "too many"} points at this tolerance, ` +
          `more than the ${this.max.toLocaleString("en-US")} the importer makes for one file; use a larger tolerance.`,
      );
    this.used += n;
  }
}

/** Line number (1-based) of a character offset. */
export function lineOf(text: string, offset: number): number {
  let line = 1;
  const end = Math.min(offset, text.length);
  for (let i = 0; i < end; i++) if (text.charCodeAt(i) === 10) line++;
  return line;
}

/** One piece of geometry read from a file, already in output coordinates (y up). */
export interface Subpath {
  points: Pt[];
  /** Drawn closed (SVG Z, a polygon, a DXF closed flag, a LINE/ARC chain that meets itself). */
  closed: boolean;
  /** A bare list of vertices (CSV): a wheel joins the last point to the first, a track does not. */
  vertexList?: boolean;
  arcs: number;
  curves: number;
  /** Where it came from, for messages: "<path id="a"> on line 3 subpath 1", "LWPOLYLINE on line 40". */
  label: string;
}

/** What a reader hands on: every candidate shape, the file's units and its notes. */
export interface ReadResult {
  subpaths: Subpath[];
  units: Units;
  notes: string[];
}
