/**
 * Cost of one motor of a design from priced lines, split into active copper, end-turn
 * copper, leads and scrap, magnets and other parts, and cost per N·m of rated torque.
 *
 * Money is exact (BigInt ten-thousandths, `~/pricing/money`), in the company currency.
 *
 * Rounding, chosen so that both sums hold exactly:
 * 1. Each line costs its per-motor quantity × unit price, rounded once, half away from
 *    zero, to 0.0001 (the project's one rule, `amountForQuantity`). Wire is priced on
 *    the mass drawn from stock, scrap included, carried to a tenth of a milligram.
 * 2. costPerMotor is the sum of the line costs: exact, no further rounding.
 * 3. A wire line's cost is apportioned to active copper, end-turn copper and leads +
 *    scrap in proportion to its exact drawn-mass split, by largest remainder at 0.0001
 *    (`apportion`): the three add up to the line cost exactly, each within 0.0001 of its
 *    exact share. Magnet and part lines go whole to "magnets" and "parts".
 * So split.activeCopper + endTurnCopper + leadsAndScrap + magnets + parts = costPerMotor
 * = Σ line costs, to the ten-thousandth, and therefore to the cent.
 *
 * A line with no price is listed with `unitPrice`, `priceSource` and `cost` null, counted
 * in `unpriced`, and `complete` is false: costPerMotor is then the cost of the priced
 * lines only and must be shown as incomplete.
 */

import type { CurrencyCode, ExactDecimal, MoneyAmount } from "~/pricing/money";
import {
  amountForQuantity,
  formatExactDecimal,
  parseExactDecimal,
} from "~/pricing/money";
import { divideHalfAwayFromZero } from "~/lib/decimal-amounts";
import { EngineeringInputError } from "~/engineering/errors";
import { apportion } from "./apportion";
import { coilLineFigures, type DrawnMassBasis } from "./coil-line-figures";
import {
  assertDesignLine,
  lineItem,
  type DesignItemRef,
  type DesignLine,
  type DesignLineKind,
} from "./design-lines";

/** The price of one item as the costing uses it. */
export interface ItemUnitPrice {
  /** Price per unit of the item's stock unit (wire per kg, magnets per piece), company currency, ten-thousandths. */
  unitPrice: MoneyAmount;
  /** Where the price comes from, shown beside it ("best price for 500 motors: <supplier>", "moving average cost of stock"). */
  source: string;
}

export interface DesignCostingInput {
  lines: readonly DesignLine[];
  /** Motors to build, whole number ≥ 1 (the caller picks quantity-break prices for it). */
  quantity: number;
  /** The company currency every price is in. */
  currency: CurrencyCode;
  /** Unit price per item id; an item missing here makes its lines unpriced. */
  prices: ReadonlyMap<number, ItemUnitPrice>;
  /** Rated torque of one motor, N·m (measured, or estimated); null when not known. */
  ratedTorqueNm: number | null;
  /**
   * The first-order torque estimate, N·m; cost per N·m uses it when no rated torque is
   * given, and says so (`perNmTorque.source` "estimated").
   */
  estimatedTorqueNm?: number | null;
}

/** The torque cost per N·m is taken over, and where it comes from. */
export interface PerNmTorque {
  torqueNm: number;
  /** "rated": the revision's rated torque; "estimated": the first-order estimate. */
  source: "rated" | "estimated";
}

/** How a cost per N·m over an estimated torque is labelled wherever it is shown. */
export const ESTIMATED_TORQUE_PER_NM_LABEL =
  "per N·m of estimated torque (first-order)";

const usableTorque = (value: number | null | undefined): value is number =>
  value !== null && value !== undefined && Number.isFinite(value) && value > 0;

/**
 * The torque "per N·m" figures divide by: the rated torque when given (> 0), else the
 * first-order estimate when there is one (> 0), else null.
 */
export function perNmTorque(
  ratedTorqueNm: number | null,
  estimatedTorqueNm: number | null | undefined,
): PerNmTorque | null {
  if (usableTorque(ratedTorqueNm))
    return { torqueNm: ratedTorqueNm, source: "rated" };
  if (usableTorque(estimatedTorqueNm))
    return { torqueNm: estimatedTorqueNm, source: "estimated" };
  return null;
}

/** Cost of one motor by where the money goes, ten-thousandths. Adds up to costPerMotor exactly. */
export interface DesignCostSplit {
  activeCopper: MoneyAmount;
  endTurnCopper: MoneyAmount;
  leadsAndScrap: MoneyAmount;
  magnets: MoneyAmount;
  parts: MoneyAmount;
}

