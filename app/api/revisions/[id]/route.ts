import { requireRevisionAccess } from "@/lib/server/dal";
import { AppError } from "@/lib/server/errors";
import { idParam, route } from "@/lib/server/route";

export const GET = route<{ id: string }>(async (_request, params) => {
  const { revision, designName, projectId } = await requireRevisionAccess(idParam(params.id, "revision"));
  return {
    revision: {
      id: revision.id,
      designId: revision.designId,
      number: revision.number,
      spec: revision.spec,
      specHash: revision.specHash,
      engineVersion: revision.engineVersion,
      summary: revision.summary,
      loads: revision.loads,
      note: revision.note,
      createdAt: revision.createdAt.toISOString(),
    },
    design: { id: revision.designId, name: designName, projectId },
  };
});

// A revision never changes: edits go into the design's draft and are saved as a new revision.
const immutable = route<{ id: string }>(async (_request, params) => {
  await requireRevisionAccess(idParam(params.id, "revision"));
  throw new AppError("conflict", "Revisions are immutable: copy it into the draft and save a new revision.");
});
export const PATCH = immutable;
export const PUT = immutable;
export const DELETE = immutable;
