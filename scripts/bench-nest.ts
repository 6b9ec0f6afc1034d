// `npm run bench` (after the engine bench) or `tsx scripts/bench-nest.ts [--only a,b] [--seconds N]`:
// the nester on the nine ESICUP strip-packing instances in tests/fixtures/nesting, each with a modest
// budget (jakobs1 and shapes0 with the 60 s of their acceptance tests), beside the published average
// of Gardeyn, Vanden Berghe & Wauters 2025 (arXiv:2509.13329; 100 runs of 1200 s each, their
// benchmark logs as tabulated in tests/fixtures/nesting/README.md). Before them our own kind of parts
// (scripts/nest-fixtures/track-parts.ts); after them the demo job in sheet mode. Each line prints the
// utilisation, the time to the first layout, the time spent on no-fit polygons and how the run ended.
import { readFileSync } from "node:fs";
import { fileURLToPath, pathToFileURL } from "node:url";
import { performance } from "node:perf_hooks";
import { buildCutParts, nestItemsFor, parseCutSettings } from "../lib/cut";
import { chooseSegmentLengths } from "../lib/cut-plan/segment-lengths";
import { loadInstance, nestOnSheets, nestStrip, type NestInstance, type SheetNestInput } from "../lib/nest";
import { solve } from "../lib/track";
import { trackPartsInstance } from "./nest-fixtures/track-parts";

const FIXTURES = fileURLToPath(new URL("../tests/fixtures/nesting/", import.meta.url));

/** Instance, budget in seconds, published average utilisation (arXiv:2509.13329). */
export const STRIP_CASES: Array<[name: string, seconds: number, published: number]> = [
  ["jakobs1", 60, 0.8908],
  ["jakobs2", 15, 0.8476],
  ["shapes0", 60, 0.6859],
  ["fu", 15, 0.9223],
  ["dagli", 15, 0.8926],
  ["albano", 15, 0.8947],
  ["marques", 15, 0.9093],
  ["shirts", 15, 0.8966],
  ["trousers", 15, 0.9173],
];

export interface SheetBenchCase {
  name: string;
  /** The nesting input; its `seconds` is the budget. */
  input: () => SheetNestInput | Promise<SheetNestInput>;
}

/** The demo job (docs/product.md §3): 6.0 m of 400 mm square-wheel track, two lines, on 2440 × 1220 plywood. */
const DEMO_SPEC = {
  mode: "track-for-wheel",
  units: "mm",
  wheel: { kind: "polygon", sides: 4, side: 400, cornerRadius: 0 },
} as const;
const DEMO_SETTINGS = { runLength: 6000, project: "Square-wheel trike run" };

async function demoJob(seconds: number): Promise<SheetNestInput> {
  const settings = parseCutSettings(DEMO_SETTINGS);
  const plan = buildCutParts(DEMO_SPEC, solve(DEMO_SPEC), settings);
  return {
    items: await nestItemsFor(plan.parts, plan.settings),
    sheet: { width: settings.sheet.length, height: settings.sheet.width },
    margin: settings.margin,
    spacing: settings.spacing,
    seconds,
    seed: 1,
  };
}

export const SHEET_CASES: SheetBenchCase[] = [{ name: "demo-job", input: () => demoJob(15) }];

/** The demo job with the joints chosen for the sheet (lib/cut-plan/segment-lengths.ts), as the cut page does. */
async function runDemoWithChosenJoints(seconds: number): Promise<void> {
  const t0 = performance.now();
  const c = await chooseSegmentLengths({
    spec: DEMO_SPEC,
    result: solve(DEMO_SPEC),
    settings: DEMO_SETTINGS,
    seconds,
    seed: 1,
  });
  const wall = (performance.now() - t0) / 1000;
  console.log(
    `demo-job, joints chosen: ${c.chosen.sheets} sheet(s) (area bound ${c.chosen.nest.areaBound}) at ${c.chosen.cuts.join(", ")} mm` +
      ` (${c.chosen.periods.join(" + ")} periods), default ${c.default.sheets} sheet(s) at ${c.default.cuts.map((v) => v.toFixed(1)).join(", ")} mm;` +
      ` ${c.evaluated} of ${c.candidates} choices nested, run ${secs(wall)} (budget ${seconds} s), ended ${c.ended}`,
  );
}

