// `npm run bench`: engine timings (medians) and accuracy, each beside the plain numeric script of
// scripts/bench-plain.ts (recursive adaptive G7/K15, Brent, golden section, no tables, no closed
// forms) computing the same outputs, with the time ratio. Targets (issue 3, tightened by issue 14):
// a polygon's track ≤ 0.6 ms and other tracks ≤ 5 ms (the studio's geometry stage: sampling and
// figures included); partner geometry ≤ 3 ms; wheel for a track with closure ≤ 30 ms; the
// closure-options table ≤ 5 ms; the rolling check ≤ 20 ms for each preset; every task ≥ 10× the
// plain script. Accuracy: the plain script's outputs agree with the engine's to 1e-11 (relative for
// scalars, of the size for points), or the line says they did not; axle deviation ≤ 1e-6 of size.
import { presetById } from "../lib/studio/presets";
import { solve, solveInStages } from "../lib/track";
import { Deadline } from "../lib/track/deadline";
import type { Pt } from "../lib/track/sampling";
import { rollInputOf } from "../lib/track/solve";
import { checkPairRoll, checkTrackRoll } from "../lib/track/rolling-check";
import { buildTrack } from "../lib/track/tracks";
import { wheelFromTrack } from "../lib/track/wheel-for-track";
import { buildWheel, TAU } from "../lib/track/wheels";
import {
  plainAxleHeight,
  plainPairRoll,
  plainPartner,
  plainTrackForWheel,
  plainTrackRoll,
  plainWheelForTrack,
} from "./bench-plain";
import { median } from "./bench-median";

const dl = new Deadline();
const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);
const e1 = (v: number) => v.toExponential(1);
const missed: string[] = [];

function line(name: string, ms: number, target: number, plainMs: number, agree: boolean, extra: string) {
  const ratio = plainMs / ms;
  const fails = [ms <= target ? "" : "time", ratio >= 10 ? "" : "ratio", agree ? "" : "accuracy"].filter(Boolean);
  if (fails.length) missed.push(`${name} (${fails.join(", ")})`);
  console.log(
    `${name.padEnd(46)} ${ms.toFixed(3).padStart(8)} ms (≤ ${target})  plain ${plainMs.toFixed(2).padStart(8)} ms` +
      `  ${ratio.toFixed(1).padStart(6)}× (≥ 10)${fails.length ? `  MISSED: ${fails.join(", ")}` : ""}\n${" ".repeat(48)}${extra}`,
  );
}

const maxDev = (pts: Pt[], y: (x: number) => number) => Math.max(...pts.map(([x, v]) => Math.abs(v - y(x))));

console.log(`Axlewright engine bench (Node ${process.version}); medians of repeated runs.\n`);

function trackCase(
  name: string,
  id: string,
  exactPeriod: number,
  exactY: (x: number) => number,
  size: number,
  target: number,
) {
  const spec = presetById(id)!.spec;
  const ms = median(() => solveInStages(spec).geometry, 41);
  const g = solveInStages(spec).geometry;
  const ws = (spec as { wheel: Parameters<typeof buildWheel>[0] }).wheel;
  const wheel = buildWheel(ws);
  const tol = 0.01;
  let plain = plainTrackForWheel(wheel.r, wheel.symmetry, wheel.corners, tol);
  const plainMs = median(() => (plain = plainTrackForWheel(wheel.r, wheel.symmetry, wheel.corners, tol)), 5);
  const eErr = maxDev(g.track!.points, exactY) / size;
  const pErr = maxDev(plain.track.pts, exactY) / size;
  const agree = rel(plain.period, g.period!) <= 1e-11 && pErr <= 1e-11;
  line(
    name,
    ms,
    target,
    plainMs,
    agree,
    `engine: period err ${e1(rel(g.period!, exactPeriod))}, profile err ${e1(eErr)} of size, ${g.track!.points.length} pts; ` +
      `plain: period err ${e1(rel(plain.period, exactPeriod))}, profile err ${e1(pErr)}, ${plain.track.pts.length} pts`,
  );
}

{
  const A = 200; // the square preset: side 400
  const P = 2 * A * Math.asinh(1);
  trackCase(
    "track: square (preset), geometry stage",
    "square",
    P,
    (x) => -A * Math.cosh((x - (x > P / 2 ? P : 0)) / A),
    A * Math.SQRT2,
    0.6,
  );
  const a = 100;
  const b = 80;
  const e = Math.sqrt(1 - (b * b) / (a * a));
  trackCase(
    "track: focal ellipse (preset), geometry stage",
    "ellipse-focus",
    TAU * b,
    (x) => -a + a * e * Math.cos(x / b),
    a * (1 + e),
    5,
  );
}

