/**
 * Turns the data rows of a price list into typed price rows, or into one
 * `{ line, message }` error per row that lists everything wrong with it.
 *
 * Money and quantities stay decimal text ("12.5000", "25.000") so nothing is
 * rounded by floating point on the way to the DECIMAL columns. Text is kept as
 * written apart from trimming: storage is parameterised, so nothing is escaped
 * here.
 *
 * The {@link PriceListRowCollector} also looks across rows: an exact repeat of
 * a row is dropped silently (importing the same file twice changes nothing), a
 * repeat with another price is an error naming the earlier line, and one SKU
 * must always describe the same item.
 *
 * Pure: runs in Node and in the browser.
 */
import {
  findIecNominalDiameter,
  type InsulationKey,
  type ThermalClass,
  type WireStandard,
} from "~/engineering/reference-data";
import type { ItemKind, StockUnit } from "~/db/tables/stock-enums";
import { maxNumberTextLength, plainDecimalText } from "~/lib/number-text";
import { iecSizeLabel } from "~/reference/wire-size-labels";
import {
  insulationStandard,
  isIsoDate,
  moneyRules,
  quantityRules,
  readAwgSize,
  readDate,
  readDecimal,
  readDiameterMm,
  readInsulation,
  readKind,
  readThermalClass,
  readUnit,
  readWireStandard,
  type DecimalProblem,
  type DecimalRules,
} from "./cell-values";
import type { FieldColumns, PriceListField } from "./column-mapping";
import {
  currencySymbolHints,
  findCurrencyCode,
  type CurrencyCode,
} from "./currencies";
import { LineErrorList } from "./line-errors";
import { lineError, type CsvDataRow, type LineError } from "./parse-price-list";

/** Matches the supplier SKU column planned for the purchasing tables. */
export const maxSupplierSkuLength = 60;
export const maxDescriptionLength = 200;
/** Our item SKUs (items.sku). */
export const maxItemSkuLength = 40;

interface PriceListRowBase {
  /** The line the row starts on in the file. */
  line: number;
  supplierSku: string;
  /** Our catalogue SKU when the file names it (the "Our SKU" column), else null. */
  itemSku: string | null;
  /** The supplier's description, trimmed; "" when there is none. */
  description: string;
  /** Price per unit as decimal text with 4 places, or null when the row gives an adder. */
  price: string | null;
  /** Adder per kg on the metal base price (wire only), 4 places, or null. */
  adderPerKg: string | null;
  currency: CurrencyCode;
  /** The quantity the price starts at, decimal text with 3 places ("1.000"). */
  minQuantity: string;
  /** The day the price starts, YYYY-MM-DD. */
  validFrom: string;
}

export interface WirePriceRow extends PriceListRowBase {
  kind: "wire";
  unit: "kg";
  standard: WireStandard;
  /** The size as the reference tables label it: "20", "0000" (AWG) or "0.500" (IEC, mm). */
  size: string;
  insulation: InsulationKey | null;
  thermalClass: ThermalClass | null;
}

export interface MagnetPriceRow extends PriceListRowBase {
  kind: "magnet";
  unit: "pcs";
  /** The grade as the file writes it, trimmed: "N42SH". */
  grade: string;
  /** The lower-case name or alias it matched in the known grades: "n42sh". */
  gradeMatch: string;
}

export interface PartPriceRow extends PriceListRowBase {
  kind: "part";
  unit: StockUnit;
}

export type PriceListRow = WirePriceRow | MagnetPriceRow | PartPriceRow;

export interface PriceListRowContext {
  /** Where each mapped field is in a row, from `checkColumnMapping`. */
  columns: FieldColumns;
  /** Numbers may use a decimal comma (semicolon-separated files). */
  decimalComma: boolean;
  /** The day of the import, YYYY-MM-DD: the start of prices without a date. */
  importDay: string;
  /** Magnet grade names and aliases in lower case, as the reference tables hold them. */
  knownGrades: ReadonlySet<string>;
  /** Used for rows whose currency cell is empty or not mapped. */
  supplierCurrency?: CurrencyCode | null;
}

