import type { SelectHTMLAttributes } from "react";
import { FieldError } from "./field";

type Props = SelectHTMLAttributes<HTMLSelectElement> & {
  name: string;
  label: string;
  options: readonly { value: string; label: string }[];
  errors?: string[];
};

/** A labelled select whose error is announced through aria-describedby. */
export function SelectField({ name, label, options, errors, id, ...select }: Props) {
  const fieldId = id ?? `field-${name}`;
  const errorId = `${fieldId}-error`;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={fieldId} className="text-sm font-medium text-steel-800">
        {label}
      </label>
      <select
        id={fieldId}
        name={name}
        aria-invalid={errors?.length ? true : undefined}
        aria-describedby={errors?.length ? errorId : undefined}
        className="min-h-11 rounded-md border border-steel-300 bg-white px-3 text-base text-ink aria-invalid:border-fail"
        {...select}
      >
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      <FieldError id={errorId} errors={errors} />
    </div>
  );
}
