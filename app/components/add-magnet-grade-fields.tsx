/**
 * The parts of the admins' add-a-magnet-grade form (add-magnet-grade-form.tsx): the
 * Conform form itself, the grade's names and material, its magnetic properties at 20 °C,
 * its temperature and material figures, and the source the values come from.
 */
import {
  getInputProps,
  getSelectProps,
  getTextareaProps,
  useForm,
  type SubmissionResult,
} from "@conform-to/react";
import {
  useBrowserValidation,
  type FieldConstraints,
} from "~/components/forms/use-browser-validation";
import { QuantityField } from "~/components/quantity-field";
import { TextField } from "~/components/text-field";
import { gradeSuffixChoices } from "~/reference/magnet-grade-suffixes";
import {
  magnetMaterialLabels,
  magnetMaterialOrder,
} from "~/reference/magnet-materials";

/**
 * The form's state, checked in the browser as on the server: the schema loads after
 * hydration (useBrowserValidation), the constraints come from the loader.
 */
export function useMagnetGradeForm(
  lastResult: SubmissionResult<string[]> | null | undefined,
  constraint: FieldConstraints,
) {
  const validate = useBrowserValidation(() =>
    import("~/reference/magnet-grade-form").then(
      (module) => module.magnetGradeFormSchema,
    ),
  );
  return useForm({
    id: "add-magnet-grade",
    lastResult,
    constraint,
    defaultValue: { material: "sintered-ndfeb" },
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onValidate: validate,
  });
}

type GradeFields = ReturnType<typeof useMagnetGradeForm>[1];

function MaterialSelect({ fields }: { fields: GradeFields }) {
  const { key: materialKey, ...materialProps } = getSelectProps(
    fields.material,
  );
  return (
    <div>
      <label htmlFor={fields.material.id} className="field-label">
        Material
      </label>
      <select key={materialKey} {...materialProps} className="field-input">
        {magnetMaterialOrder.map((material) => (
          <option key={material} value={material}>
            {magnetMaterialLabels[material]}
          </option>
        ))}
      </select>
      {fields.material.errors ? (
        <p id={fields.material.errorId} className="field-error">
          {fields.material.errors.join(" ")}
        </p>
      ) : null}
    </div>
  );
}

function TemperatureSuffixSelect({ fields }: { fields: GradeFields }) {
  const { key: suffixKey, ...suffixProps } = getSelectProps(
    fields.temperatureSuffix,
  );
  return (
    <div>
      <label htmlFor={fields.temperatureSuffix.id} className="field-label">
        Temperature suffix
      </label>
      <select key={suffixKey} {...suffixProps} className="field-input">
        <option value="">none</option>
        {gradeSuffixChoices.map((suffix) => (
          <option key={suffix} value={suffix}>
            {suffix}
          </option>
        ))}
      </select>
      <p className="mt-1 text-xs text-graphite-500">Sintered NdFeB only</p>
      {fields.temperatureSuffix.errors ? (
        <p id={fields.temperatureSuffix.errorId} className="field-error">
          {fields.temperatureSuffix.errors.join(" ")}
        </p>
      ) : null}
    </div>
  );
}

/** Name, material, temperature suffix and other names. */
export function GradeNameFields({ fields }: { fields: GradeFields }) {
  return (
    <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
      <TextField
        field={fields.name}
        label="Grade name"
        autoComplete="off"
        hint="e.g. N45UH"
      />
      <MaterialSelect fields={fields} />
      <TemperatureSuffixSelect fields={fields} />
      <TextField
        field={fields.aliases}
        label="Other names"
        autoComplete="off"
        hint="Comma-separated, optional"
      />
    </div>
  );
}

export function MagneticPropertiesFields({ fields }: { fields: GradeFields }) {
  return (
    <fieldset className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
      <legend className="mb-2 text-sm font-semibold uppercase tracking-wide text-graphite-500">
        Magnetic properties at 20 °C
      </legend>
      <QuantityField field={fields.brMinT} label="Br, lowest" unit="T" />
      <QuantityField field={fields.brMaxT} label="Br, highest" unit="T" />
      <QuantityField
        field={fields.hcbMinKAm}
        label="HcB, minimum"
        unit="kA/m"
      />
      <QuantityField
        field={fields.hcjMinKAm}
        label="HcJ, minimum"
        unit="kA/m"
      />
      <QuantityField
        field={fields.bhMaxMinKJm3}
        label="(BH)max, lowest"
        unit="kJ/m³"
      />
      <QuantityField
        field={fields.bhMaxMaxKJm3}
        label="(BH)max, highest"
        unit="kJ/m³"
      />
      <QuantityField
        field={fields.recoilPermeability}
        label="Recoil permeability μrec"
        hint="NdFeB and SmCo about 1.05"
      />
    </fieldset>
  );
}

export function TemperatureAndMaterialFields({
  fields,
}: {
  fields: GradeFields;
}) {
  const { key: coldKey, ...coldProps } = getInputProps(
    fields.coercivityFallsWhenCold,
    { type: "checkbox" },
  );
  return (
    <fieldset className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
      <legend className="mb-2 text-sm font-semibold uppercase tracking-wide text-graphite-500">
        Temperature and material
      </legend>
      <QuantityField
        field={fields.maxWorkingTemperatureC}
        label="Max. working temperature"
        unit="°C"
      />
      <QuantityField
        field={fields.brTemperatureCoefficientPercentPerK}
        label="Br temperature coefficient"
        unit="%/K"
        hint="Negative, e.g. −0.12 for NdFeB"
        allowNegative
      />
      <QuantityField
        field={fields.hcjTemperatureCoefficientPercentPerK}
        label="HcJ temperature coefficient"
        unit="%/K"
        hint="Optional. NdFeB about −0.6, SmCo −0.3, ferrite +0.27"
        allowNegative
      />
      <QuantityField
        field={fields.curieTemperatureC}
        label="Curie temperature"
        unit="°C"
        hint="Optional. NdFeB about 310, SmCo 750–825, ferrite 450"
      />
      <QuantityField
        field={fields.densityGPerCm3}
        label="Density"
        unit="g/cm³"
      />
      <div className="flex items-start gap-2 pt-7">
        <input
          key={coldKey}
          {...coldProps}
          className="mt-0.5 h-4 w-4 accent-copper-600"
        />
        <label
          htmlFor={fields.coercivityFallsWhenCold.id}
          className="text-sm text-graphite-800"
        >
          Coercivity falls when cold (ferrite)
        </label>
      </div>
    </fieldset>
  );
}

export function GradeSourceField({ fields }: { fields: GradeFields }) {
  const { key: sourceKey, ...sourceProps } = getTextareaProps(fields.source);
  return (
    <div>
      <label htmlFor={fields.source.id} className="field-label">
        Source
      </label>
      <textarea
        key={sourceKey}
        {...sourceProps}
        rows={2}
        className="field-input"
        aria-describedby={
          fields.source.errors
            ? fields.source.errorId
            : fields.source.descriptionId
        }
      />
      <p
        id={fields.source.descriptionId}
        className="mt-1 text-xs text-graphite-500"
      >
        Where the values come from, e.g. the maker, the data sheet and its date.
      </p>
      {fields.source.errors ? (
        <p id={fields.source.errorId} className="field-error">
          {fields.source.errors.join(" ")}
        </p>
      ) : null}
    </div>
  );
}
