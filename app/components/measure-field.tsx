/**
 * A large input for what is weighed, counted or typed at the bench: a label
 * with the unit, and a hint and errors that screen readers read with the field.
 */
export function MeasureField({
  id,
  name,
  label,
  unit,
  errors,
  hint,
  ...input
}: {
  id: string;
  name: string;
  label: string;
  unit?: string;
  errors?: string[];
  hint?: string;
} & React.InputHTMLAttributes<HTMLInputElement>) {
  const describedBy = [
    hint ? `${id}-hint` : null,
    errors ? `${id}-error` : null,
  ]
    .filter(Boolean)
    .join(" ");
  return (
    <div>
      <label htmlFor={id} className="field-label">
        {label}
        {unit ? (
          <span className="font-normal text-graphite-500"> ({unit})</span>
        ) : null}
      </label>
      <input
        id={id}
        name={name}
        className="field-input min-h-12 text-lg tabular-nums"
        aria-invalid={errors ? true : undefined}
        aria-describedby={describedBy || undefined}
        {...input}
      />
      {hint ? (
        <p id={`${id}-hint`} className="mt-1 text-xs text-graphite-500">
          {hint}
        </p>
      ) : null}
      {errors ? (
        <p id={`${id}-error`} className="field-error">
          {errors.join(" ")}
        </p>
      ) : null}
    </div>
  );
}
