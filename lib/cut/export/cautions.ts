// Caution lines for the job README in the signal-word form of ANSI Z535.4 (DANGER / WARNING /
// CAUTION / NOTICE, SAFETY.md §4.1), each with the hazard, its consequence and how to avoid it
// (ISO 15870's and DITA 1.3's hazard-statement structure, SAFETY.md §4.3). The wording is ours.
// Thresholds: friction demand for a regular n-gon on its road is tan(π/n), so a square needs
// μ ≥ 1 (SAFETY.md §2.1, friction cone); ISO 13854 minimum gaps for crushing (finger 25 mm, hand
// 100 mm, foot 120 mm; SAFETY.md §1.1); ASTM F963 §4.18.1 moving-part clearance (admits 5 mm →
// must admit 13 mm; SAFETY.md §1.5); dry wood on wood about 0.5 (S. A. Hill, "Coefficients of
// friction"; SAFETY.md §2.2).
import type { SolveResult } from "@/lib/track";
import { fmtLen } from "../units";

export interface Caution {
  signal: "WARNING" | "CAUTION" | "NOTICE";
  text: string;
}

export function cautionsFor(result: Pick<SolveResult, "mode" | "check" | "warnings">, opts: { insideRadius: number; maxSupportSpan?: number }): Caution[] {
  const out: Caution[] = [];
  const pair = result.mode === "partner-wheel" || result.mode === "twin-wheels";
  out.push(
    pair
      ? { signal: "WARNING", text: "Nip point where the two wheels turn against each other. It can crush and draw in fingers and hair. Enclose the wheels behind a guard or glazing so no one can reach the nip (ISO 13857 distances)." }
      : { signal: "WARNING", text: "Pinch points where the wheel meets the track, deepest at every trough. They can crush fingers and toes and catch shoelaces. Keep hands and feet out with side boards or skirts along the track." },
  );
  const mu = result.check.frictionDemand.max;
  if (mu > 0.6)
    out.push({
      signal: "WARNING",
      text: `The contact needs a friction coefficient of ${mu.toFixed(2)} at its steepest point; many dry material pairs give less (wood on wood is about 0.5). The wheel may slip, jolt and tip a rider. Use a high-grip tread, keep the track clean and dry, or use a wheel with more sides.`,
    });
  if (result.warnings.some((w) => w.code === "sharp-corner"))
    out.push({
      signal: "NOTICE",
      text: `The wheel's corners are sharp in this design. The track will dent at the troughs and the cutter rounds them to ${fmtLen(opts.insideRadius)} anyway. Give the wheel a corner radius and solve again.`,
    });
  if (result.check.interference.depth > 0)
    out.push({ signal: "WARNING", text: `The wheel cuts into the ${pair ? "other wheel" : "track"} by ${fmtLen(result.check.interference.depth)} away from the contact. It will jam or jump. Change the design before cutting.` });
  if (opts.maxSupportSpan !== undefined)
    out.push({
      signal: "CAUTION",
      text: `The track spans up to ${fmtLen(opts.maxSupportSpan)} between supports. It may sag or crack under a rider. Have the span, the supports and the joints checked for the rider and crowd loads that apply.`,
    });
  out.push({
    signal: "CAUTION",
    text: "Gaps between the wheel and its frame, fork or fender open and close as it turns. They can trap fingers. Keep such gaps under 5 mm or over 25 mm, or guard them.",
  });
  out.push({
    signal: "NOTICE",
    text: "These files and figures are simplified engineering estimates for early design, not a safety certification. Check the piece with local codes, the authority having jurisdiction and a licensed engineer before it is built and opened to the public.",
  });
  return out;
}
