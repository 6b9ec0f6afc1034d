// The bill of materials as CSV (RFC 4180: CRLF line ends, a field holding a comma, a double quote
// or a line break is enclosed in double quotes, and a double quote inside it is doubled).
import type { SheetNestResult } from "@/lib/nest/types";
import { bounds, boxHeight, boxWidth } from "@/lib/geometry/box";
import type { Part } from "../types";
import { fromMm, type OutputUnits } from "../units";

export function csvField(v: string | number): string {
  const s = String(v);
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

export function csvRow(fields: Array<string | number>): string {
  return fields.map(csvField).join(",");
}

/** Sheets (1-based) holding a part's copies, as "1, 2"; unplaced copies are counted. */
function sheetsOf(id: string, nest: Pick<SheetNestResult, "sheets" | "unplaced"> | null): string {
  if (!nest) return "";
  const on = nest.sheets.filter((s) => s.placements.some((p) => p.id === id)).map((s) => s.index + 1);
  const left = nest.unplaced.filter((u) => u.id === id).length;
  return [on.join(", "), left ? `${left} unplaced` : ""].filter(Boolean).join("; ");
}

export function bomCsv(
  parts: Part[],
  opts: {
    material: string;
    thickness: number;
    units: OutputUnits;
    nest: Pick<SheetNestResult, "sheets" | "unplaced"> | null;
  },
): string {
  const u = opts.units;
  const n = (mm: number) => String(Number(fromMm(mm, u).toFixed(u === "in" ? 3 : 1)));
  const rows = [csvRow(["part", "name", "material", `thickness (${u})`, "sheet", `size L×W (${u})`, "quantity"])];
  for (const p of parts) {
    const b = bounds(p.region.outer);
    rows.push(
      csvRow([
        p.id,
        p.name,
        opts.material,
        n(opts.thickness),
        sheetsOf(p.id, opts.nest),
        `${n(boxWidth(b))} × ${n(boxHeight(b))}`,
        p.quantity,
      ]),
    );
  }
  return rows.join("\r\n") + "\r\n";
}
