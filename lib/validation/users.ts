import { z } from "zod";
import { USER_ROLES } from "@/db/schema";
import { PASSWORD_MIN_LENGTH } from "@/lib/validation/limits";
import { emailField } from "./auth";

export const userRoleField = z.enum(USER_ROLES, { error: "Choose one of the roles." });

export const newUserSchema = z.object({
  email: emailField,
  name: z
    .string({ error: "Enter a name." })
    .trim()
    .min(1, { error: "Enter a name." })
    .max(120, { error: "A name has at most 120 characters." }),
  role: userRoleField,
  password: z
    .string({ error: "Enter a first password." })
    .min(PASSWORD_MIN_LENGTH, { error: `A password needs at least ${PASSWORD_MIN_LENGTH} characters.` })
    .max(200, { error: "A password has at most 200 characters." }),
});

export const userIdField = z.coerce.number({ error: "No such user." }).int().positive({ error: "No such user." });

export const changeRoleSchema = z.object({ userId: userIdField, role: userRoleField });
export const setActiveSchema = z.object({
  userId: userIdField,
  active: z.enum(["true", "false"]).transform((v) => v === "true"),
});
