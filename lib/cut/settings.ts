// The cut settings: one zod schema with the limits, the defaults and a plain message for every
// field, so the app's form, the command line and the stored cut plan all read the same thing.
// Lengths are millimetres. Trade defaults follow docs/fabrication.md §4: 2440 × 1220 mm sheets (4 × 8 ft),
// a router's kerf is its cutter diameter (6 mm), edge margin 10 mm for a router; the rest
// (base depth, joint sizes, support spacing) are starting values the user is expected to edit.
import { z } from "zod";
import { RUN_LENGTH_MAX_MM, RUN_LENGTH_MIN_MM, TRACK_LINES_MAX } from "@/lib/validation/limits";
import { CutError } from "./errors";

function length(what: string, min: number, max: number, def: number, opts: { zero?: boolean } = {}) {
  const bad = `${what} must be a number of millimetres.`;
  return z
    .number({ error: bad })
    .finite({ error: bad })
    .superRefine((v, ctx) => {
      if (opts.zero && v === 0) return;
      if (v < min)
        ctx.addIssue({
          code: "custom",
          message: `${what} must be at least ${min} mm${opts.zero && min > 0 ? " (or 0 for none)" : ""}; it is ${v} mm.`,
        });
      else if (v > max) ctx.addIssue({ code: "custom", message: `${what} must be at most ${max} mm; it is ${v} mm.` });
    })
    .default(def);
}

function count(what: string, min: number, max: number, def: number) {
  const bad = `${what} must be a whole number from ${min} to ${max}.`;
  return z.number({ error: bad }).int({ error: bad }).min(min, { error: bad }).max(max, { error: bad }).default(def);
}

function choice<const T extends readonly [string, ...string[]]>(what: string, values: T, def: T[number]) {
  return z
    .enum(values, { error: `${what} must be one of ${values.map((v) => `"${v}"`).join(", ")}.` })
    .default(def as never);
}

const kerf = z
  .number({ error: "The kerf must be a number of millimetres." })
  .finite({ error: "The kerf must be a number of millimetres." })
  .gt(0, {
    error: (iss) =>
      `The kerf must be more than 0 mm (it is ${String(iss.input)} mm): a router's kerf is its cutter diameter (e.g. 6 mm), a laser's about 0.2 mm.`,
  })
  .max(50, { error: "The kerf must be at most 50 mm." })
  .default(6);

export const jointSchema = z.strictObject(
  {
    kind: choice("The joint", ["dowel", "key"] as const, "key"),
    dowelDiameter: length("The dowel hole diameter", 2, 50, 10),
    /** From the cut to the first dowel hole on each side. */
    dowelInset: length("The dowel inset", 5, 500, 30),
    /** Between the two dowel holes on each side of a cut. */
    dowelSpacing: length("The dowel spacing", 5, 500, 60),
    /** The key's neck: the narrowest slot the cutter has to pass. The head is twice as wide. */
    keyWidth: length("The key width", 2, 500, 24),
    /** How far the key reaches past the cut: half neck, half head. */
    keyDepth: length("The key depth", 4, 1000, 48),
    /** Gap between key and slot on every side. */
    clearance: length("The joint clearance", 0, 5, 0.2, { zero: true }),
  },
  { error: 'The joint settings must be an object such as { kind: "key" }.' },
);

export const machineSchema = z.strictObject(
  {
    kind: choice("The machine", ["router", "laser", "waterjet", "plasma"] as const, "router"),
    /** Router: the cutter diameter. Laser, waterjet, plasma: the width of the cut. */
    kerf,
    bed: z
      .strictObject(
        { length: length("The bed length", 100, 20000, 2500), width: length("The bed width", 100, 10000, 1250) },
        { error: "The bed must be an object such as { length: 2500, width: 1250 }." },
      )
      .prefault({}),
    /** The smallest inside radius the machine leaves, beyond half the kerf (0: half the kerf). */
    minInsideRadius: length("The smallest inside radius", 0, 100, 0, { zero: true }),
  },
  { error: 'The machine settings must be an object such as { kind: "router", kerf: 6 }.' },
);