const pct = (v: number) => `${(v * 100).toFixed(2)} %`;
const secs = (v: number) => `${v.toFixed(1).padStart(5)} s`;

function timings(r: { timings?: { firstLayout: number; noFitPolygons: number }; ended?: string }): string {
  return `  first layout ${secs(r.timings?.firstLayout ?? 0)}  no-fit ${secs(r.timings?.noFitPolygons ?? 0)}  ended ${r.ended}`;
}

async function runStrip(name: string, inst: NestInstance, seconds: number, target: string): Promise<void> {
  const t0 = performance.now();
  const r = await nestStrip({ items: inst.items, height: inst.height, seconds, seed: 1 });
  const wall = (performance.now() - t0) / 1000;
  console.log(
    `${name.padEnd(16)} ${pct(r.utilisation).padStart(8)}  length ${r.length.toFixed(3).padStart(9)}  run ${secs(wall)} (budget ${seconds} s)` +
      timings(r) +
      `  ${target}`,
  );
}

export async function runStripCase(name: string, seconds: number, published: number): Promise<void> {
  const inst = loadInstance(JSON.parse(readFileSync(`${FIXTURES}${name}.json`, "utf8")));
  const r = await nestStrip({ items: inst.items, height: inst.height, seconds, seed: 1 });
  console.log(
    `${name.padEnd(16)} ${pct(r.utilisation).padStart(8)}  length ${r.length.toFixed(3).padStart(9)}  ${secs(r.seconds)}` +
      timings(r) +
      `  published ${pct(published)}  ratio ${(r.utilisation / published).toFixed(3)}`,
  );
}

export async function runSheetCase(c: SheetBenchCase): Promise<void> {
  const input = await c.input();
  const t0 = performance.now();
  const r = await nestOnSheets(input);
  const wall = (performance.now() - t0) / 1000;
  const placed = r.sheets.reduce((s, sh) => s + sh.placements.length, 0);
  console.log(
    `${c.name}: ${r.sheets.length} sheet(s) (area bound ${r.areaBound}), utilisation ${pct(r.utilisation)}, ${placed} placed, ${r.unplaced.length} left out, run ${secs(wall)} (budget ${input.seconds} s)` +
      timings(r),
  );
}

/** Our own kind of parts (scripts/nest-fixtures/track-parts.ts), at 20 s, and resampled to 2000 vertices at 3 s. */
async function runTrackParts(): Promise<void> {
  await runStrip("track-parts", loadInstance(trackPartsInstance()), 20, "target ≥ 75 % within 21 s");
  await runStrip("track-parts-2000", loadInstance(trackPartsInstance(2000)), 3, "target: complete within 4 s");
}

async function main(argv: string[]): Promise<void> {
  const only = argv.includes("--only") ? argv[argv.indexOf("--only") + 1].split(",") : undefined;
  const seconds = argv.includes("--seconds") ? Number(argv[argv.indexOf("--seconds") + 1]) : undefined;
  console.log("Nesting, strip mode (seed 1; utilisation = item area / (height × length))");
  if (!only || only.includes("track-parts")) await runTrackParts();
  for (const [name, budget, published] of STRIP_CASES)
    if (!only || only.includes(name)) await runStripCase(name, seconds ?? budget, published);
  console.log("Nesting, sheet mode");
  for (const c of SHEET_CASES) if (!only || only.includes(c.name)) await runSheetCase(c);
  if (!only || only.includes("demo-job")) await runDemoWithChosenJoints(15);
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) await main(process.argv.slice(2));
