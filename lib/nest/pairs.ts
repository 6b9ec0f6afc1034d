// Pre-paired clusters (issue 13): a part and its 180° copy, interlocked, nested as one item. A track
// segment's top edge is a row of humps; a second copy turned half a turn can sit with its humps in
// the first one's troughs, so the pair's bounding box is smaller than two separate boxes.
//
// Method: the no-fit polygon (Bennell & Oliveira 2008, "The geometry of nesting problems: a
// tutorial", EJOR 184:397–415, §4). With A and B = A turned 180° both inflated by spacing/2,
// B's reference point on the boundary of NFP(A, B) = A ⊕ (−B) puts the two parts exactly `spacing`
// apart, touching. The pair's placement is a vertex of that boundary, chosen to minimise the area
// of the axis-aligned bounding box of A ∪ (B + t), measured in the pair's own frame (A at 0°; the
// nester may then turn the whole pair). Every vertex of the NFP's rings is evaluated, and so is
// every point of an edge where B's box edge passes A's: along an edge the box's width and height
// are piecewise linear with kinks only there, and between kinks their product has no interior
// minimum, so these candidates give the least area the polygonal boundary allows. The position
// where the two boxes coincide is tried too, when it is free.
//
// The pair's outline is ONE ring holding both parts: the morphological closing of A ∪ (B + t)
// (Clipper offset out, then in, by spacing/2 plus two integer steps, mitred joins), its holes
// filled. When the nester inflates it by spacing/2, both parts keep `spacing` from everything else.
// It is checked (Clipper) to contain both parts, and the parts to be `spacing` apart.
//
// Large outlines: the NFP costs m × n Clipper quads (lib/nest/README.md, Limits), and Clipper's
// union of them grows faster than that: for a 400-vertex catenary segment it took 45–90 s, for 150
// vertices about 2.5 s, for 100 under 1 s. Above `maxVertices` (default 150) the caller passes a
// simplified ring that contains the part (e.g. a containing outline); the NFP and the outline are
// then built from it, the box areas and the containment and spacing checks from the part itself.
import { bounds, boxHeight, boxWidth, type Box } from "@/lib/geometry/box";
import type { ClipperLib } from "@/lib/geometry/clipper";
import { clipper, fromPath, toPath } from "@/lib/geometry/clipper";
import { placeRing, placer, rotateRing, type Pose } from "@/lib/geometry/place";
import type { Pt } from "@/lib/geometry/point";
import { normaliseRing, ringArea, type Ring } from "@/lib/geometry/ring";
import { noFitPolygon } from "./minkowski";
import { offsetPaths, offsetPolygon, pathPerimeter, shiftPath } from "./paths";
import { scaleForExtent } from "./scale";
import type { NestItem, Placement } from "./types";

/** Extra integer steps on each inflated part, so rounding never lets two parts come nearer than `spacing`. */
const MARGIN_STEPS = 1;
/** Extra integer steps of the closing radius, so touching inflated parts overlap and join. */
const CLOSING_STEPS = 2;
/** Default share of the two separate boxes a pairing must save to be used (issue 13). */
export const PAIR_THRESHOLD = 0.1;
/** Default cap on the vertices of the ring the NFP is built from (see the module comment). */
export const PAIR_MAX_VERTICES = 150;

export interface PairingOptions {
  /**
   * A ring containing the part, with fewer vertices (e.g. from a containing outline), in the part's
   * own frame: the NFP and the pair outline are built from it. Checked to contain the part.
   */
  simplified?: Ring;
  /** Most vertices the NFP's ring may have (default PAIR_MAX_VERTICES); above it bestPairing throws. */
  maxVertices?: number;
}

export interface Pairing {
  /** Translation of the second member B = A turned 180° about A's origin. */
  offset: Pt;
  rotation: 180;
  /** The members' poses in the pair's frame: A as given, then B. */
  members: [Pose, Pose];
  /** Bounding box of A ∪ (B + offset), the parts themselves (not inflated). */
  box: Box;
  boxArea: number;
  /** 2 × the area of A's bounding box. */
  separateBoxArea: number;
  /** separateBoxArea − boxArea. */
  saved: number;
  /** saved / separateBoxArea. */
  savedShare: number;
  /** One counter-clockwise ring holding both members: the closing of A ∪ (B + offset). */
  outline: Ring;
  /** The parts' own area, 2 × area of A (utilisation counts this, not the outline's area). */
  partArea: number;
  /** Touching positions evaluated. */
  candidates: number;
}

const outers = (lib: ClipperLib, paths: clipper.Paths) => paths.filter((p) => lib.area(p) > 0);
const netArea = (lib: ClipperLib, paths: clipper.Paths) => paths.reduce((s, p) => s + lib.area(p), 0);

