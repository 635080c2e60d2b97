/** "Found on the shelf": a lot the sheet does not list, at one of the stocktake's locations. */
import { getFormProps, useForm } from "@conform-to/react";
import { useBrowserValidation } from "~/components/forms/use-browser-validation";
import { useFetcher } from "react-router";
import { SelectField } from "~/components/select-field";
import { FormMessages, TextField } from "~/components/text-field";
import type { AddLineInput } from "~/stocktakes/stocktake-forms";
import type { CountAnswer } from "./count-line-form";

export function AddLineForm({ locations }: { locations: string[] }) {
  const fetcher = useFetcher<CountAnswer>({ key: "add-line" });
  const validate = useBrowserValidation(() =>
    import("~/stocktakes/stocktake-forms").then(
      (module) => module.addLineFormSchema,
    ),
  );
  const [form, fields] = useForm<
    { intent: string; sku: string; lot: string; location: string },
    AddLineInput
  >({
    id: "add-line",
    lastResult: fetcher.state === "idle" ? fetcher.data?.result : null,
    shouldValidate: "onSubmit",
    shouldRevalidate: "onInput",
    onValidate: validate,
  });
  return (
    <section aria-labelledby="add-line-heading" className="panel space-y-2">
      <h2 id="add-line-heading" className="text-lg font-semibold">
        Found something not on the sheet?
      </h2>
      <p className="text-sm text-graphite-500">
        Add the lot where you found it, then count it like the others.
      </p>
      <fetcher.Form method="post" {...getFormProps(form)} className="space-y-3">
        <input type="hidden" name="intent" value="add" />
        <FormMessages id={form.errorId} errors={form.errors} />
        <TextField field={fields.sku} label="SKU" autoComplete="off" />
        <TextField
          field={fields.lot}
          label="Lot (none for items kept without lots)"
          autoComplete="off"
        />
        <SelectField
          field={fields.location}
          label="Location"
          placeholder="Choose…"
        >
          {locations.map((code) => (
            <option key={code} value={code}>
              {code}
            </option>
          ))}
        </SelectField>
        <button
          type="submit"
          className="button-quiet"
          disabled={fetcher.state !== "idle"}
        >
          Add to the sheet
        </button>
      </fetcher.Form>
    </section>
  );
}
