import { PAPER_SIZES, type Paper } from "@/lib/assembly/sheet";
import { revisionBaseName } from "@/lib/cut";
import { assemblySheetPdfFor, bumpLimitParam, requireSheetAccess } from "@/lib/server/assembly";
import { AppError } from "@/lib/server/errors";
import { idParam, route } from "@/lib/server/route";

/** The assembly sheet as a PDF made on the server (`?paper=a4|letter`, `&units=in` for inches beside mm, `&limit=` the bump in mm the tolerances allow): any member of the project. */
export const GET = route<{ id: string }>(async (request, params) => {
  const access = await requireSheetAccess(idParam(params.id, "cut plan"));
  const q = new URL(request.url).searchParams;
  const paper = (q.get("paper") ?? "a4").toLowerCase();
  if (!(paper in PAPER_SIZES))
    throw new AppError("bad_request", 'The paper must be "a4" or "letter".', { paper: ["a4 or letter"] });
  const units = q.get("units");
  const { sheet, pdf } = await assemblySheetPdfFor(
    access.plan,
    access,
    {
      inches: units === "in" ? true : units === "mm" ? false : undefined,
      bumpLimit: bumpLimitParam(q.get("limit")),
      paper: paper as Paper,
    },
    request.signal,
  );
  const name = `${revisionBaseName(sheet.design.revision, sheet.project.name, sheet.design.name)}-assembly-${paper}.pdf`;
  return new Response(new Uint8Array(pdf), {
    headers: {
      "content-type": "application/pdf",
      "content-disposition": `attachment; filename="${name}"`,
      "cache-control": "private, no-store",
      "x-content-type-options": "nosniff",
    },
  });
});
