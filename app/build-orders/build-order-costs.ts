/**
 * Planned versus actual for a build order. Pure, exact (BigInt).
 *
 * Planned: the required quantity at the item's moving average cost when the order was
 * made. Actual: each issue's quantity at the moving average cost when it was issued.
 * Amounts are rounded half away from zero to 0.0001 once per line (the project's rule,
 * `valueOf`); per motor is the total ÷ motors, rounded the same way.
 */
import { divideHalfAwayFromZero, valueOf } from "~/lib/decimal-amounts";

export interface LineForCosting {
  /** Thousandths of the unit. */
  required: bigint;
  issued: bigint;
  /** Ten-thousandths per unit; null when the item had no cost when the order was made. */
  plannedUnitCost: bigint | null;
  /** Each issue: thousandths issued at ten-thousandths per unit. */
  issues: readonly { quantity: bigint; unitCost: bigint }[];
}

export interface LineCosts {
  /** Issued − required, thousandths: + used more than planned, − less. */
  difference: bigint;
  /** Ten-thousandths; null when the planned unit cost is unknown. */
  plannedCost: bigint | null;
  actualCost: bigint;
}

export function lineCosts(line: LineForCosting): LineCosts {
  return {
    difference: line.issued - line.required,
    plannedCost:
      line.plannedUnitCost === null
        ? null
        : valueOf(line.required, line.plannedUnitCost),
    actualCost: line.issues.reduce(
      (sum, issue) => sum + valueOf(issue.quantity, issue.unitCost),
      0n,
    ),
  };
}

export interface OrderCosts {
  lines: LineCosts[];
  /** Σ planned line costs (lines without a planned cost count as 0; see `plannedComplete`). */
  plannedTotal: bigint;
  actualTotal: bigint;
  plannedPerMotor: bigint;
  actualPerMotor: bigint;
  /** False when some line had no planned unit cost. */
  plannedComplete: boolean;
}

export function orderCosts(
  lines: readonly LineForCosting[],
  motors: number,
): OrderCosts {
  if (!Number.isInteger(motors) || motors < 1) {
    throw new RangeError(`motors must be a whole number ≥ 1, not ${motors}`);
  }
  const costs = lines.map(lineCosts);
  const plannedTotal = costs.reduce(
    (sum, line) => sum + (line.plannedCost ?? 0n),
    0n,
  );
  const actualTotal = costs.reduce((sum, line) => sum + line.actualCost, 0n);
  const n = BigInt(motors);
  return {
    lines: costs,
    plannedTotal,
    actualTotal,
    plannedPerMotor: divideHalfAwayFromZero(plannedTotal, n),
    actualPerMotor: divideHalfAwayFromZero(actualTotal, n),
    plannedComplete: costs.every((line) => line.plannedCost !== null),
  };
}
