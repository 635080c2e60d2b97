import { getInputProps, type FieldMetadata } from "@conform-to/react";
import {
  ENAMELS,
  findAwgSize,
  findIecDiameter,
  THERMAL_CLASSES,
  type ConductorKey,
} from "~/engineering/reference-data";
import { formatQuantity } from "~/lib/format";
import { formatSignificant } from "~/reference/quantity-display";
import { wireStockFigures } from "~/stock/stocked-item-figures";
import { SelectField } from "./select-field";

export interface WireSizeChoices {
  awg: { label: string; bareDiameterMm: number }[];
  iec: { label: string; series: string | null }[];
}

type Field = FieldMetadata<unknown>;

/** What one metre and one kilogram of the chosen wire come to, once conductor, standard and size are known. */
function WireFigures({
  conductor,
  standard,
  size,
}: {
  conductor: unknown;
  standard: unknown;
  size: unknown;
}) {
  if (
    (conductor !== "copper" && conductor !== "aluminium") ||
    typeof size !== "string"
  )
    return null;
  const known =
    standard === "AWG"
      ? findAwgSize(size)
      : standard === "IEC"
        ? findIecDiameter(Number(size))
        : undefined;
  if (!known) return null;
  const figures = wireStockFigures({
    conductor: conductor as ConductorKey,
    standard: standard as "AWG" | "IEC",
    sizeLabel: size,
    onHandKg: 1,
  });
  return (
    <p role="status" className="text-sm text-graphite-700 sm:col-span-2">
      Bare conductor {formatQuantity(figures.bareDiameterMm, "mm", 4)} ·{" "}
      {formatSignificant(figures.linearMassKgPerM * 1000, "g/m")} · at most{" "}
      {formatQuantity(figures.maxLengthM, "m", 0)} per kg (the enamel makes it a
      few per cent less)
    </p>
  );
}

/**
 * The IEC nominal diameter: typed, with the R20/R40 steps offered as suggestions. A size
 * between the steps (0.350 mm is commonly stocked) is accepted from 0.020 to 5.000 mm.
 */
function IecDiameterField({
  field,
  sizes,
}: {
  field: Field;
  sizes: WireSizeChoices["iec"];
}) {
  const { key, ...inputProps } = getInputProps(
    field as FieldMetadata<string | undefined>,
    { type: "text", ariaDescribedBy: field.descriptionId },
  );
  const listId = `${field.id}-steps`;
  return (
    <div>
      <label htmlFor={field.id} className="field-label">
        Nominal diameter (mm)
      </label>
      <input
        key={key}
        {...inputProps}
        inputMode="decimal"
        autoComplete="off"
        list={listId}
        className="field-input tabular-nums"
      />
      <datalist id={listId}>
        {sizes.map((size) => (
          <option key={size.label} value={size.label}>
            {size.series === "r40" ? "R40" : "R20"}
          </option>
        ))}
      </datalist>
      <p id={field.descriptionId} className="mt-1 text-xs text-graphite-500">
        An R20/R40 step from the list, or a size between them from 0.020 to
        5.000 mm such as 0.350; the overall diameter of such a size is an
        estimate.
      </p>
      {field.errors ? (
        <p id={field.errorId} className="field-error">
          {field.errors.join(" ")}
        </p>
      ) : null}
    </div>
  );
}

/** Conductor, size, insulation, thermal class and enamel of a magnet-wire item. */
export function WireItemFields({
  fields,
  sizes,
}: {
  fields: {
    conductor: Field;
    standard: Field;
    size: Field;
    insulation: Field;
    thermalClass: Field;
    enamel: Field;
  };
  sizes: WireSizeChoices;
}) {
  const standard = fields.standard.value === "AWG" ? "AWG" : "IEC";
  return (
    <fieldset className="grid gap-4 sm:grid-cols-2">
      <legend className="mb-2 text-sm font-semibold uppercase tracking-wide text-graphite-500">
        Wire
      </legend>
      <SelectField field={fields.conductor} label="Conductor">
        <option value="copper">Copper</option>
        <option value="aluminium">Aluminium</option>
      </SelectField>
      <SelectField field={fields.standard} label="Sizes">
        <option value="IEC">IEC 60317 (mm)</option>
        <option value="AWG">AWG</option>
      </SelectField>
      {standard === "AWG" ? (
        <SelectField
          field={fields.size}
          label="AWG size"
          placeholder="Choose the size"
          resetKey={standard}
        >
          {sizes.awg.map((size) => (
            <option key={size.label} value={size.label}>
              {size.label} ({formatQuantity(size.bareDiameterMm, "mm", 4)})
            </option>
          ))}
        </SelectField>
      ) : (
        <IecDiameterField field={fields.size} sizes={sizes.iec} />
      )}
      <SelectField
        field={fields.insulation}
        label="Insulation"
        placeholder="Choose the insulation"
        resetKey={standard}
      >
        {standard === "AWG" ? (
          <>
            <option value="single">Single build</option>
            <option value="heavy">Heavy build</option>
            <option value="triple">Triple build</option>
          </>
        ) : (
          <>
            <option value="grade1">Grade 1 (thin)</option>
            <option value="grade2">Grade 2</option>
            <option value="grade3">Grade 3 (thick)</option>
          </>
        )}
      </SelectField>
      <SelectField
        field={fields.thermalClass}
        label="Thermal class"
        placeholder="Choose the class"
        hint="The wire's thermal class must be at least the motor's insulation class."
      >
        {THERMAL_CLASSES.map((row) => (
          <option key={row.classC} value={String(row.classC)}>
            {row.classC} °C (class {row.letter})
          </option>
        ))}
      </SelectField>
      <SelectField
        field={fields.enamel}
        label="Enamel"
        placeholder="Choose the enamel"
      >
        {ENAMELS.map((enamel) => (
          <option key={enamel.key} value={enamel.key}>
            {enamel.name} (classes{" "}
            {enamel.thermalClassMin === enamel.thermalClassMax
              ? enamel.thermalClassMin
              : `${enamel.thermalClassMin}–${enamel.thermalClassMax}`}
            {enamel.solderable ? ", solderable" : ""})
          </option>
        ))}
      </SelectField>
      <WireFigures
        conductor={fields.conductor.value}
        standard={standard}
        size={fields.size.value}
      />
    </fieldset>
  );
}
