/**
 * The costing of a design revision for a number of motors: every line priced
 * from the best current supplier price for the quantity the build needs, or
 * from the moving average cost of stock (the builder chooses), plus the coil
 * figures, the first-order torque estimate and the design's checks.
 */
import { inArray } from "drizzle-orm";
import { db } from "~/db/client.server";
import { items } from "~/db/schema";
import { bestPrices } from "~/pricing/best-price";
import { formatMoneyText, type MoneyAmount } from "~/pricing/money";
import {
  metalBasesWithWhatIf,
  scaleEndTurns,
  type CostingWhatIf,
} from "~/insight/what-if";
import {
  loadPricingOfItems,
  type ItemPricing,
} from "~/purchasing/item-prices.server";
import { companyCurrency } from "~/purchasing/suppliers.server";
import { countText, quantityText } from "~/lib/unit-text";
import { parseUnitCost, quantityToNumber } from "~/lib/decimal-amounts";
import { coilLineFigures } from "./coil-line-figures";
import { coilSlotFill, designWarnings } from "./design-checks";
import {
  costDesign,
  designCostingJson,
  perMotorQuantities,
  requiredStockQuantity,
  type ItemUnitPrice,
} from "./design-costing";
import type { RevisionRow, StoredDesignLine } from "./design-revisions.server";
import { isEngineeringInputError } from "~/engineering/errors";
import { electricalFrequencyHz } from "~/engineering/motor-constants";
import {
  estimateTorque,
  TORQUE_ESTIMATE_LABEL,
  type DesignWinding,
} from "./torque-estimate";
import { designWindingFigures } from "./winding-figures";
import type { CostingBasis } from "./design-queries";

/** A stock quantity (thousandths) as it reads in a price source: "2 pieces", "0.031 kg". */
function stockQuantityText(quantity: bigint, unit: string): string {
  const value = quantityToNumber(quantity);
  return quantityText(value, unit, Number.isInteger(value) ? 0 : 3).replace(
    /\u00a0/g,
    " ",
  );
}

const optionalNumber = (value: string | null) =>
  value === null ? null : Number(value);

/** Stock needed per item for `motors` motors, thousandths of the item's unit. */
function quantitiesPerItem(
  lines: readonly StoredDesignLine[],
  motors: number,
): Map<number, { sku: string; quantity: bigint }> {
  const perMotor = perMotorQuantities(lines);
  const needed = new Map<number, { sku: string; quantity: bigint }>();
  for (const line of perMotor) {
    const entry = needed.get(line.itemId) ?? { sku: line.sku, quantity: 0n };
    entry.quantity += requiredStockQuantity(line.perMotorQuantity, motors);
    needed.set(line.itemId, entry);
  }
  return needed;
}

/**
 * The cheapest landed price of an item for the quantity a build needs. Below
 * every supplier's smallest break the item is priced at the smallest minimum
 * order (the buyer would have to buy that much), and the source says so.
 */
function bestPriceFor(
  pricing: ItemPricing,
  quantity: bigint,
  motors: number,
  date: string,
): ItemUnitPrice | null {
  const cheapestAt = (amount: bigint) =>
    bestPrices({
      itemId: String(pricing.itemId),
      quantity: amount,
      lines: pricing.lines,
      bases: pricing.bases,
      rates: pricing.rates,
      companyCurrency: pricing.companyCurrency,
      date,
    }).candidates[0];
  let best = cheapestAt(quantity);
  let note = "";
  if (!best && pricing.lines.length > 0) {
    const smallestBreak = pricing.lines
      .map((line) => line.minQuantity)
      .reduce((a, b) => (b < a ? b : a));
    if (smallestBreak > quantity) {
      best = cheapestAt(smallestBreak);
      note = `, priced at the minimum order of ${stockQuantityText(smallestBreak, pricing.unit)}`;
    }
  }
  if (!best) return null;
  const adder =
    best.adderPerKg === null
      ? ""
      : ` (adder ${formatMoneyText(best.adderPerKg)} + ${best.metalBase?.conductor ?? "metal"} base ${formatMoneyText(best.metalBase?.pricePerKg ?? 0n)} ${best.currency}/kg)`;
  return {
    unitPrice: best.landedUnitPrice,
    source: `best price for ${stockQuantityText(quantity, pricing.unit)} (${countText(motors, "motor")}${note}): ${best.supplier} ${best.supplierSku}${adder}, import ${best.sourceLine.importId} line ${best.sourceLine.line}`,
  };
}

