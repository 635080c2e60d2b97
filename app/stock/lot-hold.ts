/**
 * What a hold on a lot (quality block, decision 039) keeps from use, in thousandths. Pure.
 *
 * `items.held` is a kept balance: the free part (on hand − reserved) of every balance of a
 * held lot. A balance a count left below its reservations frees nothing, so its part is
 * zero, never negative (the column may not go below zero).
 */
export interface BalanceFigures {
  onHand: bigint;
  reserved: bigint;
}

/** The part of one balance of a held lot that the hold keeps from use. */
export function heldPartOf(balance: BalanceFigures): bigint {
  const free = balance.onHand - balance.reserved;
  return free > 0n ? free : 0n;
}

/** How much `items.held` changes when a balance of a held lot goes from `before` to `after`. */
export function heldChangeOf(
  before: BalanceFigures,
  after: BalanceFigures,
): bigint {
  return heldPartOf(after) - heldPartOf(before);
}

/** The refusal for using a held lot: "Lot 24-117 is on hold: enamel cracks on test". */
export function lotOnHoldMessage(lotNumber: string, reason: string): string {
  return `Lot ${lotNumber} is on hold: ${reason}`;
}
