/**
 * How much to order of an item that is low, from its reorder point and reorder quantity.
 * One rule for the item page, the best-prices list, the low-stock e-mails and the purchase
 * requests. Pure: quantities in thousandths of the unit.
 */

/** What to order: the reorder quantity, or more when that would still leave stock below the point. */
export function suggestedOrderQuantity(input: {
  available: bigint;
  reorderPoint: bigint;
  reorderQuantity: bigint;
}): bigint {
  const shortfall = input.reorderPoint - input.available;
  return input.reorderQuantity > shortfall
    ? input.reorderQuantity
    : shortfall > 0n
      ? shortfall
      : 0n;
}

/**
 * The quantity an item is priced at for buying, one rule for its page, the best-prices list
 * and its low-stock e-mail: the suggested order ({@link suggestedOrderQuantity}), or one unit
 * (1000 thousandths) when nothing is to be ordered (no reorder quantity, not low).
 */
export function quantityToPrice(input: {
  available: bigint;
  reorderPoint: bigint;
  reorderQuantity: bigint;
}): bigint {
  const order = suggestedOrderQuantity(input);
  return order > 0n ? order : 1_000n;
}
