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
import { formatNumber } from "~/lib/format";
import {
  findIecDiameter,
  type InsulationKey,
  type ThermalClass,
  type WireStandard,
} from "~/engineering/reference-data";
import type { ItemKind, StockUnit } from "~/db/tables/stock-enums";
import { maxNumberTextLength, plainDecimalText } from "~/lib/number-text";
import { perUnitWord } from "~/lib/unit-text";
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
import {
  priceListFieldLabel,
  type FieldColumns,
  type PriceListField,
} from "./column-mapping";
import {
  ambiguousCurrencySigns,
  findCurrencyCode,
  type CurrencyCode,
} from "./currencies";
import { LineErrorList } from "./line-errors";
import { lineError, type CsvDataRow, type LineError } from "./parse-price-list";

/** Matches the supplier SKU columns of the purchasing tables (supplier_items, price_lines: varchar 60). */
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
  /** Whole days from order to delivery for this line; null: the supplier's own. */
  leadTimeDays: number | null;
  /** The pack or spool size the item is sold in, 3 places in the item's unit ("5.000"); null: any quantity. */
  packQuantity: string | null;
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
  /** The file's header row: messages name the column a value came from by its header. */
  headers: readonly string[];
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
 * One row's cells by field, and the words messages use to point at them: each
 * message names the value and the column it is in, by the file's own header.
 */
class RowCells {
  constructor(
    private readonly data: CsvDataRow,
    private readonly context: PriceListRowContext,
  ) {}

  cell(field: PriceListField): string {
    const index = this.context.columns[field];
    return index === undefined ? "" : (this.data.cells[index] ?? "").trim();
  }

  /** `column "Adder"`. */
  column(field: PriceListField): string {
    return columnText(this.context, field);
  }

  /** `"2.4O" (column "Adder")`; `(column "Adder")` for an empty cell. */
  ref(field: PriceListField): string {
    const value = this.cell(field);
    const column = this.column(field);
    return value === "" ? `(${column})` : `${quote(value)} (${column})`;
  }

  /** `the size (column "Gauge") is empty`, or `no column is mapped to Wire size`. */
  missing(field: PriceListField, label: string): string {
    return this.context.columns[field] === undefined
      ? `no column is mapped to ${priceListFieldLabel(field)}`
      : `${label} (${columnText(this.context, field)}) is empty`;
  }
}

/** `column "Adder EUR/kg"`: the file's header of a mapped field. */
function columnText(context: PriceListRowContext, field: PriceListField) {
  const index = context.columns[field];
  const header = index === undefined ? undefined : context.headers[index];
  return header === undefined
    ? `no column is mapped to ${priceListFieldLabel(field)}`
    : `column ${quote(header)}`;
}

/**
 * Reads one data row. All problems of the row are reported together in one
 * message, the numbers first, each naming the value and its column: "Line 14:
 * the price "-3" (column "Net price") is negative; the currency "EUX" (column
 * "Cur") is …".
 */
