import { z } from "zod";

export const emailField = z
  .string({ error: "Enter an e-mail address." })
  .trim()
  .toLowerCase()
  .max(254, { error: "An e-mail address has at most 254 characters." })
  .pipe(z.email({ error: "That is not an e-mail address." }));

export const signInSchema = z.object({
  email: emailField,
  password: z.string({ error: "Enter your password." }).min(1, { error: "Enter your password." }).max(200, { error: "That password is too long." }),
});
