/**
 * The record-movement form's fields for every movement but a receipt: for an issue, the
 * build order it goes to; the lot and location it concerns; the spool's gross weight, the
 * count or the quantity; where a transfer goes; a reference; and what a weighed-back
 * spool issues or a count changes, as they are typed.
 */
import type { MovementType } from "~/db/tables/stock-enums";
import { movementFieldLabels } from "~/stock/record-movement-texts";
import { BalanceChoice, type ChoosableBalance } from "./balance-choice";
import {
  BuildOrderPicker,
  heldOnBalance,
  type PickableOrder,
} from "./build-order-picker";
import { CountDifferenceStatus } from "./count-difference-status";
import { MovementField } from "./movement-field";
import { ToLocationSelect } from "./to-location-select";
import { scannedBalance, type MovementChoices } from "./use-movement-choices";
import { WeighBackStatus } from "./weigh-back-status";

export function BalanceMovementFields({
  scanned,
  type,
  unit,
  isWire,
  balances,
  locations,
  orders,
  metresPerKg,
  choices,
  errors,
}: {
  /** A scanned label's lot and location (see use-movement-choices.ts). */
  scanned: { lot: string | null; location: string | null };
  type: Exclude<MovementType, "receipt">;
  unit: string;
  isWire: boolean;
  balances: ChoosableBalance[];
  locations: { code: string; name: string }[];
  orders: PickableOrder[];
  /** Bare metres per kg of a wire; null when not known. */
  metresPerKg: number | null;
  choices: MovementChoices;
  errors: Record<string, string[] | undefined>;
}) {
  const { order, chosen, weighBack, countDifference } = choices;
  const labels = movementFieldLabels(type);
  const step = unit === "pcs" ? "1" : "0.001";
  return (
    <div className="space-y-4">
      {type === "issue" ? (
        <BuildOrderPicker
          orders={orders}
          unit={unit}
          value={choices.orderId}
          onChange={choices.chooseOrder}
          errors={errors.buildOrderId}
        />
      ) : null}
      {(scanned.lot || scanned.location) &&
      !scannedBalance(balances, scanned) ? (
        <p role="alert" className="field-error">
          {scanned.lot ? `Lot ${scanned.lot}` : "This item"} has no stock
          {scanned.location ? ` at ${scanned.location}` : ""}: choose the lot
          and location below.
        </p>
      ) : null}
      <BalanceChoice
        legend={labels.balance}
        balances={balances}
        unit={unit}
        value={choices.balanceKey}
        onChange={choices.setBalanceKey}
        heldFor={
          order
            ? {
                reference: order.reference,
                heldOn: (key) => heldOnBalance(order, key),
              }
            : undefined
        }
        errors={errors.balance}
      />

      <div className="grid gap-4 sm:grid-cols-2">
        {type === "issue" && isWire ? (
          <MovementField
            name="grossKg"
            label="Spool gross weight now"
            unit="kg"
            type="number"
            step="0.001"
            inputMode="decimal"
            value={choices.gross}
            onChange={(event) => choices.setGross(event.target.value)}
            errors={errors.grossKg}
            hint="Or leave empty and type the quantity"
          />
        ) : null}
        {type === "count" ? (
          <MovementField
            name="quantity"
            label="Counted"
            unit={unit}
            type="number"
            step={step}
            inputMode="decimal"
            value={choices.counted}
            onChange={(event) => choices.setCounted(event.target.value)}
            errors={errors.quantity}
          />
        ) : weighBack === null ? (
          <MovementField
            name="quantity"
            label={labels.quantity}
            unit={unit}
            type="number"
            step={step}
            inputMode="decimal"
            errors={errors.quantity}
          />
        ) : null}
        {type === "transfer" ? (
          <ToLocationSelect
            locations={locations}
            from={chosen?.location}
            errors={errors.toLocation}
          />
        ) : null}
        {(type === "issue" && !order) ||
        type === "return" ||
        type === "scrap" ? (
          <MovementField
            name="reference"
            label={labels.reference}
            hint={
              type === "issue"
                ? "A job or note. For a build order, choose it under “Build order”."
                : undefined
            }
            errors={errors.reference}
            autoComplete="off"
          />
        ) : null}
      </div>

      {weighBack !== null && chosen ? (
        <WeighBackStatus
          preview={weighBack}
          previousNetKg={chosen.onHand}
          metresPerKg={metresPerKg}
        />
      ) : null}
      {countDifference !== null ? (
        <CountDifferenceStatus difference={countDifference} unit={unit} />
      ) : null}
    </div>
  );
}