export function readPriceListRow(
  data: CsvDataRow,
  context: PriceListRowContext,
): PriceListRowReading {
  assertImportDay(context.importDay);
  const cells = new RowCells(data, context);
  const cell = (field: PriceListField) => cells.cell(field);
  const problems: string[] = [];

  const amounts = readPrices(cells, context, problems);
  const quantity = readMinQuantity(cells, context, problems);

  const supplierSku = cell("supplierSku");
  if (supplierSku === "")
    problems.push(cells.missing("supplierSku", "the supplier SKU"));
  else if (supplierSku.length > maxSupplierSkuLength) {
    problems.push(
      `the supplier SKU ${cells.ref("supplierSku")} is longer than ${maxSupplierSkuLength} characters`,
    );
  }

  const itemSkuCell = cell("itemSku");
  if (itemSkuCell.length > maxItemSkuLength)
    problems.push(
      `our SKU ${cells.ref("itemSku")} is longer than ${maxItemSkuLength} characters`,
    );
  const itemSku = itemSkuCell === "" ? null : itemSkuCell;

  const description = cell("description");
  // Characters as a person counts them (code points); only counted when it could matter.
  const descriptionLength =
    description.length > maxDescriptionLength ? [...description].length : 0;
  if (descriptionLength > maxDescriptionLength) {
    problems.push(
      `the description (${cells.column("description")}) has ${descriptionLength} characters; the limit is ${maxDescriptionLength}`,
    );
  }

  const kind = readRowKind(cells, problems);
  const item = kind ? readItem(kind, cells, context, problems) : undefined;
  const prices = pricesForKind(amounts, kind, cells, problems);
  const minQuantity =
    quantity && wholePiecesFor(quantity, item?.unit, cells, problems);
  const currency = readCurrency(cells, context, problems);
  const validFrom = readValidFrom(cells, context, problems);
  const leadTimeDays = readLeadTimeDays(cells, problems);
  const packQuantity = readPackQuantity(cells, context, item?.unit, problems);

  if (
    problems.length > 0 ||
    !item ||
    !prices ||
    !currency ||
    !minQuantity ||
    !validFrom ||
    leadTimeDays === undefined ||
    packQuantity === undefined
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
      leadTimeDays,
      packQuantity,
      ...item,
    },
  };
}

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
  cells: RowCells,
  problems: string[],
): ItemKind | undefined {
  const kindCell = cells.cell("kind");
  if (kindCell !== "") {
    const kind = readKind(kindCell);
    if (!kind) {
      problems.push(
        `the kind ${cells.ref("kind")} is not wire, magnet or part`,
      );
    }
    return kind;
  }
  const hasStandard = cells.cell("standard") !== "";
  const hasSize = cells.cell("size") !== "";
  const hasGrade = cells.cell("grade") !== "";
  if (hasStandard && hasSize && hasGrade) {
    problems.push(
      `the row has a wire standard ${cells.ref("standard")} and size ${cells.ref("size")} and also a magnet grade ${cells.ref("grade")}; say in a kind column whether it is wire or a magnet`,
    );
    return undefined;
  }
  if (hasStandard) return "wire";
  if (hasGrade) return "magnet";
  return "part";
}

function readItem(
  kind: ItemKind,
  cells: RowCells,
  context: PriceListRowContext,
  problems: string[],
): ItemFields | undefined {
  const unitCell = cells.cell("unit");
  const unit = unitCell === "" ? undefined : readUnit(unitCell);
  if (unitCell !== "" && !unit) {
    problems.push(`the unit ${cells.ref("unit")} is not kg, pcs or m`);
    return undefined;
  }
  switch (kind) {
    case "wire": {
      if (unit && unit !== "kg") {
        problems.push(`wire is priced per kg, not per ${cells.ref("unit")}`);
      }
      const wire = readWire(cells, context, problems);
      return wire && (!unit || unit === "kg")
        ? { kind, unit: "kg", ...wire }
        : undefined;
    }
    case "magnet": {
      if (unit && unit !== "pcs") {
        problems.push(
          `magnets are priced per piece, not per ${cells.ref("unit")}`,
        );
      }
      const grade = readGrade(cells, context, problems);
      return grade && (!unit || unit === "pcs")
        ? { kind, unit: "pcs", ...grade }
        : undefined;
    }
    case "part":
      return { kind, unit: unit ?? "pcs" };
  }
}

