/** Builders for price lines in the pricing tests: a valid line with only what a test changes. */
import { parseQuantity } from "~/lib/decimal-amounts";
import { parseMoney } from "./money";
import type { AdderPriceLine, UnitPriceLine } from "./price-line";

let nextLine = 1;

type Overrides<Line> = Partial<Omit<Line, "pricing">>;

/** A per-piece magnet price, 1 piece minimum, valid from 2026-01-01, EUR. */
export function unitPriceLine(
  unitPrice: string,
  overrides: Overrides<UnitPriceLine> = {},
): UnitPriceLine {
  return {
    pricing: "unit-price",
    itemId: "magnet-n42sh-disc",
    supplier: "Nordmag",
    supplierSku: "N42SH-D10x3",
    currency: "EUR",
    unitPrice: parseMoney(unitPrice),
    minQuantity: parseQuantity("1"),
    validFrom: "2026-01-01",
    sourceLine: { importId: "import-1", line: nextLine++ },
    ...overrides,
  };
}

/** A copper wire adder per kg, any quantity, valid from 2026-01-01, EUR. */
export function adderLine(
  adderPerKg: string,
  overrides: Overrides<AdderPriceLine> = {},
): AdderPriceLine {
  return {
    pricing: "metal-base-adder",
    itemId: "wire-cu-0.80-grade2",
    supplier: "Aster Wire",
    supplierSku: "CU080-G2",
    currency: "EUR",
    adderPerKg: parseMoney(adderPerKg),
    conductor: "copper",
    minQuantity: 0n,
    validFrom: "2026-01-01",
    sourceLine: { importId: "import-2", line: nextLine++ },
    ...overrides,
  };
}

/** Pieces as thousandths, the stock ledger's quantity scale. */
export function pieces(count: number): bigint {
  return BigInt(count) * 1000n;
}
