import { z } from "zod";
import { PASSWORD_MIN_LENGTH } from "./limits";

export const emailField = z
  .string({ error: "Enter an e-mail address." })
  .trim()
  .toLowerCase()
  .max(254, { error: "An e-mail address has at most 254 characters." })
  .pipe(z.email({ error: "That is not an e-mail address." }));

export const signInSchema = z.object({
  email: emailField,
  password: z
    .string({ error: "Enter your password." })
    .min(1, { error: "Enter your password." })
    .max(200, { error: "That password is too long." }),
});

/** The change-password form: the current password, and the new one twice. */
export const passwordChangeSchema = z
  .object({
    currentPassword: z
      .string({ error: "Enter your current password." })
      .min(1, { error: "Enter your current password." })
      .max(200, { error: "That password is too long." }),
    newPassword: z
      .string({ error: "Enter a new password." })
      .min(PASSWORD_MIN_LENGTH, { error: `A password needs at least ${PASSWORD_MIN_LENGTH} characters.` })
      .max(200, { error: "A password has at most 200 characters." }),
    newPasswordAgain: z.string({ error: "Enter the new password again." }),
  })
  .refine((v) => v.newPassword === v.newPasswordAgain, {
    path: ["newPasswordAgain"],
    error: "The two new passwords are not the same.",
  })
  .refine((v) => v.newPassword !== v.currentPassword, {
    path: ["newPassword"],
    error: "Choose a password different from the current one.",
  });
