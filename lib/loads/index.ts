// Load-path cautions: live engineering checks of a design as it will be built and used, with their
// sources, and a helper that finds the smallest change clearing each failing check. Pure TypeScript
// beside the engine (lib/track), one module per check:
//   grip.ts (friction cone), hertz.ts (Hertz line contact), beam.ts (simply supported track),
//   gaps.ts (ISO 13854 / ASTM F963 / EN 71 gaps), dynamics.ts (uneven turning, the wheel's inertia),
//   engineer-loads.ts (loads an engineer will want), units.ts (exact conversions),
//   caution.ts (ANSI Z535.4 signal words and the disclaimer), check.ts (all of them), helper.ts.
export {
  checkLoads,
  cornerRadiusFor,
  type LoadsReport,
  type GripResult,
  type ContactResult,
  type DeflectionResult,
  type DynamicsResult,
} from "./check";
export { suggestFixes, type Suggestion } from "./helper";
export { DISCLAIMER, cautionParts, cautionText, type Caution, type Signal, type CheckId } from "./caution";
export type { EngineerLoad } from "./engineer-loads";
export type { GapFinding } from "./gaps";
