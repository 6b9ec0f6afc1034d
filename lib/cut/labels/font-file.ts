// Node only: reads the shipped single-stroke font (fonts/hershey-sans-1/HersheySans1.svg, see its
// NOTICE.md) and parses it once per process. Pure modules take the parsed GlyphTable instead.
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { parseSvgFont, type GlyphTable } from "./font";

export const HERSHEY_SANS_PATH = join(process.cwd(), "fonts", "hershey-sans-1", "HersheySans1.svg");

let cached: GlyphTable | undefined;

export function loadHersheyFont(path = HERSHEY_SANS_PATH): GlyphTable {
  if (path !== HERSHEY_SANS_PATH) return parseSvgFont(readFileSync(path, "utf8"));
  cached ??= parseSvgFont(readFileSync(path, "utf8"));
  return cached;
}
