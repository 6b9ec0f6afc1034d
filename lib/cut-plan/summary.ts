// A stored cut plan's summary and its nest as kept, from the parts and a nest that has passed the
// server's check (verify-nest.ts). Pure, so the route and the demo seed store the same shape.
import { regionArea } from "@/lib/geometry/ring";
import type { CutPlanResult } from "@/lib/cut";
import type { SheetNestResult } from "@/lib/nest/types";

export interface CutPlanSummary {
  sheets: number;
  utilisation: number;
  perSheet: number[];
  parts: number;
  copies: number;
  runLength: number | null;
  periods: number | null;
  material: string;
  sheet: string;
  machine: string;
  seconds: number;
  warnings: string[];
  /** What the plan was stored for, and the approval it was stored under (null: none yet). */
  purpose?: "review" | "production";
  approvalReference?: string | null;
  /** The shop's reason for storing a production plan of a revision the client has not approved. */
  unapprovedReason?: string | null;
}

export function summariseCutPlan(
  plan: CutPlanResult,
  nest: Pick<SheetNestResult, "sheets" | "seconds" | "cancelled">,
  names: { material: string; sheet: string; machine: string },
  gate: { purpose: "review" | "production"; approvalReference: string | null; unapprovedReason: string | null },
): { summary: CutPlanSummary; nest: Record<string, unknown> } {
  const s = plan.settings;
  const sheets = nest.sheets.filter((sh) => sh.placements.length > 0);
  const sheetArea = s.sheet.length * s.sheet.width;
  const partArea = new Map(plan.parts.map((p) => [p.id, regionArea(p.region)]));
  const perSheet = sheets.map(
    (sh) => sh.placements.reduce((sum, pl) => sum + (partArea.get(pl.id) ?? 0), 0) / sheetArea,
  );
  const summary: CutPlanSummary = {
    sheets: sheets.length,
    // The parts' own area over the stock's: the same figure the page shows.
    utilisation: perSheet.reduce((a, b) => a + b, 0) / Math.max(1, sheets.length),
    perSheet,
    parts: plan.parts.length,
    copies: plan.parts.reduce((n, p) => n + p.quantity, 0),
    runLength: plan.run?.runLength ?? null,
    periods: plan.run?.periods ?? null,
    ...names,
    seconds: nest.seconds,
    warnings: plan.warnings.filter((w) => w.code !== "no-font").map((w) => w.message),
    ...gate,
  };
  const stored = {
    sheets: sheets.map((sh, index) => ({
      index,
      utilisation: perSheet[index],
      placements: sh.placements.map((p) => ({ ...p, sheet: index })),
    })),
    unplaced: [],
    seconds: nest.seconds,
    cancelled: nest.cancelled,
  };
  return { summary, nest: stored };
}
