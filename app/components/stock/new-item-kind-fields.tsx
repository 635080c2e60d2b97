/**
 * The new item's fields of its kind: a wire's conductor, size and insulation, a magnet's
 * grade, shape and coating, or the unit another part is kept in.
 */
import type { FieldMetadata } from "@conform-to/react";
import {
  type MagnetGradeChoice,
  MagnetItemFields,
} from "~/components/magnet-item-fields";
import { SelectField } from "~/components/select-field";
import {
  WireItemFields,
  type WireSizeChoices,
} from "~/components/wire-item-fields";
import type { NewItemFields } from "./use-new-item-form";

type Field = FieldMetadata<unknown>;

export function NewItemKindFields({
  kind,
  fields,
  sizes,
  grades,
}: {
  kind: string;
  fields: NewItemFields;
  sizes: WireSizeChoices;
  grades: MagnetGradeChoice[];
}) {
  return kind === "wire" ? (
    <WireItemFields
      fields={{
        conductor: fields.conductor as Field,
        standard: fields.standard as Field,
        size: fields.size as Field,
        insulation: fields.insulation as Field,
        thermalClass: fields.thermalClass as Field,
        enamel: fields.enamel as Field,
      }}
      sizes={sizes}
    />
  ) : kind === "magnet" ? (
    <MagnetItemFields
      fields={{
        grade: fields.grade as Field,
        shape: fields.shape as unknown as FieldMetadata<
          Record<string, unknown> | undefined
        >,
        coating: fields.coating as Field,
        magnetisation: fields.magnetisation as Field,
      }}
      grades={grades}
    />
  ) : (
    <fieldset className="grid gap-4 sm:grid-cols-2">
      <legend className="mb-2 text-sm font-semibold uppercase tracking-wide text-graphite-500">
        Part
      </legend>
      <SelectField field={fields.unit as Field} label="Kept in">
        <option value="pcs">pieces (pcs)</option>
        <option value="m">metres (m)</option>
        <option value="kg">kilograms (kg)</option>
      </SelectField>
    </fieldset>
  );
}
