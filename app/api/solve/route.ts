import { z } from "zod";
import { solve } from "@/lib/track";
import { requireUser } from "@/lib/server/dal";
import { toAppError } from "@/lib/server/errors";
import { jsonBody, route } from "@/lib/server/route";
import { SOLVE_ROUTE_DEADLINE_MS, SPEC_BODY_LIMIT } from "@/lib/validation/limits";

/** Solves a design spec for any signed-in user; the engine validates the spec itself. */
export const POST = route(async (request) => {
  await requireUser();
  const spec = await jsonBody(request, z.unknown(), SPEC_BODY_LIMIT);
  try {
    return solve(spec, { deadlineMs: SOLVE_ROUTE_DEADLINE_MS });
  } catch (error) {
    // The body is the spec itself, so an engine refusal's field is its own `where` ("wheel.points[3]").
    throw toAppError(error, { spec: "" });
  }
});