export interface CostedDesignLine {
  kind: DesignLineKind;
  itemId: number;
  sku: string;
  /** Per motor in `unit`: wire kg drawn (scrap included) to 0.1 mg, magnets pieces, parts as given. */
  perMotorQuantity: ExactDecimal;
  unit: string;
  /** Null when the item has no price. */
  unitPrice: MoneyAmount | null;
  priceSource: string | null;
  /** perMotorQuantity × unitPrice rounded half away from zero to 0.0001; null when unpriced. */
  cost: MoneyAmount | null;
  /** Wire lines: whether the kg are of enamelled wire or bare conductor; null for other lines. */
  massBasis: DrawnMassBasis | null;
}

export interface DesignCosting {
  quantity: number;
  currency: CurrencyCode;
  /** Σ of the priced line costs, ten-thousandths. */
  costPerMotor: MoneyAmount;
  ratedTorqueNm: number | null;
  /** The torque cost per N·m is over: rated, else the estimate; null when neither. */
  perNmTorque: PerNmTorque | null;
  /** costPerMotor ÷ perNmTorque, half away from zero to 0.0001; null without a torque. */
  costPerNm: MoneyAmount | null;
  split: DesignCostSplit;
  lines: CostedDesignLine[];
  /** Lines without a price, in line order. */
  unpriced: (DesignItemRef & { kind: DesignLineKind })[];
  /** True when every line is priced. */
  complete: boolean;
}

/** Decimals the rated torque is taken to for cost per N·m: a micro-newton-metre. */
const TORQUE_DECIMALS = 6;

/**
 * Cost per N·m: cost ÷ torque, half away from zero to 0.0001. The torque is taken to
 * 1 µN·m first (exact decimal); null when it is missing, not finite, or rounds to ≤ 0.
 */
export function costPerNewtonMetre(
  cost: MoneyAmount,
  torqueNm: number | null,
): MoneyAmount | null {
  if (torqueNm === null || !Number.isFinite(torqueNm) || torqueNm <= 0) {
    return null;
  }
  const torque = parseExactDecimal(torqueNm.toFixed(TORQUE_DECIMALS));
  if (torque.digits <= 0n) return null;
  return divideHalfAwayFromZero(
    cost * 10n ** BigInt(torque.decimals),
    torque.digits,
  );
}

function emptySplit(): DesignCostSplit {
  return {
    activeCopper: 0n,
    endTurnCopper: 0n,
    leadsAndScrap: 0n,
    magnets: 0n,
    parts: 0n,
  };
}

interface LineQuantity {
  perMotorQuantity: ExactDecimal;
  unit: string;
  massBasis: DrawnMassBasis | null;
  /** Weights of active, end-turn and leads + scrap for a wire line; null otherwise. */
  wireSplitWeights: bigint[] | null;
}

function lineQuantity(line: DesignLine): LineQuantity {
  switch (line.kind) {
    case "coil": {
      const figures = coilLineFigures(line);
      const split = figures.drawnMassSplit;
      return {
        perMotorQuantity: figures.drawnMass,
        unit: "kg",
        massBasis: figures.massBasis,
        wireSplitWeights: [
          split.activeKg.digits,
          split.endTurnKg.digits,
          split.leadsAndScrapKg.digits,
        ],
      };
    }
    case "magnet":
      return {
        perMotorQuantity: { digits: BigInt(line.piecesPerMotor), decimals: 0 },
        unit: "pcs",
        massBasis: null,
        wireSplitWeights: null,
      };
    case "part":
      return {
        perMotorQuantity: line.quantityPerMotor,
        unit: line.part.unit,
        massBasis: null,
        wireSplitWeights: null,
      };
  }
}

function addToSplit(
  split: DesignCostSplit,
  kind: DesignLineKind,
  cost: MoneyAmount,
  wireSplitWeights: bigint[] | null,
): void {
  if (kind === "magnet") {
    split.magnets += cost;
  } else if (kind === "part") {
    split.parts += cost;
  } else {
    // A negative cost (a credit) is apportioned as its magnitude, then negated.
    const sign = cost < 0n ? -1n : 1n;
    const [active, endTurn, leadsAndScrap] = apportion(
      sign * cost,
      wireSplitWeights ?? [],
    ).map((part) => sign * part);
    split.activeCopper += active!;
    split.endTurnCopper += endTurn!;
    split.leadsAndScrap += leadsAndScrap!;
  }
}

/**
 * What each line takes per motor, in line order, as `costDesign` counts it (its
 * `perMotorQuantity`), without pricing anything: what a build needs before its prices
 * are looked up.
 */
export function perMotorQuantities(
  lines: readonly DesignLine[],
): { itemId: number; sku: string; perMotorQuantity: ExactDecimal }[] {
  return lines.map((line) => {
    assertDesignLine(line);
    const item = lineItem(line);
    return {
      itemId: item.itemId,
      sku: item.sku,
      perMotorQuantity: lineQuantity(line).perMotorQuantity,
    };
  });
}

