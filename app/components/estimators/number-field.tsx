import { getInputProps, type FieldMetadata } from "@conform-to/react";

/** A number input of an estimator, with its unit, a hint, and the browser's or the API's messages. */
export function NumberField({
  field,
  label,
  unit,
  hint,
  apiErrors,
  step = "any",
}: {
  field: FieldMetadata<number | string | undefined | null>;
  label: string;
  unit?: string;
  hint?: string;
  apiErrors?: string[];
  step?: string;
}) {
  const { key, ...props } = getInputProps(field, { type: "number" });
  const errors = field.errors ?? apiErrors;
  return (
    <div>
      <label htmlFor={field.id} className="field-label">
        {label}
        {unit ? (
          <span className="font-normal text-graphite-500"> ({unit})</span>
        ) : null}
      </label>
      <input
        key={key}
        {...props}
        step={step}
        inputMode="decimal"
        className="field-input"
        aria-invalid={errors ? true : undefined}
      />
      {hint ? <p className="mt-1 text-xs text-graphite-500">{hint}</p> : null}
      {errors ? (
        <p id={field.errorId} className="field-error">
          {errors.join(" ")}
        </p>
      ) : null}
    </div>
  );
}
