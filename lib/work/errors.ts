// Errors across the thread boundary. A worker thread's error reaches the pool as a structured clone,
// which keeps only name, message and stack, so the engine's code and `where`, or the cut field, would
// be lost. The worker sends each typed refusal as plain data and the pool throws the same class again,
// so lib/server/errors.ts maps it exactly as if the work had run on the main thread.
import { CutError, type CutErrorCode } from "@/lib/cut/errors";
import { ImportFailure } from "@/lib/outline-import/common";
import { NotBracketedError } from "@/lib/track/brent";
import { EngineError, type EngineErrorCode } from "@/lib/track/errors";

/** The task was stopped before it finished: its caller went away or its deadline passed. */
export class TaskCancelled extends Error {
  constructor() {
    super("The task was cancelled.");
    this.name = "TaskCancelled";
  }
}

export type SentError =
  | { type: "cancelled" }
  | { type: "engine"; code: EngineErrorCode; message: string; where?: string; notBracketed: boolean }
  | { type: "cut"; code: CutErrorCode; message: string; field?: string }
  | { type: "import"; message: string }
  | { type: "other"; message: string; stack?: string };

export function sendError(error: unknown): SentError {
  if (error instanceof TaskCancelled) return { type: "cancelled" };
  if (error instanceof EngineError)
    return {
      type: "engine",
      code: error.code,
      message: error.message,
      where: error.where,
      notBracketed: error instanceof NotBracketedError,
    };
  if (error instanceof CutError) return { type: "cut", code: error.code, message: error.message, field: error.field };
  if (error instanceof ImportFailure) return { type: "import", message: error.message };
  const e = error instanceof Error ? error : new Error(String(error));
  return { type: "other", message: e.message, stack: e.stack };
}

/** The error the worker sent, as the class it was thrown as (an unknown error keeps its worker stack for the log). */
export function receivedError(sent: SentError): Error {
  switch (sent.type) {
    case "cancelled":
      return new TaskCancelled();
    case "engine":
      return sent.notBracketed
        ? new NotBracketedError(sent.message)
        : new EngineError(sent.code, sent.message, sent.where);
    case "cut":
      return new CutError(sent.code, sent.message, sent.field);
    case "import":
      return new ImportFailure(sent.message);
    default: {
      const e = new Error(sent.message);
      if (sent.stack) e.stack = sent.stack;
      return e;
    }
  }
}
