/**
 * A design revision's bill of materials as a CSV file: one row per line, the
 * per-motor quantity and the quantity a build of N motors draws from stock,
 * the price and its source, and a coil line's geometry. Numbers are written as
 * plain numbers with the unit in its own column or header; text cells are
 * guarded against formula injection (`csvFile`). Pure: no I/O.
 */
import { csvFile } from "~/lib/csv-file";
import { parseExactDecimal } from "~/pricing/money";
import { nounFor } from "~/lib/unit-text";
import { quantityToNumber } from "~/lib/decimal-amounts";
import { requiredStockQuantity } from "./design-costing";

/** The geometry of a coil line, as the builder entered it. */
export interface BomCsvCoil {
  turns: number;
  strandsInHand: number;
  activeLengthMm: number;
  endTurnLengthMm: number;
  leadLengthMm: number;
  coilsPerMotor: number;
  scrapPercent: number;
  operatingTemperatureC: number;
  /** Conductor wound into the line's coils in one motor, m. */
  copperLengthM: number | null;
}

/** One line of the BOM (the costing's line with the item's name and the coil geometry). */
export interface BomCsvLine {
  kind: "coil" | "magnet" | "part";
  sku: string;
  name: string;
  /** Per motor in `unit`: wire kg drawn (scrap included), magnets pieces, parts as given. */
  perMotorQuantity: number;
  unit: string;
  /** Company currency per unit, to 0.0001; null when the item has no price. */
  unitPrice: number | null;
  /** Company currency per motor, to 0.0001; null when unpriced. */
  cost: number | null;
  priceSource: string | null;
  /** Wire lines: "enamelled" or "bare" (conductor only); null otherwise. */
  massBasis: "enamelled" | "bare" | null;
  coil: BomCsvCoil | null;
}

export interface BomCsvInput {
  /** Motors the build quantities are for, ≥ 1. */
  quantity: number;
  currency: string;
  lines: readonly BomCsvLine[];
}

/** Decimals a per-motor quantity carries at most (wire kg to a tenth of a milligram). */
const PER_MOTOR_DECIMALS = 7;

/**
 * Stock a build of `motors` motors draws for a line, in the item's unit, rounded UP to the
 * stock ledger's thousandth (a gram of wire) as a build order reserves it.
 */
export function buildQuantity(perMotorQuantity: number, motors: number) {
  return quantityToNumber(
    requiredStockQuantity(
      parseExactDecimal(perMotorQuantity.toFixed(PER_MOTOR_DECIMALS)),
      motors,
    ),
  );
}

type Cell = string | number;

function columns(
  quantity: number,
  currency: string,
): { header: string; cell: (line: BomCsvLine, index: number) => Cell }[] {
  const coil =
    (read: (coil: BomCsvCoil) => number | null) => (line: BomCsvLine) =>
      line.coil ? (read(line.coil) ?? "") : "";
  return [
    { header: "line", cell: (_line, index) => index + 1 },
    { header: "kind", cell: (line) => line.kind },
    { header: "sku", cell: (line) => line.sku },
    { header: "item", cell: (line) => line.name },
    { header: "quantity per motor", cell: (line) => line.perMotorQuantity },
    // The stock unit as stored (kg, pcs, m), not as words: a spreadsheet or a script
    // reads this column back, so it stays the code the API and the import take.
    { header: "unit", cell: (line) => line.unit },
    {
      header: `quantity for ${quantity} ${nounFor(quantity, "motor")}`,
      cell: (line) => buildQuantity(line.perMotorQuantity, quantity),
    },
    {
      header: "wire mass basis",
      cell: (line) =>
        line.massBasis === "bare"
          ? "bare conductor"
          : line.massBasis === "enamelled"
            ? "enamelled wire"
            : "",
    },
    {
      header: `unit price (${currency} per unit)`,
      cell: (line) => line.unitPrice ?? "",
    },
    {
      header: `cost per motor (${currency})`,
      cell: (line) => line.cost ?? "",
    },
    {
      header: "price source",
      cell: (line) => line.priceSource ?? "no price",
    },
    { header: "turns", cell: coil((c) => c.turns) },
    { header: "strands in hand", cell: coil((c) => c.strandsInHand) },
    { header: "active length (mm)", cell: coil((c) => c.activeLengthMm) },
    { header: "end-turn length (mm)", cell: coil((c) => c.endTurnLengthMm) },
    { header: "lead length (mm)", cell: coil((c) => c.leadLengthMm) },
    { header: "coils per motor", cell: coil((c) => c.coilsPerMotor) },
    { header: "scrap (%)", cell: coil((c) => c.scrapPercent) },
    {
      header: "operating temperature (°C)",
      cell: coil((c) => c.operatingTemperatureC),
    },
    {
      header: "copper length per motor (m)",
      cell: coil((c) =>
        c.copperLengthM === null
          ? null
          : Math.round(c.copperLengthM * 1000) / 1000,
      ),
    },
  ];
}

/** The header row for a build of `quantity` motors in `currency`. */
export function bomCsvHeaders(quantity: number, currency: string): string[] {
  return columns(quantity, currency).map((column) => column.header);
}

/**
 * The CSV text, with a byte-order mark so spreadsheet programs read it as UTF-8
 * (sizes carry × and °C) and CRLF line ends as RFC 4180 has them.
 */
export function bomCsv(input: BomCsvInput): string {
  const list = columns(input.quantity, input.currency);
  const rows = input.lines.map((line, index) =>
    list.map((column) => column.cell(line, index)),
  );
  return csvFile(
    list.map((column) => column.header),
    rows,
  );
}

/** "turnledger-bom-outrunner-12n14p-rev2.csv": the design's name in plain letters and digits. */
export function bomCsvFilename(designName: string, revision: number): string {
  const slug = designName
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "")
    .slice(0, 60)
    .replace(/-+$/g, "");
  return `turnledger-bom-${slug || "design"}-rev${revision}.csv`;
}