function readWire(
  cells: RowCells,
  context: PriceListRowContext,
  problems: string[],
):
  | Pick<WirePriceRow, "standard" | "size" | "insulation" | "thermalClass">
  | undefined {
  const standardCell = cells.cell("standard");
  const sizeCell = cells.cell("size");
  const standard =
    standardCell === "" ? undefined : readWireStandard(standardCell);
  if (standardCell === "") {
    problems.push(
      `wire needs a standard (AWG or IEC): ${cells.missing("standard", "the standard")}`,
    );
  } else if (!standard) {
    problems.push(
      `the wire standard ${cells.ref("standard")} is not AWG or IEC`,
    );
  }
  if (sizeCell === "")
    problems.push(`wire needs a size: ${cells.missing("size", "the size")}`);

  let size: string | undefined;
  if (standard === "AWG" && sizeCell !== "") {
    size = readAwgSize(sizeCell);
    if (!size) {
      problems.push(
        `the AWG size ${cells.ref("size")} is not an AWG size from 4/0 to 46`,
      );
    }
  }
  if (standard === "IEC" && sizeCell !== "") {
    const diameterMm = readDiameterMm(sizeCell, context.decimalComma);
    const nominal =
      diameterMm === undefined ? undefined : findIecDiameter(diameterMm);
    size = nominal ? iecSizeLabel(nominal.diameterMm) : undefined;
    if (!size) {
      problems.push(
        `the IEC size ${cells.ref("size")} is not an IEC 60317 nominal diameter in mm (0.020 to 5.000, given to 0.001 mm, such as 0.500 or 0.350)`,
      );
    }
  }

  const insulationCell = cells.cell("insulation");
  let insulation: InsulationKey | null = null;
  if (insulationCell !== "") {
    const key = readInsulation(insulationCell);
    const ref = cells.ref("insulation");
    if (!key) {
      problems.push(
        `the insulation ${ref} is not one we know (grade 1, 2 or 3 for IEC wire; single, heavy or triple build for AWG wire)`,
      );
    } else if (standard && insulationStandard(key) !== standard) {
      problems.push(
        standard === "IEC"
          ? `the insulation ${ref} is an AWG film build; IEC wire takes grade 1, 2 or 3`
          : `the insulation ${ref} is an IEC grade; AWG wire takes single, heavy or triple build`,
      );
    } else {
      insulation = key;
    }
  }

  const thermalCell = cells.cell("thermalClass");
  const thermalClass =
    thermalCell === "" ? null : readThermalClass(thermalCell);
  if (thermalClass === undefined) {
    problems.push(
      `the thermal class ${cells.ref("thermalClass")} is not 130, 155, 180, 200 or 220`,
    );
  }

  if (!standard || !size || thermalClass === undefined) return undefined;
  if (insulationCell !== "" && insulation === null) return undefined;
  return { standard, size, insulation, thermalClass };
}

function readGrade(
  cells: RowCells,
  context: PriceListRowContext,
  problems: string[],
): { grade: string; gradeMatch: string } | undefined {
  const gradeCell = cells.cell("grade");
  if (gradeCell === "") {
    problems.push(
      `a magnet needs a grade (such as N42SH): ${cells.missing("grade", "the grade")}`,
    );
    return undefined;
  }
  const gradeMatch = gradeCell.toLowerCase().replace(/\s+/g, " ");
  if (!context.knownGrades.has(gradeMatch)) {
    problems.push(
      `the magnet grade ${cells.ref("grade")} is not a grade we know; check the spelling, or have an admin add the grade first`,
    );
    return undefined;
  }
  return { grade: gradeCell, gradeMatch };
}

type RowPrices = Pick<PriceListRowBase, "price" | "adderPerKg">;

/** The price or the adder per kg as numbers, before anything is known of the row's kind. */
function readPrices(
  cells: RowCells,
  context: PriceListRowContext,
  problems: string[],
): RowPrices | undefined {
  const priceMapped = context.columns.price !== undefined;
  const adderMapped = context.columns.adderPerKg !== undefined;
  const priceCell = cells.cell("price");
  const adderCell = cells.cell("adderPerKg");

  if (priceCell === "" && adderCell === "") {
    problems.push(
      priceMapped && adderMapped
        ? `the price ${cells.ref("price")} and the adder per kg ${cells.ref("adderPerKg")} are both empty`
        : priceMapped
          ? cells.missing("price", "the price")
          : cells.missing("adderPerKg", "the adder per kg"),
    );
    return undefined;
  }
  if (priceCell !== "" && adderCell !== "") {
    problems.push(
      `the row gives both a price ${cells.ref("price")} and an adder per kg ${cells.ref("adderPerKg")}; give one of them`,
    );
    return undefined;
  }
  if (priceCell !== "") {
    const price = readAmount(
      "price",
      "the price",
      moneyRules,
      cells,
      context,
      problems,
    );
    return price === undefined ? undefined : { price, adderPerKg: null };
  }
  const adderPerKg = readAmount(
    "adderPerKg",
    "the adder per kg",
    moneyRules,
    cells,
    context,
    problems,
  );
  return adderPerKg === undefined ? undefined : { price: null, adderPerKg };
}

