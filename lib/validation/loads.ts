// The load-path check's input (lib/loads): what `npm run loads` reads and the studio's loads panel
// sends to its worker. Lengths in mm, moduli in GPa, stresses in MPa, forces in N, whatever the
// design spec's own units. Unknown keys are refused, so a misspelt field is named, not ignored.
import { z } from "zod";

export const USES = ["ride-on", "push-along", "hand-turned", "display"] as const;
export type Use = (typeof USES)[number];

export const USE_LABELS: Record<Use, string> = {
  "ride-on": "Ride-on (people sit or stand on it)",
  "push-along": "Push-along (pushed by hand)",
  "hand-turned": "Hand-turned (a crank or handle turns it)",
  display: "Display behind a guard (no one can reach it)",
};

const positive = z.number().finite().positive();
const poisson = z
  .number({ error: "Poisson's ratio must be a number." })
  .finite()
  .min(0, { error: "Poisson's ratio must be from 0 to 0.49." })
  .max(0.49, { error: "Poisson's ratio must be from 0 to 0.49." });

const tread = z.strictObject({
  /** Name shown in the helper's suggestion, e.g. the library row. */
  name: z.string().trim().min(1).max(120),
  mu: positive.max(5),
  modulusGpa: positive.max(1000),
  poisson,
  allowableMpa: positive.max(10000).optional(),
});

export const loadsInputSchema = z.strictObject({
  /** The design spec, as the engine takes it (the engine checks it). */
  spec: z.unknown().refine((v) => typeof v === "object" && v !== null, { message: "must be a design spec object" }),
  use: z.enum(USES),
  load: z
    .strictObject({
      riderMassKg: positive.max(1000).optional(),
      dynamicFactor: z.number().finite().min(1).max(10).optional(),
      wheels: z.number().int().min(1).max(64).optional(),
      wheelLoadN: positive.max(1e6).optional(),
    })
    .default({}),
  /** Traction or braking force as a share of the wheel load, H/V. */
  traction: z.number().finite().min(0).max(1).optional(),
  /** The pair's static friction coefficient, from the library or measured. */
  mu: positive.max(5).optional(),
  /** A measured slip angle (tilt test), degrees: μ = tan θ. */
  tiltDeg: z.number().finite().gt(0).lt(90).optional(),
  /** Design speed of the axle, m/s (with the wheel's density it gives the wheel's own inertia load). */
  speedMps: positive.max(20).optional(),
  wheel: z.strictObject({
    /** The library row the figures came from (tread, or the wheel's own sheet). */
    material: z.string().trim().max(120).optional(),
    modulusGpa: positive.max(1000),
    poisson,
    treadWidthMm: positive.max(10000),
    allowableMpa: positive.max(10000).optional(),
    densityKgM3: positive.max(30000).optional(),
  }),
  track: z.strictObject({
    material: z.string().trim().max(120).optional(),
    modulusGpa: positive.max(1000),
    poisson,
    widthMm: positive.max(10000),
    depthMm: positive.max(10000),
    supportSpanMm: positive.max(100000),
    densityKgM3: positive.max(30000).optional(),
    allowableMpa: positive.max(10000).optional(),
  }),
  /** Gaps people can reach that open and close as the piece moves, by name (wheel to frame, fork, fender, guard). */
  clearancesMm: z.record(z.string().trim().min(1).max(60), z.number().finite().min(0).max(10000)).optional(),
  /** Other treads the helper may suggest (the shop library's rows). */
  treads: z.array(tread).max(50).optional(),
});

/** What a design keeps (the draft's and each revision's `loads`): the input without the spec and the library's treads. */
export const loadsSettingsSchema = loadsInputSchema.omit({ spec: true, treads: true });
export type LoadsSettings = z.output<typeof loadsSettingsSchema>;

export type LoadsInput = z.output<typeof loadsInputSchema>;
export type LoadsInputDraft = z.input<typeof loadsInputSchema>;
export type TreadOption = z.output<typeof tread>;

/** The first problem as one line naming the field, e.g. "wheel.poisson: Too big: expected number to be <=0.49". */
export function firstLoadsIssue(error: z.ZodError): string {
  const issue = error.issues[0];
  const where = issue.path.map(String).join(".") || "input";
  return `${where}: ${issue.message}`;
}
