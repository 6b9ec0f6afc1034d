import { approvalOf } from "@/db/queries/reviews";
import { requireRevisionAccess } from "@/lib/server/dal";
import { AppError } from "@/lib/server/errors";
import { refuseChanges } from "@/lib/server/immutable";
import { signOffJson } from "@/lib/server/reviews";
import { idParam, route } from "@/lib/server/route";

const access = (params: { id: string }) => requireRevisionAccess(idParam(params.id, "revision"));

/** The revision's approval, for any member; 404 when the client has not approved it. */
export const GET = route<{ id: string }>(async (_request, params) => {
  const a = await access(params);
  const signOff = await approvalOf(a.revision.id);
  if (!signOff) throw new AppError("not_found", `R${a.revision.number} has no client approval.`);
  return { signOff: signOffJson(signOff, { withOrigin: a.canManage }) };
});

export const { PUT, PATCH, DELETE } = refuseChanges(
  access,
  "GET",
  "A sign-off is permanent: it cannot be changed or removed.",
);