/**
 * The prices when they suit the row's kind: an adder per kg is for wire only.
 * Wrong numbers were reported before this; an adder on a row that is not wire
 * is reported after them, whether its number was right or not.
 */
function pricesForKind(
  amounts: RowPrices | undefined,
  kind: ItemKind | undefined,
  cells: RowCells,
  problems: string[],
): RowPrices | undefined {
  const adderOnly =
    cells.cell("adderPerKg") !== "" && cells.cell("price") === "";
  if (!adderOnly || !kind || kind === "wire") return amounts;
  problems.push(
    `an adder per kg (${cells.column("adderPerKg")}) is for wire priced on the metal base, and this row is a ${kind}`,
  );
  return undefined;
}

function readCurrency(
  cells: RowCells,
  context: PriceListRowContext,
  problems: string[],
): CurrencyCode | undefined {
  const currencyCell = cells.cell("currency");
  if (currencyCell === "") {
    if (context.supplierCurrency) return context.supplierCurrency;
    problems.push(
      `${cells.missing("currency", "the currency")} and the supplier has no default currency`,
    );
    return undefined;
  }
  const code = findCurrencyCode(currencyCell);
  if (code) return code;
  const sign = currencyCell.trim().toLowerCase();
  const ambiguous = Object.hasOwn(ambiguousCurrencySigns, sign)
    ? ambiguousCurrencySigns[sign]
    : undefined;
  const ref = cells.ref("currency");
  problems.push(
    ambiguous
      ? `the currency ${ref} stands for several currencies (${ambiguous.standsFor}); write ${ambiguous.write}`
      : `the currency ${ref} is not a currency code we know (use a three-letter ISO 4217 code such as EUR or USD)`,
  );
  return undefined;
}

/** The minimum quantity as a number more than zero ("1.000" when the cell is empty). */
function readMinQuantity(
  cells: RowCells,
  context: PriceListRowContext,
  problems: string[],
): string | undefined {
  if (cells.cell("minQuantity") === "") return "1.000";
  return readPositiveQuantity(
    "minQuantity",
    "the minimum quantity",
    cells,
    context,
    problems,
  );
}

/** A quantity more than zero, 3 places; undefined with a problem naming the field otherwise. */
function readPositiveQuantity(
  field: "minQuantity" | "packQuantity",
  label: string,
  cells: RowCells,
  context: PriceListRowContext,
  problems: string[],
): string | undefined {
  const quantity = readAmount(
    field,
    label,
    quantityRules,
    cells,
    context,
    problems,
  );
  if (quantity === undefined) return undefined;
  if (/^0+\.0+$/.test(quantity)) {
    problems.push(`${label} ${cells.ref(field)} must be more than zero`);
    return undefined;
  }
  return quantity;
}

/** The quantity, when it is a whole number of pieces for an item counted in pieces. */
function wholePiecesFor(
  quantity: string,
  unit: StockUnit | undefined,
  cells: RowCells,
  problems: string[],
): string | undefined {
  if (unit !== "pcs" || quantity.endsWith(".000")) return quantity;
  problems.push(
    `the minimum quantity ${cells.ref("minQuantity")} is not a whole number of pieces`,
  );
  return undefined;
}

/** The longest lead time accepted, in days (ten years): more is a typing mistake. */
export const maxLeadTimeDays = 3650;

/** Whole days, 0 or more; null when the cell is empty or not mapped. */
function readLeadTimeDays(
  cells: RowCells,
  problems: string[],
): number | null | undefined {
  const cell = cells.cell("leadTimeDays");
  if (cell === "") return null;
  const named = `the lead time ${cells.ref("leadTimeDays")}`;
  const whole = /^\d+(?:\.0*)?$/.exec(cell);
  if (!whole) {
    problems.push(
      /^-\s*\d/.test(cell)
        ? `${named} is negative`
        : `${named} is not a whole number of days`,
    );
    return undefined;
  }
  const days = Number.parseInt(cell, 10);
  if (days > maxLeadTimeDays) {
    problems.push(
      `${named} is more than ${formatNumber(maxLeadTimeDays)} days; check it`,
    );
    return undefined;
  }
  return days;
}