/**
 * The best price of every needed item, all items' price lines read at once; with a
 * what-if metal base standing in for the stored bases in the company currency. Without
 * a `loadPricing` of the caller's, the items' lines and the pricing reference are read
 * here, and the company currency comes with them.
 */
async function bestPricesFor(
  needed: Map<number, { sku: string; quantity: bigint }>,
  motors: number,
  date: string,
  options: {
    loadPricing?: (
      skus: readonly string[],
    ) => Promise<Map<string, ItemPricing>>;
    currency?: string;
    metalBasePerKg: CostingWhatIf["metalBasePerKg"];
  },
): Promise<{ prices: Map<number, ItemUnitPrice>; currency: string }> {
  const [pricings, currency] = options.loadPricing
    ? await Promise.all([
        options.loadPricing([...needed.values()].map((entry) => entry.sku)),
        options.currency ?? companyCurrency(),
      ])
    : await loadPricingOfItems([...needed.keys()]).then(
        ({ pricings, reference }) =>
          [pricings, options.currency ?? reference.companyCurrency] as const,
      );
  const prices = new Map<number, ItemUnitPrice>();
  for (const [itemId, { sku, quantity }] of needed) {
    const stored = pricings.get(sku);
    const pricing =
      stored && options.metalBasePerKg
        ? {
            ...stored,
            bases: metalBasesWithWhatIf(
              stored.bases,
              options.metalBasePerKg,
              stored.companyCurrency,
            ),
          }
        : stored;
    const price = pricing
      ? bestPriceFor(pricing, quantity, motors, date)
      : null;
    if (price) prices.set(itemId, price);
  }
  return { prices, currency };
}

async function stockAveragePrices(
  itemIds: number[],
): Promise<Map<number, ItemUnitPrice>> {
  const rows =
    itemIds.length === 0
      ? []
      : await db
          .select({ id: items.id, averageCost: items.averageCost })
          .from(items)
          .where(inArray(items.id, itemIds));
  const prices = new Map<number, ItemUnitPrice>();
  for (const row of rows) {
    const unitPrice: MoneyAmount = parseUnitCost(row.averageCost);
    if (unitPrice > 0n)
      prices.set(row.id, {
        unitPrice,
        source: "moving average cost of stock",
      });
  }
  return prices;
}

/**
 * The first-order torque estimate, or what is missing (no figures given) or why the
 * revision's winding refuses it (as a message: the page shows it, never an error page).
 */
function firstOrderTorque(
  estimate: (() => ReturnType<typeof estimateTorque>) | null,
): ReturnType<typeof estimateTorque> | { label: string; missing: string } {
  if (!estimate)
    return {
      label: TORQUE_ESTIMATE_LABEL,
      missing:
        "Give the air-gap radius and flux density (and at least one coil line) for a first-order torque estimate.",
    };
  try {
    return estimate();
  } catch (error) {
    if (!isEngineeringInputError(error)) throw error;
    return { label: TORQUE_ESTIMATE_LABEL, missing: error.message };
  }
}

/**
 * The whole costing of a revision as the API and the design page show it.
 *
 * `whatIf` (optional, nothing saved) stands in for the metal base in the company currency
 * and scales the end-turn length of every coil line (see `~/insight/what-if`); without it
 * the costing is the stored design at stored prices. `loadPricing` and `currency` let a
 * caller costing many revisions or days read each item's prices and the company currency
 * once (by default they are read here: the needed items' price lines and the pricing
 * reference, which carries the company currency).
 */
