// The rolling check in plain words for a client deciding about a design: each figure the engine
// checked, said as a sentence, with whether it is fine. The limits are the studio's (check-limits.ts),
// so the review and the studio never disagree about what passes. Pure.
import type { RevisionSummary } from "@/lib/revision-summary";
import { CLOSURE_LIMIT, FRICTION_GUIDE, lengthTolerance } from "@/lib/studio/check-limits";

export interface PlainFigure {
  key: "level" | "grip" | "cut-in" | "slip" | "closure";
  /** The heading, e.g. "Level ride". */
  label: string;
  text: string;
  ok: boolean;
}

type Checked = Pick<RevisionSummary, "check"> & { mode: string; units: "mm" | "in" };

const MM_PER_IN = 25.4;

/** A length in the design's units as a reader's length: mm to 3 decimals, or inches to 4. */
function length(v: number, units: "mm" | "in"): string {
  const mm = units === "in" ? v * MM_PER_IN : v;
  // "To within" is an upper bound: below what three decimals show, the bound is the last digit shown.
  const mmText = `${Math.max(mm, 0.001).toFixed(3)} mm`;
  if (units === "in") return `${Math.max(v, 0.0001).toFixed(4)} in (${mmText})`;
  return mmText;
}

export function plainFigures(r: Checked): PlainFigure[] {
  const c = r.check;
  const tol = lengthTolerance(r.units);
  const pair = r.mode === "partner-wheel";
  const twins = r.mode === "twin-wheels";
  const other = pair || twins ? "the other wheel" : "the track";
  const mu = c.frictionDemand.max;
  const out: PlainFigure[] = [
    pair
      ? {
          key: "level",
          label: "Steady turning",
          text: `The two wheels stay in touch all the way round: the distance between their axles holds to within ${length(c.axleDeviation, r.units)}.`,
          ok: c.axleDeviation <= tol,
        }
      : {
          key: "level",
          label: "Level ride",
          text: `The axle stays level to within ${length(c.axleDeviation, r.units)} over the whole roll.`,
          ok: c.axleDeviation <= tol,
        },
    {
      key: "grip",
      label: "Grip needed",
      // Indicative dry static friction, docs/safety.md §2.2: rubber on dry concrete about 1.0 and wood on
      // wood about 0.5 (S. A. Hill, "Coefficients of friction"; textbook tables); they vary with the
      // materials, dust and wet, so the shop tests the real pair.
      text:
        `Where ${other} is steepest the contact needs a friction coefficient of ${mu.toFixed(2)} to roll without slipping. ` +
        (mu > FRICTION_GUIDE
          ? "That is more than many dry material pairs give (wood on wood is about 0.5; rubber on dry concrete about 1.0): the shop must choose a grippy tread, test it, and keep the surface clean and dry."
          : "Most dry material pairs give that much, but the shop still checks the actual materials."),
      ok: mu <= FRICTION_GUIDE,
    },
    c.interference.depth > 0
      ? {
          key: "cut-in",
          label: "Clearance",
          text: `The wheel cuts into ${other} by ${length(c.interference.depth, r.units)} away from the point of contact. It would jam; the shop must change the design before building it.`,
          ok: false,
        }
      : {
          key: "cut-in",
          label: "Clearance",
          text: `The wheel never cuts into ${other}: they touch only where they roll.`,
          ok: true,
        },
    {
      key: "slip",
      label: "Rolling, not sliding",
      text: `The lengths rolled on the wheel and on ${other} agree to within ${length(c.slip, r.units)}.`,
      ok: c.slip <= tol,
    },
    {
      key: "closure",
      label: "Repeats exactly",
      text: `After each turn the motion starts again where it began, to within ${c.closureError.toExponential(1)} rad.`,
      ok: Math.abs(c.closureError) <= CLOSURE_LIMIT,
    },
  ];
  return out;
}
