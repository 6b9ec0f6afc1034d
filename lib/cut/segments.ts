// Where the run splits into segments. By default at crests (the tops of the humps: for the square
// wheel's catenary track, x = kP; the troughs between are the cusps where the corners sit), chosen
// greedily from the start: each cut at the farthest crest that keeps the segment, with its key and
// the kerf, within the usable sheet length and the machine bed. User stations replace them and are
// checked: inside the run, increasing, and each segment fitting.
import { CutError } from "./errors";
import { keyShape } from "./joints/key";
import { spliceGeometry } from "./joints/dowel";
import type { RunInfo } from "./run-length";
import type { CutSettings } from "./settings";
import type { CutWarning } from "./types";
import { fmtLen } from "./units";

/** The longest and widest part the sheet (less its margin) and the bed both take, and which binds. */
export function usableSize(s: CutSettings): {
  length: number;
  width: number;
  lengthBy: "sheet" | "bed";
  widthBy: "sheet" | "bed";
} {
  const sl = s.sheet.length - 2 * s.margin;
  const sw = s.sheet.width - 2 * s.margin;
  return {
    length: Math.min(sl, s.machine.bed.length),
    width: Math.min(sw, s.machine.bed.width),
    lengthBy: sl <= s.machine.bed.length ? "sheet" : "bed",
    widthBy: sw <= s.machine.bed.width ? "sheet" : "bed",
  };
}

/** How far past its right-hand station a segment reaches (the key). */
export function jointReach(s: CutSettings): number {
  return s.joint.kind === "key" ? keyShape(s.joint).reach : 0;
}

/** The shortest segment that holds a joint at each end with material to spare. */
export function minSegment(s: CutSettings): number {
  const j =
    s.joint.kind === "key"
      ? keyShape(s.joint).reach + 2 * s.machine.kerf + 10
      : spliceGeometry(s).half + s.joint.dowelDiameter;
  return Math.max(100, 2 * j);
}

/** Length of the part cut for segment [a, b] (its bounding length with the kerf). */
export function segmentCutLength(a: number, b: number, last: boolean, s: CutSettings): number {
  return b - a + (last ? 0 : jointReach(s)) + s.machine.kerf;
}

export interface CutPlan {
  cuts: number[];
  segments: Array<{ x0: number; x1: number }>;
  warnings: CutWarning[];
}

function segmentsOf(cuts: number[], L: number) {
  const xs = [0, ...cuts, L];
  return xs.slice(1).map((x1, i) => ({ x0: xs[i], x1 }));
}

export function planCuts(run: RunInfo, s: CutSettings): CutPlan {
  const L = run.runLength;
  const U = usableSize(s);
  const minSeg = minSegment(s);
  const by =
    U.lengthBy === "sheet"
      ? `the usable sheet length (${fmtLen(s.sheet.length)} less ${fmtLen(s.margin)} margins)`
      : `the machine bed (${fmtLen(s.machine.bed.length)})`;
  if (s.cuts) {
    s.cuts.forEach((c, i) => {
      if (!(c > 0 && c < L))
        throw new CutError(
          "bad-cuts",
          `Cut station ${i + 1} (${fmtLen(c)}) is not inside the run (0 to ${fmtLen(L)}).`,
          `cuts.${i}`,
        );
    });
    const segs = segmentsOf(s.cuts, L);
    segs.forEach((g, i) => {
      const last = i === segs.length - 1;
      const len = segmentCutLength(g.x0, g.x1, last, s);
      const field = `cuts.${Math.min(i, s.cuts!.length - 1)}`;
      if (len > U.length)
        throw new CutError(
          "bad-cuts",
          `Segment ${i + 1} (${fmtLen(g.x0)} to ${fmtLen(g.x1)}) is ${fmtLen(len)} long with its joint and the kerf, ${fmtLen(len - U.length)} more than ${by}. Add a cut station inside it.`,
          field,
        );
      if (g.x1 - g.x0 < minSeg)
        throw new CutError(
          "bad-cuts",
          `Segment ${i + 1} (${fmtLen(g.x0)} to ${fmtLen(g.x1)}) is shorter than ${fmtLen(minSeg)}, too short to hold its joints.`,
          field,
        );
    });
    return { cuts: [...s.cuts], segments: segs, warnings: [] };
  }
  const cuts: number[] = [];
  const warnings: CutWarning[] = [];
  let pos = 0;
  for (;;) {
    if (segmentCutLength(pos, L, true, s) <= U.length) break;
    // The farthest station this segment can reach with its key and the kerf.
    const reach = pos + U.length - jointReach(s) - s.machine.kerf;
    const ok = (c: number) => c > pos + minSeg - 1e-9 && c <= reach + 1e-9 && L - c >= minSeg - 1e-9;
    const crest = [...run.crests].reverse().find(ok);
    let c: number;
    if (crest !== undefined) c = crest;
    else {
      c = Math.min(reach, L - minSeg);
      if (!(c > pos + minSeg - 1e-9))
        throw new CutError(
          "part-too-big",
          `The run cannot be split into segments that fit ${by}: a segment must be at least ${fmtLen(minSeg)} long to hold its joints. Use a larger sheet or a smaller joint.`,
          "sheet",
        );
      warnings.push({
        code: "no-crest-cut",
        message: `No crest lies within reach of the segment starting at x = ${fmtLen(pos)}: it is cut on a slope at x = ${fmtLen(c)}. The rolling surface stays continuous, but check the joint there by hand.`,
        at: [c],
      });
    }
    cuts.push(c);
    pos = c;
  }
  return { cuts, segments: segmentsOf(cuts, L), warnings };
}
