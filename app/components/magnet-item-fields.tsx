import type { FieldMetadata } from "@conform-to/react";
import { isEngineeringInputError } from "~/engineering/errors";
import {
  massKgFromVolume,
  magnetVolumeMm3,
  type MagnetShape,
} from "~/engineering/magnet-estimate";
import type { MagnetMaterial } from "~/engineering/reference-data";
import { groupMagnetGrades } from "~/reference/magnet-materials";
import { formatMass } from "~/reference/quantity-display";
import { MagnetHandlingCaution } from "./magnet-handling-caution";
import {
  MagnetDimensionInputs,
  MagnetShapePicker,
} from "./magnet-shape-fields";
import { SelectField } from "./select-field";
import { TextField } from "./text-field";

export interface MagnetGradeChoice {
  name: string;
  material: MagnetMaterial;
  densityGPerCm3: number;
}

type Field = FieldMetadata<unknown>;
type ShapeKind = MagnetShape["kind"];
type DimensionFieldset = Parameters<
  typeof MagnetDimensionInputs
>[0]["fieldset"];

const shapeKinds: readonly ShapeKind[] = ["block", "arc", "disc", "ring"];

/** Mass of one piece from the typed dimensions and the grade's density, once they make a shape. */
function PieceMass({
  grade,
  shape,
}: {
  grade: MagnetGradeChoice | undefined;
  shape: Record<string, unknown>;
}) {
  if (!grade) return null;
  const numbers = Object.fromEntries(
    Object.entries(shape).map(([key, value]) => [
      key,
      key === "kind"
        ? value
        : value === undefined || value === ""
          ? NaN
          : Number(value),
    ]),
  );
  let massKg: number;
  try {
    massKg = massKgFromVolume(
      magnetVolumeMm3(numbers as MagnetShape),
      grade.densityGPerCm3,
    );
  } catch (error) {
    if (isEngineeringInputError(error)) return null;
    throw error;
  }
  if (!Number.isFinite(massKg)) return null;
  return (
    <p role="status" className="text-sm text-graphite-700 sm:col-span-3">
      Mass per piece about {formatMass(massKg)} ({grade.name})
    </p>
  );
}

/** Grade, coating, magnetisation, shape and dimensions of a magnet item, under the handling caution. */
export function MagnetItemFields({
  fields,
  grades,
}: {
  fields: {
    grade: Field;
    shape: FieldMetadata<Record<string, unknown> | undefined>;
    coating: Field;
    magnetisation: Field;
  };
  grades: MagnetGradeChoice[];
}) {
  const shape = fields.shape.getFieldset();
  const chosen = shape.kind?.value;
  const kind: ShapeKind = shapeKinds.includes(chosen as ShapeKind)
    ? (chosen as ShapeKind)
    : "block";
  // The typed values of every dimension, as text; the chosen shape picks its own.
  const typedShape: Record<string, unknown> = {
    ...(fields.shape.value as Record<string, unknown> | undefined),
    kind,
  };
  return (
    <div className="space-y-5">
      <MagnetHandlingCaution />
      <fieldset className="grid gap-4 sm:grid-cols-3">
        <legend className="mb-2 text-sm font-semibold uppercase tracking-wide text-graphite-500">
          Magnet
        </legend>
        <SelectField
          field={fields.grade}
          label="Grade"
          placeholder="Choose the grade"
        >
          {groupMagnetGrades(grades).map((group) => (
            <optgroup key={group.material} label={group.label}>
              {group.grades.map((grade) => (
                <option key={grade.name} value={grade.name}>
                  {grade.name}
                </option>
              ))}
            </optgroup>
          ))}
        </SelectField>
        <TextField
          field={fields.coating as FieldMetadata<string | undefined>}
          label="Coating"
          hint="e.g. NiCuNi, epoxy, none"
          autoComplete="off"
        />
        <TextField
          field={fields.magnetisation as FieldMetadata<string | undefined>}
          label="Magnetisation direction"
          hint="e.g. through 5 mm, axial, radial"
          autoComplete="off"
        />
        <div className="sm:col-span-3">
          <MagnetShapePicker field={shape.kind as FieldMetadata<string>} />
        </div>
        <div className="grid grid-cols-2 gap-4 sm:col-span-3 sm:grid-cols-4">
          <MagnetDimensionInputs
            fieldset={shape as unknown as DimensionFieldset}
            kind={kind}
            apiErrors={{}}
          />
        </div>
        <PieceMass
          grade={grades.find((grade) => grade.name === fields.grade.value)}
          shape={typedShape}
        />
      </fieldset>
    </div>
  );
}
