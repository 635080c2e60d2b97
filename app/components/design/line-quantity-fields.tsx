import { QuantityField } from "~/components/quantity-field";
import type { LineKind } from "./line-editor";

type Field = Parameters<typeof QuantityField>[0]["field"];

/** The figures of a design line besides its item: a coil's winding, a magnet's pieces, a part's quantity. */
export function LineQuantityFields({
  kind,
  field,
}: {
  kind: LineKind;
  /** The editor's fields by name. */
  field: Record<string, Field>;
}) {
  return kind === "coil" ? (
    <>
      <QuantityField field={field.turns!} label="Turns" />
      <QuantityField field={field.strandsInHand!} label="Strands in hand" />
      <QuantityField
        field={field.activeLengthMm!}
        label="Active length"
        unit="mm"
        hint="Each coil side in the field"
      />
      <QuantityField
        field={field.endTurnLengthMm!}
        label="End-turn length"
        unit="mm"
        hint="Each of the two ends; or estimate it below"
      />
      <QuantityField
        field={field.leadLengthMm!}
        label="Lead length"
        unit="mm"
        hint="Each of the two leads"
      />
      <QuantityField field={field.coilsPerMotor!} label="Coils per motor" />
      <QuantityField
        field={field.scrapPercent!}
        label="Scrap"
        unit="%"
        hint="Drawn beyond the wound length; 2–5 % in production"
      />
      <QuantityField
        field={field.operatingTemperatureC!}
        label="Operating temperature"
        unit="°C"
        hint="Of the copper at the rated point"
        allowNegative
      />
    </>
  ) : kind === "magnet" ? (
    <>
      <QuantityField field={field.piecesPerMotor!} label="Pieces per motor" />
      <QuantityField
        field={field.operatingTemperatureC!}
        label="Magnet temperature"
        unit="°C"
        hint="At the rated point; empty when not known (not checked)"
        allowNegative
      />
    </>
  ) : (
    <QuantityField
      field={field.quantityPerMotor!}
      label="Quantity per motor"
      hint="In the item's unit (pcs, kg, m)"
    />
  );
}
