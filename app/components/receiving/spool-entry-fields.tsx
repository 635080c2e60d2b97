/**
 * One spool or lot of a delivery: its lot number and the supplier's lot or heat, where it goes (the item's usual place
 * first) and its quantity, or for wire the gross and tare weights with the net shown as
 * they are typed. Named `lines[i].…` for the form's one list of entries.
 */
import { useState } from "react";
import { MeasureField } from "~/components/measure-field";
import { SpoolNetStatus } from "~/components/stock/spool-net-status";

type Errors = Record<string, string[] | undefined>;

export function SpoolEntryFields({
  index,
  number: position,
  lineId,
  unit,
  isWire,
  locations,
  usualLocation,
  errors,
  onRemove,
}: {
  /** Position in the form's list of entries. */
  index: number;
  /** 1, 2, … within its order line, for the words. */
  number: number;
  lineId: number;
  unit: string;
  isWire: boolean;
  locations: { code: string; name: string }[];
  usualLocation: string | null;
  errors: Errors;
  onRemove: () => void;
}) {
  const [gross, setGross] = useState("");
  const [tare, setTare] = useState("");
  const name = (field: string) => `lines[${index}].${field}`;
  const id = (field: string) => `receive-${index}-${field}`;
  const fieldErrors = (field: string) => errors[name(field)];
  const number = {
    type: "text",
    inputMode: "decimal" as const,
    autoComplete: "off",
  };
  return (
    <fieldset className="grid gap-3 rounded-md border border-graphite-300 p-3 sm:grid-cols-4">
      <legend className="px-1 text-sm text-graphite-500">
        {isWire ? "Spool" : "Lot"} {position}
      </legend>
      <input type="hidden" name={name("lineId")} value={lineId} />
      <MeasureField
        id={id("lot")}
        name={name("lot")}
        label={isWire ? "Spool lot number" : "Lot (optional)"}
        errors={fieldErrors("lot")}
        autoComplete="off"
      />
      <MeasureField
        id={id("supplierBatch")}
        name={name("supplierBatch")}
        label="Supplier's lot or heat"
        errors={fieldErrors("supplierBatch")}
        autoComplete="off"
      />
      <div>
        <label htmlFor={id("location")} className="field-label">
          Into location
        </label>
        <select
          id={id("location")}
          name={name("location")}
          defaultValue={usualLocation ?? locations[0]?.code}
          className="field-input min-h-12 text-lg"
          aria-invalid={fieldErrors("location") ? true : undefined}
        >
          {locations.map((location) => (
            <option key={location.code} value={location.code}>
              {location.code} · {location.name}
            </option>
          ))}
        </select>
        {fieldErrors("location") ? (
          <p className="field-error">{fieldErrors("location")!.join(" ")}</p>
        ) : null}
      </div>
      {isWire ? (
        <>
          <MeasureField
            id={id("grossKg")}
            name={name("grossKg")}
            label="Gross weight"
            unit="kg"
            {...number}
            value={gross}
            onChange={(event) => setGross(event.target.value)}
            errors={fieldErrors("grossKg") ?? fieldErrors("quantity")}
          />
          <MeasureField
            id={id("tareKg")}
            name={name("tareKg")}
            label="Tare weight"
            unit="kg"
            {...number}
            value={tare}
            onChange={(event) => setTare(event.target.value)}
            errors={fieldErrors("tareKg")}
          />
          <SpoolNetStatus
            gross={gross}
            tare={tare}
            className="rounded-md bg-graphite-50 px-3 py-2 sm:col-span-3"
          />
        </>
      ) : (
        <MeasureField
          id={id("quantity")}
          name={name("quantity")}
          label="Quantity"
          unit={unit}
          {...number}
          errors={fieldErrors("quantity")}
        />
      )}
      <div className="flex items-end sm:col-start-4">
        <button type="button" className="button-quiet" onClick={onRemove}>
          Remove {isWire ? "spool" : "lot"} {position}
        </button>
      </div>
    </fieldset>
  );
}
