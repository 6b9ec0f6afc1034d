// Expands items into copies and checks the caller's item list.
import type { Copy } from "./decoder";
import { MAX_TOTAL_COPIES } from "./instance";
import { ringArea } from "@/lib/geometry/ring";
import type { NestItem } from "./types";

export function expandCopies(items: readonly NestItem[]): Copy[] {
  const copies: Copy[] = [];
  items.forEach((it, item) => {
    for (let index = 0; index < it.quantity; index++) copies.push({ item, index });
  });
  return copies;
}

export function checkItems(items: readonly NestItem[]): void {
  if (!Array.isArray(items) || items.length === 0) throw new Error("Nothing to nest: the item list is empty");
  let total = 0;
  const ids = new Set<string>();
  for (const it of items) {
    if (ids.has(it.id)) throw new Error(`Item id ${JSON.stringify(it.id)} is used twice`);
    ids.add(it.id);
    if (!Number.isInteger(it.quantity) || it.quantity < 0)
      throw new Error(`${it.id}: quantity must be a whole number of at least 0`);
    total += it.quantity;
    if (
      !Array.isArray(it.rotations) ||
      it.rotations.length === 0 ||
      it.rotations.some((r: number) => !Number.isFinite(r))
    )
      throw new Error(`${it.id}: rotations must be a non-empty list of degrees`);
    if (
      !Array.isArray(it.polygon) ||
      it.polygon.length < 3 ||
      it.polygon.some((p: readonly number[]) => !Number.isFinite(p[0]) || !Number.isFinite(p[1]))
    )
      throw new Error(`${it.id}: the polygon needs at least 3 points with finite coordinates`);
    if (!(ringArea(it.polygon) > 0)) throw new Error(`${it.id}: the polygon has zero area`);
    if (
      it.holes !== undefined &&
      (!Array.isArray(it.holes) ||
        it.holes.some(
          (h: readonly (readonly number[])[]) =>
            !Array.isArray(h) || h.length < 3 || h.some((p) => !Number.isFinite(p[0]) || !Number.isFinite(p[1])),
        ))
    )
      throw new Error(`${it.id}: each hole needs at least 3 points with finite coordinates`);
  }
  if (total > MAX_TOTAL_COPIES) throw new Error(`More than ${MAX_TOTAL_COPIES} copies in total`);
}
