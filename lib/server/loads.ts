import "server-only";
// The load-path check on the server, for every page and file that shows cautions (the review page,
// the cut-plan page, the job README and the assembly sheet): the revision's own load settings (or the
// library's defaults), the library's treads, and what a stored cut plan fixes about the track.
import { listShopLibrary } from "@/db/queries/shop";
import type { LoadsReport } from "@/lib/loads";
import type { CutFacts, LibraryMaterial } from "@/lib/loads/settings";
import { SERVER_SOLVE_DEADLINE_MS } from "@/lib/validation/limits";
import { runTask } from "./pool";

export interface ServerLoads {
  report: LoadsReport;
  /** False: no settings were saved with the revision; the report uses the library's defaults. */
  stored: boolean;
}

export async function libraryMaterials(): Promise<LibraryMaterial[]> {
  return (await listShopLibrary({ activeOnly: true })).materials;
}

/** The check of a revision (solved on the worker pool); `cut` when a stored cut plan fixes the board and the spans. */
export async function loadsForRevision(
  revision: { spec: unknown; loads?: unknown },
  cut?: CutFacts,
): Promise<ServerLoads> {
  const input = { spec: revision.spec, revisionLoads: revision.loads ?? null, library: await libraryMaterials(), cut };
  return runTask("revisionLoads", input, { deadlineMs: SERVER_SOLVE_DEADLINE_MS });
}
