/**
 * Figures of the design insight that the costing does not give directly. Pure.
 *
 * Money arrives here as the costing's JSON numbers (exact to 0.0001) and is taken back to
 * BigInt ten-thousandths before any sum, so nothing drifts.
 */
import { apportion } from "~/designs/apportion";
import { countText } from "~/lib/unit-text";
import { formatMoney, type MoneyAmount } from "~/pricing/money";

/** The five parts of a motor's cost, in the order the charts stack them. */
export const splitKeys = [
  "activeCopper",
  "endTurnCopper",
  "leadsAndScrap",
  "magnets",
  "parts",
] as const;

export type SplitKey = (typeof splitKeys)[number];
export type SplitFigures = Record<SplitKey, number>;

/** A money figure from the costing's JSON (4 decimals) as ten-thousandths. */
export function moneyFromJson(value: number): MoneyAmount {
  return BigInt(Math.round(value * 10_000));
}

/**
 * A costing figure to the cent, exactly (half away from zero): "1,234.50 EUR",
 * per a unit "12.34 EUR/N·m"; without a currency the number alone, for tables
 * whose caption names it: "11.75".
 */
export function costingMoneyText(
  value: number,
  currency = "",
  per?: string,
): string {
  const text = formatMoney(moneyFromJson(value), currency, {
    decimals: 2,
    ...(per ? { per } : {}),
  });
  return currency ? text : text.split("\u00a0")[0]!;
}

/** Ten-thousandths as a JSON number, exact to 4 decimals. */
export function moneyToJson(amount: MoneyAmount): number {
  return Number(amount) / 10_000;
}

/**
 * Cost per N·m split the way the cost per motor is: `costPerNm` (already rounded to
 * 0.0001 by the costing) shared out over the five parts in proportion to the per-motor
 * split, largest remainder at 0.0001 (`apportion`), so the five add up to `costPerNm`
 * exactly and each is within 0.0001 of part ÷ torque. Null when there is no cost per N·m,
 * or a part is negative (a credit line), which a proportion cannot carry.
 *
 * Example by hand: split 2.0000 / 1.0000 / 0.5000 / 4.0000 / 1.5000 (9.0000 per motor) at
 * 0.5 N·m → 18.0000 per N·m → 4.0000 / 2.0000 / 1.0000 / 8.0000 / 3.0000.
 */
export function splitPerNewtonMetre(
  split: SplitFigures,
  costPerNm: number | null,
): SplitFigures | null {
  if (costPerNm === null) return null;
  const total = moneyFromJson(costPerNm);
  const weights = splitKeys.map((key) => moneyFromJson(split[key]));
  if (total < 0n || weights.some((weight) => weight < 0n)) return null;
  if (weights.every((weight) => weight === 0n)) {
    return total === 0n
      ? (Object.fromEntries(splitKeys.map((key) => [key, 0])) as SplitFigures)
      : null;
  }
  const parts = apportion(total, weights);
  return Object.fromEntries(
    splitKeys.map((key, index) => [key, moneyToJson(parts[index]!)]),
  ) as SplitFigures;
}

/** How far a what-if moved a figure: what-if − stored, exact; null when either is missing. */
export function moneyChange(
  whatIf: number | null,
  stored: number | null,
): number | null {
  if (whatIf === null || stored === null) return null;
  return moneyToJson(moneyFromJson(whatIf) - moneyFromJson(stored));
}

/**
 * How a design's cost per motor moved over its history: the first and the last month
 * with every line priced, the change between them (exact) and that change as a share of
 * the first, in per cent to one decimal (half away from zero); null without two such
 * months. 5.8742 → 5.9042: +0.0300, +0.5 % (0.0300 ÷ 5.8742 = 0.511 %).
 */
export function costHistoryChange(
  points: readonly { date: string; costPerMotor: number; complete: boolean }[],
): {
  from: { date: string; costPerMotor: number };
  to: { date: string; costPerMotor: number };
  change: number;
  percent: number | null;
} | null {
  const priced = points.filter((point) => point.complete);
  if (priced.length < 2) return null;
  const first = priced[0]!;
  const last = priced.at(-1)!;
  const change =
    moneyFromJson(last.costPerMotor) - moneyFromJson(first.costPerMotor);
  const base = moneyFromJson(first.costPerMotor);
  // Per cent to 0.1: change × 1000 ÷ base, rounded half away from zero, in tenths.
  const tenths =
    base === 0n
      ? null
      : (() => {
          const numerator = change * 1000n;
          const negative = numerator < 0n !== base < 0n;
          const n = numerator < 0n ? -numerator : numerator;
          const d = base < 0n ? -base : base;
          const rounded = (n * 2n + d) / (2n * d);
          return negative ? -rounded : rounded;
        })();
  return {
    from: { date: first.date, costPerMotor: first.costPerMotor },
    to: { date: last.date, costPerMotor: last.costPerMotor },
    change: moneyToJson(change),
    percent: tenths === null ? null : Number(tenths) / 10,
  };
}

/** What a ranking needs of a design's figures. */
interface RankedFigures {
  costPerNm: number | null;
  complete: boolean;
  unpriced: readonly unknown[];
}

/**
 * Designs ranked by cost per N·m, cheapest first, with those that cannot be ranked set
 * apart: a design with lines without a price would look cheaper than it is (its cost
 * leaves those lines out), and one with no torque (rated or estimated) has no cost per
 * N·m. Each group keeps the order it came in where figures tie.
 */
export function rankByCostPerNm<Design extends RankedFigures>(
  designs: readonly Design[],
): { ranked: Design[]; incomplete: Design[]; withoutTorque: Design[] } {
  const incomplete = designs.filter((design) => !design.complete);
  const withoutTorque = designs.filter(
    (design) => design.complete && design.costPerNm === null,
  );
  const ranked = designs
    .filter((design) => design.complete && design.costPerNm !== null)
    .map((design, index) => ({ design, index }))
    .sort(
      (a, b) =>
        Number(
          moneyFromJson(a.design.costPerNm!) -
            moneyFromJson(b.design.costPerNm!),
        ) || a.index - b.index,
    )
    .map(({ design }) => design);
  return { ranked, incomplete, withoutTorque };
}

/** "incomplete — 1 line unpriced", "incomplete — 2 lines unpriced". */
export function unpricedText(unpricedLines: number): string {
  return `incomplete — ${countText(unpricedLines, "line")} unpriced`;
}