export type PriceListRowReading =
  { ok: true; row: PriceListRow } | { ok: false; error: LineError };

/**
 * Reads one data row. All problems of the row are reported together in one
 * message: "Line 14: the price "-3" is negative; the currency "EUX" is …".
 */
export function readPriceListRow(
  data: CsvDataRow,
  context: PriceListRowContext,
): PriceListRowReading {
  assertImportDay(context.importDay);
  const cell = (field: PriceListField): string => {
    const index = context.columns[field];
    return index === undefined ? "" : (data.cells[index] ?? "").trim();
  };
  const problems: string[] = [];

  const supplierSku = cell("supplierSku");
  if (supplierSku === "") problems.push("the supplier SKU is empty");
  else if (supplierSku.length > maxSupplierSkuLength) {
    problems.push(
      `the supplier SKU ${quote(supplierSku)} is longer than ${maxSupplierSkuLength} characters`,
    );
  }

  const itemSkuCell = cell("itemSku");
  if (itemSkuCell.length > maxItemSkuLength)
    problems.push(
      `our SKU ${quote(itemSkuCell)} is longer than ${maxItemSkuLength} characters`,
    );
  const itemSku = itemSkuCell === "" ? null : itemSkuCell;

  const description = cell("description");
  // Characters as a person counts them (code points); only counted when it could matter.
  const descriptionLength =
    description.length > maxDescriptionLength ? [...description].length : 0;
  if (descriptionLength > maxDescriptionLength) {
    problems.push(
      `the description has ${descriptionLength} characters; the limit is ${maxDescriptionLength}`,
    );
  }

  const kind = readRowKind(cell, problems);
  const item = kind ? readItem(kind, cell, context, problems) : undefined;
  const prices = readPrices(cell, kind, context, problems);
  const currency = readCurrency(cell("currency"), context, problems);
  const minQuantity = readMinQuantity(
    cell("minQuantity"),
    item?.unit,
    context,
    problems,
  );
  const validFrom = readValidFrom(cell("validFrom"), context, problems);

  if (
    problems.length > 0 ||
    !item ||
    !prices ||
    !currency ||
    !minQuantity ||
    !validFrom
  ) {
    return {
      ok: false,
      error: lineError(data.line, `${problems.join("; ")}.`),
    };
  }
  return {
    ok: true,
    row: {
      line: data.line,
      supplierSku,
      itemSku,
      description,
      ...prices,
      currency,
      minQuantity,
      validFrom,
      ...item,
    },
  };
}

type CellReader = (field: PriceListField) => string;
type ItemFields =
  | Pick<
      WirePriceRow,
      "kind" | "unit" | "standard" | "size" | "insulation" | "thermalClass"
    >
  | Pick<MagnetPriceRow, "kind" | "unit" | "grade" | "gradeMatch">
  | Pick<PartPriceRow, "kind" | "unit">;

/**
 * The kind from the kind column, or inferred: a wire standard and size make
 * wire, a magnet grade makes a magnet, anything else is a part. A wire
 * standard without a size still counts as wire, so the missing size is
 * reported instead of the row quietly becoming a part.
 */
function readRowKind(
  cell: CellReader,
  problems: string[],
): ItemKind | undefined {
  const kindCell = cell("kind");
  if (kindCell !== "") {
    const kind = readKind(kindCell);
    if (!kind) {
      problems.push(`the kind ${quote(kindCell)} is not wire, magnet or part`);
    }
    return kind;
  }
  const hasStandard = cell("standard") !== "";
  const hasSize = cell("size") !== "";
  const hasGrade = cell("grade") !== "";
  if (hasStandard && hasSize && hasGrade) {
    problems.push(
      "the row has a wire standard and size and also a magnet grade; say in the kind column whether it is wire or a magnet",
    );
    return undefined;
  }
  if (hasStandard) return "wire";
  if (hasGrade) return "magnet";
  return "part";
}

