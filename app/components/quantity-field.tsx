import { getInputProps, type FieldMetadata } from "@conform-to/react";

/**
 * A labelled number input bound to a Conform field, its unit in the label,
 * its message beneath. `extraErrors` shows messages found after the browser's
 * own check (e.g. by the API), until the person types again.
 */
export function QuantityField({
  field,
  label,
  unit,
  hint,
  extraErrors,
  allowNegative = false,
  placeholder,
}: {
  // Conform types a number field by its schema; the input only needs its name, id and errors.
  field: FieldMetadata<number | string | null | undefined>;
  label: string;
  unit?: string;
  hint?: string;
  extraErrors?: string[];
  allowNegative?: boolean;
  placeholder?: string;
}) {
  const { key, ...inputProps } = getInputProps(field, { type: "text" });
  const errors = field.errors ?? extraErrors;
  const describedBy = [
    errors ? field.errorId : null,
    hint ? field.descriptionId : null,
  ]
    .filter(Boolean)
    .join(" ");
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
        {...inputProps}
        // Decimal keypads on phones have no minus sign, so signed values get the full keyboard.
        inputMode={allowNegative ? "text" : "decimal"}
        autoComplete="off"
        spellCheck={false}
        placeholder={placeholder}
        aria-invalid={errors ? true : undefined}
        aria-describedby={describedBy || undefined}
        className="field-input text-right tabular-nums"
      />
      {hint ? (
        <p id={field.descriptionId} className="mt-1 text-xs text-graphite-500">
          {hint}
        </p>
      ) : null}
      {errors ? (
        <p id={field.errorId} className="field-error">
          {errors.join(" ")}
        </p>
      ) : null}
    </div>
  );
}
