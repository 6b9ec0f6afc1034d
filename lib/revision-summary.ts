// The engine's figures kept beside a revision, for lists, comparisons, sign-off and the seed.
import type { SolveResult } from "@/lib/track";

export interface RevisionSummary {
  period?: number;
  depth?: number;
  axleHeight?: number;
  centreDistance?: number;
  wheel: { rMin: number; rMax: number };
  partner?: { rMin: number; rMax: number };
  check: SolveResult["check"];
  warnings: SolveResult["warnings"];
}

export function summarise(result: SolveResult): RevisionSummary {
  return {
    period: result.period,
    depth: result.depth,
    axleHeight: result.axleHeight,
    centreDistance: result.centreDistance,
    wheel: { rMin: result.wheel.rMin, rMax: result.wheel.rMax },
    ...(result.partner ? { partner: { rMin: result.partner.rMin, rMax: result.partner.rMax } } : {}),
    check: result.check,
    warnings: result.warnings,
  };
}
