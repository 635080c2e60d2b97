import { getTextareaProps, type FieldMetadata } from "@conform-to/react";

/** A labelled multi-line text box bound to a Conform field, with its message beneath. */
export function TextAreaField({
  field,
  label,
  rows = 3,
}: {
  field: FieldMetadata<string | undefined>;
  label: string;
  rows?: number;
}) {
  const { key, ...textareaProps } = getTextareaProps(field);
  return (
    <div>
      <label htmlFor={field.id} className="field-label">
        {label}
      </label>
      <textarea
        key={key}
        {...textareaProps}
        rows={rows}
        aria-invalid={field.errors ? true : undefined}
        className="field-input"
      />
      {field.errors ? (
        <p id={field.errorId} className="field-error">
          {field.errors.join(" ")}
        </p>
      ) : null}
    </div>
  );
}
