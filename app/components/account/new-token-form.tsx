import {
  getFormProps,
  getSelectProps,
  useForm,
  type SubmissionResult,
} from "@conform-to/react";
import {
  useBrowserValidation,
  type FieldConstraints,
} from "~/components/forms/use-browser-validation";
import { Form, useNavigation } from "react-router";
import { RoleCheckboxes } from "~/components/role-checkboxes";
import { FormMessages, TextField } from "~/components/text-field";
import type { Role } from "~/lib/roles";

/**
 * Makes an API token: its name, how long it lives (an admin may choose "until
 * revoked"), the person's password again, and the roles it acts with.
 */
export function NewTokenForm({
  lastResult,
  roles,
  constraint,
}: {
  lastResult: SubmissionResult<string[]> | null | undefined;
  /** The person's own roles: a token never has more. */
  roles: Role[];
  /** The fields' constraints (required, lengths), from the loader: getZodConstraint(schema). */
  constraint: FieldConstraints;
}) {
  const navigation = useNavigation();
  const validate = useBrowserValidation(() =>
    import("~/lib/token-schemas").then((module) => module.createTokenSchema),
  );
  const [form, fields] = useForm({
    id: "new-token",
    lastResult,
    defaultValue: { scope: "all", roles, lifetimeDays: "90" },
    constraint,
    shouldValidate: "onBlur",
    onValidate: validate,
  });
  const { key: selectKey, ...selectProps } = getSelectProps(
    fields.lifetimeDays,
    { ariaDescribedBy: fields.lifetimeDays.descriptionId },
  );
  const isAdmin = roles.includes("admin");
  return (
    <Form
      method="post"
      {...getFormProps(form)}
      className="panel grid gap-4 md:grid-cols-2"
    >
      <FormMessages id={form.errorId} errors={form.errors} />
      <TextField
        field={fields.name}
        label="Token name"
        autoComplete="off"
        hint="e.g. the scale at the winding bench"
      />
      <div>
        <label htmlFor={fields.lifetimeDays.id} className="field-label">
          Lives for
        </label>
        <select key={selectKey} {...selectProps} className="field-input">
          <option value="30">30 days</option>
          <option value="90">90 days</option>
          <option value="365">a year</option>
          {isAdmin ? <option value="never">until revoked</option> : null}
        </select>
        <p
          id={fields.lifetimeDays.descriptionId}
          className="mt-1 text-xs text-graphite-500"
        >
          {isAdmin
            ? "A year at most, or until revoked for an admin's own tokens."
            : "A year at most."}
        </p>
        {fields.lifetimeDays.errors ? (
          <p id={fields.lifetimeDays.errorId} className="field-error">
            {fields.lifetimeDays.errors.join(" ")}
          </p>
        ) : null}
      </div>
      <TextField
        field={fields.currentPassword}
        label="Your password"
        type="password"
        autoComplete="current-password"
        hint="Asked again before a token is made."
      />
      <fieldset className="space-y-3 md:col-span-2">
        <legend className="field-label">Roles the token acts with</legend>
        <label className="flex items-center gap-2 text-sm">
          <input
            type="radio"
            name={fields.scope.name}
            value="all"
            defaultChecked
            className="h-4 w-4 accent-copper-600"
          />
          All my roles, as they are each time it is used
        </label>
        <label className="flex items-center gap-2 text-sm">
          <input
            type="radio"
            name={fields.scope.name}
            value="chosen"
            className="h-4 w-4 accent-copper-600"
          />
          Only the roles ticked below (never more than I hold)
        </label>
        <RoleCheckboxes
          field={fields.roles}
          legend="Roles for “only these”"
          choices={roles}
        />
      </fieldset>
      <div>
        <button
          type="submit"
          name="intent"
          value="create"
          className="button-primary"
          disabled={navigation.state !== "idle"}
        >
          Create token
        </button>
      </div>
    </Form>
  );
}
