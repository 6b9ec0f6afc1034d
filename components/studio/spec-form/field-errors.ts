// The spec form's errors, keyed by the field they belong to. Kept apart from the form itself so the
// track and wheel field groups can read them without importing the form that renders them.
import { designSpecSchema, type DesignSpecInput } from "@/lib/track";
import { compileFormula } from "@/lib/track/formula";

export type FieldErrors = Record<string, string>;

/** Schema messages keyed by their dotted path ("wheel.side"), for the fields to show. */
export function specErrors(spec: DesignSpecInput): FieldErrors {
  const parsed = designSpecSchema.safeParse(spec);
  if (parsed.success) return {};
  const errors: FieldErrors = {};
  for (const issue of parsed.error.issues) {
    const key = issue.path.join(".");
    errors[key] ??= issue.message;
  }
  return errors;
}

/** The formula reader's message for a formula as typed, or undefined when it reads. */
export function formulaError(source: string, variable: string): string | undefined {
  try {
    compileFormula(source, variable, "formula");
    return undefined;
  } catch (e) {
    return (e as Error).message;
  }
}