function clip(
  lib: ClipperLib,
  clipType: clipper.ClipType,
  subject: clipper.ReadonlyPath[],
  clipPaths: clipper.ReadonlyPath[] = [],
): clipper.Paths {
  return lib.clipToPaths({
    clipType,
    subjectInputs: subject.map((data) => ({ data, closed: true })),
    clipInputs: clipPaths.map((data) => ({ data })),
    subjectFillType: clipper.PolyFillType.NonZero,
    clipFillType: clipper.PolyFillType.NonZero,
  });
}

/** Area of the bounding box of boxes a and (b + t). */
function jointArea(a: Box, b: Box, tx: number, ty: number): number {
  const w = Math.max(a.maxX, b.maxX + tx) - Math.min(a.minX, b.minX + tx);
  const h = Math.max(a.maxY, b.maxY + ty) - Math.min(a.minY, b.minY + ty);
  return w * h;
}

/** Winding of the NFP at q (+1 in an outer ring, −1 in a hole); a point on a boundary counts as free. */
function insideNfp(lib: ClipperLib, nfp: clipper.Paths, q: clipper.IntPoint): boolean {
  let w = 0;
  for (const p of nfp) {
    const r = lib.pointInPolygon(q, p);
    if (r === clipper.PointInPolygonResult.OnBoundary) return false;
    if (r === clipper.PointInPolygonResult.Inside) w += lib.area(p) > 0 ? 1 : -1;
  }
  return w > 0;
}

/**
 * The 180° pairing of a part with itself that minimises the pair's bounding box, with the pair's
 * outline. `ring` in any orientation, in the part's own frame; `spacing` ≥ 0 is kept between the two
 * parts.
 */
export function bestPairing(lib: ClipperLib, ring: Ring, spacing: number, options: PairingOptions = {}): Pairing {
  if (!(spacing >= 0) || !Number.isFinite(spacing)) throw new Error("bestPairing: spacing must be 0 or more");
  const a = normaliseRing(ring);
  if (a.length < 3 || !(ringArea(a) > 0)) throw new Error("bestPairing: the ring needs 3 points and a positive area");
  const b = rotateRing(a, 180);
  const used = options.simplified ? normaliseRing(options.simplified) : a;
  const maxVertices = options.maxVertices ?? PAIR_MAX_VERTICES;
  if (used.length > maxVertices)
    throw new Error(
      `bestPairing: ${used.length} vertices is more than ${maxVertices}; pass a simplified ring that contains the part`,
    );
  const usedB = rotateRing(used, 180);

  // One scale for the run: NFP coordinates reach |A| + |B|, each inflated by spacing/2.
  const reach = used.concat(a).reduce((m, [x, y]) => Math.max(m, Math.abs(x), Math.abs(y)), 0) + spacing;
  const scale = scaleForExtent(2 * reach);
  const half = Math.ceil((spacing / 2) * scale) + MARGIN_STEPS;

  const pa = toPath(a, scale);
  const pb = toPath(b, scale);
  const pu = toPath(used, scale);
  const pub = toPath(usedB, scale);
  if (options.simplified) {
    const outside = netArea(lib, clip(lib, clipper.ClipType.Difference, [pa], [pu]));
    if (outside > 2 * pathPerimeter(pa)) throw new Error("bestPairing: the simplified ring does not contain the part");
  }

  // NFP of B (inflated) orbiting A (inflated): its boundary is where they touch.
  const nfp = noFitPolygon(lib, offsetPolygon(lib, pu, half), offsetPolygon(lib, pub, half));
  if (nfp.length === 0) throw new Error("bestPairing: empty no-fit polygon");

  const boxA = bounds(a);
  const boxB = bounds(b);
  let best: { t: Pt; area: number } | undefined;
  let candidates = 0;
  const consider = (tx: number, ty: number) => {
    candidates++;
    const area = jointArea(boxA, boxB, tx, ty);
    if (!best || area < best.area) best = { t: [tx, ty], area };
  };
  for (const path of nfp)
    for (let i = 0; i < path.length; i++) {
      const p = path[i];
      const q = path[(i + 1) % path.length];
      consider(p.x / scale, p.y / scale);
      // Points of the edge where B's box edge passes A's: the kinks of width and height along it.
      const kinks = [
        [p.x, q.x, (boxA.minX - boxB.minX) * scale],
        [p.x, q.x, (boxA.maxX - boxB.maxX) * scale],
        [p.y, q.y, (boxA.minY - boxB.minY) * scale],
        [p.y, q.y, (boxA.maxY - boxB.maxY) * scale],
      ];
      for (const [u0, u1, k] of kinks) {
        if (u0 === u1) continue;
        const s = (k - u0) / (u1 - u0);
        if (s > 0 && s < 1) consider((p.x + s * (q.x - p.x)) / scale, (p.y + s * (q.y - p.y)) / scale);
      }
    }
  // Both boxes coinciding: the least area of all, if B fits there without overlapping A.
  const t0: Pt = [boxA.minX - boxB.minX, boxA.minY - boxB.minY];
  if (!insideNfp(lib, nfp, { x: Math.round(t0[0] * scale), y: Math.round(t0[1] * scale) })) consider(t0[0], t0[1]);
  // On the integer grid, where the checks below are made.
  const tStep = { x: Math.round(best!.t[0] * scale), y: Math.round(best!.t[1] * scale) };
  const t: Pt = [tStep.x / scale, tStep.y / scale];

  // Check: the parts themselves at least spacing apart (less the rounding of one step).
  const inner = Math.floor((spacing / 2) * scale) - 1;
  const overlap = netArea(
    lib,
    clip(
      lib,
      clipper.ClipType.Intersection,
      [offsetPolygon(lib, pa, inner)],
      [shiftPath(offsetPolygon(lib, pb, inner), tStep.x, tStep.y)],
    ),
  );
  if (overlap > 0) throw new Error("bestPairing: the paired parts come nearer than the spacing");

  const outline = pairOutline(lib, [pu, shiftPath(pub, tStep.x, tStep.y)], half + CLOSING_STEPS);
  // Check: the outline holds both parts.
  const parts = [pa, shiftPath(pb, tStep.x, tStep.y)];
  const outside = netArea(lib, clip(lib, clipper.ClipType.Difference, parts, [outline]));
  if (outside > 2 * (pathPerimeter(parts[0]) + pathPerimeter(parts[1])))
    throw new Error("bestPairing: the pair outline does not contain both parts");

  const box: Box = {
    minX: Math.min(boxA.minX, boxB.minX + t[0]),
    minY: Math.min(boxA.minY, boxB.minY + t[1]),
    maxX: Math.max(boxA.maxX, boxB.maxX + t[0]),
    maxY: Math.max(boxA.maxY, boxB.maxY + t[1]),
  };
  const boxArea = boxWidth(box) * boxHeight(box);
  const separateBoxArea = 2 * boxWidth(boxA) * boxHeight(boxA);
  const saved = separateBoxArea - boxArea;
  return {
    offset: t,
    rotation: 180,
    members: [
      { rotation: 0, x: 0, y: 0 },
      { rotation: 180, x: t[0], y: t[1] },
    ],
    box,
    boxArea,
    separateBoxArea,
    saved,
    savedShare: saved / separateBoxArea,
    outline: fromPath(outline, scale),
    partArea: 2 * ringArea(a),
    candidates,
  };
}

