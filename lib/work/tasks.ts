// Everything the server hands to its worker threads (lib/server/pool.ts runs them; worker.ts is the
// thread's entry). Each task takes and returns plain data (structured clones), never a database
// handle: the server reads the rows, a task does the work. Node only (sharp, pdfkit, archiver).
import sharp from "sharp";
import { assemblySheetPdf } from "@/lib/assembly/pdf";
import { buildAssemblySheet, type SheetContext } from "@/lib/assembly/build";
import type { AssemblySheet, Paper } from "@/lib/assembly/sheet";
import { jobTextFiles, nestItemsFor } from "@/lib/cut";
import { svgToPng } from "@/lib/cut/export/png";
import { jobZip } from "@/lib/cut/export/zip";
import { summariseCutPlan } from "@/lib/cut-plan/summary";
import { checkNest } from "@/lib/cut-plan/verify-nest";
import { animatedPreview } from "@/lib/drawing/animated-preview";
import { previewSvg } from "@/lib/drawing/preview-svg";
import { checkLoads, type LoadsReport } from "@/lib/loads";
import { loadsInputFor, settingsOrDefault, type CutFacts, type LibraryMaterial } from "@/lib/loads/settings";
import type { SheetNestResult } from "@/lib/nest/types";
import { buildJob, planParts, solveHere, type JobContext } from "./job";

type SheetExtras = Omit<SheetContext, "job" | "date"> & { date: string };
/** What every task is given besides its input: the time left before its deadline, ms. */
export interface TaskRun {
  deadlineMs: number;
  /** Throws when the caller has gone away or the deadline has passed: called before each render. */
  stopIfCancelled: () => void;
}

const fileList = (ctx: JobContext, run: TaskRun) =>
  buildJob(ctx, run.deadlineMs).then((job) => {
    const { files, previews } = jobTextFiles(job);
    return ["job.zip", ...files.map((f) => f.name), ...previews.map((p) => p.name)];
  });

export const tasks = {
  /** Nothing: answered once the thread has loaded everything (the pool's warm-up). */
  ping: async () => true,

  solve: (a: { spec: unknown }, run: TaskRun) => solveHere(a.spec, run.deadlineMs),

  /** A revision's still picture (PNG). */
  async revisionPreview(a: { spec: unknown }, run: TaskRun): Promise<Uint8Array> {
    const result = await solveHere(a.spec, run.deadlineMs);
    run.stopIfCancelled();
    return sharp(Buffer.from(previewSvg(result)))
      .png()
      .toBuffer();
  },

  /** The animated picture of a review (WebP, else GIF). */
  async animatedPreview(a: { spec: unknown }, run: TaskRun) {
    const result = await solveHere(a.spec, run.deadlineMs);
    run.stopIfCancelled();
    return animatedPreview(result);
  },

  /** The load-path check of a revision on its own settings (or the library's defaults). */
  async revisionLoads(
    a: {
      spec: unknown;
      revisionLoads: unknown;
      library: LibraryMaterial[];
      cut?: CutFacts;
    },
    run: TaskRun,
  ): Promise<{ report: LoadsReport; stored: boolean }> {
    const result = await solveHere(a.spec, run.deadlineMs);
    const { settings, stored } = settingsOrDefault(a.revisionLoads ?? null, a.library);
    return { report: checkLoads(loadsInputFor(a.spec, settings, a.library, a.cut), result), stored };
  },

  /** A nest made in the browser, checked against the parts rebuilt here; its summary when it passes. */
  async checkCutPlan(
    a: {
      spec: unknown;
      settings: unknown;
      nest: Pick<SheetNestResult, "sheets" | "unplaced" | "seconds" | "cancelled">;
      names: { material: string; sheet: string; machine: string };
      gate: Parameters<typeof summariseCutPlan>[3];
    },
    run: TaskRun,
  ) {
    const { plan } = await planParts(a.spec, a.settings, run.deadlineMs, false);
    const s = plan.settings;
    const items = await nestItemsFor(plan.parts, s);
    const problems = await checkNest({
      items,
      nest: a.nest,
      sheet: { width: s.sheet.length, height: s.sheet.width },
      margin: s.margin,
      spacing: s.spacing,
    });
    if (problems.length) return { problems };
    return { problems, composed: s, ...summariseCutPlan(plan, a.nest, a.names, a.gate) };
  },

  cutFileNames: fileList,

  /** One file of a stored plan by name (job.zip: all of them), or null when the plan has no such file. */
  async cutFile(
    a: { ctx: JobContext; name: string },
    run: TaskRun,
  ): Promise<{ fileName: string; data: Uint8Array } | null> {
    const job = await buildJob(a.ctx, run.deadlineMs);
    run.stopIfCancelled();
    if (a.name === "job.zip") return { fileName: `${job.baseName}.zip`, data: await jobZip(job) };
    const { files, previews } = jobTextFiles(job);
    const file = files.find((f) => f.name === a.name);
    if (file) return { fileName: a.name, data: typeof file.data === "string" ? Buffer.from(file.data) : file.data };
    const preview = previews.find((p) => p.name === a.name);
    return preview ? { fileName: a.name, data: await svgToPng(preview.svg, 1600) } : null;
  },

  /** What the cut page shows of a stored plan: the load check as its files state it, and the file names. */
  async cutPage(ctx: JobContext, run: TaskRun) {
    const job = await buildJob(ctx, run.deadlineMs);
    return { loads: { report: job.loads!, stored: !job.loadsFromDefaults }, files: await fileList(ctx, run) };
  },

  /** Everything that can be ticked on a plan's sheet: each part id, then each joint ("T01/T02"). */
  async tickItems(ctx: JobContext, run: TaskRun): Promise<string[]> {
    const { plan } = await buildJob(ctx, run.deadlineMs);
    const r = plan.run;
    const joints = r ? r.cuts.map((_, i) => `${r.segments[i].id}/${r.segments[i + 1].id}`) : [];
    return [...plan.parts.map((p) => p.id), ...joints];
  },

  async assemblySheet(a: { ctx: JobContext; sheet: SheetExtras }, run: TaskRun): Promise<AssemblySheet> {
    return buildAssemblySheet({ ...a.sheet, job: await buildJob(a.ctx, run.deadlineMs), date: new Date(a.sheet.date) });
  },

  async assemblyPdf(a: { ctx: JobContext; sheet: SheetExtras; paper: Paper }, run: TaskRun) {
    const sheet = await tasks.assemblySheet(a, run);
    run.stopIfCancelled();
    return {
      sheet: { design: sheet.design, project: sheet.project },
      pdf: await assemblySheetPdf(sheet, { paper: a.paper }),
    };
  },
};

export type Tasks = typeof tasks;
export type TaskName = keyof Tasks;
export type TaskInput<K extends TaskName> = Parameters<Tasks[K]>[0];
export type TaskOutput<K extends TaskName> = Awaited<ReturnType<Tasks[K]>>;
