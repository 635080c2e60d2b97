import { NumberField } from "./number-field";
import type { CoilEstimatorFields } from "./use-coil-estimate";

/**
 * The coil estimator's AC and heat inputs: the current's frequency and the winding's
 * layers (for the AC resistance), and the ambient with a thermal resistance or a
 * temperature rise (for the operating temperature).
 */
export function CoilFrequencyFields({
  fields,
  apiFieldErrors,
}: {
  fields: CoilEstimatorFields;
  apiFieldErrors: Record<string, string[]>;
}) {
  return (
    <fieldset className="grid grid-cols-2 gap-4">
      <legend className="mb-2 text-sm font-semibold uppercase tracking-wide text-graphite-500">
        AC and heat
      </legend>
      <NumberField
        field={fields.frequencyHz}
        label="Frequency"
        unit="Hz"
        hint="Leave empty for DC figures only"
        apiErrors={apiFieldErrors.frequencyHz}
      />
      <NumberField
        field={fields.layersPerCoil}
        label="Layers per coil"
        step="1"
        hint="Layers of turns; 1 if empty"
        apiErrors={apiFieldErrors.layersPerCoil}
      />
      <NumberField
        field={fields.ambientC}
        label="Ambient"
        unit="°C"
        hint="For the operating temperature"
        apiErrors={apiFieldErrors.ambientC}
      />
      <NumberField
        field={fields.thermalResistanceKPerW}
        label="Thermal resistance"
        unit="K/W"
        hint="Coil to ambient; or give a rise"
        apiErrors={apiFieldErrors.thermalResistanceKPerW}
      />
      <NumberField
        field={fields.temperatureRiseK}
        label="Temperature rise"
        unit="K"
        hint="Measured or rated, over ambient"
        apiErrors={apiFieldErrors.temperatureRiseK}
      />
    </fieldset>
  );
}
