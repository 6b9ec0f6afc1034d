import { findRevision } from "@/db/queries/designs";
import { animatedPreview } from "@/lib/drawing/animated-preview";
import { requireReviewAccess } from "@/lib/server/dal";
import { solveStored } from "@/lib/server/designs";
import { AppError } from "@/lib/server/errors";
import { idParam, route } from "@/lib/server/route";

// The animated picture the review e-mail carried, for members: made again from the frozen revision
// (the app keeps no files), so it is the same picture and may be cached for good.
export const GET = route<{ id: string }>(async (_request, params) => {
  const { review } = await requireReviewAccess(idParam(params.id, "review"));
  const found = await findRevision(review.revisionId);
  if (!found) throw new AppError("not_found", "No such revision.");
  const picture = await animatedPreview(solveStored(found.revision.spec));
  return new Response(new Uint8Array(picture.data), {
    headers: {
      "content-type": picture.contentType,
      "cache-control": "private, max-age=31536000, immutable",
      "x-content-type-options": "nosniff",
    },
  });
});
