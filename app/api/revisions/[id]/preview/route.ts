import sharp from "sharp";
import { previewSvg } from "@/lib/drawing/preview-svg";
import { requireRevisionAccess } from "@/lib/server/dal";
import { solveStored } from "@/lib/server/designs";
import { idParam, route } from "@/lib/server/route";

// A revision never changes, so its picture never does: it is drawn from the stored spec on request
// (the app keeps no files of its own) and may be cached for good by the browser.
export const GET = route<{ id: string }>(async (_request, params) => {
  const { revision } = await requireRevisionAccess(idParam(params.id, "revision"));
  const result = solveStored(revision.spec);
  const png = await sharp(Buffer.from(previewSvg(result)))
    .png()
    .toBuffer();
  return new Response(new Uint8Array(png), {
    headers: { "content-type": "image/png", "cache-control": "private, max-age=31536000, immutable" },
  });
});
