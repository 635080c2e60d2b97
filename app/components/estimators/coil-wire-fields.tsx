import { formatQuantity } from "~/lib/format";
import { getSelectProps, type FieldMetadata } from "@conform-to/react";
import { coilEstimatorDefaults } from "~/lib/coil-estimator-fields";
import { NumberField } from "./number-field";
import type { CoilEstimatorFields } from "./use-coil-estimate";

/**
 * The coil estimator's wire: conductor, its form (round, litz of round strands, or flat),
 * size standard, the size (AWG or IEC 60317 nominal diameter; for litz, of each strand),
 * litz strands and bunching, flat-wire thickness and width, and the insulation build or
 * grade of that standard.
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
  const wireForm = fields.wireForm.value ?? coilEstimatorDefaults.wireForm;
  const round = wireForm !== "rectangular";
  const strandWord = wireForm === "litz" ? " of each strand" : "";
  const { key: wireFormKey, ...wireFormProps } = getSelectProps(
    fields.wireForm,
  );
  const { key: edgeKey, ...edgeProps } = getSelectProps(fields.flatEdgewise);
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
        <label htmlFor={fields.wireForm.id} className="field-label">
          Wire form
        </label>
        <select key={wireFormKey} {...wireFormProps} className="field-input">
          <option value="round">Round wire</option>
          <option value="litz">Litz wire</option>
          <option value="rectangular">Flat wire (IEC 60317-0-2)</option>
        </select>
        {selectError(fields.wireForm)}
      </div>
      {round ? (
        <div>
          <label htmlFor={fields.standard.id} className="field-label">
            Sizes
          </label>
          <select key={standardKey} {...standardProps} className="field-input">
            <option value="IEC">IEC 60317 (mm)</option>
            <option value="AWG">AWG</option>
          </select>
        </div>
      ) : null}
      {!round ? null : standard === "AWG" ? (
        <div>
          <label htmlFor={fields.awgSize.id} className="field-label">
            AWG size{strandWord}
          </label>
          <select key={awgKey} {...awgProps} className="field-input">
            {awgSizes.map((size) => (
              <option key={size.label} value={size.label}>
                {size.label} ({formatQuantity(size.bareDiameterMm, "", 4)} mm)
              </option>
            ))}
          </select>
          {selectError(fields.awgSize)}
        </div>
      ) : (
        <div>
          <label htmlFor={fields.iecDiameterMm.id} className="field-label">
            Nominal diameter{strandWord}{" "}
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
          {round && standard === "AWG" ? (
            <>
              <option value="single">single build</option>
              <option value="heavy">heavy build</option>
              <option value="triple">triple build</option>
            </>
          ) : (
            <>
              <option value="grade1">grade 1</option>
              <option value="grade2">grade 2</option>
              {round ? <option value="grade3">grade 3</option> : null}
            </>
          )}
        </select>
        {selectError(fields.insulation)}
      </div>
      {wireForm === "litz" ? (
        <>
          <NumberField
            field={fields.litzStrands}
            label="Strands in the litz"
            step="1"
            apiErrors={apiFieldErrors.litzStrands}
          />
          <NumberField
            field={fields.litzBunchingSteps}
            label="Bunching steps"
            step="1"
            hint="Each step adds about 2 % of strand length (IEC 60317-11)"
            apiErrors={apiFieldErrors.litzBunchingSteps}
          />
        </>
      ) : null}
      {wireForm === "rectangular" ? (
        <>
          <NumberField
            field={fields.flatThicknessMm}
            label="Thickness"
            unit="mm"
            hint="0.80–5.60 mm"
            apiErrors={apiFieldErrors.flatThicknessMm}
          />
          <NumberField
            field={fields.flatWidthMm}
            label="Width"
            unit="mm"
            hint="2.00–16.00 mm, 1.4–8 × the thickness"
            apiErrors={apiFieldErrors.flatWidthMm}
          />
          <div>
            <label htmlFor={fields.flatEdgewise.id} className="field-label">
              Wound
            </label>
            <select key={edgeKey} {...edgeProps} className="field-input">
              <option value="flat">flat (wide side on the layer)</option>
              <option value="edge">on edge</option>
            </select>
          </div>
        </>
      ) : null}
    </fieldset>
  );
}
