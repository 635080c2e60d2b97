/**
 * What a build order needs from stock: the design revision's lines turned into one
 * requirement per item, for N motors. Pure: no database, no framework.
 *
 * Per-motor quantities are the design costing's own (`costDesign`): wire in kg drawn
 * from stock with scrap included (to a tenth of a milligram), magnets in pieces, parts in
 * their unit. Lines of the same item are added exactly per motor, then multiplied by N
 * and rounded UP to the stock ledger's step (a gram for kg, a millimetre for m, a whole
 * piece for pcs), so a build never reserves less than it needs.
 */

import { costDesign } from "~/designs/design-costing";
import type { DesignLine } from "~/designs/design-lines";
import type { ExactDecimal } from "~/pricing/money";

/** Whole motors a build order may be for. */
export const maxMotorsPerOrder = 100_000;

/** The largest quantity a DECIMAL(14,3) column holds, in thousandths. */
const maxStockThousandths = 99_999_999_999_999n;

export interface ItemRequirement {
  itemId: number;
  sku: string;
  /** The unit the design counts the item in: "kg" for wire, "pcs" for magnets, the part's unit. */
  unit: string;
  /** Per motor, exact (all lines of the item added). */
  perMotor: ExactDecimal;
  /** For all motors, thousandths of the unit, rounded up to the unit's step. */
  required: bigint;
}

/** Adds two exact decimals without rounding. */
export function addExact(a: ExactDecimal, b: ExactDecimal): ExactDecimal {
  const decimals = Math.max(a.decimals, b.decimals);
  const scale = (value: ExactDecimal) =>
    value.digits * 10n ** BigInt(decimals - value.decimals);
  return { digits: scale(a) + scale(b), decimals };
}

/** `perMotor × motors` in thousandths of the unit, rounded up to the unit's step (1000 for pieces). */
export function requiredThousandths(
  perMotor: ExactDecimal,
  motors: number,
  unit: string,
): bigint {
  if (!Number.isInteger(motors) || motors < 1) {
    throw new RangeError(`motors must be a whole number ≥ 1, not ${motors}`);
  }
  const scaled = perMotor.digits * BigInt(motors) * 1000n;
  const divisor = 10n ** BigInt(perMotor.decimals);
  const step = unit === "pcs" ? 1000n : 1n;
  const unitDivisor = divisor * step;
  const whole = scaled / unitDivisor;
  const roundedUp = scaled % unitDivisor > 0n ? whole + 1n : whole;
  return roundedUp * step;
}

/** The per-motor stock quantity of every line, as the design costing works it out. */
export function perMotorQuantities(lines: readonly DesignLine[]) {
  // Prices play no part in quantities; the costing is the one place they are worked out.
  return costDesign({
    lines,
    quantity: 1,
    currency: "",
    prices: new Map(),
    ratedTorqueNm: null,
  }).lines.map((line) => ({
    itemId: line.itemId,
    sku: line.sku,
    unit: line.unit,
    perMotorQuantity: line.perMotorQuantity,
  }));
}

/**
 * One requirement per item for `motors` motors, in the order the items first appear.
 * Throws EngineeringInputError for a line that cannot be calculated, RangeError when a
 * requirement is larger than stock can hold.
 */
export function itemRequirements(
  lines: readonly DesignLine[],
  motors: number,
): ItemRequirement[] {
  const byItem = new Map<
    number,
    { itemId: number; sku: string; unit: string; perMotor: ExactDecimal }
  >();
  for (const line of perMotorQuantities(lines)) {
    const found = byItem.get(line.itemId);
    if (found) {
      found.perMotor = addExact(found.perMotor, line.perMotorQuantity);
    } else {
      byItem.set(line.itemId, {
        itemId: line.itemId,
        sku: line.sku,
        unit: line.unit,
        perMotor: line.perMotorQuantity,
      });
    }
  }
  return [...byItem.values()].map((item) => {
    const required = requiredThousandths(item.perMotor, motors, item.unit);
    if (required > maxStockThousandths) {
      throw new RangeError(
        `${item.sku}: ${motors} motors need more than the stock ledger can hold.`,
      );
    }
    return { ...item, required };
  });
}
