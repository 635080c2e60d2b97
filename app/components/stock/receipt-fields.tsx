/**
 * The receipt fields of the record-movement page: the location (starting at where the
 * item usually is), the spool's gross and tare with the net shown as they are typed, the
 * unit cost in the company currency, the supplier (optional), the supplier's lot or heat
 * and the delivery note.
 */
import { useState } from "react";
import { perUnitWord } from "~/lib/unit-text";
import { MovementField as Field } from "./movement-field";
import { SpoolNetStatus } from "./spool-net-status";

type Errors = Record<string, string[] | undefined>;

export function ReceiptFields({
  scanned,
  unit,
  isWire,
  locations,
  usualLocation,
  currency,
  suppliers = [],
  errors,
  inputClassName,
}: {
  /** A scanned label's lot and location, filled in to start with. */
  scanned: { lot: string | null; location: string | null };
  unit: string;
  isWire: boolean;
  locations: { code: string; name: string }[];
  /** Where the item usually is (see usual-location.server.ts); null: the first location. */
  usualLocation: string | null;
  /** The company currency the unit cost is in. */
  currency: string;
  /** The suppliers to choose from; none chosen is allowed. */
  suppliers?: { id: number; name: string }[];
  errors: Errors;
  inputClassName: string;
}) {
  const [gross, setGross] = useState("");
  const [tare, setTare] = useState("");
  const scannedLocation = locations.find(
    (location) =>
      location.code.toUpperCase() === scanned.location?.toUpperCase(),
  )?.code;
  return (
    <div className="grid gap-4 sm:grid-cols-2">
      <div>
        <label htmlFor="movement-location" className="field-label">
          Into location
        </label>
        <select
          id="movement-location"
          name="location"
          className={inputClassName}
          defaultValue={scannedLocation ?? usualLocation ?? locations[0]?.code}
          aria-describedby={
            usualLocation && !scannedLocation
              ? "movement-location-hint"
              : undefined
          }
        >
          {locations.map((location) => (
            <option key={location.code} value={location.code}>
              {location.code} · {location.name}
            </option>
          ))}
        </select>
        {usualLocation && !scannedLocation ? (
          <p
            id="movement-location-hint"
            className="mt-1 text-xs text-graphite-500"
          >
            Where this item usually is
          </p>
        ) : null}
        {errors.location ? (
          <p className="field-error">{errors.location.join(" ")}</p>
        ) : null}
      </div>
      <Field
        name="lot"
        label={isWire ? "Spool lot number" : "Lot (optional)"}
        defaultValue={scanned.lot ?? undefined}
        errors={errors.lot}
        autoComplete="off"
        required={isWire}
      />
      {isWire ? (
        <>
          <Field
            name="grossKg"
            label="Gross weight"
            unit="kg"
            type="number"
            step="0.001"
            inputMode="decimal"
            value={gross}
            onChange={(event) => setGross(event.target.value)}
            // A spool's quantity is its weight: the form has no quantity field, so a missing one is asked for here.
            errors={
              errors.grossKg ??
              (errors.quantity ? ["Give the spool's gross weight."] : undefined)
            }
            hint="Spool with wire, on the scale"
          />
          <Field
            name="tareKg"
            label="Tare weight"
            unit="kg"
            type="number"
            step="0.001"
            inputMode="decimal"
            value={tare}
            onChange={(event) => setTare(event.target.value)}
            errors={errors.tareKg}
            hint="The empty spool"
          />
          <SpoolNetStatus gross={gross} tare={tare} />
          <Field
            name="spoolType"
            label="Spool type"
            errors={errors.spoolType}
            placeholder="e.g. DIN 250"
          />
        </>
      ) : (
        <Field
          name="quantity"
          label="Quantity"
          unit={unit}
          type="number"
          step={unit === "pcs" ? "1" : "0.001"}
          inputMode="decimal"
          errors={errors.quantity}
        />
      )}
      <Field
        name="unitCost"
        label={`Unit cost per ${perUnitWord(unit)}`}
        unit={currency}
        type="number"
        step="0.0001"
        inputMode="decimal"
        errors={errors.unitCost}
        hint={`In ${currency}, the company currency`}
      />
      <div>
        <label htmlFor="movement-supplier" className="field-label">
          Supplier (optional)
        </label>
        <select
          id="movement-supplier"
          name="supplierId"
          className={inputClassName}
          defaultValue=""
        >
          <option value="">Not named</option>
          {suppliers.map((supplier) => (
            <option key={supplier.id} value={supplier.id}>
              {supplier.name}
            </option>
          ))}
        </select>
        {errors.supplierId ? (
          <p className="field-error">{errors.supplierId.join(" ")}</p>
        ) : null}
      </div>
      <Field
        name="supplierBatch"
        label="Supplier's lot or heat"
        errors={errors.supplierBatch}
        autoComplete="off"
      />
      <Field
        name="reference"
        label="Delivery note"
        errors={errors.reference}
        autoComplete="off"
      />
    </div>
  );
}
