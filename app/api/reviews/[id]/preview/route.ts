import { findRevision } from "@/db/queries/designs";
import { requireReviewAccess } from "@/lib/server/dal";
import { AppError } from "@/lib/server/errors";
import { runTask } from "@/lib/server/pool";
import { idParam, route } from "@/lib/server/route";
import { SERVER_SOLVE_DEADLINE_MS } from "@/lib/validation/limits";

// The animated picture the review e-mail carried, for members: made again from the frozen revision
// (the app keeps no files; the worker pool draws it), so it is the same picture and may be cached for good.
export const GET = route<{ id: string }>(async (request, params) => {
  const { review } = await requireReviewAccess(idParam(params.id, "review"));
  const found = await findRevision(review.revisionId);
  if (!found) throw new AppError("not_found", "No such revision.");
  const picture = await runTask(
    "animatedPreview",
    { spec: found.revision.spec },
    { deadlineMs: SERVER_SOLVE_DEADLINE_MS, signal: request.signal },
  );
  return new Response(new Uint8Array(picture.data), {
    headers: {
      "content-type": picture.contentType,
      "cache-control": "private, max-age=31536000, immutable",
      "x-content-type-options": "nosniff",
    },
  });
});
