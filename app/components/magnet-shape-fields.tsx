import { getInputProps, type FieldMetadata } from "@conform-to/react";
import type { MagnetShape } from "~/engineering/magnet-estimate";
import { MagnetShapeIcon } from "./magnet-shape-icon";
import { QuantityField } from "./quantity-field";

type ShapeKind = MagnetShape["kind"];

const shapeKinds: { kind: ShapeKind; label: string }[] = [
  { kind: "block", label: "Block" },
  { kind: "arc", label: "Arc segment" },
  { kind: "disc", label: "Disc" },
  { kind: "ring", label: "Ring" },
];

type DimensionName =
  | "lengthMm"
  | "widthMm"
  | "heightMm"
  | "innerRadiusMm"
  | "outerRadiusMm"
  | "angleDeg"
  | "axialLengthMm"
  | "diameterMm"
  | "outerDiameterMm"
  | "innerDiameterMm"
  | "thicknessMm";

/** Every dimension input once (disc and ring share the thickness), with the shapes that use it. */
const dimensions: {
  name: DimensionName;
  label: string;
  unit: string;
  kinds: ShapeKind[];
}[] = [
  { name: "lengthMm", label: "Length", unit: "mm", kinds: ["block"] },
  { name: "widthMm", label: "Width", unit: "mm", kinds: ["block"] },
  { name: "heightMm", label: "Height", unit: "mm", kinds: ["block"] },
  { name: "outerRadiusMm", label: "Outer radius", unit: "mm", kinds: ["arc"] },
  { name: "innerRadiusMm", label: "Inner radius", unit: "mm", kinds: ["arc"] },
  { name: "angleDeg", label: "Angle", unit: "°", kinds: ["arc"] },
  { name: "axialLengthMm", label: "Axial length", unit: "mm", kinds: ["arc"] },
  { name: "diameterMm", label: "Diameter", unit: "mm", kinds: ["disc"] },
  {
    name: "outerDiameterMm",
    label: "Outer diameter",
    unit: "mm",
    kinds: ["ring"],
  },
  {
    name: "innerDiameterMm",
    label: "Inner diameter",
    unit: "mm",
    kinds: ["ring"],
  },
  {
    name: "thicknessMm",
    label: "Thickness",
    unit: "mm",
    kinds: ["disc", "ring"],
  },
];

/** How the shape's fields are named in messages ("Waiting for a valid height"), by form name. */
export const shapeFieldLabels: Record<string, string> = {
  "shape.kind": "shape",
  ...Object.fromEntries(
    dimensions.map((dimension) => [
      `shape.${dimension.name}`,
      dimension.label.toLowerCase(),
    ]),
  ),
};

/** The shape as four tiles, each a radio button (arrow keys move between them). */
export function MagnetShapePicker({ field }: { field: FieldMetadata<string> }) {
  return (
    <fieldset>
      <legend className="field-label">Shape</legend>
      <div className="mt-1 grid grid-cols-4 gap-2">
        {shapeKinds.map((option) => {
          const { key, ...radioProps } = getInputProps(field, {
            type: "radio",
            value: option.kind,
          });
          return (
            <label
              key={option.kind}
              className="relative flex cursor-pointer flex-col items-center gap-1 rounded-md border border-graphite-300 bg-white px-2 py-2 text-sm has-checked:border-copper-500 has-checked:bg-copper-50 has-focus-visible:outline-2 has-focus-visible:outline-copper-500"
            >
              {/* The radio covers its whole tile, invisible: the tile is what people see and click. */}
              <input
                key={key}
                {...radioProps}
                className="absolute inset-0 z-10 cursor-pointer opacity-0"
              />
              <MagnetShapeIcon kind={option.kind} />
              {option.label}
            </label>
          );
        })}
      </div>
    </fieldset>
  );
}

/**
 * The dimension inputs of the chosen shape. The other shapes' inputs stay in
 * the form, hidden, so switching shape and back loses nothing typed.
 */
export function MagnetDimensionInputs({
  fieldset,
  kind,
  apiErrors,
}: {
  fieldset: Record<
    DimensionName,
    FieldMetadata<number | string | null | undefined>
  >;
  kind: ShapeKind;
  apiErrors: Record<string, string[]>;
}) {
  return dimensions.map((dimension) => (
    <div key={dimension.name} hidden={!dimension.kinds.includes(kind)}>
      <QuantityField
        field={fieldset[dimension.name]}
        label={dimension.label}
        unit={dimension.unit}
        extraErrors={apiErrors[`shape.${dimension.name}`]}
      />
    </div>
  ));
}
