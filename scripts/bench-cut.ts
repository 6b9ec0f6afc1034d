// npm run bench, cut plans: the demo job ("Square-wheel trike run": 6.0 m of 400 mm square-wheel
// track, 18 mm birch plywood on 2440 × 1220 mm sheets, a 6 mm router) from spec to parts, nest and
// files, with times and the stock used. Prints figures; it asserts nothing (targets live here, not
// in timed tests).
import { performance } from "node:perf_hooks";
import { buildCutParts, kerfParts, nestItemsFor, parseCutSettings } from "@/lib/cut";
import { regionArea } from "@/lib/geometry/ring";
import { loadHersheyFont } from "@/lib/cut/labels/font-file";
import { jobZip } from "@/lib/cut/export/zip";
import { nestOnSheets } from "@/lib/nest";
import { solve } from "@/lib/track";

const SPEC = { mode: "track-for-wheel", units: "mm", wheel: { kind: "polygon", sides: 4, side: 400, cornerRadius: 0 } };
const SECONDS = Number(process.env.BENCH_CUT_SECONDS ?? 15);

function median(xs: number[]) {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}

const result = solve(SPEC);
const settings = parseCutSettings({ runLength: 6000, project: "Square-wheel trike run" });
const font = loadHersheyFont();
const buildMs: number[] = [];
let plan = buildCutParts(SPEC, result, settings, { font });
for (let i = 0; i < 9; i++) {
  const t = performance.now();
  plan = buildCutParts(SPEC, result, settings, { font });
  buildMs.push(performance.now() - t);
}
const t0 = performance.now();
const { paths } = await kerfParts(plan.parts, plan.settings);
const kerfMs = performance.now() - t0;
const items = await nestItemsFor(plan.parts, plan.settings, paths);
const partArea = plan.parts.reduce((a, p) => a + p.quantity * regionArea(p.region), 0);
const t1 = performance.now();
const nest = await nestOnSheets({
  items,
  sheet: { width: 2440, height: 1220 },
  margin: settings.margin,
  spacing: settings.spacing,
  seconds: SECONDS,
  seed: 1,
});
const nestS = (performance.now() - t1) / 1000;
const t2 = performance.now();
const zip = await jobZip({ baseName: "bench", result, plan, toolPaths: paths, nest });
const zipMs = performance.now() - t2;
const sheets = nest.sheets.filter((s) => s.placements.length).length;

console.log("\ncut plan — demo job (6.0 m, 400 mm square wheels, 2440 × 1220 mm sheets, 6 mm router)");
console.log(`  parts             ${plan.parts.length} kinds, ${plan.parts.reduce((n, p) => n + p.quantity, 0)} to cut`);
console.log(`  build parts       ${median(buildMs).toFixed(1)} ms (median of 9)`);
console.log(`  kerf offsets      ${kerfMs.toFixed(1)} ms`);
console.log(
  `  nest (budget ${SECONDS} s) ${nestS.toFixed(1)} s: ${sheets} sheet(s), ${((100 * partArea) / (sheets * 2440 * 1220)).toFixed(1)} % of the stock used (nominal part area), ${nest.unplaced.length} unplaced`,
);
console.log(
  `  lower bound       ${Math.ceil(partArea / (2420 * 1200))} sheet(s) by area alone (usable 2420 × 1200 mm)`,
);
console.log(`  files (ZIP)       ${zipMs.toFixed(0)} ms, ${(zip.length / 1024).toFixed(0)} KiB`);