/**
 * Morphological closing of the union of `parts` by `radius` steps (offset out, then in, mitred),
 * holes filled; the parts themselves are added back in case the mitres cut a corner. One ring.
 */
function pairOutline(lib: ClipperLib, parts: clipper.Path[], radius: number): clipper.Path {
  const grown = offsetPaths(lib, parts, radius);
  const closed = offsetPaths(lib, outers(lib, grown), -radius);
  const filled = outers(lib, clip(lib, clipper.ClipType.Union, [...outers(lib, closed), ...parts]));
  if (filled.length !== 1) throw new Error(`bestPairing: the pair outline has ${filled.length} pieces, not one`);
  return filled[0];
}

export interface PairItemsOptions {
  /** Least share of the two separate boxes a pairing must save (default 0.1). */
  threshold?: number;
  /** Simplified containing rings by item id (PairingOptions.simplified). */
  simplified?: ReadonlyMap<string, Ring>;
  /** PairingOptions.maxVertices; an item above it without a simplified ring is left unpaired. */
  maxVertices?: number;
}

export interface PairedItem {
  /** Id of the pair item, `${itemId}×2`. */
  pairId: string;
  itemId: string;
  /** Pair copies (⌊q/2⌋) and single copies left (q mod 2). */
  pairs: number;
  singles: number;
  pairing: Pairing;
}

export interface PairedItems {
  /** The items to nest: pair items, remainders (same id as the item) and items left as they were. */
  items: NestItem[];
  /** The pairings used. */
  pairs: PairedItem[];
  /** Items that could have been paired but were not tried: over the vertex cap without a simplified ring. */
  skipped: Array<{ id: string; reason: string }>;
  /** Part area of one copy of each returned item, by id: both parts for a pair item. */
  partArea: Map<string, number>;
  /** Placements of the returned items → placements of the original items (each copy 0..q−1 once). */
  expand<P extends Placement>(placements: readonly P[]): P[];
  /** The same for records naming copies without a pose (e.g. parts left out). */
  expandCopies<U extends { id: string; copy: number }>(records: readonly U[]): U[];
}

