import { NumberField } from "./number-field";
import type { CoilEstimatorFields } from "./use-coil-estimate";

/** The coil estimator's coil: turns, strands, the active, end-turn and lead lengths, and how many coils. */
export function CoilWindingFields({
  fields,
  apiFieldErrors,
}: {
  fields: CoilEstimatorFields;
  apiFieldErrors: Record<string, string[]>;
}) {
  return (
    <fieldset className="grid grid-cols-2 gap-4">
      <legend className="mb-2 text-sm font-semibold uppercase tracking-wide text-graphite-500">
        Coil
      </legend>
      <NumberField
        field={fields.turns}
        label="Turns"
        step="1"
        apiErrors={apiFieldErrors.turns}
      />
      <NumberField
        field={fields.strandsInHand}
        label="Strands in hand"
        step="1"
        apiErrors={apiFieldErrors.strandsInHand}
      />
      <NumberField
        field={fields.activeLengthMm}
        label="Active length"
        unit="mm"
        hint="Each coil side in the field"
        apiErrors={apiFieldErrors.activeLengthMm}
      />
      <NumberField
        field={fields.endTurnLengthMm}
        label="End-turn length"
        unit="mm"
        hint="Each of the two ends"
        apiErrors={apiFieldErrors.endTurnLengthMm}
      />
      <NumberField
        field={fields.leadLengthMm}
        label="Lead length"
        unit="mm"
        hint="Each of the two leads"
        apiErrors={apiFieldErrors.leadLengthMm}
      />
      <NumberField
        field={fields.coilCount}
        label="Coils"
        step="1"
        apiErrors={apiFieldErrors.coilCount}
      />
    </fieldset>
  );
}
