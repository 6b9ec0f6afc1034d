import type { InputHTMLAttributes, ReactNode, SelectHTMLAttributes } from "react";
import { controlClass as inputClass } from "./control-class";

interface FieldProps {
  label: string;
  name: string;
  errors?: string[];
  hint?: ReactNode;
}

function Messages({ id, errors, hint }: { id: string; errors?: string[]; hint?: ReactNode }) {
  return (
    <>
      {hint && !errors?.length ? <p className="text-xs text-ink-soft">{hint}</p> : null}
      <div id={id} aria-live="polite">
        {errors?.map((e) => (
          <p key={e} className="text-xs font-medium text-caution-ink">
            {e}
          </p>
        ))}
      </div>
    </>
  );
}

// The label holds only its words; hints and errors sit beside the control and are tied to it by
// aria-describedby, so a screen reader (and a test) finds the field by its label alone.
export function TextField({
  label,
  name,
  errors,
  hint,
  id,
  ...input
}: FieldProps & InputHTMLAttributes<HTMLInputElement>) {
  const fieldId = id ?? `field-${name}`;
  const errorId = `${fieldId}-error`;
  return (
    <div className="flex flex-col gap-1 text-sm">
      <label htmlFor={fieldId} className="font-medium">
        {label}
      </label>
      <input
        id={fieldId}
        name={name}
        className={inputClass}
        aria-invalid={errors?.length ? true : undefined}
        aria-describedby={errorId}
        {...input}
      />
      <Messages id={errorId} errors={errors} hint={hint} />
    </div>
  );
}

export function SelectField({
  label,
  name,
  errors,
  hint,
  options,
  id,
  ...select
}: FieldProps & SelectHTMLAttributes<HTMLSelectElement> & { options: { value: string; label: string }[] }) {
  const fieldId = id ?? `field-${name}`;
  const errorId = `${fieldId}-error`;
  return (
    <div className="flex flex-col gap-1 text-sm">
      <label htmlFor={fieldId} className="font-medium">
        {label}
      </label>
      {/* Keyed by its default so a failed submit, which resets the form, shows the value typed. */}
      <select
        key={String(select.defaultValue ?? "")}
        id={fieldId}
        name={name}
        className={inputClass}
        aria-invalid={errors?.length ? true : undefined}
        aria-describedby={errorId}
        {...select}
      >
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      <Messages id={errorId} errors={errors} hint={hint} />
    </div>
  );
}