export const sheetSchema = z.strictObject(
  {
    length: length("The sheet length", 100, 20000, 2440),
    width: length("The sheet width", 100, 10000, 1220),
    thickness: length("The sheet thickness", 0.5, 200, 18),
    grain: choice("The sheet grain", ["length", "none"] as const, "length"),
  },
  { error: "The sheet settings must be an object such as { length: 2440, width: 1220 }." },
);

export const lighteningSchema = z.strictObject(
  {
    count: count("The number of lightening holes", 2, 24, 4),
    /** The least material left between a hole and the wheel's outline, the bore and the next hole. */
    rim: length("The lightening rim", 2, 500, 25),
  },
  { error: "The lightening settings must be null or an object such as { count: 4, rim: 25 }." },
);

/** The nest's allowed rotations as the shop says them, for the form and the README. */
export const ROTATION_LABELS = {
  "90": "Quarter turns",
  "180": "Half turns only",
  free: "Eighth turns (45° steps)",
  none: "None",
} as const;

export const cutSettingsSchema = z
  .strictObject(
    {
      /** Project name for the labels and the job README; empty: the labels carry the part ids alone (never the product's name). */
      project: z
        .string({ error: "The project name must be text." })
        .trim()
        .max(60, { error: "The project name has at most 60 characters." })
        .default(""),
      /** Largest cap height of engraved label text. */
      labelHeight: length("The label height", 2, 50, 10),
      runLength: length("The run length", RUN_LENGTH_MIN_MM, RUN_LENGTH_MAX_MM, 2400),
      endTreatment: choice("The end treatment", ["flat", "half", "scale"] as const, "flat"),
      /** Solid track below the profile's lowest point. */
      baseDepth: length("The base depth", 10, 2000, 80),
      /** Parallel tracks, e.g. 2 for a trike's two rear wheels. */
      trackLines: count("The number of track lines", 1, TRACK_LINES_MAX, 2),
      /** Laminations glued face to face per track. */
      layers: count("The number of layers", 1, 10, 1),
      /** Stations along the run (mm from its start) where segments split. Default: at crests, as long as the sheet allows. */
      cuts: z
        .array(z.number({ error: "Each cut station must be a number of millimetres." }).finite(), {
          error: "The cut stations must be a list of numbers.",
        })
        .max(500, { error: "At most 500 cut stations." })
        .optional(),
      joint: jointSchema.prefault({}),
      supportSpacing: length("The support spacing", 50, 10000, 600),
      supportHoleDiameter: length("The support hole diameter", 1, 100, 10),
      wheelCount: count("The number of wheels", 0, 64, 2),
      boreDiameter: length("The axle bore diameter", 1, 1000, 25, { zero: true }),
      lightening: lighteningSchema.nullable().default(null),
      machine: machineSchema.prefault({}),
      sheet: sheetSchema.prefault({}),
      material: z
        .string({ error: "The material must be text." })
        .trim()
        .min(1, { error: "Name the material." })
        .max(80, { error: "The material name has at most 80 characters." })
        .default("Birch plywood"),
      margin: length("The sheet margin", 0, 500, 10, { zero: true }),
      spacing: length("The part spacing", 0, 500, 6, { zero: true }),
      rotations: choice("The rotations", ["free", "90", "180", "none"] as const, "90"),
      /** True: the files hold tool-centre paths (offset by half the kerf). False: nominal outlines for the shop's CAM to offset. */
      kerfInFile: z.boolean({ error: "kerfInFile must be true or false." }).default(false),
      outputUnits: choice("The output units", ["mm", "in"] as const, "mm"),
    },
    { error: "The cut settings must be an object." },
  )
  .superRefine((s, ctx) => {
    const k = s.machine.kerf;
    const fmt = (v: number) => Number(v.toPrecision(4));
    if (s.joint.kind === "key") {
      if (k > s.joint.keyWidth)
        ctx.addIssue({
          code: "custom",
          path: ["joint", "keyWidth"],
          message: `The key's neck slot is ${fmt(s.joint.keyWidth)} mm wide, narrower than the ${fmt(k)} mm kerf: the cutter cannot pass through it. Make the key width at least ${fmt(k)} mm or use a smaller cutter.`,
        });
      if (k > s.joint.keyDepth / 2)
        ctx.addIssue({
          code: "custom",
          path: ["joint", "keyDepth"],
          message: `The key's neck is ${fmt(s.joint.keyDepth / 2)} mm long (half the key depth), shorter than the ${fmt(k)} mm kerf: the cutter cannot pass behind the key's head. Make the key depth at least ${fmt(2 * k)} mm.`,
        });
      const head = 2 * s.joint.keyWidth + 2 * s.joint.clearance;
      const wall = Math.max(k, 3);
      if (head + 2 * wall > s.baseDepth)
        ctx.addIssue({
          code: "custom",
          path: ["joint", "keyWidth"],
          message: `The key's head (${fmt(head)} mm, twice the key width) needs ${fmt(head + 2 * wall)} mm of base band with a ${fmt(wall)} mm wall each side, but the base depth is ${fmt(s.baseDepth)} mm. Use a narrower key or a deeper base.`,
        });
    } else if (s.joint.dowelDiameter + 2 * Math.max(k, 5) > 0.8 * s.baseDepth) {
      ctx.addIssue({
        code: "custom",
        path: ["joint", "dowelDiameter"],
        message: `A ${fmt(s.joint.dowelDiameter)} mm dowel hole does not leave enough splice plate around it in a ${fmt(s.baseDepth)} mm base band. Use smaller dowels or a deeper base.`,
      });
    } else if (s.joint.dowelSpacing < 2 * s.joint.dowelDiameter) {
      ctx.addIssue({
        code: "custom",
        path: ["joint", "dowelSpacing"],
        message: `The dowel spacing must be at least twice the dowel diameter (${fmt(2 * s.joint.dowelDiameter)} mm).`,
      });
    }
    if (s.supportHoleDiameter > s.baseDepth / 2)
      ctx.addIssue({
        code: "custom",
        path: ["supportHoleDiameter"],
        message: `A support hole of ${fmt(s.supportHoleDiameter)} mm is more than half the ${fmt(s.baseDepth)} mm base band.`,
      });
    if (s.sheet.length - 2 * s.margin < 10 || s.sheet.width - 2 * s.margin < 10)
      ctx.addIssue({
        code: "custom",
        path: ["margin"],
        message: `A ${fmt(s.margin)} mm margin leaves no usable sheet (${fmt(s.sheet.length)} × ${fmt(s.sheet.width)} mm).`,
      });
    if (s.cuts) {
      for (let i = 1; i < s.cuts.length; i++)
        if (!(s.cuts[i] > s.cuts[i - 1]))
          ctx.addIssue({
            code: "custom",
            path: ["cuts", i],
            message: `Cut stations must increase along the run: station ${i + 1} (${fmt(s.cuts[i])} mm) is not past station ${i} (${fmt(s.cuts[i - 1])} mm).`,
          });
    }
  });

export type CutSettings = z.output<typeof cutSettingsSchema>;
export type CutSettingsInput = z.input<typeof cutSettingsSchema>;

/** The settings with every default filled in. */
export const DEFAULT_CUT_SETTINGS: CutSettings = cutSettingsSchema.parse({});

/** Validates settings, throwing CutError "invalid-settings" that names the first bad field. */
export function parseCutSettings(input: unknown): CutSettings {
  const r = cutSettingsSchema.safeParse(input ?? {});
  if (r.success) return r.data;
  const issue = r.error.issues[0];
  const path = issue.path.map(String);
  if (issue.code === "unrecognized_keys") {
    const key = [...path, issue.keys[0]].join(".");
    throw new CutError("invalid-settings", `There is no setting "${key}".`, key);
  }
  const field = path.join(".");
  throw new CutError("invalid-settings", issue.message, field || undefined);
}

/** The radius a machine leaves in a concave corner: half the kerf (the cutter's or the beam's radius), or the machine's own figure if larger. */
export function insideRadius(s: Pick<CutSettings, "machine">): number {
  return Math.max(s.machine.kerf / 2, s.machine.minInsideRadius);
}
