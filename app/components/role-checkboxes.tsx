import type { FieldMetadata } from "@conform-to/react";
import { roleLabels, roles, type Role } from "~/lib/roles";

/** One checkbox per role, bound to a Conform array field named "roles". */
export function RoleCheckboxes({
  field,
  legend = "Roles",
  choices = roles,
}: {
  field: FieldMetadata<Role[] | undefined>;
  legend?: string;
  /** The roles offered; all five unless narrowed (e.g. to the roles a person holds). */
  choices?: readonly Role[];
}) {
  const chosen = new Set(
    Array.isArray(field.initialValue)
      ? field.initialValue
      : field.initialValue
        ? [field.initialValue]
        : [],
  );
  return (
    <fieldset aria-describedby={field.errors ? field.errorId : undefined}>
      <legend className="field-label">{legend}</legend>
      <div className="mt-2 flex flex-wrap gap-x-5 gap-y-2">
        {choices.map((role) => (
          <label key={role} className="inline-flex items-center gap-2 text-sm">
            <input
              type="checkbox"
              name={field.name}
              value={role}
              defaultChecked={chosen.has(role)}
              className="h-4 w-4 accent-copper-600"
            />
            {roleLabels[role]}
          </label>
        ))}
      </div>
      {field.errors ? (
        <p id={field.errorId} className="field-error">
          {field.errors.join(" ")}
        </p>
      ) : null}
    </fieldset>
  );
}