function readItem(
  kind: ItemKind,
  cell: CellReader,
  context: PriceListRowContext,
  problems: string[],
): ItemFields | undefined {
  const unitCell = cell("unit");
  const unit = unitCell === "" ? undefined : readUnit(unitCell);
  if (unitCell !== "" && !unit) {
    problems.push(`the unit ${quote(unitCell)} is not kg, pcs or m`);
    return undefined;
  }
  switch (kind) {
    case "wire": {
      if (unit && unit !== "kg") {
        problems.push(`wire is priced per kg, not per ${quote(unitCell)}`);
      }
      const wire = readWire(cell, context, problems);
      return wire && (!unit || unit === "kg")
        ? { kind, unit: "kg", ...wire }
        : undefined;
    }
    case "magnet": {
      if (unit && unit !== "pcs") {
        problems.push(
          `magnets are priced per piece, not per ${quote(unitCell)}`,
        );
      }
      const grade = readGrade(cell("grade"), context, problems);
      return grade && (!unit || unit === "pcs")
        ? { kind, unit: "pcs", ...grade }
        : undefined;
    }
    case "part":
      return { kind, unit: unit ?? "pcs" };
  }
}

function readWire(
  cell: CellReader,
  context: PriceListRowContext,
  problems: string[],
):
  | Pick<WirePriceRow, "standard" | "size" | "insulation" | "thermalClass">
  | undefined {
  const standardCell = cell("standard");
  const sizeCell = cell("size");
  const standard =
    standardCell === "" ? undefined : readWireStandard(standardCell);
  if (standardCell === "") {
    problems.push("wire needs a standard (AWG or IEC)");
  } else if (!standard) {
    problems.push(`the wire standard ${quote(standardCell)} is not AWG or IEC`);
  }
  if (sizeCell === "") problems.push("wire needs a size");

  let size: string | undefined;
  if (standard === "AWG" && sizeCell !== "") {
    size = readAwgSize(sizeCell);
    if (!size) {
      problems.push(
        `the AWG size ${quote(sizeCell)} is not an AWG size from 4/0 to 46`,
      );
    }
  }
  if (standard === "IEC" && sizeCell !== "") {
    const diameterMm = readDiameterMm(sizeCell, context.decimalComma);
    const nominal =
      diameterMm === undefined ? undefined : findIecNominalDiameter(diameterMm);
    size = nominal ? iecSizeLabel(nominal.diameterMm) : undefined;
    if (!size) {
      problems.push(
        `the IEC size ${quote(sizeCell)} is not an IEC 60317 nominal diameter in mm (0.020 to 5.000, such as 0.500)`,
      );
    }
  }

  const insulationCell = cell("insulation");
  let insulation: InsulationKey | null = null;
  if (insulationCell !== "") {
    const key = readInsulation(insulationCell);
    if (!key) {
      problems.push(
        `the insulation ${quote(insulationCell)} is not one we know (grade 1, 2 or 3 for IEC wire; single, heavy or triple build for AWG wire)`,
      );
    } else if (standard && insulationStandard(key) !== standard) {
      problems.push(
        standard === "IEC"
          ? `the insulation ${quote(insulationCell)} is an AWG film build; IEC wire takes grade 1, 2 or 3`
          : `the insulation ${quote(insulationCell)} is an IEC grade; AWG wire takes single, heavy or triple build`,
      );
    } else {
      insulation = key;
    }
  }

  const thermalCell = cell("thermalClass");
  const thermalClass =
    thermalCell === "" ? null : readThermalClass(thermalCell);
  if (thermalClass === undefined) {
    problems.push(
      `the thermal class ${quote(thermalCell)} is not 130, 155, 180, 200 or 220`,
    );
  }

  if (!standard || !size || thermalClass === undefined) return undefined;
  if (insulationCell !== "" && insulation === null) return undefined;
  return { standard, size, insulation, thermalClass };
}

