import { z } from "zod";
import { isEngineError, solve } from "@/lib/track";
import { requireUser } from "@/lib/server/dal";
import { AppError } from "@/lib/server/errors";
import { jsonBody, route } from "@/lib/server/route";

// A spec with an uploaded outline of a few thousand points fits well inside this.
const SPEC_BODY_LIMIT = 512 * 1024;
// The engine checks this deadline cooperatively and stops with a "timeout" error.
const SOLVE_TIME_LIMIT_MS = 5_000;

/** Solves a design spec for any signed-in user; the engine validates the spec itself. */
export const POST = route(async (request) => {
  await requireUser();
  const spec = await jsonBody(request, z.unknown(), SPEC_BODY_LIMIT);
  try {
    return solve(spec, { deadlineMs: SOLVE_TIME_LIMIT_MS });
  } catch (error) {
    if (!isEngineError(error)) throw error;
    const message = error.where ? `${error.message} (at ${error.where})` : error.message;
    if (error.code === "timeout") throw new AppError("timeout", `${message} Try a coarser tolerance or a simpler shape.`);
    throw new AppError("bad_request", message, error.where ? { [error.where]: [error.message] } : undefined);
  }
});
