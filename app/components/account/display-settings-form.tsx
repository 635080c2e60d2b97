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
import { SelectField } from "~/components/select-field";
import { FormMessages } from "~/components/text-field";
import {
  localeLabels,
  supportedLocales,
  type DisplaySettings,
} from "~/lib/display-settings";
import { formatAmount, formatDateTime } from "~/lib/format";

/**
 * The account page's panel for how numbers, money, days and times are shown:
 * a locale and a time zone. What is stored never changes, only how it is shown.
 */
export function DisplaySettingsForm({
  settings,
  timeZones,
  lastResult,
  constraint,
}: {
  settings: DisplaySettings;
  timeZones: string[];
  lastResult: SubmissionResult<string[]> | null;
  /** The fields' constraints (required, lengths), from the loader: getZodConstraint(schema). */
  constraint: FieldConstraints;
}) {
  const navigation = useNavigation();
  const validate = useBrowserValidation(() =>
    import("~/people/display-settings-form").then(
      (module) => module.displaySettingsSchema,
    ),
  );
  const [form, fields] = useForm({
    id: "display-settings",
    lastResult,
    defaultValue: settings,
    constraint,
    shouldValidate: "onBlur",
    onValidate: validate,
  });
  const saving =
    navigation.state !== "idle" &&
    navigation.formData?.get("intent") === "display-settings";
  return (
    <section aria-labelledby="display-heading" className="space-y-3">
      <h2 id="display-heading" className="text-lg font-semibold">
        Numbers, days and times
      </h2>
      <p className="text-sm text-graphite-700">
        Now shown as{" "}
        <span className="font-medium tabular-nums">{formatAmount(1234.5)}</span>{" "}
        and{" "}
        <span className="font-medium tabular-nums">
          {formatDateTime(new Date("2026-12-02T14:05:00Z"))}
        </span>
        . Number fields take your decimal mark; stored figures and CSV files are
        not changed by this choice.
      </p>
      <Form
        method="post"
        {...getFormProps(form)}
        className="grid max-w-xl gap-4 sm:grid-cols-2"
      >
        <input type="hidden" name="intent" value="display-settings" />
        <FormMessages id={form.errorId} errors={form.errors} />
        <SelectField field={fields.locale} label="Numbers and days written as">
          {supportedLocales.map((locale) => (
            <option key={locale} value={locale}>
              {localeLabels[locale]}
            </option>
          ))}
        </SelectField>
        <SelectField field={fields.timeZone} label="Time zone">
          {timeZones.map((zone) => (
            <option key={zone} value={zone}>
              {zone.replaceAll("_", " ")}
            </option>
          ))}
        </SelectField>
        <div className="sm:col-span-2">
          <button type="submit" className="button-quiet" disabled={saving}>
            {saving ? "Saving…" : "Save"}
          </button>
        </div>
      </Form>
    </section>
  );
}
