// A stored cut plan's job (parts with labels, tool paths, the load-path check) from plain data the
// server read from the database: the half of every cut-file, assembly-sheet and tick request that
// is pure work, so it runs on a worker thread (lib/work/worker.ts). Built jobs are kept per thread
// by (spec, settings): a plan's files are usually fetched one after another.
import { buildCutParts, kerfParts, revisionBaseName, type JobInput } from "@/lib/cut";
import { loadHersheyFont } from "@/lib/cut/labels/font-file";
import { cutFactsOf } from "@/lib/cut/load-facts";
import { checkLoads } from "@/lib/loads";
import { loadsInputFor, settingsOrDefault, type LibraryMaterial } from "@/lib/loads/settings";
import type { SheetNestResult } from "@/lib/nest/types";
import type { ApprovalStamp } from "@/lib/review/reference";
import { solve, type SolveResult } from "@/lib/track";
import { inputKey, resultCache } from "./result-cache";
import { WORKER_CACHE_BYTES } from "@/lib/validation/limits";

/** What the server reads for a stored plan: the revision, the plan's own settings and nest, the approval now. */
export interface JobContext {
  spec: unknown;
  revisionNumber: number;
  /** The revision's stored load settings (null: the library's defaults). */
  revisionLoads: unknown;
  /** The plan's composed settings, copied in when it was saved. */
  composed: unknown;
  nest: SheetNestResult;
  cutPlanNumber: number;
  unapprovedReason: string | null;
  designName: string;
  approval: ApprovalStamp | null;
  library: LibraryMaterial[];
}

const solved = resultCache<SolveResult>(WORKER_CACHE_BYTES / 2);
const built = resultCache<Pick<JobInput, "result" | "plan" | "toolPaths">>(WORKER_CACHE_BYTES / 2);

/** A solve on this thread, kept by its spec. */
export function solveHere(spec: unknown, deadlineMs: number): Promise<SolveResult> {
  return solved.get(inputKey("solve", spec), () => solve(spec, { deadlineMs }));
}

/** The parts of a revision under a plan's settings, as the browser builds them (labels optional). */
export async function planParts(spec: unknown, settings: unknown, deadlineMs: number, labels: boolean) {
  const result = await solveHere(spec, deadlineMs);
  return { result, plan: buildCutParts(spec, result, settings, labels ? { font: loadHersheyFont() } : {}) };
}

export async function buildJob(c: JobContext, deadlineMs: number): Promise<JobInput> {
  const parts = await built.get(inputKey("job", c.spec, c.composed), async () => {
    const { result, plan } = await planParts(c.spec, c.composed, deadlineMs, true);
    const { paths } = await kerfParts(plan.parts, plan.settings);
    return { result, plan, toolPaths: paths };
  });
  const { settings, stored } = settingsOrDefault(c.revisionLoads ?? null, c.library);
  const loads = checkLoads(loadsInputFor(c.spec, settings, c.library, cutFactsOf(parts.plan)), parts.result);
  return {
    spec: c.spec,
    loads,
    loadsFromDefaults: !stored,
    approval: c.approval,
    unapprovedReason: c.unapprovedReason,
    cutPlanNumber: c.cutPlanNumber,
    baseName: revisionBaseName(c.revisionNumber, parts.plan.settings.project, c.designName),
    design: c.designName,
    revision: c.revisionNumber,
    ...parts,
    nest: c.nest,
  };
}
