// The assembly sheet's content from a stored cut plan: the run as cut (its segments, joints and
// supports, from lib/cut), the parts as engraved with the sheets they were cut from, the order of
// work, the joint schedule, and the level and position table with the engine's installation
// tolerances (tolerances.ts). Pure: the caller brings the plan, the approval and the people.
import { loadsOf, type JobInput } from "@/lib/cut/export/job";
import { cautionText } from "@/lib/loads";
import type { ApprovalStamp } from "@/lib/review/reference";
import type { AssemblySheet, LevelRow, SheetJoint } from "./sheet";
import { DEFAULT_BUMP_LIMIT_MM, runTolerances } from "./tolerances";

/** What the sheet is not, before the load-path check's own disclaimer (lib/loads/caution.ts). */
const SHEET_SCOPE =
  "This sheet gives the geometry and the installation figures of the design as cut; it is not a structural design.";

export interface SheetContext {
  job: JobInput;
  cutPlanId: number;
  cutPlanNumber: number;
  project: { name: string; site: string; client: string | null };
  approval: ApprovalStamp | null;
  shop: { name: string; contact: string };
  date: Date;
  inches?: boolean;
  bumpLimit?: number;
}

const mm = (v: number) => `${Number(v.toFixed(1))} mm`;

function heightAt(profile: [number, number][], x: number): number {
  let j = 1;
  while (j < profile.length - 1 && profile[j][0] < x) j++;
  const [a, b] = [profile[j - 1], profile[j]];
  return b[0] === a[0] ? a[1] : a[1] + ((x - a[0]) / (b[0] - a[0])) * (b[1] - a[1]);
}

