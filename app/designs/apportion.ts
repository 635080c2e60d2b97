/**
 * Splitting a whole number of units (ten-thousandths of money, tenths of a milligram) into
 * parts in proportion to weights so that the parts add up to the total exactly.
 *
 * Method: largest remainder (Hamilton's method of apportionment). Every part first gets
 * the whole units of its exact share total × weight ÷ Σ weights, rounded down; the few
 * units left over (fewer than the number of parts) go one each to the parts whose exact
 * shares had the largest fractional remainders, the earlier part first on a tie. So the
 * parts always add up to the total, none is negative, and each is less than one unit
 * away from its exact share. All in BigInt: no rounding by floating point.
 */

/**
 * `total` units split in proportion to `weights` (largest remainder, see the module
 * comment). Throws RangeError for a negative total or weight, or a non-zero total with
 * all weights zero.
 */
export function apportion(total: bigint, weights: readonly bigint[]): bigint[] {
  if (total < 0n) throw new RangeError("cannot apportion a negative total");
  if (weights.some((weight) => weight < 0n)) {
    throw new RangeError("weights must not be negative");
  }
  const weightSum = weights.reduce((sum, weight) => sum + weight, 0n);
  if (weightSum === 0n) {
    if (total === 0n) return weights.map(() => 0n);
    throw new RangeError(
      "cannot apportion a total over weights that are all zero",
    );
  }
  const parts = weights.map((weight) => (total * weight) / weightSum);
  const remainders = weights.map((weight) => (total * weight) % weightSum);
  let left = total - parts.reduce((sum, part) => sum + part, 0n);
  const order = weights
    .map((_, index) => index)
    .sort((a, b) => {
      const byRemainder = remainders[b]! - remainders[a]!;
      return byRemainder > 0n ? 1 : byRemainder < 0n ? -1 : a - b;
    });
  for (const index of order) {
    if (left === 0n) break;
    parts[index]! += 1n;
    left -= 1n;
  }
  return parts;
}

/** Resolution of {@link weightsFromShares}: the largest share becomes 2^50. */
const SHARE_WEIGHT_SCALE = 2 ** 50;

/**
 * Non-negative numbers (lengths, masses) as whole weights for {@link apportion}, in the
 * same proportions to about 1 part in 10^15: the largest becomes 2^50, the others scale
 * with it. Throws RangeError for a negative or non-finite share.
 */
export function weightsFromShares(shares: readonly number[]): bigint[] {
  if (shares.some((share) => !Number.isFinite(share) || share < 0)) {
    throw new RangeError("shares must be finite numbers of zero or more");
  }
  const largest = Math.max(0, ...shares);
  if (largest === 0) return shares.map(() => 0n);
  return shares.map((share) =>
    BigInt(Math.round((share / largest) * SHARE_WEIGHT_SCALE)),
  );
}
