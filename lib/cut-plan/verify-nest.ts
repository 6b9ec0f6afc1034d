// The server's own check of a nest made in the browser, before it is stored as a cut plan: every
// copy of every part placed exactly once, in an allowed rotation, inside the sheet's margin, and at
// least the part spacing clear of every other part on its sheet. It rebuilds each placed outline
// from the part and the placement and tests it with Clipper (Vatti polygon clipping), so it trusts
// nothing the nester reported about itself.
import { clipper, loadClipper, toPath, type ClipperLib } from "@/lib/geometry/clipper";
import { bounds, type Box } from "@/lib/geometry/box";
import { placeRing } from "@/lib/geometry/place";
import { orient, type Ring } from "@/lib/geometry/ring";
import type { NestItem, SheetNestResult } from "@/lib/nest/types";

/** Integer steps per model unit for the check (1 µm when the unit is the millimetre). */
const SCALE = 1000;
/** Slack for rounding, in model units: far below any kerf, far above floating-point noise. */
const TOLERANCE = 0.005;

export interface NestCheckInput {
  items: NestItem[];
  nest: Pick<SheetNestResult, "sheets" | "unplaced">;
  sheet: { width: number; height: number };
  margin: number;
  spacing: number;
}

function sameAngle(a: number, b: number): boolean {
  const d = (((a - b) % 360) + 360) % 360;
  return d < 1e-6 || 360 - d < 1e-6;
}

interface Placed {
  outer: Ring;
  /** Holes through the part, clockwise: another part may sit inside one. */
  holes: Ring[];
}

/** The part as Clipper paths, outer counter-clockwise and holes clockwise (NonZero: holes are empty). */
const pathsOf = (r: Placed) => [
  toPath(orient(r.outer, true), SCALE),
  ...r.holes.map((h) => toPath(orient(h, false), SCALE)),
];

function overlapArea(lib: ClipperLib, a: Placed, b: Placed, grow: number): number {
  const inflate = (r: Placed) =>
    grow > 0
      ? // Round joins: the grown part is every point within `grow` of it (a Minkowski sum with a disc;
        // its holes shrink by as much), so two grown parts meet exactly when the parts are closer than
        // twice `grow`.
        (lib.offsetToPaths({
          delta: grow * SCALE,
          arcTolerance: 0.001 * SCALE,
          offsetInputs: [
            { data: pathsOf(r), joinType: clipper.JoinType.Round, endType: clipper.EndType.ClosedPolygon },
          ],
        }) ?? [])
      : pathsOf(r);
  const out = lib.clipToPaths({
    clipType: clipper.ClipType.Intersection,
    subjectInputs: inflate(a).map((data) => ({ data, closed: true })),
    clipInputs: inflate(b).map((data) => ({ data })),
    subjectFillType: clipper.PolyFillType.NonZero,
    clipFillType: clipper.PolyFillType.NonZero,
  });
  return (out ?? []).reduce((sum, p) => sum + lib.area(p), 0) / (SCALE * SCALE);
}

/** Plain-English problems with the nest; an empty list means it holds. */
export async function checkNest(input: NestCheckInput): Promise<string[]> {
  const lib = await loadClipper();
  const problems: string[] = [];
  const byId = new Map(input.items.map((i) => [i.id, i]));
  const seen = new Set<string>();
  for (const u of input.nest.unplaced) problems.push(`${u.id} (copy ${u.copy + 1}) is not placed: ${u.reason}`);
  const { width, height } = input.sheet;
  const m = input.margin;
  for (const sheet of input.nest.sheets) {
    const placed: { label: string; ring: Placed; box: Box }[] = [];
    for (const p of sheet.placements) {
      const item = byId.get(p.id);
      const label = `${p.id} (copy ${p.copy + 1})`;
      if (!item) {
        problems.push(`The nest places a part ${p.id} that is not in the plan.`);
        continue;
      }
      const key = `${p.id}#${p.copy}`;
      if (!Number.isInteger(p.copy) || p.copy < 0 || p.copy >= item.quantity)
        problems.push(`${label} is more copies than the plan needs (${item.quantity}).`);
      else if (seen.has(key)) problems.push(`${label} is placed twice.`);
      seen.add(key);
      if (!item.rotations.some((r) => sameAngle(r, p.rotation)))
        problems.push(`${label} is turned ${p.rotation}°, which its grain or the settings do not allow.`);
      if (![p.x, p.y, p.rotation].every(Number.isFinite)) {
        problems.push(`${label} has no proper position.`);
        continue;
      }
      const ring: Placed = {
        outer: placeRing(item.polygon, p.rotation, p.x, p.y),
        holes: (item.holes ?? []).map((h) => placeRing(h, p.rotation, p.x, p.y)),
      };
      const box = bounds(ring.outer);
      if (
        box.minX < m - TOLERANCE ||
        box.minY < m - TOLERANCE ||
        box.maxX > width - m + TOLERANCE ||
        box.maxY > height - m + TOLERANCE
      ) {
        problems.push(`${label} on sheet ${sheet.index + 1} is not inside the sheet's ${m} margin.`);
      }
      placed.push({ label, ring, box });
    }
    const grow = Math.max(0, input.spacing / 2 - TOLERANCE);
    for (let i = 0; i < placed.length; i++) {
      for (let j = i + 1; j < placed.length; j++) {
        const a = placed[i],
          b = placed[j];
        const reach = input.spacing;
        if (
          a.box.maxX + reach < b.box.minX ||
          b.box.maxX + reach < a.box.minX ||
          a.box.maxY + reach < b.box.minY ||
          b.box.maxY + reach < a.box.minY
        )
          continue;
        if (overlapArea(lib, a.ring, b.ring, grow) > TOLERANCE * TOLERANCE) {
          problems.push(
            `${a.label} and ${b.label} on sheet ${sheet.index + 1} are closer than the ${input.spacing} part spacing.`,
          );
        }
      }
    }
  }
  for (const item of input.items) {
    for (let copy = 0; copy < item.quantity; copy++) {
      if (!seen.has(`${item.id}#${copy}`) && !input.nest.unplaced.some((u) => u.id === item.id && u.copy === copy)) {
        problems.push(`${item.id} (copy ${copy + 1}) is missing from the nest.`);
      }
    }
  }
  return problems;
}
