import { getInputProps, type FieldMetadata } from "@conform-to/react";

/** A labelled input bound to a Conform field, with its error message beneath. */
export function TextField({
  field,
  label,
  type = "text",
  autoComplete,
  hint,
}: {
  field: FieldMetadata<string | undefined>;
  label: string;
  type?: "text" | "email" | "password" | "date";
  autoComplete?: string;
  hint?: string;
}) {
  const { key, ...inputProps } = getInputProps(field, {
    type,
    // The hint is read with the field (after any error, in Conform's order).
    ariaDescribedBy: hint ? field.descriptionId : undefined,
  });
  return (
    <div>
      <label htmlFor={field.id} className="field-label">
        {label}
      </label>
      <input
        key={key}
        {...inputProps}
        autoComplete={autoComplete}
        className="field-input"
      />
      {hint ? (
        <p id={field.descriptionId} className="mt-1 text-xs text-graphite-500">
          {hint}
        </p>
      ) : null}
      {field.errors ? (
        <p id={field.errorId} className="field-error">
          {field.errors.join(" ")}
        </p>
      ) : null}
    </div>
  );
}

/** Messages for the whole form (not one field). */
export function FormMessages({
  id,
  errors,
}: {
  id?: string;
  errors?: string[];
}) {
  if (!errors || errors.length === 0) return null;
  return (
    <div
      id={id}
      role="alert"
      className="rounded-md border border-danger/40 bg-danger/5 px-3 py-2 text-sm text-danger"
    >
      {errors.join(" ")}
    </div>
  );
}
