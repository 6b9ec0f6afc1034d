// Gaps people can reach, against the published body-part tables (the figures as docs/safety.md §1
// reads them; check the current edition where the piece is built):
// - ISO 13854:2017 minimum gaps to avoid crushing: finger 25, hand 100, foot 120, arm 120, leg 180 mm;
// - ASTM F963 §4.18.1 (toys, ride-on wheels, wheel wells and fenders): a clearance that admits a 5 mm
//   rod must also admit a 13 mm rod; EN 71-1 Annex A and RoSPA: no gaps between 5 and 12 mm;
// - EN 1176-1 Annex D (playgrounds): an opening an 8 mm rod enters but a 25 mm rod does not traps a finger.
// The nip where a wheel meets its track (or another wheel) closes to nothing, so it can never meet
// a minimum gap: it is always reported, and must be guarded or out of reach.

import type { Use } from "@/lib/validation/loads";

export interface GapFinding {
  name: string;
  gap: number;
  ok: boolean;
  /** Which part of the body the gap can crush or trap ("finger …", "hand …", "foot …"), or why it is safe. */
  band: string;
  limit: string;
  source: string;
}

export const FINGER_MIN = 25;
export const HAND_MIN = 100;
export const FOOT_MIN = 120;
export const MOVING_SMALL = 5;

const SOURCE =
  "ISO 13854:2017 (finger 25, hand 100, foot 120 mm); ASTM F963 §4.18.1 (a gap that admits a 5 mm rod must admit 13 mm); EN 71-1 Annex A (no gaps of 5–12 mm)";

/**
 * A gap between a moving part and another part. Under 5 mm no finger enters; from 5 to 25 mm a
 * finger enters and is crushed as it closes. From 25 mm a finger is safe, but where feet are near the
 * wheels (a ride-on) a hand or foot can follow, so ISO 13854's 100 mm (hand) and 120 mm (foot) apply
 * there; pushed and hand-turned pieces are judged for fingers. Display pieces are behind a guard.
 */
export function judgeGap(name: string, gap: number, use: Use): GapFinding {
  if (use === "display")
    return {
      name,
      gap,
      ok: true,
      band: "behind the guard",
      limit: "out of reach (ISO 13857 distances)",
      source: "ISO 13857:2019",
    };
  if (gap < MOVING_SMALL)
    return { name, gap, ok: true, band: "too narrow for a finger", limit: `under ${MOVING_SMALL} mm`, source: SOURCE };
  if (gap < FINGER_MIN)
    return {
      name,
      gap,
      ok: false,
      band: "finger crush: a finger enters and is crushed as the gap closes",
      limit: `under ${MOVING_SMALL} mm or at least ${FINGER_MIN} mm`,
      source: SOURCE,
    };
  if (use === "ride-on" && gap < FOOT_MIN) {
    const hand = gap < HAND_MIN;
    return {
      name,
      gap,
      ok: false,
      band: hand ? "hand crush: a hand can follow a finger in" : "foot crush: a foot can enter",
      limit: `at least ${hand ? HAND_MIN : FOOT_MIN} mm, or guarded`,
      source: SOURCE,
    };
  }
  return {
    name,
    gap,
    ok: true,
    band: use === "ride-on" ? "wide enough for a hand and a foot" : "wide enough for a finger",
    limit: `at least ${use === "ride-on" ? FOOT_MIN : FINGER_MIN} mm`,
    source: SOURCE,
  };
}