const norm360 = (d: number): number => ((d % 360) + 360) % 360;
/** Whether `d` is among the rotations, as angles (370° is 10°). */
const hasRotation = (rotations: readonly number[], d: number) =>
  rotations.some((r) => {
    const diff = norm360(r - d);
    return diff < 1e-9 || diff > 360 - 1e-9;
  });

/**
 * Replaces each item worth pairing (rotations include 0° and 180°, quantity ≥ 2, pairing saves at
 * least `threshold` of the two separate boxes) by ⌊q/2⌋ copies of a pair item and, for odd q, one
 * single copy under the item's own id. A pair item may turn by R when the item allows R and R + 180°.
 */
export function pairItems(
  lib: ClipperLib,
  items: readonly NestItem[],
  spacing: number,
  options: PairItemsOptions = {},
): PairedItems {
  const threshold = options.threshold ?? PAIR_THRESHOLD;
  const maxVertices = options.maxVertices ?? PAIR_MAX_VERTICES;
  const skipped: Array<{ id: string; reason: string }> = [];
  const ids = new Set(items.map((it) => it.id));
  const out: NestItem[] = [];
  const pairs: PairedItem[] = [];
  const partArea = new Map<string, number>();
  const byPairId = new Map<string, PairedItem>();
  /** Copies of an item taken by its pairs, for the remainder's copy numbers. */
  const remainderBase = new Map<string, number>();

  for (const item of items) {
    const area = ringArea(item.polygon);
    const simplified = options.simplified?.get(item.id);
    let candidate = item.quantity >= 2 && hasRotation(item.rotations, 0) && hasRotation(item.rotations, 180);
    const vertices = normaliseRing(simplified ?? item.polygon).length;
    if (candidate && vertices > maxVertices) {
      const which = simplified ? "its simplified ring has" : "no simplified ring, and the part has";
      skipped.push({ id: item.id, reason: `${which} ${vertices} vertices, more than ${maxVertices}` });
      candidate = false;
    }
    const pairing = candidate ? bestPairing(lib, item.polygon, spacing, { simplified, maxVertices }) : undefined;
    if (!pairing || pairing.savedShare < threshold) {
      out.push(item);
      partArea.set(item.id, area);
      continue;
    }
    const pairId = `${item.id}×2`;
    if (ids.has(pairId)) throw new Error(`pairItems: an item is already called ${JSON.stringify(pairId)}`);
    const rotations = [...new Set(item.rotations.filter((r) => hasRotation(item.rotations, r + 180)))];
    const n = Math.floor(item.quantity / 2);
    const entry: PairedItem = { pairId, itemId: item.id, pairs: n, singles: item.quantity % 2, pairing };
    pairs.push(entry);
    byPairId.set(pairId, entry);
    out.push({ id: pairId, polygon: pairing.outline, quantity: n, rotations });
    partArea.set(pairId, pairing.partArea);
    if (entry.singles > 0) {
      out.push({ ...item, quantity: entry.singles });
      partArea.set(item.id, area);
      remainderBase.set(item.id, 2 * n);
    }
  }

  function expandCopies<U extends { id: string; copy: number }>(records: readonly U[]): U[] {
    return records.flatMap((r) => {
      const pair = byPairId.get(r.id);
      if (pair) return [0, 1].map((k) => ({ ...r, id: pair.itemId, copy: 2 * r.copy + k }));
      const base = remainderBase.get(r.id);
      return [base === undefined ? r : { ...r, copy: base + r.copy }];
    });
  }

  function expand<P extends Placement>(placements: readonly P[]): P[] {
    return placements.flatMap((p) => {
      const pair = byPairId.get(p.id);
      if (!pair) return expandCopies([p]);
      // Member k at (r_k, o_k) in the pair's frame, the pair placed at (R, T): the member turns by
      // R + r_k about its own origin and goes to rotate(o_k, R) + T (placeRing's convention).
      const place = placer(p.rotation, p.x, p.y);
      return pair.pairing.members.map((m, k) => {
        const [x, y] = place([m.x, m.y]);
        return { ...p, id: pair.itemId, copy: 2 * p.copy + k, rotation: norm360(p.rotation + m.rotation), x, y };
      });
    });
  }

  return { items: out, pairs, skipped, partArea, expand, expandCopies };
}

/** The two members of a pairing placed in the pair's frame, vertices in the ring's own order. */
export function pairMembers(ring: Ring, pairing: Pairing): [Ring, Ring] {
  const [m0, m1] = pairing.members;
  return [placeRing(ring, m0.rotation, m0.x, m0.y), placeRing(ring, m1.rotation, m1.x, m1.y)];
}