{
  const spec = presetById("sine-track")!.spec;
  const [A, P, k] = [10, 100, 4];
  const hExact = Math.sqrt(((k * P) / TAU) ** 2 + A * A); // ∫dx/(h − A sin) = P/√(h² − A²)
  const ms = median(() => solveInStages(spec).geometry, 21);
  const g = solveInStages(spec).geometry;
  const y = (x: number) => A * Math.sin((TAU * x) / P);
  let plain = plainWheelForTrack(y, P, k, -A, A, 0.01);
  const plainMs = median(() => (plain = plainWheelForTrack(y, P, k, -A, A, 0.01)), 3);
  // The plain wheel's vertices against the engine's wheel at the same track parameters.
  const wf = wheelFromTrack(buildTrack({ kind: "sine", amplitude: A, period: P }), g.axleHeight!, k, 1, dl);
  let ptErr = 0;
  plain.wheel.u.forEach((s, i) => {
    const q = wf.point(0, s);
    ptErr = Math.max(ptErr, Math.hypot(q[0] - plain.wheel.pts[i][0], q[1] - plain.wheel.pts[i][1]));
  });
  const size = hExact + A;
  line(
    "wheel for sine track (preset, k = 4), geometry",
    ms,
    30,
    plainMs,
    rel(plain.h, g.axleHeight!) <= 1e-11 && ptErr <= 1e-11 * size,
    `engine: h err ${e1(rel(g.axleHeight!, hExact))}; plain: h err ${e1(rel(plain.h, hExact))}, ` +
      `closure ${e1(Math.abs(plain.closure - TAU / k))} rad, wheel points off the engine's by ${e1(ptErr / size)} of size`,
  );
}

for (const lobes of [1, 4]) {
  const ws = { kind: "polygon", sides: 4, inradius: 100, cornerRadius: 0 } as const;
  const spec = { mode: "partner-wheel", units: "mm", wheel: ws, lobes };
  const ms = median(() => solveInStages(spec).geometry, 21);
  const g = solveInStages(spec).geometry;
  const w = buildWheel(ws);
  let plain = plainPartner(w.r, 4, lobes, w.corners, w.rMin, w.rMax, 0.01);
  const plainMs = median(() => (plain = plainPartner(w.r, 4, lobes, w.corners, w.rMin, w.rMax, 0.01)), 3);
  line(
    `partner of the square, ${lobes} lobe${lobes > 1 ? "s" : ""}, geometry`,
    ms,
    3,
    plainMs,
    rel(plain.a, g.centreDistance!) <= 1e-11,
    `centre distance: engine ${g.centreDistance!.toPrecision(15)}, plain ${plain.a.toPrecision(15)} ` +
      `(rel diff ${e1(rel(plain.a, g.centreDistance!))}); plain closure ${e1(Math.abs(plain.closure - TAU / lobes))} rad`,
  );
}

{
  const spec = presetById("sine-track")!.spec;
  const staged = solveInStages(spec);
  const ms = median(() => staged.options(), 21);
  const opts = staged.options()!;
  const y = (x: number) => 10 * Math.sin((TAU * x) / 100);
  let plainH: number[] = [];
  const plainMs = median(() => (plainH = [1, 2, 3, 4, 5, 6].map((k) => plainAxleHeight(y, 100, k, -10, 10))), 3);
  const exact = (k: number) => Math.sqrt(((k * 100) / TAU) ** 2 + 100);
  const eErr = Math.max(...opts.map((o) => rel(o.axleHeight!, exact(o.periodsPerTurn!))));
  const pErr = Math.max(...plainH.map((h, i) => rel(h, exact(i + 1))));
  line(
    "closure options (sine-track preset, k = 1..6)",
    ms,
    5,
    plainMs,
    opts.length === 6 && Math.max(...plainH.map((h, i) => rel(h, opts[i].axleHeight!))) <= 1e-11,
    `h against √((kP/2π)² + A²): engine ${e1(eErr)}, plain ${e1(pErr)}`,
  );
}

console.log(
  "\nRolling check, each preset: the check stage (roll + figures) and the roll alone, beside the plain roll.",
);
const presetIds = [
  "square",
  "hexagon",
  "rounded-square",
  "ellipse-focus",
  "sine-track",
  "catenary-row",
  "ellipse-pair",
  "window-twins",
];
for (const id of presetIds) {
  const spec = presetById(id)!.spec;
  const staged = solveInStages(spec);
  const ms = median(() => staged.check(), 9);
  const ri = rollInputOf(spec);
  const size = ri.input.size;
  const roll = () => (ri.kind === "track" ? checkTrackRoll(ri.input) : checkPairRoll(ri.input));
  const rollMs = median(roll, 9);
  const eng = roll();
  let plain = ri.kind === "track" ? plainTrackRoll(ri.input) : plainPairRoll(ri.input);
  const t0 = performance.now();
  plain = ri.kind === "track" ? plainTrackRoll(ri.input) : plainPairRoll(ri.input);
  const plainMs = performance.now() - t0;
  const dDepth = Math.abs((eng.interference.depth > 0 ? eng.interference.depth : 0) - plain.depth) / size;
  line(
    `rolling check: ${id}`,
    ms,
    20,
    plainMs,
    eng.axleDeviation <= 1e-6 * size && plain.axleDeviation <= 1e-6 * size && dDepth <= 1e-4,
    `roll alone ${rollMs.toFixed(2)} ms; axle deviation engine ${e1(eng.axleDeviation / size)}, plain ${e1(plain.axleDeviation / size)} of size; ` +
      `closure engine ${e1(eng.closureError)}, plain ${e1(plain.closureError)} rad; depth ${e1(eng.interference.depth / size)} vs ${e1(plain.depth / size)}`,
  );
}

console.log("\nWhole solve(), each preset (geometry, options and check):");
for (const id of presetIds) {
  const spec = presetById(id)!.spec;
  console.log(
    `  ${id.padEnd(16)} ${median(() => solve(spec), 7)
      .toFixed(2)
      .padStart(8)} ms`,
  );
}

console.log(missed.length ? `\nTargets missed: ${missed.join("; ")}` : "\nEvery target met.");
