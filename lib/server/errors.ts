// One typed error for every failure the app reports: an HTTP status and a plain message (plus field
// messages for bad input). Route handlers turn it into JSON; server actions into form state.
// `toAppError` is the one place where the errors of the engine, the cut code, the outline reader,
// the queries (db/queries/refusal.ts) and zod become these kinds; nothing else maps them by hand.
import { z } from "zod";
import { Refusal } from "@/db/queries/refusal";
import { CutError } from "@/lib/cut/errors";
import { ImportFailure } from "@/lib/outline-import/common";
import { NotBracketedError } from "@/lib/track/brent";
import { EngineError } from "@/lib/track/errors";
import { BUSY_RETRY_AFTER_S } from "@/lib/validation/limits";

export type ErrorKind =
  | "bad_request"
  | "unauthorized"
  | "forbidden"
  | "not_found"
  | "conflict"
  | "unprocessable"
  | "method_not_allowed"
  | "too_large"
  | "unsupported"
  | "too_many"
  | "timeout"
  | "unavailable"
  | "busy"
  | "internal";

const STATUS: Record<ErrorKind, number> = {
  bad_request: 400,
  unauthorized: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  unprocessable: 422,
  method_not_allowed: 405,
  too_large: 413,
  unsupported: 415,
  too_many: 429,
  timeout: 408,
  unavailable: 503,
  busy: 503,
  internal: 500,
};

const DEFAULT_MESSAGE: Record<ErrorKind, string> = {
  bad_request: "The request is not valid.",
  unauthorized: "Please sign in.",
  forbidden: "Your role does not allow this.",
  not_found: "Not found.",
  conflict: "That conflicts with what is already there.",
  unprocessable: "The request is understood but cannot be carried out as it stands.",
  method_not_allowed: "That cannot be done to this record.",
  too_large: "The request is too large.",
  unsupported: "That kind of file is not accepted here.",
  too_many: "Too many requests; please wait and try again.",
  timeout: "The work took too long and was stopped.",
  unavailable: "A service the app needs did not answer. Nothing was changed.",
  busy: "The server is busy with other people's work. Nothing was changed; please try again in a few seconds.",
  internal: "Something went wrong on our side. Nothing was changed.",
};

export type FieldErrors = Record<string, string[]>;

/** The JSON body of every error response. */
export interface ErrorBody {
  status: number;
  message: string;
  fields?: FieldErrors;
}

export class AppError extends Error {
  readonly kind: ErrorKind;
  readonly fields?: FieldErrors;

  constructor(kind: ErrorKind, message?: string, fields?: FieldErrors) {
    super(message ?? DEFAULT_MESSAGE[kind]);
    this.name = "AppError";
    this.kind = kind;
    this.fields = fields;
  }

  get status(): number {
    return STATUS[this.kind];
  }

  /** Headers the answer carries: Retry-After when the server is busy (RFC 9110 §10.2.3). */
  get headers(): Record<string, string> {
    return this.kind === "busy" ? { "retry-after": String(BUSY_RETRY_AFTER_S) } : {};
  }

  toBody(): ErrorBody {
    return { status: this.status, message: this.message, ...(this.fields ? { fields: this.fields } : {}) };
  }

  static fromZod(error: z.ZodError, message = "Some fields need attention."): AppError {
    return new AppError("bad_request", message, z.flattenError(error).fieldErrors as FieldErrors);
  }
}

/**
 * For `.catch`: a parent's 404 ("No such project.") said as the record asked for, so an id reveals
 * nothing about what it belongs to.
 */
export function notFoundAs(message: string): (error: unknown) => never {
  return (error) => {
    if (error instanceof AppError && error.kind === "not_found") throw new AppError("not_found", message);
    throw error;
  };
}

/** Where the request being answered carries what an error points at, so field messages land on the request's own keys. */
export interface ErrorPlace {
  /**
   * The spec's path in the request: "" when the body is the spec, "spec" or "draft" when it is a
   * member of the body. Absent: the spec is a stored one, and an engine refusal names no field.
   */
  spec?: string;
  /** The cut settings' path in the request: "settings", or "" when they are the body's own members. */
  settings?: string;
  /** The field a cut refusal belongs on when it names none itself (and settings are not in the request). */
  cutField?: string;
}

const under = (base: string, path: string) => (base ? `${base}.${path}` : path);

/** Said instead of the root finder's own wording ("The root is not bracketed: f(…)") if it ever reaches a person. */
export const NO_CLOSING_SHAPE =
  "No shape closes with these settings: try fewer periods per turn, another number of lobes or a gentler track.";
/** Added to the engine's time-limit message: what to change. */
export const TIMEOUT_HINT = "Try a coarser tolerance or a simpler shape.";

function fromEngine(error: EngineError, place: ErrorPlace): AppError {
  if (error.code === "timeout") return new AppError("timeout", `${error.message} ${TIMEOUT_HINT}`);
  // The engine's own message is a sentence for people; `where` is the machine-readable spec path, kept as the field key.
  const message = error instanceof NotBracketedError ? NO_CLOSING_SHAPE : error.message;
  const field = error.where && place.spec !== undefined ? under(place.spec, error.where) : undefined;
  return new AppError("bad_request", message, field ? { [field]: [message] } : undefined);
}

function fromCut(error: CutError, place: ErrorPlace): AppError {
  const field = error.field && place.settings !== undefined ? under(place.settings, error.field) : place.cutField;
  return new AppError("bad_request", error.message, field ? { [field]: [error.message] } : undefined);
}

/**
 * Any thrown value as an AppError: the engine's refusals are a 400 with the engine's sentence (a
 * solve past its deadline a 408), cut refusals a 400 on the settings field they name, an outline
 * refusal a 400 with the reader's words, a query's refusal its own kind (400, 404, 409) and words,
 * zod issues a 400 with field messages. Unknown errors are logged (without request data) and hidden
 * behind a 500.
 */
export function toAppError(error: unknown, place: ErrorPlace = {}): AppError {
  if (error instanceof AppError) return error;
  if (error instanceof z.ZodError) return AppError.fromZod(error);
  if (error instanceof Refusal) return new AppError(error.kind, error.message, error.fields);
  if (error instanceof EngineError) return fromEngine(error, place);
  if (error instanceof CutError) return fromCut(error, place);
  if (error instanceof ImportFailure) return new AppError("bad_request", error.message);
  console.error("[axlewright] unexpected error:", error instanceof Error ? (error.stack ?? error.message) : error);
  return new AppError("internal");
}
