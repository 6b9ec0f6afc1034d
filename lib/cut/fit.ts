// The part builder's own check that every part fits the usable sheet (its size less the margins)
// and the machine bed in at least one allowed rotation, with the kerf. The nester reports parts it
// cannot place, but this says which part is too big and by how much before any nesting is tried.
import { CutError } from "./errors";
import { bounds, boxHeight, boxWidth } from "@/lib/geometry/box";
import { placer } from "@/lib/geometry/place";
import { allowedRotations } from "./rotations";
import { usableSize } from "./segments";
import type { CutSettings } from "./settings";
import type { Part } from "./types";
import { fmtLen } from "./units";

/** The part's bounding length × width at a rotation, with half the kerf on every side. */
export function cutSize(part: Part, deg: number, kerf: number): { length: number; width: number } {
  const b = bounds(part.region.outer.map(placer(deg, 0, 0)));
  return { length: boxWidth(b) + kerf, width: boxHeight(b) + kerf };
}

export function checkPartsFit(parts: Part[], s: CutSettings): void {
  const U = usableSize(s);
  for (const p of parts) {
    const sizes = allowedRotations(p, s).map((r) => ({ r, ...cutSize(p, r, s.machine.kerf) }));
    if (sizes.some((z) => z.length <= U.length + 1e-9 && z.width <= U.width + 1e-9)) continue;
    // Report the rotation that comes closest.
    const over = (z: { length: number; width: number }) =>
      Math.max(z.length - U.length, 0) + Math.max(z.width - U.width, 0);
    const z = sizes.sort((a, b) => over(a) - over(b))[0];
    const long = z.length - U.length;
    const wide = z.width - U.width;
    const what = [long > 0 ? `${fmtLen(long)} too long` : "", wide > 0 ? `${fmtLen(wide)} too wide` : ""]
      .filter(Boolean)
      .join(" and ");
    const bed = (long > 0 && U.lengthBy === "bed") || (wide > 0 && U.widthBy === "bed");
    const room = bed
      ? `the machine bed takes ${fmtLen(s.machine.bed.length)} × ${fmtLen(s.machine.bed.width)}`
      : `the sheet (${fmtLen(s.sheet.length)} × ${fmtLen(s.sheet.width)} less a ${fmtLen(s.margin)} margin) leaves ${fmtLen(U.length)} × ${fmtLen(U.width)}`;
    throw new CutError(
      "part-too-big",
      `Part ${p.id} (${p.name}) is ${fmtLen(z.length)} × ${fmtLen(z.width)} with the kerf, but ${room}: it is ${what}${z.r ? ` even turned ${z.r}°` : ""}. Use a larger sheet, ${p.kind === "track" ? "more cut stations or a shallower base" : "a smaller design"}.`,
      bed ? "machine.bed" : "sheet",
    );
  }
}
