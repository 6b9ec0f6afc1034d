import { findPhoto } from "@/db/queries/build-log";
import { requireProjectAccess, requireUser } from "@/lib/server/dal";
import { AppError, notFoundAs } from "@/lib/server/errors";
import { idParam, route } from "@/lib/server/route";
import { getObject } from "@/lib/server/storage";

// A build-log photo (or `?size=thumb`, its 480 px thumbnail), for members of its project only: the
// bucket is private and a photo's only address is this route, which checks who is asking.
export const GET = route<{ id: string }>(async (request, params) => {
  await requireUser();
  const photo = await findPhoto(idParam(params.id, "photo"));
  if (!photo) throw new AppError("not_found", "No such photo.");
  await requireProjectAccess(photo.projectId).catch(notFoundAs("No such photo."));
  const thumb = new URL(request.url).searchParams.get("size") === "thumb";
  const object = await getObject(thumb ? photo.thumbKey : photo.objectKey);
  return new Response(new Uint8Array(object.body), {
    headers: {
      "content-type": thumb ? "image/webp" : photo.contentType,
      "content-length": String(object.body.length),
      "cache-control": "private, max-age=86400",
      "x-content-type-options": "nosniff",
      "content-security-policy": "default-src 'none'",
    },
  });
});
