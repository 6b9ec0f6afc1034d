// A caution in the signal-word form of ANSI Z535.4-2007 §4.14: DANGER (will cause death or serious
// injury), WARNING (could), CAUTION (minor or moderate injury) and NOTICE (practices not related to
// personal injury). Each carries the three parts of a safety message — the hazard, its consequence,
// how to avoid it (ISO 15870's message panel; the DITA 1.3 hazardstatement) — and the figure, the
// limit it was held to and where the limit comes from. The wording is ours.

export type Signal = "DANGER" | "WARNING" | "CAUTION" | "NOTICE";

export const SIGNAL_ORDER: Record<Signal, number> = { DANGER: 0, WARNING: 1, CAUTION: 2, NOTICE: 3 };

/** Which check raised it: the studio links each to a place on the drawing and the helper to a fix. */
export type CheckId = "grip" | "contact" | "deflection" | "nip" | "gap" | "interference" | "inputs";

export interface Caution {
  signal: Signal;
  hazard: string;
  consequence: string;
  avoid: string;
  /** The figure with its units ("" when the caution has none, as for the nip). */
  figure: string;
  limit: string;
  /** The published source, or "common practice" / "from memory". */
  source: string;
  check: CheckId;
  /** Where on the drawing: axle x in the spec's units (track modes) or the driver's turn in radians (pairs). */
  at?: number;
  /** For gaps: the clearance's name as entered. */
  name?: string;
}

/** Goes wherever cautions appear (ASCE 7 commentary C4.3.1 defers unlisted loads to the authority having jurisdiction). */
export const DISCLAIMER =
  "These checks are simplified engineering estimates to support early design, not a safety certification. " +
  "They do not cover every hazard and do not replace a risk assessment, the local building, fire, accessibility " +
  "and amusement-device rules, or the requirements of the authority having jurisdiction. Anything people ride on, " +
  "climb or touch while it moves must be reviewed and approved by a licensed professional engineer (or the local " +
  "equivalent) and the venue's safety officer before it is built and opened to the public. Figures from standards " +
  "are for orientation: use the current edition adopted where the piece is built.";

export const bySeverity = (a: Caution, b: Caution) => SIGNAL_ORDER[a.signal] - SIGNAL_ORDER[b.signal];

/** The message (hazard, consequence, how to avoid it) and its detail (figure, limit, source), for lists that show the detail smaller. */
export function cautionParts(c: Caution): { signal: Signal; text: string; detail: string } {
  const figures = [c.figure, c.limit].filter(Boolean).join("; ");
  return {
    signal: c.signal,
    text: `${c.hazard} ${c.consequence} ${c.avoid}`,
    detail: `${figures ? `${figures}. ` : ""}Source: ${c.source}.`,
  };
}

/** A caution as one paragraph: the message, then its detail in brackets. */
export function cautionText(c: Caution): string {
  const { text, detail } = cautionParts(c);
  return `${text} (${detail})`;
}
