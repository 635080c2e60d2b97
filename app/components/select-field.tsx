import { getSelectProps, type FieldMetadata } from "@conform-to/react";

/** A labelled select bound to a Conform field, with a hint and its error message beneath. */
export function SelectField({
  field,
  label,
  hint,
  placeholder,
  resetKey,
  children,
}: {
  // The select only needs the field's name, id and errors, whatever the schema's type.
  field: FieldMetadata<unknown>;
  label: string;
  hint?: React.ReactNode;
  /** A first, empty option ("Choose…"); the schema's message asks for a choice. */
  placeholder?: string;
  /** Changing it starts the select afresh, e.g. when its options change. */
  resetKey?: string;
  children: React.ReactNode;
}) {
  const { key, ...selectProps } = getSelectProps(field);
  const describedBy = [
    field.errors ? field.errorId : null,
    hint ? field.descriptionId : null,
  ]
    .filter(Boolean)
    .join(" ");
  return (
    <div>
      <label htmlFor={field.id} className="field-label">
        {label}
      </label>
      <select
        key={`${key ?? ""}${resetKey ?? ""}`}
        {...selectProps}
        aria-describedby={describedBy || undefined}
        className="field-input"
      >
        {placeholder !== undefined ? (
          <option value="">{placeholder}</option>
        ) : null}
        {children}
      </select>
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