function readGrade(
  gradeCell: string,
  context: PriceListRowContext,
  problems: string[],
): { grade: string; gradeMatch: string } | undefined {
  if (gradeCell === "") {
    problems.push("a magnet needs a grade (such as N42SH)");
    return undefined;
  }
  const gradeMatch = gradeCell.toLowerCase().replace(/\s+/g, " ");
  if (!context.knownGrades.has(gradeMatch)) {
    problems.push(
      `the magnet grade ${quote(gradeCell)} is not a grade we know; check the spelling, or have an admin add the grade first`,
    );
    return undefined;
  }
  return { grade: gradeCell, gradeMatch };
}

function readPrices(
  cell: CellReader,
  kind: ItemKind | undefined,
  context: PriceListRowContext,
  problems: string[],
): Pick<PriceListRowBase, "price" | "adderPerKg"> | undefined {
  const priceMapped = context.columns.price !== undefined;
  const adderMapped = context.columns.adderPerKg !== undefined;
  const priceCell = cell("price");
  const adderCell = cell("adderPerKg");

  if (priceCell === "" && adderCell === "") {
    problems.push(
      priceMapped && adderMapped
        ? "the price and the adder per kg are both empty"
        : priceMapped
          ? "the price is empty"
          : "the adder per kg is empty",
    );
    return undefined;
  }
  if (priceCell !== "" && adderCell !== "") {
    problems.push(
      "the row gives both a price and an adder per kg; give one of them",
    );
    return undefined;
  }
  if (priceCell !== "") {
    const price = readAmount("price", priceCell, moneyRules, context, problems);
    return price === undefined ? undefined : { price, adderPerKg: null };
  }
  if (kind && kind !== "wire") {
    problems.push(
      `an adder per kg is for wire priced on the metal base, and this row is a ${kind}`,
    );
    return undefined;
  }
  const adderPerKg = readAmount(
    "adder per kg",
    adderCell,
    moneyRules,
    context,
    problems,
  );
  return adderPerKg === undefined ? undefined : { price: null, adderPerKg };
}

function readCurrency(
  currencyCell: string,
  context: PriceListRowContext,
  problems: string[],
): CurrencyCode | undefined {
  if (currencyCell === "") {
    if (context.supplierCurrency) return context.supplierCurrency;
    problems.push(
      "the currency is empty and the supplier has no default currency",
    );
    return undefined;
  }
  const code = findCurrencyCode(currencyCell);
  if (code) return code;
  const hinted = Object.hasOwn(currencySymbolHints, currencyCell)
    ? currencySymbolHints[currencyCell]
    : undefined;
  problems.push(
    hinted
      ? `the currency ${quote(currencyCell)} is a sign, not a code; write ${hinted}`
      : `the currency ${quote(currencyCell)} is not a currency code we know (use a three-letter ISO 4217 code such as EUR or USD)`,
  );
  return undefined;
}

function readMinQuantity(
  quantityCell: string,
  unit: StockUnit | undefined,
  context: PriceListRowContext,
  problems: string[],
): string | undefined {
  if (quantityCell === "") return "1.000";
  const quantity = readAmount(
    "minimum quantity",
    quantityCell,
    quantityRules,
    context,
    problems,
  );
  if (quantity === undefined) return undefined;
  if (/^0+\.0+$/.test(quantity)) {
    problems.push(
      `the minimum quantity ${quote(quantityCell)} must be more than zero`,
    );
    return undefined;
  }
  if (unit === "pcs" && !quantity.endsWith(".000")) {
    problems.push(
      `the minimum quantity ${quote(quantityCell)} is not a whole number of pieces`,
    );
    return undefined;
  }
  return quantity;
}

