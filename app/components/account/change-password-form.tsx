import {
  getFormProps,
  useForm,
  type SubmissionResult,
} from "@conform-to/react";
import {
  useBrowserValidation,
  type FieldConstraints,
} from "~/components/forms/use-browser-validation";
import { Form, useNavigation } from "react-router";
import { useFlash } from "~/components/flash-message";
import { FormMessages, TextField } from "~/components/text-field";
import { passwordMinimum } from "~/lib/password-minimum";

interface ChangePasswordProps {
  lastResult: SubmissionResult<string[]> | null;
  /** How many of the person's API tokens still work (they are revoked by a change). */
  liveTokens: number;
  /** The fields' constraints (required, lengths), from the loader: getZodConstraint(schema). */
  constraint: FieldConstraints;
}

/** The account page's panel for choosing a new password (the current one asked first). */
export function ChangePasswordForm(props: ChangePasswordProps) {
  // A change's message comes with a new key: the form starts empty again.
  const changed = useFlash()?.key ?? "first";
  return <ChangePasswordPanel key={changed} {...props} />;
}

function ChangePasswordPanel({
  lastResult,
  liveTokens,
  constraint,
}: ChangePasswordProps) {
  const navigation = useNavigation();
  const validate = useBrowserValidation(() =>
    import("~/lib/account-schemas").then(
      (module) => module.changePasswordSchema,
    ),
  );
  const [form, fields] = useForm({
    id: "change-password",
    lastResult,
    constraint,
    shouldValidate: "onBlur",
    onValidate: validate,
  });
  const submitting =
    navigation.state !== "idle" &&
    navigation.formData?.get("intent") === "change-password";
  return (
    <section aria-labelledby="password-heading" className="space-y-3">
      <h2 id="password-heading" className="text-lg font-semibold">
        Password
      </h2>
      <p className="text-sm text-graphite-700">
        A new password signs you out everywhere else and ends any password links
        e-mailed to you
        {liveTokens > 0
          ? `; your ${liveTokens === 1 ? "API token stops" : `${liveTokens} API tokens stop`} working too (make new ones after).`
          : "."}
      </p>
      <Form
        method="post"
        {...getFormProps(form)}
        className="panel grid gap-4 md:grid-cols-3"
      >
        <input type="hidden" name="intent" value="change-password" />
        <FormMessages id={form.errorId} errors={form.errors} />
        <TextField
          field={fields.currentPassword}
          label="Current password"
          type="password"
          autoComplete="current-password"
        />
        <TextField
          field={fields.password}
          label="New password"
          type="password"
          autoComplete="new-password"
          hint={`At least ${passwordMinimum} characters.`}
        />
        <TextField
          field={fields.confirmPassword}
          label="New password again"
          type="password"
          autoComplete="new-password"
        />
        <div className="md:col-span-3">
          <button
            type="submit"
            className="button-primary"
            disabled={submitting}
          >
            Change password
          </button>
        </div>
      </Form>
    </section>
  );
}
