// The client's mock-up as built: the whole site run in millimetres, its periods tiled and its ends
// treated exactly as the cut files will have them (lib/cut/run-length.ts buildRun, from the engine's
// tileRun), the wheel scaled with the run, a person 1.7 m tall beside it, and the pose of every body
// at any point of the roll. Poses come from the engine's own motion tables (lib/studio/motion.ts:
// the rolling law x = ∫ r dθ of L. Hall and S. Wagon, "Roads and Wheels", Mathematics Magazine 65(5),
// 1992, pp. 283–301, and for a pair r₁ dθ₁ = r₂ dθ₂ of F. L. Litvin et al., "Noncircular Gears",
// 2009), and each axle is set at the height its own outline rests at, so a wrong pose would show.
// Pure: no React, no DOM.
import { buildRun, hasTrack } from "@/lib/cut/run-length";
import { parseCutSettings } from "@/lib/cut/settings";
import { mmPerUnit } from "@/lib/cut/units";
import { axleLineY, followerAt, lowerAngleAt, trackYAtX, wheelAngleAt } from "@/lib/studio/motion";
import { rayReach, tileTrack } from "@/lib/studio/view-math";
import type { Pt, SolvedGeometry } from "@/lib/track";
import { personOutline } from "./person";

export type EndTreatment = "flat" | "half" | "scale";

export interface RunChoice {
  /** The site run, mm. */
  runLength: number;
  endTreatment: EndTreatment;
}

/** How deep the solid track is drawn below its lowest point, mm (the cut settings' default base). */
export const BASE_DEPTH_MM = 80;
/** Run laid out for twin wheels when no run is given: a few periods. */
const TWIN_DEFAULT_PERIODS = 4;

interface Common {
  mode: SolvedGeometry["mode"];
  /** mm per design unit times the run's scale: design lengths × this = mm as built. */
  k: number;
  wheel: Pt[];
  /** Twin wheels: the lower wheel; a pair: the partner. Around their own axles, mm. */
  partner?: Pt[];
  person: Pt[];
  /** Where the person's feet stand, mm (y up). */
  floorY: number;
  bounds: { minX: number; minY: number; maxX: number; maxY: number };
  dims: {
    runLength?: number;
    humpHeight?: number;
    axleHeight?: number;
    wheelAcross: number;
    partnerAcross?: number;
    centreDistance?: number;
  };
}

export interface RunLayout extends Common {
  kind: "run";
  runLength: number;
  endTreatment: EndTreatment;
  /** The rolling surface from 0 to runLength, mm, y up. */
  profile: Pt[];
  /** The span the axle travels (the profiled part; flat run-outs are drawn but not rolled on, where a polygon would bump). */
  rollStart: number;
  rollEnd: number;
  periods: number;
  period: number;
  /** Flat at each end, mm (0 when scaled or when none is left over). */
  eachEnd: number;
  scale: number;
  axleY: number;
  lowerAxleY?: number;
  crestY: number;
  troughY: number;
  /** Run x → design x: design = designStart + (x − rollStart) / (k). */
  designStart: number;
}

export interface PairLayout extends Common {
  kind: "pair";
  centreDistance: number;
}

export type RunScene = RunLayout | PairLayout;

const mm = (pts: readonly Pt[], k: number): Pt[] => pts.map(([x, y]) => [x * k, y * k]);

function boundsOf(sets: Pt[][]): Common["bounds"] {
  const b = { minX: Infinity, minY: Infinity, maxX: -Infinity, maxY: -Infinity };
  for (const pts of sets)
    for (const [x, y] of pts) {
      if (x < b.minX) b.minX = x;
      if (x > b.maxX) b.maxX = x;
      if (y < b.minY) b.minY = y;
      if (y > b.maxY) b.maxY = y;
    }
  return b;
}

const across = (pts: readonly Pt[]) => 2 * Math.max(...pts.map(([x, y]) => Math.hypot(x, y)));

/** A person standing with feet at (x, floorY), facing the viewer. */
function personAt(x: number, floorY: number): Pt[] {
  return personOutline().map(([px, py]) => [x + px, floorY + py]);
}

