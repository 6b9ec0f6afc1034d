import { z } from "zod";
import { planChoiceSchema } from "@/lib/cut-plan/compose";

const finite = z.number({ error: "Positions must be numbers." }).finite({ error: "Positions must be finite numbers." });
const partId = z.string().min(1).max(40);

const placement = z.strictObject({
  id: partId,
  copy: z.number().int().min(0).max(10_000),
  rotation: finite,
  x: finite,
  y: finite,
  sheet: z.number().int().min(0).max(500),
});

/** A nest as the browser's nester hands it back; the server checks it against its own parts. */
export const nestSchema = z.strictObject({
  sheets: z
    .array(
      z.strictObject({
        index: z.number().int().min(0).max(500),
        utilisation: z.number().finite(),
        placements: z.array(placement).max(5000),
      }),
      { error: "The nest needs its sheets." },
    )
    .min(1, { error: "The nest places nothing." })
    .max(500, { error: "A cut plan of more than 500 sheets cannot be saved." }),
  unplaced: z
    .array(z.strictObject({ id: partId, copy: z.number().int().min(0), reason: z.string().max(500) }))
    .max(5000),
  seconds: z.number().finite().min(0),
  cancelled: z.boolean(),
  utilisation: z.number().finite().optional(),
  // How the search ended and where its time went: kept with the plan as the nester reported them.
  ended: z.enum(["proved-best", "time", "iterations", "cancelled"]).optional(),
  areaBound: z.number().int().min(0).max(500).optional(),
  timings: z
    .strictObject({ firstLayout: z.number().finite().min(0), noFitPolygons: z.number().finite().min(0) })
    .optional(),
  outlines: z
    .array(
      z.strictObject({
        id: partId,
        vertices: z.number().int().min(0),
        outlineVertices: z.number().int().min(0),
        extraArea: z.number().finite(),
        extraShare: z.number().finite(),
      }),
    )
    .max(500)
    .optional(),
});

export const CUT_PLAN_PURPOSES = ["review", "production"] as const;

export const newCutPlanSchema = planChoiceSchema.extend({
  nest: nestSchema,
  /**
   * What the plan is for. Default: production once the client has approved the revision, review
   * until then. Production on a revision without an approval needs the shop's reason (logged).
   */
  purpose: z.enum(CUT_PLAN_PURPOSES, { error: `The purpose must be "review" or "production".` }).optional(),
  reason: z
    .string({ error: "The reason must be text." })
    .trim()
    .max(500, { error: "A reason has at most 500 characters." })
    .optional(),
});
