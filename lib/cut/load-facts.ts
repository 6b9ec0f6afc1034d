// What a cut plan fixes about the track for the load-path check (lib/loads): the board is the sheet
// thickness times the layers wide, its shallowest section is the base band under the profile's
// lowest point, and the span that matters is the longest between two supports.
import type { CutFacts } from "@/lib/loads/settings";
import type { CutPlanResult } from "./plan";
import type { CutSettings } from "./settings";

export function cutFactsOf(plan: CutPlanResult): CutFacts | undefined {
  const run = plan.run;
  if (!run || run.supports.length < 2) return undefined;
  const spans = run.supports.slice(1).map((x, i) => x - run.supports[i]);
  const s = plan.settings;
  return { widthMm: s.sheet.thickness * s.layers, depthMm: s.baseDepth, supportSpanMm: Math.max(...spans) };
}

/** Before the parts are built: the supports are never further apart than the support spacing. */
export function cutFactsOfSettings(s: CutSettings): CutFacts {
  return { widthMm: s.sheet.thickness * s.layers, depthMm: s.baseDepth, supportSpanMm: s.supportSpacing };
}
