// Reads a 2D irregular strip-packing instance in either JSON key style used for the ESICUP
// benchmarks (the ESICUP/OR-Datasets PascalCase conversion and the snake_case one of
// Gardeyn, Vanden Berghe & Wauters 2025): see docs/fabrication.md §1.3.
import type { Pt } from "@/lib/geometry/point";
import { bounds, boxHeight, boxWidth } from "@/lib/geometry/box";
import { normaliseRing, signedArea } from "@/lib/geometry/ring";
import type { NestInstance, NestItem } from "./types";

/** More copies than this is refused: a nest of that size is not what this tool is for. */
export const MAX_TOTAL_COPIES = 5000;
export const MAX_VERTICES_PER_ITEM = 10_000;

type Obj = Record<string, unknown>;

const isObj = (v: unknown): v is Obj => typeof v === "object" && v !== null && !Array.isArray(v);

/** The value under the first of the given keys that is present. */
function pick(o: Obj, ...keys: string[]): unknown {
  for (const k of keys) if (k in o) return o[k];
  return undefined;
}

function fail(message: string): never {
  throw new Error(`Invalid nesting instance: ${message}`);
}

function readPolygon(raw: unknown, where: string): Pt[] {
  if (!isObj(raw)) fail(`${where} has no shape object ("Shape" or "shape")`);
  const type = pick(raw, "Type", "type");
  if (type !== undefined && type !== "SimplePolygon" && type !== "simple_polygon")
    fail(`${where}: shape type ${JSON.stringify(type)} is not supported (only a simple polygon)`);
  const data = pick(raw, "Data", "data");
  if (!Array.isArray(data)) fail(`${where}: the shape has no point list ("Data" or "data")`);
  if (data.length > MAX_VERTICES_PER_ITEM + 1) fail(`${where}: more than ${MAX_VERTICES_PER_ITEM} points`);
  const pts = data.map((p, i): Pt => {
    if (
      !Array.isArray(p) ||
      p.length < 2 ||
      typeof p[0] !== "number" ||
      typeof p[1] !== "number" ||
      !Number.isFinite(p[0]) ||
      !Number.isFinite(p[1])
    )
      fail(`${where}: point ${i} is not a pair of finite numbers`);
    return [p[0], p[1]];
  });
  const ring = normaliseRing(pts);
  if (ring.length < 3) fail(`${where}: a polygon needs at least 3 distinct points, it has ${ring.length}`);
  const box = bounds(ring);
  const size = Math.max(boxWidth(box), boxHeight(box));
  if (!(Math.abs(signedArea(ring)) > 1e-12 * size * size)) fail(`${where}: the polygon has zero area`);
  return ring;
}

function readRotations(raw: unknown, where: string): number[] {
  if (raw === undefined) return [0];
  if (!Array.isArray(raw) || raw.length === 0)
    fail(`${where}: allowed orientations must be a non-empty list of degrees`);
  const out: number[] = [];
  for (const r of raw) {
    if (typeof r !== "number" || !Number.isFinite(r))
      fail(`${where}: orientation ${JSON.stringify(r)} is not a number of degrees`);
    if (!out.includes(r)) out.push(r);
  }
  return out;
}

export function loadInstance(json: unknown): NestInstance {
  if (!isObj(json)) fail("expected a JSON object");
  const rawItems = pick(json, "Items", "items");
  if (!Array.isArray(rawItems) || rawItems.length === 0) fail('no items ("Items" or "items" must be a non-empty list)');
  const strip = pick(json, "Strip", "strip");
  const height = isObj(strip) ? pick(strip, "Height", "height") : pick(json, "strip_height", "StripHeight");
  if (typeof height !== "number" || !Number.isFinite(height) || height <= 0)
    fail('the strip height ("Strip.Height" or "strip_height") must be a positive number');
  const nameRaw = pick(json, "Name", "name");
  const name = typeof nameRaw === "string" && nameRaw.trim() ? nameRaw : "instance";

  let total = 0;
  const ids = new Set<string>();
  const items: NestItem[] = rawItems.map((raw, index) => {
    const where = `item ${index}`;
    if (!isObj(raw)) fail(`${where} is not an object`);
    const idRaw = pick(raw, "Id", "id", "ID");
    const id = typeof idRaw === "string" || typeof idRaw === "number" ? String(idRaw) : String(index);
    if (ids.has(id)) fail(`${where}: id ${JSON.stringify(id)} is used twice`);
    ids.add(id);
    const demand = pick(raw, "Demand", "demand");
    if (typeof demand !== "number" || !Number.isInteger(demand) || demand < 1)
      fail(`${where}: demand must be a whole number of at least 1`);
    total += demand;
    if (total > MAX_TOTAL_COPIES) fail(`more than ${MAX_TOTAL_COPIES} copies in total`);
    return {
      id,
      quantity: demand,
      rotations: readRotations(pick(raw, "AllowedOrientations", "allowed_orientations"), where),
      polygon: readPolygon(pick(raw, "Shape", "shape"), where),
    };
  });
  return { name, items, height };
}
