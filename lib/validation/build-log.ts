// What a build-log entry may hold: a kind people write, some text, the part ids (as engraved) it
// concerns. Photos are checked on their own (lib/server/photos.ts).
import { z } from "zod";
import { PEOPLE_LOG_KINDS } from "@/db/schema";

export const PART_ID = /^[A-Z0-9][A-Z0-9-]{0,15}$/i;

/** "T01, T02 W1" → ["T01", "T02", "W1"]. */
export function splitPartIds(raw: string): string[] {
  return raw
    .split(/[\s,;]+/)
    .map((s) => s.trim().toUpperCase())
    .filter(Boolean);
}

export const logEntrySchema = z.object({
  kind: z.enum(PEOPLE_LOG_KINDS, { error: `The kind must be one of ${PEOPLE_LOG_KINDS.join(", ")}.` }),
  text: z
    .string({ error: "The text must be text." })
    .trim()
    .max(4000, { error: "An entry has at most 4000 characters." })
    .default(""),
  parts: z
    .string({ error: "The parts must be part ids, e.g. T01, T02." })
    .max(1000)
    .default("")
    .transform(splitPartIds)
    .pipe(
      z
        .array(z.string().regex(PART_ID, { error: "Part ids are letters and digits as engraved, e.g. T01 or W1." }))
        .max(50, { error: "At most 50 parts in one entry." }),
    ),
});

/** A tick on the assembly sheet: one part, or one joint ("T01/T02"), installed or not after all. */
export const tickSchema = z.strictObject({
  item: z
    .string({ error: "Name the part or the joint." })
    .trim()
    .min(1)
    .max(40)
    .regex(/^[A-Z0-9][A-Z0-9/-]{0,39}$/i, { error: "A part id such as T01, or a joint such as T01/T02." }),
  done: z.boolean({ error: "done must be true or false." }),
});
