import { z } from "zod";
import { MEMBER_ROLES, PROJECT_STATUSES } from "@/db/schema";

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
