import { NumberField } from "./number-field";
import type { CoilEstimatorFields } from "./use-coil-estimate";

/** The coil estimator's operation: temperature, current (for the loss) and scrap. */
export function CoilOperationFields({
  fields,
  apiFieldErrors,
}: {
  fields: CoilEstimatorFields;
  apiFieldErrors: Record<string, string[]>;
}) {
  return (
    <fieldset className="grid grid-cols-2 gap-4">
      <legend className="mb-2 text-sm font-semibold uppercase tracking-wide text-graphite-500">
        Operation
      </legend>
      <NumberField
        field={fields.temperatureC}
        label="Temperature"
        unit="°C"
        apiErrors={apiFieldErrors.temperatureC}
      />
      <NumberField
        field={fields.currentA}
        label="Current"
        unit="A"
        hint="Leave empty for no loss figure"
        apiErrors={apiFieldErrors.currentA}
      />
      <NumberField
        field={fields.scrapPercent}
        label="Scrap"
        unit="%"
        hint="Common practice: 2–5 % in production"
        apiErrors={apiFieldErrors.scrapPercent}
      />
    </fieldset>
  );
}
