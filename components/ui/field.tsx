import type { InputHTMLAttributes, ReactNode, SelectHTMLAttributes } from "react";

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
          <p key={e} className="text-xs font-medium text-caution">
            {e}
          </p>
        ))}
      </div>
    </>
  );
}

const inputClass =
  "w-full rounded-plate border bg-white/70 px-2.5 py-1.5 text-sm text-ink placeholder:text-ink-faint aria-[invalid=true]:border-caution border-ink-line";

export function TextField({ label, name, errors, hint, ...input }: FieldProps & InputHTMLAttributes<HTMLInputElement>) {
  const errorId = `${name}-error`;
  return (
    <label className="flex flex-col gap-1 text-sm">
      <span className="font-medium">{label}</span>
      <input name={name} className={inputClass} aria-invalid={errors?.length ? true : undefined} aria-describedby={errorId} {...input} />
      <Messages id={errorId} errors={errors} hint={hint} />
    </label>
  );
}

export function SelectField({
  label,
  name,
  errors,
  hint,
  options,
  ...select
}: FieldProps & SelectHTMLAttributes<HTMLSelectElement> & { options: { value: string; label: string }[] }) {
  const errorId = `${name}-error`;
  return (
    <label className="flex flex-col gap-1 text-sm">
      <span className="font-medium">{label}</span>
      {/* Keyed by its default so a failed submit, which resets the form, shows the value typed. */}
      <select key={String(select.defaultValue ?? "")} name={name} className={inputClass} aria-invalid={errors?.length ? true : undefined} aria-describedby={errorId} {...select}>
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      <Messages id={errorId} errors={errors} hint={hint} />
    </label>
  );
}