/** Cost per motor of a design (see the module comment for the rounding). */
export function costDesign(input: DesignCostingInput): DesignCosting {
  if (!Number.isInteger(input.quantity) || input.quantity < 1) {
    throw new EngineeringInputError(
      "quantity",
      "The number of motors must be a whole number of at least 1.",
    );
  }
  const split = emptySplit();
  const lines: CostedDesignLine[] = [];
  const unpriced: DesignCosting["unpriced"] = [];
  let costPerMotor = 0n;

  for (const line of input.lines) {
    assertDesignLine(line);
    const item = lineItem(line);
    const quantity = lineQuantity(line);
    const price = input.prices.get(item.itemId);
    const cost = price
      ? amountForQuantity(quantity.perMotorQuantity, price.unitPrice)
      : null;
    if (cost === null) {
      unpriced.push({ kind: line.kind, itemId: item.itemId, sku: item.sku });
    } else {
      costPerMotor += cost;
      addToSplit(split, line.kind, cost, quantity.wireSplitWeights);
    }
    lines.push({
      kind: line.kind,
      itemId: item.itemId,
      sku: item.sku,
      perMotorQuantity: quantity.perMotorQuantity,
      unit: quantity.unit,
      unitPrice: price?.unitPrice ?? null,
      priceSource: price?.source ?? null,
      cost,
      massBasis: quantity.massBasis,
    });
  }

  const torque = perNmTorque(input.ratedTorqueNm, input.estimatedTorqueNm);
  return {
    quantity: input.quantity,
    currency: input.currency,
    costPerMotor,
    ratedTorqueNm: input.ratedTorqueNm,
    perNmTorque: torque,
    costPerNm: costPerNewtonMetre(costPerMotor, torque?.torqueNm ?? null),
    split,
    lines,
    unpriced,
    complete: unpriced.length === 0,
  };
}

/**
 * Stock needed for `motors` motors of a line's per-motor quantity, in thousandths of the
 * item's unit (the stock ledger's scale: grams for kg), rounded UP so a build never
 * reserves less than it needs: 0.0308378 kg × 500 = 15.4189 kg → 15.419 kg.
 */
export function requiredStockQuantity(
  perMotorQuantity: ExactDecimal,
  motors: number,
): bigint {
  if (!Number.isInteger(motors) || motors < 0) {
    throw new RangeError(`motors must be a whole number ≥ 0, not ${motors}`);
  }
  const scaled = perMotorQuantity.digits * BigInt(motors) * 1000n;
  const divisor = 10n ** BigInt(perMotorQuantity.decimals);
  const whole = scaled / divisor;
  return scaled % divisor > 0n ? whole + 1n : whole;
}

/** Money (ten-thousandths) as a JSON number, exact to the 4 decimals a double holds for any price. */
function moneyNumber(amount: MoneyAmount): number {
  return Number(formatExactDecimal({ digits: amount, decimals: 4 }));
}

function moneyNumberOrNull(amount: MoneyAmount | null): number | null {
  return amount === null ? null : moneyNumber(amount);
}

/**
 * The costing as the API returns it: `{ quantity, currency, costPerMotor, ratedTorqueNm,
 * costPerNm, split, lines: [{ kind, sku, perMotorQuantity, unit, unitPrice, priceSource,
 * cost }] }` with money as JSON numbers to 0.0001 (rounded to cents only at display),
 * plus `complete`, `unpriced`, each line's `massBasis` and `perNmTorque` (the torque
 * cost per N·m is over: `{ torqueNm, source: "rated" | "estimated" }`, or null).
 */
export function designCostingJson(costing: DesignCosting) {
  return {
    quantity: costing.quantity,
    currency: costing.currency,
    costPerMotor: moneyNumber(costing.costPerMotor),
    ratedTorqueNm: costing.ratedTorqueNm,
    perNmTorque: costing.perNmTorque,
    costPerNm: moneyNumberOrNull(costing.costPerNm),
    split: {
      activeCopper: moneyNumber(costing.split.activeCopper),
      endTurnCopper: moneyNumber(costing.split.endTurnCopper),
      leadsAndScrap: moneyNumber(costing.split.leadsAndScrap),
      magnets: moneyNumber(costing.split.magnets),
      parts: moneyNumber(costing.split.parts),
    },
    lines: costing.lines.map((line) => ({
      kind: line.kind,
      sku: line.sku,
      perMotorQuantity: Number(formatExactDecimal(line.perMotorQuantity)),
      unit: line.unit,
      unitPrice: moneyNumberOrNull(line.unitPrice),
      priceSource: line.priceSource,
      cost: moneyNumberOrNull(line.cost),
      massBasis: line.massBasis,
    })),
    complete: costing.complete,
    unpriced: costing.unpriced.map(({ kind, sku }) => ({ kind, sku })),
  };
}

/** The JSON shape of {@link designCostingJson}. */
export type DesignCostingJson = ReturnType<typeof designCostingJson>;
