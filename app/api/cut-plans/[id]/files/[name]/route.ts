import { requireStoredPlan, jobForPlan } from "@/lib/server/cut-plans";
import { jobTextFiles } from "@/lib/cut/export/job";
import { svgToPng } from "@/lib/cut/export/png";
import { jobZip } from "@/lib/cut/export/zip";
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
 * project's fabricator or an admin (clients and installers get 403). Made on request from the plan.
 */
export const GET = route<{ id: string; name: string }>(async (_request, params) => {
  await requireUser();
  const plan = await requireStoredPlan(idParam(params.id, "cut plan"));
  const access = await requireCutPlanAccess(plan.revisionId);
  const name = typeof params.name === "string" ? params.name : "";
  if (!/^[a-z0-9][a-z0-9.-]{0,160}$/i.test(name)) throw new AppError("not_found", "No such file in this cut plan.");
  const job = await jobForPlan(plan, access.revision, access.designName);
  let body: Buffer | string;
  let fileName = name;
  if (name === "job.zip") {
    body = await jobZip(job);
    fileName = `${job.baseName}.zip`;
  } else {
    const { files, previews } = jobTextFiles(job);
    const file = files.find((f) => f.name === name);
    const preview = previews.find((p) => p.name === name);
    if (file) body = file.data;
    else if (preview) body = await svgToPng(preview.svg, 1600);
    else throw new AppError("not_found", "No such file in this cut plan.");
  }
  const ext = fileName.split(".").pop() ?? "";
  const bytes = typeof body === "string" ? Buffer.from(body, "utf8") : body;
  return new Response(new Uint8Array(bytes), {
    headers: {
      "content-type": TYPES[ext] ?? "application/octet-stream",
      "content-disposition": `attachment; filename="${fileName}"`,
      "cache-control": "private, no-store",
      "x-content-type-options": "nosniff",
    },
  });
});
