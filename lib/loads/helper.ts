// For every check that fails, the smallest change that clears it — more sides, a corner radius,
// another tread from the library, a shorter support span, a lower design speed, a gap out of the
// crush band — each re-solved by the engine and re-checked here; a change is offered only when its
// own check passes.
import { solve } from "@/lib/track";
import type { LoadsInput } from "@/lib/validation/loads";
import type { CheckId } from "./caution";
import { checkLoads, cornerRadiusFor, withCornerRadius, type LoadsReport } from "./check";
import { FINGER_MIN, FOOT_MIN, HAND_MIN, MOVING_SMALL } from "./gaps";

export interface Suggestion {
  check: CheckId;
  /** For gaps: which clearance. */
  name?: string;
  /** The change in plain words. */
  change: string;
  /** The whole design spec to put in the draft (when the design changes). */
  spec?: Record<string, unknown>;
  /** Check inputs to change (tread, span, speed, clearances). */
  inputs?: Partial<Pick<LoadsInput, "mu" | "tiltDeg" | "speedMps" | "clearancesMm">> & {
    wheel?: LoadsInput["wheel"];
    track?: LoadsInput["track"];
  };
  /** The re-check of the changed design: it passes this check. */
  after: LoadsReport;
}

const MAX_SIDES = 24;

function passes(report: LoadsReport, check: CheckId, name?: string): boolean {
  switch (check) {
    case "grip":
      return report.grip.ok === true;
    case "contact":
      return report.contact.ok === true;
    case "deflection":
      return report.deflection.ok;
    case "interference":
      return !report.cautions.some((c) => c.check === "interference");
    case "gap":
      return report.gaps.find((g) => g.name === name)?.ok === true;
    default:
      return true;
  }
}

function tryCheck(input: LoadsInput): LoadsReport | null {
  try {
    return checkLoads(input, solve(input.spec), { cornerSearch: false });
  } catch {
    return null;
  }
}

function moreSides(input: LoadsInput, check: CheckId): Suggestion | null {
  const wheel = (input.spec as { wheel?: { kind?: string; sides?: number } }).wheel;
  if (wheel?.kind !== "polygon" || wheel.sides === undefined) return null;
  for (let n = wheel.sides + 1; n <= MAX_SIDES; n++) {
    const spec = { ...(input.spec as Record<string, unknown>), wheel: { ...wheel, sides: n } };
    const after = tryCheck({ ...input, spec });
    if (after && passes(after, check))
      return { check, change: `Use a wheel with ${n} sides instead of ${wheel.sides}.`, spec, after };
  }
  return null;
}

function cornerRadius(input: LoadsInput): Suggestion | null {
  const result = solve(input.spec);
  const rc = cornerRadiusFor(input, result);
  if (rc === null) return null;
  const spec = withCornerRadius(input.spec, rc)!;
  const after = tryCheck({ ...input, spec });
  if (!after || !passes(after, "contact")) return null;
  return { check: "contact", change: `Round the wheel's corners to ${rc} ${result.units}.`, spec, after };
}

function otherTread(input: LoadsInput, check: CheckId): Suggestion | null {
  for (const t of input.treads ?? []) {
    const wheel = {
      ...input.wheel,
      material: t.name,
      modulusGpa: t.modulusGpa,
      poisson: t.poisson,
      allowableMpa: t.allowableMpa ?? input.wheel.allowableMpa,
    };
    const changed: LoadsInput = { ...input, mu: t.mu, tiltDeg: undefined, wheel };
    const after = tryCheck(changed);
    if (after && passes(after, check))
      return {
        check,
        change: `Use the tread ${t.name} (μ ${t.mu}).`,
        inputs: { mu: t.mu, tiltDeg: undefined, wheel },
        after,
      };
  }
  return null;
}

function shorterSpan(input: LoadsInput, report: LoadsReport): Suggestion | null {
  const span = Math.floor(report.deflection.maxSpanMm / 10) * 10;
  if (!(span > 0)) return null;
  const track = { ...input.track, supportSpanMm: span };
  const after = tryCheck({ ...input, track });
  if (!after || !passes(after, "deflection")) return null;
  return {
    check: "deflection",
    change: `Support the track at most ${span} mm apart (now ${input.track.supportSpanMm} mm).`,
    inputs: { track },
    after,
  };
}

function lowerSpeed(input: LoadsInput): Suggestion | null {
  if (input.speedMps === undefined || input.wheel.densityKgM3 === undefined) return null;
  const at = (v: number) => tryCheck({ ...input, speedMps: v });
  const floor = 0.05;
  const slow = at(floor);
  if (!slow || !passes(slow, "grip")) return null;
  let lo = floor;
  let hi = input.speedMps;
  while (hi - lo > 0.01) {
    const mid = (lo + hi) / 2;
    const r = at(mid);
    if (r && passes(r, "grip")) lo = mid;
    else hi = mid;
  }
  const v = Math.floor(lo * 20) / 20;
  const after = at(v);
  if (!after || !passes(after, "grip")) return null;
  return {
    check: "grip",
    change: `Design for at most ${v} m/s (now ${input.speedMps} m/s).`,
    inputs: { speedMps: v },
    after,
  };
}

function gapOut(input: LoadsInput, name: string, gap: number): Suggestion | null {
  const targets = input.use === "ride-on" ? [MOVING_SMALL - 1, HAND_MIN, FOOT_MIN] : [MOVING_SMALL - 1, FINGER_MIN];
  const best = targets.sort((a, b) => Math.abs(a - gap) - Math.abs(b - gap));
  for (const g of best) {
    const clearancesMm = { ...input.clearancesMm, [name]: g };
    const after = tryCheck({ ...input, clearancesMm });
    if (after && passes(after, "gap", name))
      return {
        check: "gap",
        name,
        change: `Make the ${name} gap ${g} mm (now ${gap} mm).`,
        inputs: { clearancesMm },
        after,
      };
  }
  return null;
}

/** Suggestions for the report's failing checks, each already re-checked. */
export function suggestFixes(input: LoadsInput, report: LoadsReport): Suggestion[] {
  const out: Suggestion[] = [];
  const push = (s: Suggestion | null) => s && out.push(s);
  if (report.grip.ok === false) {
    push(moreSides(input, "grip"));
    push(otherTread(input, "grip"));
    push(lowerSpeed(input));
  }
  if (report.contact.ok === false) {
    push(cornerRadius(input));
    push(otherTread(input, "contact"));
  }
  if (!report.deflection.ok) push(shorterSpan(input, report));
  if (report.cautions.some((c) => c.check === "interference")) push(moreSides(input, "interference"));
  for (const g of report.gaps.filter((x) => !x.ok)) push(gapOut(input, g.name, g.gap));
  return out;
}
