// What the review routes and forms accept: a review request, a comment, a decision.
import { z } from "zod";
import { END_TREATMENTS, REVIEW_DECISIONS } from "@/db/schema";
import { CURRENCY_CODES } from "@/lib/money/currency";

const text = (what: string, max: number) =>
  z
    .string({ error: `${what} must be text.` })
    .trim()
    .min(1, { error: `Write ${what.toLowerCase()}.` })
    .max(max, { error: `${what} has at most ${max} characters.` });

export const MAX_DEPOSIT = 1_000_000;

export const depositSchema = z.strictObject(
  {
    amount: z
      .number({ error: "The deposit must be a number." })
      .finite({ error: "The deposit must be a number." })
      .gt(0, { error: "The deposit must be more than 0." })
      .max(MAX_DEPOSIT, { error: `The deposit is at most ${MAX_DEPOSIT.toLocaleString("en-GB")}.` }),
    currency: z.enum(CURRENCY_CODES, { error: `The currency must be one of ${CURRENCY_CODES.join(", ")}.` }),
  },
  { error: 'The deposit must be an object such as { amount: 1500, currency: "GBP" }.' },
);

export const newReviewSchema = z.strictObject({
  message: text("A message for the client", 2000),
  deposit: depositSchema.nullish(),
  /** The site run the mock-up lays out, mm. Default: the revision's cut plan, else its last review, else 2400 mm. */
  runLength: z
    .number({ error: "The run length must be a number of millimetres." })
    .finite({ error: "The run length must be a number of millimetres." })
    .min(10, { error: "The run length must be at least 10 mm." })
    .max(100_000, { error: "The run length must be at most 100 000 mm." })
    .optional(),
  endTreatment: z
    .enum(END_TREATMENTS, { error: `The end treatment must be one of ${END_TREATMENTS.join(", ")}.` })
    .optional(),
});

export const newCommentSchema = z.strictObject({
  text: text("A comment", 4000),
  /** A place along the run, mm from its start (a pair of wheels: the driver's turn in degrees). */
  at: z.number({ error: "The place must be a number." }).finite({ error: "The place must be a number." }).nullish(),
});

export const decisionSchema = z
  .strictObject({
    decision: z.enum(REVIEW_DECISIONS, { error: `The decision must be "approve" or "request-changes".` }),
    typedName: z
      .string({ error: "Type your full name." })
      .trim()
      .min(1, { error: "Type your full name." })
      .max(160, { error: "A name has at most 160 characters." }),
    comment: z
      .string({ error: "The comment must be text." })
      .trim()
      .max(4000, { error: "A comment has at most 4000 characters." })
      .optional(),
    /** The form's "I approve revision N for fabrication" tick; optional for API callers. */
    confirm: z.boolean().optional(),
  })
  .superRefine((d, ctx) => {
    if (d.decision === "request-changes" && !d.comment)
      ctx.addIssue({
        code: "custom",
        path: ["comment"],
        message: "Say what should change: a comment is needed to request changes.",
      });
    if (d.confirm === false)
      ctx.addIssue({ code: "custom", path: ["confirm"], message: "Tick the box to confirm your decision." });
  });

export type NewReview = z.infer<typeof newReviewSchema>;
export type Decision = z.infer<typeof decisionSchema>;
