/**
 * What the record-movement form keeps while it is filled in: the lot and location
 * chosen (the oldest lot first), the build order chosen for an issue, the spool's gross
 * weight and the count typed, and what those come to (the weigh-back, the difference
 * to the books).
 */
import { useState } from "react";
import type { MovementType } from "~/db/tables/stock-enums";
import { typedNumber } from "~/lib/number-text";
import { weighBackPreview } from "~/stock/weigh-back-preview";
import { balanceKeyOf, type ChoosableBalance } from "./balance-choice";
import type { PickableOrder } from "./build-order-picker";

export type MovementChoices = ReturnType<typeof useMovementChoices>;

export function useMovementChoices({
  type,
  isWire,
  balances,
  orders,
  scanned = { lot: null, location: null },
}: {
  type: MovementType;
  isWire: boolean;
  /** The item's balances, oldest lot first (the server lists them so): where a reservation sits. */
  balances: ChoosableBalance[];
  orders: PickableOrder[];
  /** A scanned label's lot and location: the balance they name is chosen to start with. */
  scanned?: { lot: string | null; location: string | null };
}) {
  const [balanceKey, setBalanceKey] = useState(() => {
    const first = scannedBalance(balances, scanned) ?? balances[0];
    return first ? balanceKeyOf(first) : "";
  });
  const [orderId, setOrderId] = useState("");
  const order = orders.find((candidate) => String(candidate.id) === orderId);
  const chooseOrder = (value: string) => {
    setOrderId(value);
    // The chosen order's oldest held lot, if this item holds stock there.
    const first = orders
      .find((candidate) => String(candidate.id) === value)
      ?.held.map(balanceKeyOf)
      .find((key) => balances.some((b) => balanceKeyOf(b) === key));
    if (first) setBalanceKey(first);
  };
  const [gross, setGross] = useState("");
  const [counted, setCounted] = useState("");
  const chosen = balances.find(
    (balance) => balanceKeyOf(balance) === balanceKey,
  );

  // The server computes the weigh-back again when the issue is recorded.
  const weighBack =
    type === "issue" && isWire && chosen && chosen.tareKg !== null
      ? weighBackPreview(chosen.onHand, gross, chosen.tareKg)
      : null;
  const countedNumber = typedNumber(counted);
  const countDifference =
    type === "count" && chosen && countedNumber !== null
      ? countedNumber - chosen.onHand
      : null;

  return {
    balanceKey,
    setBalanceKey,
    orderId,
    order,
    chooseOrder,
    chosen,
    gross,
    setGross,
    counted,
    setCounted,
    weighBack,
    countDifference,
  };
}

/**
 * The balance a scan names: its lot at its location, else the lot's first balance (a lot
 * scanned without a location), else the first balance at the scanned location.
 */
export function scannedBalance(
  balances: ChoosableBalance[],
  scanned: { lot: string | null; location: string | null },
): ChoosableBalance | undefined {
  const same = (a: string | null, b: string | null) =>
    (a ?? "").toUpperCase() === (b ?? "").toUpperCase();
  if (scanned.lot)
    return balances.find(
      (balance) =>
        same(balance.lot, scanned.lot) &&
        (!scanned.location || same(balance.location, scanned.location)),
    );
  if (scanned.location)
    return balances.find((balance) => same(balance.location, scanned.location));
  return undefined;
}
