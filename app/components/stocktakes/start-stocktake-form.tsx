/** "Start a stocktake": tick the locations to count, or give the SKUs to count wherever they are. */
import {
  getFormProps,
  useForm,
  type SubmissionResult,
} from "@conform-to/react";
import { useBrowserValidation } from "~/components/forms/use-browser-validation";
import { Form, useNavigation } from "react-router";
import type { StartStocktakeInput } from "~/stocktakes/stocktake-forms";
import { FormMessages, TextField } from "~/components/text-field";

export function StartStocktakeForm({
  locations,
  lastResult,
}: {
  locations: { code: string; name: string }[];
  lastResult?: SubmissionResult<string[]> | null;
}) {
  const navigation = useNavigation();
  const validate = useBrowserValidation(() =>
    import("~/stocktakes/stocktake-forms").then(
      (module) => module.startFormSchema,
    ),
  );
  const [form, fields] = useForm<
    {
      intent: string;
      locations: string[];
      skus: string;
      note: string;
    },
    StartStocktakeInput
  >({
    id: "start-stocktake",
    lastResult: navigation.state === "idle" ? lastResult : null,
    shouldValidate: "onSubmit",
    shouldRevalidate: "onInput",
    onValidate: validate,
  });
  const chosen = new Set(
    ([] as unknown[]).concat(fields.locations.initialValue ?? []),
  );
  return (
    <section aria-labelledby="start-stocktake-heading" className="panel h-fit">
      <h2 id="start-stocktake-heading" className="mb-1 text-lg font-semibold">
        Start a stocktake
      </h2>
      <p className="mb-3 text-sm text-graphite-500">
        The book of every lot at the chosen places is noted now. Counters see
        only what to count, never the book.
      </p>
      <Form method="post" {...getFormProps(form)} className="space-y-4">
        <input type="hidden" name="intent" value="start" />
        <FormMessages id={form.errorId} errors={form.errors} />
        <fieldset
          aria-describedby={
            fields.locations.errors ? fields.locations.errorId : undefined
          }
        >
          <legend className="field-label">Locations</legend>
          <div className="mt-1 max-h-64 space-y-1 overflow-y-auto rounded-md border border-graphite-300 bg-white p-2">
            {locations.length === 0 ? (
              <p className="text-sm text-graphite-500">No locations yet.</p>
            ) : null}
            {locations.map((location) => (
              <label
                key={location.code}
                className="flex items-center gap-2 text-sm touch:min-h-11"
              >
                <input
                  type="checkbox"
                  name={fields.locations.name}
                  value={location.code}
                  defaultChecked={chosen.has(location.code)}
                />
                <span className="font-medium whitespace-nowrap">
                  {location.code}
                </span>
                <span className="text-graphite-500">{location.name}</span>
              </label>
            ))}
          </div>
          {fields.locations.errors ? (
            <p id={fields.locations.errorId} className="field-error">
              {fields.locations.errors.join(" ")}
            </p>
          ) : null}
        </fieldset>
        <TextField
          field={fields.skus}
          label="Or count items by SKU"
          hint="SKUs separated by commas or spaces: every lot of them, wherever it is kept."
          autoComplete="off"
        />
        <TextField
          field={fields.note}
          label="Note (optional)"
          autoComplete="off"
        />
        <button
          type="submit"
          className="button-primary w-full"
          disabled={navigation.state !== "idle"}
        >
          Start stocktake
        </button>
      </Form>
    </section>
  );
}
