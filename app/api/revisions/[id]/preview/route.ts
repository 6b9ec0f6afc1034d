import { requireRevisionAccess } from "@/lib/server/dal";
import { runTask } from "@/lib/server/pool";
import { idParam, route } from "@/lib/server/route";
import { SERVER_SOLVE_DEADLINE_MS } from "@/lib/validation/limits";

// A revision never changes, so its picture never does: it is drawn from the stored spec on request
// (the app keeps no files of its own, the worker pool draws it) and may be cached for good by the browser.
export const GET = route<{ id: string }>(async (request, params) => {
  const { revision } = await requireRevisionAccess(idParam(params.id, "revision"));
  const png = await runTask(
    "revisionPreview",
    { spec: revision.spec },
    { deadlineMs: SERVER_SOLVE_DEADLINE_MS, signal: request.signal },
  );
  return new Response(new Uint8Array(png), {
    headers: { "content-type": "image/png", "cache-control": "private, max-age=31536000, immutable" },
  });
});
