// Variants of the assembly-sheet fixture for the PDF tests: the fixture as it is, a pair of wheels
// that nobody has approved (no run), and a long run built the way the fixture's run is (whole
// periods of the same profile, segments of at most two periods, a support every 600 mm).
import fixture from "@/tests/fixtures/assembly-sheet.json";
import type { AssemblySheet, LevelRow, SheetJoint } from "@/lib/assembly/sheet";
import type { Pt } from "@/lib/track";

export const trikeSheet = fixture as unknown as AssemblySheet;

export function unapprovedPair(): AssemblySheet {
  return {
    ...trikeSheet,
    approval: null,
    run: null,
    joints: [],
    levels: [],
    parts: trikeSheet.parts.filter((p) => p.id.startsWith("W")),
    steps: ["Fit the bearings to both wheels.", "Set the two axles at the centre distance on the frame."],
  };
}

/** The fixture's run repeated to about `length` mm (whole periods), with its parts, joints and levels. */
export function longRun(length: number): AssemblySheet {
  const run = trikeSheet.run!;
  const period = run.period;
  const periods = Math.round(length / period);
  const one = run.profile.filter(([x]) => x <= period + 1e-9);
  const profile: Pt[] = [];
  for (let p = 0; p < periods; p++) for (const [x, y] of one) if (p === 0 || x > 0) profile.push([x + p * period, y]);
  const total = periods * period;
  const segments: Array<{ id: string; x0: number; x1: number }> = [];
  for (let i = 0, x = 0; x < total - 1e-9; i++, x += 2 * period)
    segments.push({ id: `T${String(i + 1).padStart(2, "0")}`, x0: x, x1: Math.min(x + 2 * period, total) });
  const supports: number[] = [];
  for (let x = 60; x < total - 30; x += 600) supports.push(x);
  const joints: SheetJoint[] = segments.slice(1).map((s, i) => ({
    station: s.x0,
    between: [segments[i].id, s.id],
    kind: "key",
    detail: trikeSheet.joints[0].detail,
  }));
  const levels: LevelRow[] = [
    ...supports.map((x, i) => ({
      what: "support" as const,
      label: `S${i + 1}`,
      station: x,
      topHeight: 160,
      tolerance: 1,
    })),
    ...joints.map((j) => ({
      what: "joint" as const,
      label: j.between.join("/"),
      station: j.station,
      topHeight: 162.8,
      tolerance: 0.42,
    })),
  ].sort((a, b) => a.station - b.station);
  return {
    ...trikeSheet,
    run: { ...run, length: total, periods, profile, segments, supports },
    joints,
    levels,
    parts: segments
      .map((s, i) => ({
        id: s.id,
        name: `Track segment ${i + 1} of ${segments.length}`,
        material: "Birch plywood 18 mm",
        quantity: 2,
        sheets: [1 + Math.floor(i / 3)],
      }))
      .concat(trikeSheet.parts.filter((p) => p.id.startsWith("W"))),
  };
}