function readValidFrom(
  dateCell: string,
  context: PriceListRowContext,
  problems: string[],
): string | undefined {
  if (dateCell === "") return context.importDay;
  const reading = readDate(dateCell);
  if (reading.ok) return reading.isoDate;
  const quoted = quote(dateCell);
  problems.push(
    {
      "not-a-date": `the date ${quoted} is not a date we can read; write it as YYYY-MM-DD, DD.MM.YYYY or DD/MM/YYYY`,
      "month-first": `the date ${quoted} is written month first, which is not accepted because it is easily misread; write it as YYYY-MM-DD`,
      "no-such-day": `the date ${quoted} does not exist`,
      "unlikely-year": `the date ${quoted} has an unlikely year; check it`,
    }[reading.problem],
  );
  return undefined;
}

/** A non-negative decimal amount, or undefined with a problem naming the field. */
function readAmount(
  label: string,
  amountCell: string,
  rules: { decimals: number; maxWholeDigits: number },
  context: PriceListRowContext,
  problems: string[],
): string | undefined {
  const reading = readDecimal(
    amountCell,
    decimalRulesOf(rules, context.decimalComma),
  );
  if (reading.ok) return reading.text;
  const quoted = quote(amountCell);
  const messages: Record<DecimalProblem, string> = {
    "not-a-number": `the ${label} ${quoted} is not a number`,
    "too-long": `the ${label} ${quoted} is longer than ${maxNumberTextLength} characters, more than any number can be`,
    "comma-not-allowed": `the ${label} ${quoted} has a comma; in a file separated by commas or tabs, write numbers with a decimal point and no thousands separator (1234.50)`,
    "ambiguous-point": `the ${label} ${quoted} could mean ${amountCell.replace(".", ",")} or ${amountCell.replace(".", "")}; in a file separated by semicolons, write it with a decimal comma and no thousands separator`,
    negative: `the ${label} ${quoted} is negative`,
    "too-many-decimals": `the ${label} ${quoted} has more than ${rules.decimals} decimals`,
    "too-large": `the ${label} ${quoted} is too large`,
  };
  problems.push(messages[reading.problem]);
  return undefined;
}

/** The rules with the file's decimal separator, made once per rules and separator (read per row). */
const decimalRulesByRules = new WeakMap<
  object,
  { point: DecimalRules; comma: DecimalRules }
>();
function decimalRulesOf(
  rules: { decimals: number; maxWholeDigits: number },
  decimalComma: boolean,
): DecimalRules {
  let both = decimalRulesByRules.get(rules);
  if (!both) {
    both = {
      point: { ...rules, decimalComma: false },
      comma: { ...rules, decimalComma: true },
    };
    decimalRulesByRules.set(rules, both);
  }
  return decimalComma ? both.comma : both.point;
}

/** A cell in double quotes for a message, shortened when long. */
function quote(cellText: string): string {
  const shown =
    cellText.length > 40 ? `${cellText.slice(0, 39).trimEnd()}…` : cellText;
  return `"${shown}"`;
}

let lastCheckedImportDay = "";

/** Refuses a context whose import day is not a real YYYY-MM-DD day (checked once per day given). */
function assertImportDay(importDay: string): void {
  if (importDay === lastCheckedImportDay) return;
  lastCheckedImportDay = importDay;
  if (!isIsoDate(importDay)) {
    lastCheckedImportDay = "";
    throw new Error(
      `importDay must be a YYYY-MM-DD day, got ${JSON.stringify(importDay)}`,
    );
  }
}

// ---------------------------------------------------------------------------
// Across rows: repeats and one item per SKU
// ---------------------------------------------------------------------------

/**
 * Reads rows one by one (as the CSV reader hands them over) and keeps the
 * good ones and the errors. Rows are compared by supplier SKU (ignoring
 * letter case, as the database compares text), minimum quantity and start day.
 */
/** What a kept row is compared by; smaller than the row, so a 100,000-row file stays light. */
interface RowFingerprint {
  line: number;
  price: string;
  item: string;
  description: string;
}

function fingerprintOf(row: PriceListRow): RowFingerprint {
  return {
    line: row.line,
    price: describePrice(row),
    item: describeItem(row),
    description: row.description,
  };
}

