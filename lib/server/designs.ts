import "server-only";
// Designs and revisions on the server: the engine checks a spec before it is stored, and solves it
// before a revision is saved, so a revision's hash and summary figures are the engine's own. The
// rows themselves are written by db/queries/designs.ts, which only talks to the database.
// `solveStored` is the one way the server solves a spec it already holds (previews, cut plans,
// reviews, comparisons), within the server's deadline.
import { insertDesign, insertRevision, updateDesignRow } from "@/db/queries/designs";
import { summarise } from "@/lib/revision-summary";
import { ENGINE_VERSION, parseSpec, solve, specHash, type DesignSpec, type SolveResult } from "@/lib/track";
import type { LoadsSettings } from "@/lib/validation/loads";
import { SERVER_SOLVE_DEADLINE_MS } from "@/lib/validation/limits";
import type { CurrentUser } from "./dal";
import { toAppError, type ErrorPlace } from "./errors";

/** Checks a spec with the engine's schema; a refusal becomes a 400 with the engine's words, on the field `where` names. */
function validSpec(input: unknown, place: ErrorPlace = { spec: "spec" }): DesignSpec {
  try {
    return parseSpec(input);
  } catch (error) {
    throw toAppError(error, place);
  }
}

/** Solves a spec within the server's deadline; a refusal or a timeout becomes the matching AppError. */
export function solveStored(spec: unknown, options: { place?: ErrorPlace } = {}): SolveResult {
  try {
    return solve(spec, { deadlineMs: SERVER_SOLVE_DEADLINE_MS });
  } catch (error) {
    throw toAppError(error, options.place);
  }
}

export async function createDesign(
  actor: CurrentUser,
  projectId: number,
  input: { name: string; spec: unknown },
): Promise<number> {
  const spec = validSpec(input.spec);
  return insertDesign(actor, projectId, { name: input.name, spec });
}

export async function updateDesign(
  actor: CurrentUser,
  designId: number,
  projectId: number,
  input: { name?: string; draft?: unknown; loads?: LoadsSettings },
): Promise<void> {
  const draft = input.draft !== undefined ? validSpec(input.draft, { spec: "draft" }) : undefined;
  await updateDesignRow(actor, designId, projectId, { name: input.name, draft, loads: input.loads });
}

/**
 * Saves a spec as the design's next revision. The engine solves it first (a spec that does not
 * solve is refused with the engine's message), then the row is written with its number taken under
 * a lock (db/queries/designs.ts insertRevision).
 */
export async function saveRevision(
  actor: CurrentUser,
  designId: number,
  projectId: number,
  input: { spec: unknown; note: string; loads?: LoadsSettings },
): Promise<{ id: number; number: number; specHash: string }> {
  const spec = validSpec(input.spec);
  const result = solveStored(spec, { place: { spec: "spec" } });
  return insertRevision(actor, designId, projectId, {
    spec,
    specHash: specHash(spec),
    engineVersion: ENGINE_VERSION,
    summary: summarise(result),
    loads: input.loads,
    note: input.note,
  });
}
