// Figures as the sheet prints them: millimetres first, inches beside them when the sheet asks,
// converted by the exact 1 in = 25.4 mm (the international inch, NIST Handbook 44 Appendix C).
// A tape reads to 0.5 mm, so stations and heights carry one decimal; tolerances carry two.
import { MM_PER_IN } from "@/lib/cut/units";

const fixed = (v: number, digits: number) => {
  const s = v.toFixed(digits);
  return /^-0\.0*$/.test(s) ? s.slice(1) : s;
};

/** A station or a height in its two units: "705.1 mm" and "27.76 in". */
export function lengthParts(mm: number): { mm: string; inches: string } {
  return { mm: `${fixed(mm, 1)} mm`, inches: `${fixed(mm / MM_PER_IN, 2)} in` };
}

/** A station or a height: "705.1 mm", or "705.1 mm (27.76 in)" with inches. */
export function length(mm: number, inches: boolean): string {
  const p = lengthParts(mm);
  return inches ? `${p.mm} (${p.inches})` : p.mm;
}

/** A length for a narrow table cell: the inches under the millimetres. */
export function lengthCell(mm: number, inches: boolean): string {
  const p = lengthParts(mm);
  return inches ? `${p.mm}\n(${p.inches})` : p.mm;
}

/** A small length to two decimals: "0.42 mm", or "0.42 mm (0.017 in)" with inches. */
export function fine(mm: number, inches: boolean): string {
  return inches ? `${fixed(mm, 2)} mm (${fixed(mm / MM_PER_IN, 3)} in)` : `${fixed(mm, 2)} mm`;
}

/** A tolerance: "± 0.42 mm", or "± 0.42 mm (± 0.017 in)" with inches; `stacked` puts the inches under. */
export function tolerance(mm: number, inches: boolean, stacked = false): string {
  const t = `± ${fixed(mm, 2)} mm`;
  return inches ? `${t}${stacked ? "\n" : " "}(± ${fixed(mm / MM_PER_IN, 3)} in)` : t;
}

/** "2026-12-02" from an ISO time, read in UTC so the sheet says the same wherever it is made. */
export function isoDay(iso: string): string {
  return new Date(iso).toISOString().slice(0, 10);
}

/** "2026-11-20 15:42 UTC". */
export function isoMinute(iso: string): string {
  return `${new Date(iso).toISOString().slice(0, 16).replace("T", " ")} UTC`;
}