/** A quantity more than zero (whole pieces for an item counted in pieces); null when empty or not mapped. */
function readPackQuantity(
  cells: RowCells,
  context: PriceListRowContext,
  unit: StockUnit | undefined,
  problems: string[],
): string | null | undefined {
  if (cells.cell("packQuantity") === "") return null;
  const quantity = readPositiveQuantity(
    "packQuantity",
    "the pack quantity",
    cells,
    context,
    problems,
  );
  if (quantity === undefined) return undefined;
  if (unit === "pcs" && !quantity.endsWith(".000")) {
    problems.push(
      `the pack quantity ${cells.ref("packQuantity")} is not a whole number of pieces`,
    );
    return undefined;
  }
  return quantity;
}

function readValidFrom(
  cells: RowCells,
  context: PriceListRowContext,
  problems: string[],
): string | undefined {
  const dateCell = cells.cell("validFrom");
  if (dateCell === "") return context.importDay;
  const reading = readDate(dateCell);
  if (reading.ok) return reading.isoDate;
  const ref = cells.ref("validFrom");
  problems.push(
    {
      "not-a-date": `the date ${ref} is not a date we can read; write it as YYYY-MM-DD, DD.MM.YYYY or DD/MM/YYYY`,
      "month-first": `the date ${ref} is written month first, which is not accepted because it is easily misread; write it as YYYY-MM-DD`,
      "no-such-day": `the date ${ref} does not exist`,
      "unlikely-year": `the date ${ref} has an unlikely year; check it`,
    }[reading.problem],
  );
  return undefined;
}

/** A non-negative decimal amount, or undefined with a problem naming the field, its value and column. */
function readAmount(
  field: PriceListField,
  label: string,
  rules: { decimals: number; maxWholeDigits: number },
  cells: RowCells,
  context: PriceListRowContext,
  problems: string[],
): string | undefined {
  const amountCell = cells.cell(field);
  const reading = readDecimal(
    amountCell,
    decimalRulesOf(rules, context.decimalComma),
  );
  if (reading.ok) return reading.text;
  const named = `${label} ${cells.ref(field)}`;
  const messages: Record<DecimalProblem, string> = {
    "not-a-number": `${named} is not a number`,
    "too-long": `${named} is longer than ${maxNumberTextLength} characters, more than any number can be`,
    "comma-not-allowed": `${named} has a comma; in a file separated by commas or tabs, write numbers with a decimal point and no thousands separator (1234.50)`,
    "ambiguous-point": `${named} could mean ${amountCell.replace(".", ",")} or ${amountCell.replace(".", "")}; in a file separated by semicolons, write it with a decimal comma and no thousands separator`,
    negative: `${named} is negative`,
    "too-many-decimals": `${named} has more than ${rules.decimals} decimals`,
    "too-large": `${named} is too large`,
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
  /** Lead time and pack quantity: "14|5.000", "|" when neither is given. */
  terms: string;
}

function fingerprintOf(row: PriceListRow): RowFingerprint {
  return {
    line: row.line,
    price: describePrice(row),
    item: describeItem(row),
    description: row.description,
    terms: `${row.leadTimeDays ?? ""}|${row.packQuantity ?? ""}`,
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
            `the supplier SKU ${quote(row.supplierSku)} (${columnText(this.context, "supplierSku")}; minimum quantity ${plainDecimalText(row.minQuantity)}, valid from ${row.validFrom}) is already on line ${earlier.line} with ${difference}.`,
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
          `the supplier SKU ${quote(row.supplierSku)} (${columnText(this.context, "supplierSku")}) is ${fingerprint.item} here but ${first.item} on line ${first.line}; one SKU must always be the same item.`,
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
  if (earlier.terms !== later.terms) {
    return "another lead time or pack quantity";
  }
  return null;
}

/** "12.5 EUR", or "adder 3.2 EUR per kg". */
function describePrice(row: PriceListRow): string {
  return row.price !== null
    ? `${plainDecimalText(row.price)} ${row.currency}`
    : `adder ${plainDecimalText(row.adderPerKg ?? "0")} ${row.currency} per kg`;
}

/** "wire AWG 20 heavy class 155", "magnet N42SH", "part per piece". */
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
      return `part per ${perUnitWord(row.unit)}`;
  }
}
