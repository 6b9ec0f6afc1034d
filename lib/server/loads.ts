import "server-only";
// The load-path check on the server, for every page and file that shows cautions (the review page,
// the cut-plan page, the job README and the assembly sheet): the revision's own load settings (or the
// library's defaults), the library's treads, and what a stored cut plan fixes about the track.
import { listShopLibrary } from "@/db/queries/shop";
import { checkLoads, type LoadsReport } from "@/lib/loads";
import { loadsInputFor, settingsOrDefault, type CutFacts, type LibraryMaterial } from "@/lib/loads/settings";
import type { SolveResult } from "@/lib/track";

export interface ServerLoads {
  report: LoadsReport;
  /** False: no settings were saved with the revision; the report uses the library's defaults. */
  stored: boolean;
}

export async function libraryMaterials(): Promise<LibraryMaterial[]> {
  return (await listShopLibrary({ activeOnly: true })).materials;
}

/** The check of a solved revision; `cut` when a stored cut plan fixes the board and the spans. */
export async function loadsForRevision(
  revision: { spec: unknown; loads?: unknown },
  result: SolveResult,
  cut?: CutFacts,
): Promise<ServerLoads> {
  const library = await libraryMaterials();
  const { settings, stored } = settingsOrDefault(revision.loads ?? null, library);
  return { report: checkLoads(loadsInputFor(revision.spec, settings, library, cut), result), stored };
}
