import "server-only";
// Designs and revisions on the server: the engine checks a spec before it is stored, and solves it
// before a revision is saved, so a revision's hash and summary figures are the engine's own. The
// rows themselves are written by db/queries/designs.ts, which only talks to the database.
// `solveStored` is the one way the server solves a spec it already holds (previews, cut plans,
// reviews, comparisons), within the server's deadline; `solveAsked` solves one sent by a user. Both
// run on the worker pool (pool.ts), and results are kept by spec and engine version within a memory
// bound (a spec never solves differently under one engine version).
import { insertDesign, insertRevision, updateDesignRow } from "@/db/queries/designs";
import { summarise } from "@/lib/revision-summary";
import { ENGINE_VERSION, parseSpec, specHash, type DesignSpec, type SolveResult } from "@/lib/track";
import type { LoadsSettings } from "@/lib/validation/loads";
import { SERVER_SOLVE_DEADLINE_MS, SOLVE_CACHE_BYTES, SOLVE_ROUTE_DEADLINE_MS } from "@/lib/validation/limits";
import { inputKey, resultCache } from "@/lib/work/result-cache";
import type { CurrentUser } from "./dal";
import { toAppError, type ErrorPlace } from "./errors";
import { CANCELLED, runTask } from "./pool";

const solves = resultCache<SolveResult>(Number(process.env.AXLEWRIGHT_SOLVE_CACHE_MB) * 2 ** 20 || SOLVE_CACHE_BYTES);

/** Hits and misses of the solve cache (the bench and the tests read them). */
export const solveCacheStats = () => solves.stats;

async function solveOnPool(spec: unknown, deadlineMs: number, place: ErrorPlace | undefined, signal?: AbortSignal) {
  const key = inputKey(ENGINE_VERSION, spec);
  const run = () => runTask("solve", { spec }, { deadlineMs, signal, place });
  return solves.get(key, run).catch((error: unknown) => {
    // A request that joined another's solve of the same spec, whose caller then went away: solve it for this one.
    if (error instanceof Error && error.message === CANCELLED && !signal?.aborted) return solves.get(key, run);
    throw error;
  });
}

/** Checks a spec with the engine's schema; a refusal becomes a 400 with the engine's words, on the field `where` names. */
function validSpec(input: unknown, place: ErrorPlace = { spec: "spec" }): DesignSpec {
  try {
    return parseSpec(input);
  } catch (error) {
    throw toAppError(error, place);
  }
}

/** Solves a spec within the server's deadline; a refusal or a timeout becomes the matching AppError. */
export function solveStored(spec: unknown, options: { place?: ErrorPlace; signal?: AbortSignal } = {}) {
  return solveOnPool(spec, SERVER_SOLVE_DEADLINE_MS, options.place, options.signal);
}

/** A spec a user sent to be solved (POST /api/solve): the interactive deadline; refusals on the body's own paths. */
export function solveAsked(spec: unknown, signal?: AbortSignal) {
  return solveOnPool(spec, SOLVE_ROUTE_DEADLINE_MS, { spec: "" }, signal);
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
  signal?: AbortSignal,
): Promise<{ id: number; number: number; specHash: string }> {
  const spec = validSpec(input.spec);
  const result = await solveStored(spec, { place: { spec: "spec" }, signal });
  return insertRevision(actor, designId, projectId, {
    spec,
    specHash: specHash(spec),
    engineVersion: ENGINE_VERSION,
    summary: summarise(result),
    loads: input.loads,
    note: input.note,
  });
}
