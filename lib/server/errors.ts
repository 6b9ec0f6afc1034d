// One typed error for every failure the app reports: an HTTP status and a plain message (plus field
// messages for bad input). Route handlers turn it into JSON; server actions into form state.
import { z } from "zod";

export type ErrorKind = "bad_request" | "unauthorized" | "forbidden" | "not_found" | "conflict" | "unprocessable" | "method_not_allowed" | "too_large" | "unsupported" | "too_many" | "timeout" | "unavailable" | "internal";

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

  toBody(): ErrorBody {
    return { status: this.status, message: this.message, ...(this.fields ? { fields: this.fields } : {}) };
  }

  static fromZod(error: z.ZodError, message = "Some fields need attention."): AppError {
    return new AppError("bad_request", message, z.flattenError(error).fieldErrors as FieldErrors);
  }
}

/** Any thrown value as an AppError; unknown errors are logged (without request data) and hidden. */
export function toAppError(error: unknown): AppError {
  if (error instanceof AppError) return error;
  if (error instanceof z.ZodError) return AppError.fromZod(error);
  console.error("[axlewright] unexpected error:", error instanceof Error ? error.stack ?? error.message : error);
  return new AppError("internal");
}
