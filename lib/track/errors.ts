// The engine's one typed error. Every refusal of bad input, and the time limit, comes through it,
// so the CLI and the route handler can show `message` as is and map `code` to a status.

export type EngineErrorCode =
  | "invalid-spec" // the spec does not match the schema
  | "bad-formula" // a formula is malformed, uses something not allowed, or is not finite and positive
  | "invalid-wheel" // the wheel is not star-shaped about the axle, the axle is outside, r <= 0, ...
  | "invalid-track" // the track is not a graph, not periodic, reaches the axle line, ...
  | "no-solution" // no axle height / centre distance closes the wheel
  | "too-fine" // the tolerance asks for more output points than the engine will produce
  | "timeout"; // the deadline passed

export class EngineError extends Error {
  readonly code: EngineErrorCode;
  /** Where the input fails: a spec path ("wheel.points[3]") or a position ("theta = 1.2"). */
  readonly where?: string;

  constructor(code: EngineErrorCode, message: string, where?: string) {
    super(message);
    this.name = "EngineError";
    this.code = code;
    this.where = where;
  }
}

export function isEngineError(e: unknown): e is EngineError {
  return e instanceof EngineError;
}
