import { z } from "zod";
import { loadsSettingsSchema } from "./loads";

const name = z
  .string({ error: "Enter a design name." })
  .trim()
  .min(1, { error: "Enter a design name." })
  .max(160, { error: "A design name has at most 160 characters." });

/** The spec itself is checked by the engine's own schema (lib/track), which gives the precise message. */
export const newDesignSchema = z.object({ name, spec: z.unknown() });
export const designUpdateSchema = z
  .object({ name, draft: z.unknown(), loads: loadsSettingsSchema })
  .partial()
  .refine((v) => v.name !== undefined || v.draft !== undefined || v.loads !== undefined, {
    error: "Nothing to change.",
  });
export const newRevisionSchema = z.object({
  spec: z.unknown(),
  note: z.string().trim().max(500, { error: "A note has at most 500 characters." }).default(""),
  /** The load settings to keep with the revision; absent: the design's own. */
  loads: loadsSettingsSchema.optional(),
});
