import { jobContext, planFile, requireStoredPlan } from "@/lib/server/cut-plans";
import { requireCutPlanAccess, requireUser } from "@/lib/server/dal";
import { AppError } from "@/lib/server/errors";
import { idParam, route } from "@/lib/server/route";

const TYPES: Record<string, string> = {
  dxf: "application/dxf",
  svg: "image/svg+xml",
  png: "image/png",
  csv: "text/csv; charset=utf-8",
  txt: "text/plain; charset=utf-8",
  zip: "application/zip",
};

/**
 * One file of a stored cut plan, or `job.zip` with all of them. Cut files are the shop's: the
 * project's fabricator or an admin (clients and installers get 403). Made on request from the plan, on the worker pool.
 */
export const GET = route<{ id: string; name: string }>(async (request, params) => {
  await requireUser();
  const plan = await requireStoredPlan(idParam(params.id, "cut plan"));
  const access = await requireCutPlanAccess(plan.revisionId);
  const name = typeof params.name === "string" ? params.name : "";
  if (!/^[a-z0-9][a-z0-9.-]{0,160}$/i.test(name)) throw new AppError("not_found", "No such file in this cut plan.");
  const { fileName, data } = await planFile(
    await jobContext(plan, access.revision, access.designName),
    name,
    request.signal,
  );
  const ext = fileName.split(".").pop() ?? "";
  return new Response(new Uint8Array(data), {
    headers: {
      "content-type": TYPES[ext] ?? "application/octet-stream",
      "content-disposition": `attachment; filename="${fileName}"`,
      "cache-control": "private, no-store",
      "x-content-type-options": "nosniff",
    },
  });
});