export function runScene(result: SolvedGeometry, run: RunChoice | null): RunScene {
  const unit = mmPerUnit(result.units);
  if (result.mode === "partner-wheel") {
    const a = (result.centreDistance ?? 0) * unit;
    const wheel = mm(result.wheel.points, unit);
    const partner = mm(result.partner?.points ?? [], unit);
    const rP = across(partner) / 2;
    const rW = across(wheel) / 2;
    // A pair turns on fixed axles whose height the design does not set: the person stands on a
    // floor at the pair's lowest reach, which is said on the drawing.
    const floorY = -a - rP;
    const person = personAt(Math.max(rW, rP) + 450, floorY);
    return {
      kind: "pair",
      mode: result.mode,
      k: unit,
      wheel,
      partner,
      person,
      floorY,
      centreDistance: a,
      bounds: boundsOf([
        wheel.map(([x, y]) => [x, y]),
        partner.map(([x, y]) => [x, y - a]),
        person,
        [
          [-rW, rW],
          [rW, -a - rP],
        ],
      ]),
      dims: { wheelAcross: 2 * rW, partnerAcross: 2 * rP, centreDistance: a },
    };
  }
  if (hasTrack(result))
    return trackRun(result, run ?? { runLength: (result.period ?? 1) * unit * 3, endTreatment: "flat" }, unit);
  return twinRun(result, run, unit);
}

function trackRun(result: SolvedGeometry, run: RunChoice, unit: number): RunLayout {
  const built = buildRun(
    result as Parameters<typeof buildRun>[0],
    parseCutSettings({ runLength: run.runLength, endTreatment: run.endTreatment }),
  );
  const r = built.run;
  const k = unit * r.scale;
  const x0 = result.track!.points[0][0];
  const rollStart = r.eachEnd;
  const rollEnd = r.eachEnd + r.periods * r.period;
  const axleY = axleLineY(result) * k;
  const wheel = mm(result.wheel.points, k);
  const floorY = r.minY - BASE_DEPTH_MM;
  const person = personAt(-700, floorY);
  const crestY = r.crestLevel;
  const troughY = r.minY;
  return {
    kind: "run",
    mode: result.mode,
    k,
    wheel,
    person,
    floorY,
    runLength: r.runLength,
    endTreatment: r.endTreatment,
    profile: r.profile,
    rollStart,
    rollEnd,
    periods: r.periods,
    period: r.period,
    eachEnd: r.eachEnd,
    scale: r.scale,
    axleY,
    crestY,
    troughY,
    // The run starts at the design's first crest: `phase` is that crest's x in the design's period, mm.
    designStart: x0 + r.phase / unit,
    bounds: boundsOf([
      r.profile,
      person,
      [
        [0, floorY],
        [r.runLength, axleY + across(wheel) / 2],
      ],
      [[-across(wheel) / 2, axleY]],
    ]),
    dims: {
      runLength: r.runLength,
      humpHeight: crestY - troughY,
      axleHeight: axleY - floorY,
      wheelAcross: across(wheel),
    },
  };
}

function twinRun(result: SolvedGeometry, run: RunChoice | null, unit: number): RunLayout {
  const P = (result.period ?? 1) * unit;
  const periods = run ? Math.max(1, Math.floor(run.runLength / P + 1e-9)) : TWIN_DEFAULT_PERIODS;
  const k = unit;
  const x0 = result.track!.points[0][0];
  const profile = tileTrack(result.track!.points, result.period ?? 1, periods).map(([x, y]): Pt => [
    (x - x0) * k,
    y * k,
  ]);
  const axleY = (result.axleHeight ?? 0) * k;
  const lowerAxleY = (result.lowerAxleHeight ?? 0) * k;
  const wheel = mm(result.wheel.points, k);
  const partner = mm(result.partner?.points ?? [], k);
  const floorY = lowerAxleY - across(partner) / 2;
  const person = personAt(-700, floorY);
  const ys = profile.map((p) => p[1]);
  const runLength = periods * P;
  return {
    kind: "run",
    mode: result.mode,
    k,
    wheel,
    partner,
    person,
    floorY,
    runLength,
    endTreatment: "flat",
    profile,
    rollStart: 0,
    rollEnd: runLength,
    periods,
    period: P,
    eachEnd: 0,
    scale: 1,
    axleY,
    lowerAxleY,
    crestY: Math.max(...ys),
    troughY: Math.min(...ys),
    designStart: x0,
    bounds: boundsOf([
      profile,
      person,
      [
        [0, axleY + across(wheel) / 2],
        [runLength, floorY],
      ],
      [[-across(wheel) / 2, axleY]],
    ]),
    dims: {
      runLength,
      humpHeight: Math.max(...ys) - Math.min(...ys),
      axleHeight: axleY - floorY,
      wheelAcross: across(wheel),
      partnerAcross: across(partner),
    },
  };
}

