import "server-only";
// Every server action goes through `formAction`: validate the form with zod, run the access check
// the action names, and return one state shape the forms render (message, field errors, and the
// values typed, so a failed form keeps them).
import { unstable_rethrow } from "next/navigation";
import { z } from "zod";
import { AppError, toAppError, type FieldErrors } from "./errors";

export interface ActionState {
  ok?: boolean;
  status?: number;
  message?: string;
  fields?: FieldErrors;
  values?: Record<string, string>;
}

const SECRET_FIELDS = new Set(["password", "newPassword", "currentPassword", "newPasswordAgain"]);

/** What the user typed, minus passwords, to put back into the form. */
function typedValues(formData: FormData): Record<string, string> {
  const values: Record<string, string> = {};
  for (const [key, value] of formData.entries()) {
    if (typeof value === "string" && !key.startsWith("$") && !SECRET_FIELDS.has(key))
      values[key] = value.slice(0, 1000);
  }
  return values;
}

/**
 * `authorize` runs first, on the raw form (so an anonymous or wrong-role caller learns nothing from
 * validation), and its result is handed to `run` with the validated input.
 */
export function formAction<T extends z.ZodType, C>(
  schema: T,
  authorize: (raw: Record<string, FormDataEntryValue>) => Promise<C>,
  run: (input: z.infer<T>, context: C) => Promise<string | void>,
) {
  return async (_previous: ActionState, formData: FormData): Promise<ActionState> => {
    const values = typedValues(formData);
    try {
      const raw = Object.fromEntries(formData.entries());
      const context = await authorize(raw);
      const parsed = schema.safeParse(raw);
      if (!parsed.success) throw AppError.fromZod(parsed.error);
      const message = await run(parsed.data, context);
      return { ok: true, message: message ?? "Saved." };
    } catch (error) {
      unstable_rethrow(error);
      const appError = toAppError(error);
      return { ok: false, status: appError.status, message: appError.message, fields: appError.fields, values };
    }
  };
}
