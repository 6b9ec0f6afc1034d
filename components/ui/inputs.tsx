"use client";
// The controlled inputs of the studio, the loads panel and the cut plan: numbers with their unit,
// free text, selects, check boxes and formulas. Each shows its own error or hint under it, tied to it
// for screen readers. Forms posted to a server action use ./field.tsx instead; both share one look.
import { useId, useState, type ReactNode } from "react";
import { controlClass as box } from "./control-class";
import { FieldRow as Row } from "./field-row";

/** A number with its unit. Keeps the text as typed while it is not yet a number, so typing "1." works. */
export function NumberInput(props: {
  label: string;
  id?: string;
  value: number | undefined;
  unit?: string;
  min?: number;
  max?: number;
  step?: number;
  integer?: boolean;
  disabled?: boolean;
  error?: string;
  hint?: ReactNode;
  /** Clearing the box is a value too: undefined (for figures that may be left out). */
  optional?: boolean;
  onChange: (value: number | undefined) => void;
}) {
  const autoId = useId();
  const id = props.id ?? autoId;
  const [text, setText] = useState<string | null>(null);
  const shown = text ?? (props.value === undefined ? "" : String(props.value));
  let localError: string | undefined;
  if (text !== null && text.trim() !== "") {
    const v = Number(text);
    if (!Number.isFinite(v)) localError = "Enter a number.";
    else if (props.integer && !Number.isInteger(v)) localError = "Enter a whole number.";
    else if (props.min !== undefined && v < props.min) localError = `At least ${props.min}.`;
    else if (props.max !== undefined && v > props.max) localError = `At most ${props.max}.`;
  }
  const error = localError ?? props.error;
  return (
    <Row id={id} label={props.unit ? `${props.label} (${props.unit})` : props.label} error={error} hint={props.hint}>
      <input
        id={id}
        type="text"
        inputMode="decimal"
        className={`${box} font-mono`}
        value={shown}
        disabled={props.disabled}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        onChange={(e) => {
          setText(e.target.value);
          if (props.optional && e.target.value.trim() === "") return props.onChange(undefined);
          const v = Number(e.target.value);
          const ok =
            e.target.value.trim() !== "" &&
            Number.isFinite(v) &&
            (!props.integer || Number.isInteger(v)) &&
            (props.min === undefined || v >= props.min) &&
            (props.max === undefined || v <= props.max);
          if (ok) props.onChange(v);
        }}
        onBlur={() => setText(null)}
      />
    </Row>
  );
}

/** Text kept exactly as typed (lists of stations, figures the caller reads itself). */
export function TextInput(props: {
  label: string;
  id?: string;
  value: string;
  unit?: string;
  inputMode?: "text" | "decimal" | "numeric";
  maxLength?: number;
  placeholder?: string;
  disabled?: boolean;
  error?: string;
  hint?: ReactNode;
  onChange: (value: string) => void;
}) {
  const autoId = useId();
  const id = props.id ?? autoId;
  return (
    <Row
      id={id}
      label={props.unit ? `${props.label} (${props.unit})` : props.label}
      error={props.error}
      hint={props.hint}
    >
      <input
        id={id}
        type="text"
        inputMode={props.inputMode ?? "text"}
        className={box}
        maxLength={props.maxLength}
        placeholder={props.placeholder}
        value={props.value}
        disabled={props.disabled}
        aria-invalid={props.error ? true : undefined}
        aria-describedby={props.error ? `${id}-error` : undefined}
        onChange={(e) => props.onChange(e.target.value)}
      />
    </Row>
  );
}

export function SelectInput<T extends string>(props: {
  label: string;
  id?: string;
  value: T;
  options: { value: T; label: string }[];
  disabled?: boolean;
  error?: string;
  hint?: ReactNode;
  onChange: (value: T) => void;
  testId?: string;
}) {
  const autoId = useId();
  const id = props.id ?? autoId;
  return (
    <Row id={id} label={props.label} error={props.error} hint={props.hint}>
      <select
        id={id}
        className={box}
        value={props.value}
        disabled={props.disabled}
        data-testid={props.testId}
        aria-invalid={props.error ? true : undefined}
        aria-describedby={props.error ? `${id}-error` : undefined}
        onChange={(e) => props.onChange(e.target.value as T)}
      >
        {props.options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    </Row>
  );
}

/** A formula, checked as it is typed by the engine's own formula reader. */
export function FormulaInput(props: {
  label: string;
  value: string;
  variable: string;
  disabled?: boolean;
  check: (source: string) => string | undefined;
  onChange: (value: string) => void;
  hint?: ReactNode;
}) {
  const id = useId();
  const error = props.check(props.value);
  return (
    <Row id={id} label={props.label} error={error} hint={props.hint}>
      <input
        id={id}
        type="text"
        spellCheck={false}
        className={`${box} font-mono`}
        value={props.value}
        disabled={props.disabled}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        onChange={(e) => props.onChange(e.target.value)}
      />
    </Row>
  );
}

/** A yes-or-no choice, its label to the right of the box. */
export function CheckInput(props: {
  label: string;
  id?: string;
  checked: boolean;
  disabled?: boolean;
  onChange: (checked: boolean) => void;
}) {
  const autoId = useId();
  const id = props.id ?? autoId;
  return (
    <div className="flex items-center gap-2 text-sm">
      <input
        id={id}
        type="checkbox"
        checked={props.checked}
        disabled={props.disabled}
        onChange={(e) => props.onChange(e.target.checked)}
      />
      <label htmlFor={id}>{props.label}</label>
    </div>
  );
}
