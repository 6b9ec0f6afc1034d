import { z } from "zod";
import { MEMBER_ROLES, PROJECT_STATUSES } from "@/db/schema";
import { RUN_LENGTH_MAX_MM, RUN_LENGTH_MIN_MM, TRACK_LINES_MAX } from "./limits";

const name = z
  .string({ error: "Enter a project name." })
  .trim()
  .min(1, { error: "Enter a project name." })
  .max(160, { error: "A project name has at most 160 characters." });
const site = z.string().trim().max(200, { error: "A site has at most 200 characters." });
const clientOrganisation = z.string().trim().max(160, { error: "An organisation name has at most 160 characters." });

export const newProjectSchema = z.object({
  name,
  site: site.default(""),
  clientOrganisation: clientOrganisation.default(""),
});

export const projectUpdateSchema = z
  .object({
    name,
    site,
    clientOrganisation,
    status: z.enum(PROJECT_STATUSES, { error: "Choose one of the statuses." }),
  })
  .partial()
  .refine((v) => Object.keys(v).length > 0, { error: "Nothing to change." });

export const memberRoleField = z.enum(MEMBER_ROLES, { error: "Choose fabricator, client or installer." });

export const newMemberSchema = z.object({
  userId: z.coerce.number({ error: "Choose a person." }).int().positive({ error: "Choose a person." }),
  role: memberRoleField,
});

export const memberUpdateSchema = z.object({ role: memberRoleField });

// The project's site and stock ("Site and stock" on the project page), from which a new cut plan
// starts. Each may be left blank: not set. Whether a chosen sheet or machine is still in the shop
// library is checked against its row when the change is written (db/queries/projects.ts).
const unsetWhenBlank = (v: unknown) =>
  v === undefined || v === null || (typeof v === "string" && v.trim() === "") ? null : v;

const badRunLength = "Enter the run length on site in millimetres, as a number (or leave it blank).";
const badTrackLines = `The track lines must be a whole number from 1 to ${TRACK_LINES_MAX} (or leave it blank).`;

const libraryChoice = (message: string) =>
  z.preprocess(
    unsetWhenBlank,
    z.coerce.number({ error: message }).int({ error: message }).positive({ error: message }).nullable(),
  );

export const projectSiteSchema = z.object({
  siteRunLengthMm: z.preprocess(
    // A decimal comma is read as a point, as the cut-plan page does.
    (v) => unsetWhenBlank(typeof v === "string" ? v.trim().replace(",", ".") : v),
    z.coerce
      .number({ error: badRunLength })
      .refine(Number.isFinite, { error: badRunLength })
      .refine((v) => v >= RUN_LENGTH_MIN_MM, {
        error: `The run length on site must be at least ${RUN_LENGTH_MIN_MM} mm.`,
      })
      .refine((v) => v <= RUN_LENGTH_MAX_MM, {
        error: `The run length on site must be at most ${RUN_LENGTH_MAX_MM} mm (${RUN_LENGTH_MAX_MM / 1000} m).`,
      })
      .nullable(),
  ),
  trackLines: z.preprocess(
    unsetWhenBlank,
    z.coerce
      .number({ error: badTrackLines })
      .int({ error: badTrackLines })
      .min(1, { error: badTrackLines })
      .max(TRACK_LINES_MAX, { error: badTrackLines })
      .nullable(),
  ),
  stockSheetId: libraryChoice("Choose a stock sheet from the list."),
  machineId: libraryChoice("Choose a machine from the list."),
});
export type ProjectSiteInput = z.infer<typeof projectSiteSchema>;