export async function costRevision(input: {
  revision: RevisionRow;
  lines: StoredDesignLine[];
  quantity: number;
  basis: CostingBasis;
  date: string;
  whatIf?: CostingWhatIf;
  loadPricing?: (skus: readonly string[]) => Promise<Map<string, ItemPricing>>;
  /** The company currency when the caller has read it already (costing many revisions). */
  currency?: string;
}) {
  const { revision, whatIf } = input;
  const lines =
    whatIf?.endTurnScale === undefined
      ? input.lines
      : scaleEndTurns(input.lines, whatIf.endTurnScale);
  const needed = quantitiesPerItem(lines, input.quantity);
  const { prices, currency } =
    input.basis === "stock-average"
      ? await Promise.all([
          stockAveragePrices([...needed.keys()]),
          input.currency ?? companyCurrency(),
        ]).then(([prices, currency]) => ({ prices, currency }))
      : await bestPricesFor(needed, input.quantity, input.date, {
          loadPricing: input.loadPricing,
          currency: input.currency,
          metalBasePerKg: whatIf?.metalBasePerKg,
        });
  const ratedTorqueNm = optionalNumber(revision.ratedTorqueNm);
  // The rated current is the RMS phase current; each of a parallel paths carries 1/a of it.
  const ratedCurrentA = Number(revision.ratedCurrentA);
  const coilCurrentA = ratedCurrentA / revision.parallelPaths;
  const ratedSpeedRpm = optionalNumber(revision.ratedSpeedRpm);
  // The coils' current alternates at the electrical frequency p · n / 60 at rated speed.
  const frequencyHz =
    ratedSpeedRpm === null
      ? null
      : electricalFrequencyHz(revision.poles, ratedSpeedRpm);
  const winding: DesignWinding = {
    slots: revision.slots,
    poles: revision.poles,
    layers: revision.windingLayers,
    phases: revision.phases,
    connection: revision.phaseConnection,
    parallelPaths: revision.parallelPaths,
  };
  const coils = lines.flatMap((line, index) =>
    line.kind === "coil"
      ? [
          {
            index,
            sku: line.wire.sku,
            figures: coilLineFigures(line, coilCurrentA, frequencyHz),
            fill: coilSlotFill(line),
          },
        ]
      : [],
  );
  const copperLossW = coils.reduce(
    (sum, coil) => sum + (coil.figures.copperLossW ?? 0),
    0,
  );
  const airGapRadiusMm = optionalNumber(revision.airGapRadiusMm);
  const fluxDensityT = optionalNumber(revision.airGapFluxDensityT);
  const torqueEstimate = firstOrderTorque(
    airGapRadiusMm !== null && fluxDensityT !== null && coils.length > 0
      ? () =>
          estimateTorque({
            lines,
            winding,
            fluxDensity: { source: "typed", fluxDensityT },
            ratedCurrentA,
            airGapRadiusMm,
            poleCoverage: optionalNumber(revision.poleCoverage),
          })
      : null,
  );
  const estimatedTorque = "torqueNm" in torqueEstimate ? torqueEstimate : null;
  // Without a rated torque, "per N·m" is over the first-order estimate (labelled so).
  const costing = costDesign({
    lines,
    quantity: input.quantity,
    currency,
    prices,
    ratedTorqueNm,
    estimatedTorqueNm: estimatedTorque?.torqueNm ?? null,
  });
  const perNmTorqueNm = costing.perNmTorque?.torqueNm ?? null;

  return {
    ...designCostingJson(costing),
    basis: input.basis,
    torqueBasis: revision.torqueBasis,
    copperLossW,
    copperLossPerNm:
      perNmTorqueNm === null ? null : copperLossW / perNmTorqueNm,
    torqueEstimate,
    winding: designWindingFigures({
      winding,
      lines,
      ratedCurrentA,
      ratedSpeedRpm,
      airGapRadiusMm,
      airGapFluxDensityT: fluxDensityT,
      poleCoverage: optionalNumber(revision.poleCoverage),
    }),
    coils: coils.map(({ index, sku, figures, fill }) => ({
      line: index + 1,
      sku,
      copperLengthM: figures.copperLengthM,
      drawnMassKg: figures.drawnMassKg,
      massBasis: figures.massBasis,
      resistance20PerCoilOhm: figures.resistance20PerCoilOhm,
      resistancePerCoilOhm: figures.resistancePerCoilOhm,
      operatingTemperatureC: figures.operatingTemperatureC,
      activeShare: figures.activeShare,
      copperLossW: figures.copperLossW,
      forceLengthM: figures.forceLengthM,
      currentDensityAPerMm2: figures.currentDensityAPerMm2,
      skinDepthMm: figures.skinDepthMm,
      acResistanceRatio: figures.acResistanceRatio,
      // Slot fill (null without a slot area): bare copper, and over the enamel with the liner
      // taken off; the limits in `warnings` are judged on the gross fill.
      copperFill: fill?.copperFill ?? null,
      grossFill: fill?.grossFill ?? null,
    })),
    warnings: designWarnings({
      lines,
      insulationClassC: revision.insulationClassC,
      ratedCurrentA: coilCurrentA,
    }).map(({ code, lineIndex, sku, message }) => ({
      code,
      line: lineIndex + 1,
      sku,
      message,
    })),
    itemsNeeded: [...needed.values()].map(({ sku, quantity }) => ({
      sku,
      quantity: quantityToNumber(quantity),
    })),
  };
}

export type RevisionCosting = Awaited<ReturnType<typeof costRevision>>;
