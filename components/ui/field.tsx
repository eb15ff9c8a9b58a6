import type { InputHTMLAttributes, ReactNode } from "react";

type FieldProps = InputHTMLAttributes<HTMLInputElement> & {
  name: string;
  label: string;
  errors?: string[];
  hint?: ReactNode;
};

/** A labelled input whose error and hint are announced through aria-describedby. */
export function Field({ name, label, errors, hint, id, className = "", ...input }: FieldProps) {
  const fieldId = id ?? `field-${name}`;
  const errorId = `${fieldId}-error`;
  const hintId = `${fieldId}-hint`;
  const describedBy = [errors?.length ? errorId : null, hint ? hintId : null].filter(Boolean).join(" ") || undefined;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={fieldId} className="text-sm font-medium text-steel-800">
        {label}
      </label>
      <input
        id={fieldId}
        name={name}
        aria-invalid={errors?.length ? true : undefined}
        aria-describedby={describedBy}
        className="min-h-11 rounded-md border border-steel-300 bg-white px-3 text-base text-ink shadow-sm outline-none focus:border-oil-500 focus:ring-2 focus:ring-oil-100 aria-invalid:border-fail"
        {...input}
      />
      {hint ? (
        <p id={hintId} className="text-xs text-steel-500">
          {hint}
        </p>
      ) : null}
      <FieldError id={errorId} errors={errors} />
    </div>
  );
}

/** A field's error text, referenced by the control's aria-describedby. */
export function FieldError({ id, errors }: { id: string; errors?: string[] }) {
  if (!errors?.length) return null;
  return (
    <p id={id} className="text-sm text-fail">
      {errors.join(" ")}
    </p>
  );
}
