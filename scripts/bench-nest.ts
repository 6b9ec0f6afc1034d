// `npm run bench` (after the engine bench) or `tsx scripts/bench-nest.ts [--only a,b] [--seconds N]`:
// the nester on the nine ESICUP strip-packing instances in tests/fixtures/nesting, each with a modest
// budget (jakobs1 and shapes0 with the 60 s of their acceptance tests), beside the published average
// of Gardeyn, Vanden Berghe & Wauters 2025 (arXiv:2509.13329; 100 runs of 1200 s each, their
// benchmark logs as tabulated in tests/fixtures/nesting/README.md). Then any sheet-mode cases.
import { readFileSync } from "node:fs";
import { fileURLToPath, pathToFileURL } from "node:url";
import { loadInstance, nestOnSheets, nestStrip, type SheetNestInput } from "../lib/nest";

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

/**
 * Sheet-mode cases. ▼ Add the demo parts here (built with lib/cut), for example:
 *   { name: "demo parts on 2440 × 1220", input: async () => ({ items: await nestItemsFor(parts, settings),
 *     sheet: { width: 2440, height: 1220 }, margin: 10, spacing: 6, seconds: 15, seed: 1 }) },
 */
export const SHEET_CASES: SheetBenchCase[] = [];

const pct = (v: number) => `${(v * 100).toFixed(2)} %`;

export async function runStripCase(name: string, seconds: number, published: number): Promise<void> {
  const inst = loadInstance(JSON.parse(readFileSync(`${FIXTURES}${name}.json`, "utf8")));
  const r = await nestStrip({ items: inst.items, height: inst.height, seconds, seed: 1 });
  console.log(
    `${name.padEnd(10)} ${pct(r.utilisation).padStart(8)}  length ${r.length.toFixed(3).padStart(9)}  ${r.seconds.toFixed(1).padStart(5)} s` +
      `  published ${pct(published)}  ratio ${(r.utilisation / published).toFixed(3)}`,
  );
}

export async function runSheetCase(c: SheetBenchCase): Promise<void> {
  const input = await c.input();
  const r = await nestOnSheets(input);
  const placed = r.sheets.reduce((s, sh) => s + sh.placements.length, 0);
  console.log(
    `${c.name}: ${r.sheets.length} sheet(s), utilisation ${pct(r.utilisation)}, ${placed} placed, ${r.unplaced.length} left out, ${r.seconds.toFixed(1)} s`,
  );
}

async function main(argv: string[]): Promise<void> {
  const only = argv.includes("--only") ? argv[argv.indexOf("--only") + 1].split(",") : undefined;
  const seconds = argv.includes("--seconds") ? Number(argv[argv.indexOf("--seconds") + 1]) : undefined;
  console.log("Nesting, strip mode (seed 1; utilisation = item area / (height × length))");
  for (const [name, budget, published] of STRIP_CASES)
    if (!only || only.includes(name)) await runStripCase(name, seconds ?? budget, published);
  if (SHEET_CASES.length) console.log("Nesting, sheet mode");
  for (const c of SHEET_CASES) if (!only || only.includes(c.name)) await runSheetCase(c);
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) await main(process.argv.slice(2));
