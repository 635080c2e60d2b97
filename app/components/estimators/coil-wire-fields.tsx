import { getSelectProps, type FieldMetadata } from "@conform-to/react";
import { coilEstimatorDefaults } from "~/lib/coil-estimator-form";
import type { CoilEstimatorFields } from "./use-coil-estimate";

/**
 * The coil estimator's wire: conductor, size standard, the size (AWG or IEC 60317
 * nominal diameter) and the insulation build or grade of that standard.
 */
export function CoilWireFields({
  fields,
  awgSizes,
  iecSizes,
  apiFieldErrors,
}: {
  fields: CoilEstimatorFields;
  awgSizes: { label: string; bareDiameterMm: number }[];
  iecSizes: { label: string; series: string | null }[];
  apiFieldErrors: Record<string, string[]>;
}) {
  const standard = fields.standard.value ?? coilEstimatorDefaults.standard;
  const { key: conductorKey, ...conductorProps } = getSelectProps(
    fields.conductor,
  );
  const { key: standardKey, ...standardProps } = getSelectProps(
    fields.standard,
  );
  const { key: awgKey, ...awgProps } = getSelectProps(fields.awgSize);
  const { key: iecKey, ...iecProps } = getSelectProps(fields.iecDiameterMm);
  const { key: insulationKey, ...insulationProps } = getSelectProps(
    fields.insulation,
  );
  const selectError = (field: FieldMetadata<unknown>) => {
    const errors = field.errors ?? apiFieldErrors[field.name];
    return errors ? (
      <p id={field.errorId} className="field-error">
        {errors.join(" ")}
      </p>
    ) : null;
  };

  return (
    <fieldset className="grid grid-cols-2 gap-4">
      <legend className="mb-2 text-sm font-semibold uppercase tracking-wide text-graphite-500">
        Wire
      </legend>
      <div>
        <label htmlFor={fields.conductor.id} className="field-label">
          Conductor
        </label>
        <select key={conductorKey} {...conductorProps} className="field-input">
          <option value="copper">Copper</option>
          <option value="aluminium">Aluminium</option>
        </select>
        {selectError(fields.conductor)}
      </div>
      <div>
        <label htmlFor={fields.standard.id} className="field-label">
          Sizes
        </label>
        <select key={standardKey} {...standardProps} className="field-input">
          <option value="IEC">IEC 60317 (mm)</option>
          <option value="AWG">AWG</option>
        </select>
      </div>
      {standard === "AWG" ? (
        <div>
          <label htmlFor={fields.awgSize.id} className="field-label">
            AWG size
          </label>
          <select key={awgKey} {...awgProps} className="field-input">
            {awgSizes.map((size) => (
              <option key={size.label} value={size.label}>
                {size.label} ({size.bareDiameterMm.toFixed(4)} mm)
              </option>
            ))}
          </select>
          {selectError(fields.awgSize)}
        </div>
      ) : (
        <div>
          <label htmlFor={fields.iecDiameterMm.id} className="field-label">
            Nominal diameter{" "}
            <span className="font-normal text-graphite-500">(mm)</span>
          </label>
          <select key={iecKey} {...iecProps} className="field-input">
            {iecSizes.map((size) => (
              <option key={size.label} value={size.label}>
                {size.label}
                {size.series === "r40" ? " (R40)" : ""}
              </option>
            ))}
          </select>
          {selectError(fields.iecDiameterMm)}
        </div>
      )}
      <div>
        <label htmlFor={fields.insulation.id} className="field-label">
          Insulation
        </label>
        <select
          key={insulationKey}
          {...insulationProps}
          className="field-input"
        >
          <option value="">not given</option>
          {standard === "AWG" ? (
            <>
              <option value="single">single build</option>
              <option value="heavy">heavy build</option>
              <option value="triple">triple build</option>
            </>
          ) : (
            <>
              <option value="grade1">grade 1</option>
              <option value="grade2">grade 2</option>
              <option value="grade3">grade 3</option>
            </>
          )}
        </select>
        {selectError(fields.insulation)}
      </div>
    </fieldset>
  );
}