export interface RunPose {
  /** Run x of the axle (track modes), or the driver's turn in degrees (a pair). */
  along: number;
  wheelAxle: Pt;
  /** Clockwise turn of the wheel (or driver) from its start, rad. */
  wheelAngle: number;
  partnerAxle?: Pt;
  /** Counter-clockwise turn of the lower twin or the partner, rad. */
  partnerAngle?: number;
  contact: Pt;
  /** The nominal axle line, and how far the drawn axle sits off it (mm). */
  axleLineY: number;
  offLine: number;
}

/** The body direction that points straight down after a clockwise turn a. */
const downInBody = (a: number): Pt => [Math.sin(a), -Math.cos(a)];
const upInBody = (a: number): Pt => [Math.sin(a), Math.cos(a)];

/** Every body at roll position p ∈ [0, 1] (0: the start of the roll, 1: its end; a pair: one driver turn). */
export function poseOnRun(result: SolvedGeometry, scene: RunScene, p: number): RunPose {
  const t = Math.min(1, Math.max(0, p));
  if (scene.kind === "pair") {
    const theta = 2 * Math.PI * t;
    const a = scene.centreDistance;
    const r1 = rayReach(scene.wheel, downInBody(theta));
    const phi = followerAt(result, theta);
    const r2 = rayReach(scene.partner!, upInBody(phi));
    // The partner's axle where the two outlines, turned as the engine says, touch on the line of centres.
    const restY = -(r1 + r2);
    return {
      along: (theta * 180) / Math.PI,
      wheelAxle: [0, 0],
      wheelAngle: theta,
      partnerAxle: [0, restY],
      partnerAngle: phi,
      contact: [0, -r1],
      axleLineY: -a,
      offLine: restY + a,
    };
  }
  const x = scene.rollStart + t * (scene.rollEnd - scene.rollStart);
  const designX = scene.designStart + (x - scene.rollStart) / scene.k;
  const angle = wheelTurnAt(result, scene, x);
  const contactY = trackYAtX(result, designX) * scene.k;
  const rest = contactY + rayReach(scene.wheel, downInBody(angle));
  const pose: RunPose = {
    along: x,
    wheelAxle: [x, rest],
    wheelAngle: angle,
    contact: [x, contactY],
    axleLineY: scene.axleY,
    offLine: rest - scene.axleY,
  };
  if (scene.partner && scene.lowerAxleY !== undefined) {
    const lower = lowerAngleAt(result, designX);
    pose.partnerAxle = [x, contactY - rayReach(scene.partner, upInBody(lower))];
    pose.partnerAngle = lower;
  }
  return pose;
}

/** The wheel's clockwise turn with its axle at run x (mm), on the run as designed (a run layout only). */
export function wheelTurnAt(result: SolvedGeometry, scene: RunLayout, x: number): number {
  return wheelAngleAt(result, scene.designStart + (x - scene.rollStart) / scene.k);
}

/** The roll position of a pinned place (mm along the run, or a pair's degrees), clamped to the roll. */
export function positionOfPlace(scene: RunScene, at: number): number {
  if (scene.kind === "pair") return Math.min(1, Math.max(0, (((at % 360) + 360) % 360) / 360));
  const span = scene.rollEnd - scene.rollStart;
  return span > 0 ? Math.min(1, Math.max(0, (at - scene.rollStart) / span)) : 0;
}

/** The place a roll position stands for: mm along the run, or a pair's driver turn in degrees. */
export function placeOfPosition(scene: RunScene, p: number): number {
  const t = Math.min(1, Math.max(0, p));
  return scene.kind === "pair" ? 360 * t : scene.rollStart + t * (scene.rollEnd - scene.rollStart);
}
