import { listLog } from "@/db/queries/build-log";
import { addLogEntry } from "@/lib/server/build-log";
import { requireProjectAccess } from "@/lib/server/dal";
import { created, idParam, route } from "@/lib/server/route";

/** The project's build log, newest first (`?before=<entry id>` pages back), for any member. */
export const GET = route<{ id: string }>(async (request, params) => {
  const access = await requireProjectAccess(idParam(params.id, "project"));
  const before = Number(new URL(request.url).searchParams.get("before"));
  const entries = await listLog(access.projectId, {
    before: Number.isSafeInteger(before) && before > 0 ? before : undefined,
  });
  return {
    entries: entries.map((e) => ({
      ...e,
      photos: e.photos.map((p) => ({ ...p, url: `/api/photos/${p.id}`, thumbUrl: `/api/photos/${p.id}?size=thumb` })),
    })),
  };
});

/** A new entry (multipart: kind, text, parts?, photos[]): the shop, the crew and admins; a client adds text notes. */
export const POST = route<{ id: string }>(async (request, params) => {
  const access = await requireProjectAccess(idParam(params.id, "project"));
  return created(await addLogEntry(access, request));
});
