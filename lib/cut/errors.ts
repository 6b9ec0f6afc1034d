// The one typed error of lib/cut. Every refusal of bad settings, or of a design that cannot be cut
// as asked, comes through it with a plain message and the settings field to fix, so the app can put
// the message beside that field.

export type CutErrorCode =
  | "invalid-settings" // the settings do not match the schema or contradict each other
  | "run-too-short" // the run is shorter than one track period
  | "bad-cuts" // user cut stations outside the run, out of order, or giving a segment that does not fit
  | "part-too-big" // a part does not fit the sheet or the machine bed
  | "no-wheel" // the solve result has no wheel outline
  | "units"; // the design's units are not mm or in

export class CutError extends Error {
  readonly code: CutErrorCode;
  /** The settings path to fix, e.g. "machine.kerf", "cuts.2", "sheet". */
  readonly field?: string;

  constructor(code: CutErrorCode, message: string, field?: string) {
    super(message);
    this.name = "CutError";
    this.code = code;
    this.field = field;
  }
}

export function isCutError(e: unknown): e is CutError {
  return e instanceof CutError;
}