export function buildAssemblySheet(c: SheetContext): AssemblySheet {
  const { plan, result, nest } = c.job;
  const s = plan.settings;
  const run = plan.run;
  const limit = c.bumpLimit ?? DEFAULT_BUMP_LIMIT_MM;
  const sheetsOf = new Map<string, Set<number>>();
  for (const sheet of nest?.sheets ?? [])
    for (const p of sheet.placements)
      (sheetsOf.get(p.id) ?? sheetsOf.set(p.id, new Set()).get(p.id)!).add(sheet.index + 1);
  const material = `${s.material}, ${mm(s.sheet.thickness)}`;
  const parts = plan.parts.map((p) => ({
    id: p.id,
    name: p.name,
    material,
    quantity: p.quantity,
    sheets: [...(sheetsOf.get(p.id) ?? [])].sort((a, b) => a - b),
  }));

  const joints: SheetJoint[] = [];
  const levels: LevelRow[] = [];
  if (run) {
    const detail =
      s.joint.kind === "key"
        ? `neck-and-head key: neck ${mm(s.joint.keyWidth)}, depth ${mm(s.joint.keyDepth)}, ${mm(s.joint.clearance)} clearance; tap home, glue if the piece is permanent`
        : `spliced butt joint: 2 × Ø${mm(s.joint.dowelDiameter)} dowels each side at ${mm(s.joint.dowelInset)} and ${mm(s.joint.dowelInset + s.joint.dowelSpacing)} from the cut, with a splice plate`;
    run.cuts.forEach((station, i) =>
      joints.push({ station, between: [run.segments[i].id, run.segments[i + 1].id], kind: s.joint.kind, detail }),
    );
    const tol = runTolerances(
      result,
      { runLength: run.runLength, endTreatment: run.endTreatment },
      { joints: run.cuts, supports: run.supports },
      limit,
    );
    const rows: LevelRow[] = [
      ...run.supports.map((x, i) => ({
        what: "support" as const,
        label: `S${i + 1}`,
        station: x,
        topHeight: heightAt(run.profile, x) - run.baseY,
        tolerance: tol.supports.find((t) => t.station === x)?.tolerance ?? 0,
      })),
      ...joints.map((j) => ({
        what: "joint" as const,
        label: j.between.join("/"),
        station: j.station,
        topHeight: heightAt(run.profile, j.station) - run.baseY,
        tolerance: tol.joints.find((t) => t.station === j.station)?.tolerance ?? 0,
      })),
    ];
    levels.push(...rows.sort((a, b) => a.station - b.station));
  }

  const lines = s.trackLines;
  const steps = run
    ? [
        `Mark the datum: the start of the run (station 0) and a level line at the track parts' bottom edge. Every station and height on this sheet is measured from it${lines > 1 ? `; set out ${lines} track lines side by side, each the same` : ""}.`,
        `Set the ${run.supports.length} supports of each track line at their stations (the level and position table) and bring each to the datum level within its tolerance.`,
        `Lay the segments in order ${run.segments.map((g) => g.id).join(", ")} with their engraved arrows pointing the way the wheel travels, from station 0.`,
        ...(joints.length
          ? [
              `Make the ${joints.length} joint${joints.length === 1 ? "" : "s"} as the joint schedule says, keeping each at its station within its tolerance.`,
            ]
          : []),
        "Fix each segment to its supports through the drilled holes.",
        "Check the level and position of every support and joint against the table, and roll a wheel along the whole run by hand: the axle should not knock.",
        "Fit the guards or side boards that keep hands and feet from the nip where the wheel meets the track.",
        "Sign the block at the end of this sheet.",
      ]
    : [
        "The design is a pair of wheels on fixed axles: mount both axles at the centre distance and check that the wheels turn without slipping or binding.",
        "Fit the guard that keeps hands away from the nip between the wheels.",
        "Sign the block at the end of this sheet.",
      ];

  const loads = loadsOf(c.job);
  const cautions = loads.cautions.map((x) => ({ signal: x.signal, text: cautionText(x) }));

  return {
    title: `Assembly sheet: ${c.project.name}`,
    project: c.project,
    design: { name: c.job.design ?? "design", revision: Number(c.job.revision ?? 0), specHash: result.specHash },
    approval: c.approval
      ? {
          reference: c.approval.reference,
          typedName: c.approval.typedName,
          organisation: c.approval.organisation,
          signedAt: c.approval.signedAt,
        }
      : null,
    date: c.date.toISOString(),
    shop: c.shop,
    cutPlanId: c.cutPlanId,
    cutPlanNumber: c.cutPlanNumber,
    cautions,
    disclaimer: `${SHEET_SCOPE} ${loads.disclaimer}`,
    inches: c.inches ?? s.outputUnits === "in",
    run: run
      ? {
          length: run.runLength,
          periods: run.periods,
          period: run.period,
          endTreatment: run.endTreatment,
          eachEnd: run.eachEnd,
          profile: run.profile,
          baseY: run.baseY,
          datumY: run.baseY,
          segments: run.segments,
          supports: run.supports,
          direction: "start-to-end",
        }
      : null,
    parts,
    steps,
    joints,
    fasteners: run
      ? [
          `Support fixings through the Ø${mm(s.supportHoleDiameter)} holes, sized for the supports the engineer specifies`,
          ...(s.joint.kind === "dowel"
            ? [`Ø${mm(s.joint.dowelDiameter)} dowels, 4 per joint, and a splice plate per joint`]
            : ["Glue for the key joints if the piece is permanent"]),
          ...(s.wheelCount
            ? [`Axles of Ø${mm(s.boreDiameter)} for the wheel bores, with their collars or bearings`]
            : []),
        ]
      : [`Axles of Ø${mm(s.boreDiameter)} for the wheel bores, with their collars or bearings`],
    tools: [
      "Tape measure (mm)",
      "Spirit level or laser level",
      "Chalk line for the datum",
      "Drill and bits for the support fixings",
      "Mallet (for the key joints)",
    ],
    levels,
    tolerance: {
      bumpLimit: limit,
      method: `The wheel, turned as the rolling law turns it, rolled over the track as built with one joint moved along the run, or one support lowered, until the axle rose or fell by ${mm(limit)}; figures rounded down to 0.05 mm.`,
    },
  };
}