export class PriceListRowCollector {
  /** Good rows not yet taken, in file order. */
  rows: PriceListRow[] = [];
  /** The rows with errors: the first ones listed, all counted. */
  private readonly lineErrors = new LineErrorList();
  /** Good rows seen so far, exact repeats counted once. */
  goodRowCount = 0;
  private readonly rowsByPriceKey = new Map<string, RowFingerprint>();
  private readonly firstRowBySku = new Map<string, RowFingerprint>();

  constructor(private readonly context: PriceListRowContext) {
    assertImportDay(context.importDay);
  }

  /** The first rows with errors, in file order. */
  get errors(): readonly LineError[] {
    return this.lineErrors.errors;
  }

  /** Every row with an error, listed or not. */
  get errorCount(): number {
    return this.lineErrors.errorCount;
  }

  /** The good rows collected since the last call; the collector forgets them (it still knows their keys). */
  takeRows(): PriceListRow[] {
    const taken = this.rows;
    this.rows = [];
    return taken;
  }

  add(data: CsvDataRow): void {
    const reading = readPriceListRow(data, this.context);
    if (!reading.ok) {
      this.lineErrors.add(reading.error);
      return;
    }
    const row = reading.row;
    const skuKey = row.supplierSku.toLowerCase();
    const priceKey = `${skuKey}\u0000${row.minQuantity}\u0000${row.validFrom}`;
    const fingerprint = fingerprintOf(row);

    const earlier = this.rowsByPriceKey.get(priceKey);
    if (earlier) {
      const difference = describeDifference(earlier, fingerprint);
      if (difference) {
        this.lineErrors.add(
          lineError(
            row.line,
            `the supplier SKU ${quote(row.supplierSku)} (minimum quantity ${plainDecimalText(row.minQuantity)}, valid from ${row.validFrom}) is already on line ${earlier.line} with ${difference}.`,
          ),
        );
      }
      return;
    }

    const first = this.firstRowBySku.get(skuKey);
    if (first && first.item !== fingerprint.item) {
      this.lineErrors.add(
        lineError(
          row.line,
          `the supplier SKU ${quote(row.supplierSku)} is ${fingerprint.item} here but ${first.item} on line ${first.line}; one SKU must always be the same item.`,
        ),
      );
      return;
    }

    this.rowsByPriceKey.set(priceKey, fingerprint);
    if (!first) this.firstRowBySku.set(skuKey, fingerprint);
    this.goodRowCount += 1;
    this.rows.push(row);
  }
}

/** What differs between two rows with the same SKU, quantity and day; null when they are the same. */
function describeDifference(
  earlier: RowFingerprint,
  later: RowFingerprint,
): string | null {
  if (earlier.price !== later.price) {
    return `another price (${earlier.price} there, ${later.price} here)`;
  }
  if (earlier.item !== later.item) {
    return `another item (${earlier.item} there, ${later.item} here)`;
  }
  if (earlier.description !== later.description) {
    return "another description";
  }
  return null;
}

/** "12.5 EUR", or "adder 3.2 EUR per kg". */
function describePrice(row: PriceListRow): string {
  return row.price !== null
    ? `${plainDecimalText(row.price)} ${row.currency}`
    : `adder ${plainDecimalText(row.adderPerKg ?? "0")} ${row.currency} per kg`;
}

/** "wire AWG 20 heavy class 155", "magnet N42SH", "part per pcs". */
function describeItem(row: PriceListRow): string {
  const kindText = describeItemKind(row);
  return row.itemSku ? `${kindText} (our SKU ${row.itemSku})` : kindText;
}

function describeItemKind(row: PriceListRow): string {
  switch (row.kind) {
    case "wire":
      return [
        "wire",
        row.standard,
        row.size,
        row.insulation,
        row.thermalClass === null ? null : `class ${row.thermalClass}`,
      ]
        .filter((part) => part !== null)
        .join(" ");
    case "magnet":
      return `magnet ${row.gradeMatch.toUpperCase()}`;
    case "part":
      return `part per ${row.unit}`;
  }
}
