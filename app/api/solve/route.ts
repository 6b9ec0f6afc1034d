import { z } from "zod";
import { requireUser } from "@/lib/server/dal";
import { solveAsked } from "@/lib/server/designs";
import { jsonBody, route } from "@/lib/server/route";
import { SPEC_BODY_LIMIT } from "@/lib/validation/limits";

/** Solves a design spec for any signed-in user (on the worker pool); the engine validates the spec itself. */
export const POST = route(async (request) => {
  await requireUser();
  const spec = await jsonBody(request, z.unknown(), SPEC_BODY_LIMIT);
  return solveAsked(spec, request.signal);
});
