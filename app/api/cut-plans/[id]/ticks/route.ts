import { requireSheetAccess } from "@/lib/server/assembly";
import { tick, ticksOf } from "@/lib/server/installation-ticks";
import { created, idParam, jsonBody, route } from "@/lib/server/route";
import { tickSchema } from "@/lib/validation/build-log";

/** The plan's installation progress: each part and joint, ticked or not (any member). */
export const GET = route<{ id: string }>(async (_request, params) =>
  ticksOf(await requireSheetAccess(idParam(params.id, "cut plan"))),
);

/** Ticks (or unticks) a part or a joint as installed; each writes a build-log entry. The crew, the shop, admins. */
export const POST = route<{ id: string }>(async (request, params) => {
  const access = await requireSheetAccess(idParam(params.id, "cut plan"));
  return created(await tick(access, await jsonBody(request, tickSchema)));
});
