/**
 * The price basis beside a cost, so two costs of the same motor on different pages
 * (the design at today's best supplier price, its build order at the stock average when
 * the order was made) say why they differ.
 */
import { costBasisLabels, type CostBasis } from "~/designs/cost-basis";

/** "best current supplier price", "moving average cost of stock". */
export function costBasisText(basis: CostBasis): string {
  return costBasisLabels[basis].toLowerCase();
}

export function PriceBasisNote({
  basis,
  after = "",
  className = "",
}: {
  basis: CostBasis;
  /** Words after the basis: " when the order was made". */
  after?: string;
  className?: string;
}) {
  return (
    <span
      data-price-basis={basis}
      className={`text-xs font-normal text-graphite-500 ${className}`}
    >
      at the {costBasisText(basis)}
      {after}
    </span>
  );
}
