import type { ReactNode } from "react";
import type { FieldError, UseFormRegisterReturn } from "react-hook-form";
import { Field } from "@/components/ui/field";
import { inputStyles } from "@/components/ui/button-styles";

/** A group of fields under a heading, laid out in a grid. */
export function FieldGroup({ title, children, hint }: { title: string; children: ReactNode; hint?: string }) {
  return (
    <fieldset className="grid gap-3 sm:grid-cols-2">
      <legend className="mb-1 text-sm font-semibold uppercase tracking-wide text-muted sm:col-span-2">{title}</legend>
      {hint && <p className="-mt-1 text-xs text-muted sm:col-span-2">{hint}</p>}
      {children}
    </fieldset>
  );
}

type InputProps = { id: string; label: string; error?: FieldError | { message?: string }; hint?: string; reg: UseFormRegisterReturn; required?: boolean };

function fullLabel(label: string, required?: boolean) {
  return required ? `${label} (required)` : label;
}

/** A number typed in the person's units; the label carries the unit. */
export function NumberInput({ id, label, error, hint, reg, required }: InputProps) {
  return (
    <Field id={id} label={fullLabel(label, required)} error={error?.message} hint={hint}>
      <input
        id={id}
        inputMode="decimal"
        autoComplete="off"
        className={`${inputStyles} num`}
        aria-invalid={!!error}
        aria-describedby={error ? `${id}-error` : undefined}
        {...reg}
      />
    </Field>
  );
}

export function SelectInput({ id, label, error, hint, reg, required, options }: InputProps & { options: readonly { value: string; label: string }[] }) {
  return (
    <Field id={id} label={fullLabel(label, required)} error={error?.message} hint={hint}>
      <select id={id} className={inputStyles} aria-invalid={!!error} aria-describedby={error ? `${id}-error` : undefined} {...reg}>
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    </Field>
  );
}

export function TextInput({ id, label, error, hint, reg, multiline }: InputProps & { multiline?: boolean }) {
  return (
    <Field id={id} label={label} error={error?.message} hint={hint}>
      {multiline ? (
        <textarea id={id} rows={3} className={inputStyles} aria-invalid={!!error} {...reg} />
      ) : (
        <input id={id} className={inputStyles} aria-invalid={!!error} {...reg} />
      )}
    </Field>
  );
}

/** Choices with a blank first option meaning "not answered yet". */
export const withBlank = (options: readonly { value: string; label: string }[]) => [{ value: "", label: "Choose…" }, ...options];
