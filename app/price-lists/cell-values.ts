/**
 * Reads single cells of a price list: decimal numbers, dates, and the words
 * suppliers use for kinds, units, wire standards, insulation and thermal
 * classes. Each reader returns the value or a short problem code; the row
 * reader turns codes into sentences that name the field and quote the cell.
 * A cell longer than any value it could hold is refused before it is matched,
 * and every pattern here reads in time proportional to the cell.
 *
 * Pure: runs in Node and in the browser.
 */
import {
  findAwgSize,
  THERMAL_CLASSES,
  type InsulationKey,
  type ThermalClass,
  type WireStandard,
} from "~/engineering/reference-data";
import type { ItemKind, StockUnit } from "~/db/tables/stock-enums";
import { isRealDay } from "~/lib/calendar-days";
import {
  isTooLongForNumber,
  maxNumberTextLength,
  withoutSuffix,
  withoutTrailingZeros,
} from "~/lib/number-text";

// ---------------------------------------------------------------------------
// Decimal numbers
// ---------------------------------------------------------------------------

export interface DecimalRules {
  /** Decimal places kept; more non-zero decimals are refused. */
  decimals: number;
  /** Digits allowed before the decimal separator. */
  maxWholeDigits: number;
  /** "12,5" is read as 12.5 (semicolon-separated files only). */
  decimalComma: boolean;
}

export type DecimalProblem =
  | "not-a-number"
  | "too-long"
  | "comma-not-allowed"
  | "ambiguous-point"
  | "negative"
  | "too-many-decimals"
  | "too-large";

export type DecimalReading =
  | {
      ok: true;
      /** The value as decimal text with exactly `decimals` places: "12.5000". */
      text: string;
      isZero: boolean;
    }
  | { ok: false; problem: DecimalProblem };

/** Money per unit: 4 decimals, like the DECIMAL(14,4) columns of the stock tables. */
export const moneyRules = { decimals: 4, maxWholeDigits: 10 } as const;
/** Quantities: 3 decimals, like the DECIMAL(14,3) columns of the stock tables. */
export const quantityRules = { decimals: 3, maxWholeDigits: 11 } as const;

/** "12", "12.5", "12,5". */
const plainDecimal = /^(\d+)(?:([.,])(\d+))?$/;
/** "1.234,50", "1.234.567": points between groups of thousands, as decimal-comma spreadsheets write them. */
const pointGroupedDecimal = /^(\d{1,3}(?:\.\d{3})+)(?:,(\d+))?$/;
/** "1,234.50", "1,234,567". */
const commaGroupedDecimal = /^\d{1,3}(?:,\d{3})+(?:\.\d+)?$/;

/**
 * Reads "12.5", "0.1250" and, with `decimalComma`, "12,5" and "1.234,50"
 * exactly, without floating point. Refused: a leading minus (reported as
 * negative), exponents, currency signs, commas in files without decimal
 * commas, and "1.234" in a decimal-comma file, where it could mean 1.234 or
 * 1234.
 */
/** A plain number with a decimal point or none ("12", "12.50", "0.5"): the common case, read with one test. */
const simpleDecimal = /^(?:[1-9]\d*|0)(?:\.\d+)?$/;

export function readDecimal(cell: string, rules: DecimalRules): DecimalReading {
  if (isTooLongForNumber(cell)) return { ok: false, problem: "too-long" };
  if (!rules.decimalComma && simpleDecimal.test(cell)) {
    const point = cell.indexOf(".");
    const whole = point === -1 ? cell : cell.slice(0, point);
    const fraction =
      point === -1 ? "" : withoutTrailingZeros(cell.slice(point + 1));
    if (fraction.length > rules.decimals)
      return { ok: false, problem: "too-many-decimals" };
    if (whole.length > rules.maxWholeDigits)
      return { ok: false, problem: "too-large" };
    return {
      ok: true,
      text:
        rules.decimals > 0
          ? `${whole}.${fraction.padEnd(rules.decimals, "0")}`
          : whole,
      isZero: whole === "0" && fraction === "",
    };
  }
  const negative = cell.startsWith("-");
  const parts = splitDecimal(
    negative ? cell.slice(1) : cell,
    rules.decimalComma,
  );
  if ("problem" in parts) return { ok: false, problem: parts.problem };
  const whole = parts.whole.replace(/^0+(?=\d)/, "");
  const fraction = withoutTrailingZeros(parts.fraction);
  const isZero = /^0*$/.test(whole) && fraction === "";
  if (negative && !isZero) return { ok: false, problem: "negative" };
  if (fraction.length > rules.decimals) {
    return { ok: false, problem: "too-many-decimals" };
  }
  if (whole.length > rules.maxWholeDigits) {
    return { ok: false, problem: "too-large" };
  }
  const places = fraction.padEnd(rules.decimals, "0");
  return {
    ok: true,
    text: rules.decimals > 0 ? `${whole}.${places}` : whole,
    isZero,
  };
}

function splitDecimal(
  text: string,
  decimalComma: boolean,
): { whole: string; fraction: string } | { problem: DecimalProblem } {
  const plain = plainDecimal.exec(text);
  if (plain) {
    const [, whole = "", separator, fraction = ""] = plain;
    if (separator === "," && !decimalComma) {
      return { problem: "comma-not-allowed" };
    }
    const pointMayGroupThousands =
      separator === "." && fraction.length === 3 && !/^0+$/.test(whole);
    if (decimalComma && pointMayGroupThousands && whole.length <= 3) {
      return { problem: "ambiguous-point" };
    }
    return { whole, fraction };
  }
  if (decimalComma) {
    const grouped = pointGroupedDecimal.exec(text);
    if (grouped) {
      return {
        whole: grouped[1]!.replaceAll(".", ""),
        fraction: grouped[2] ?? "",
      };
    }
  } else if (commaGroupedDecimal.test(text)) {
    return { problem: "comma-not-allowed" };
  }
  return { problem: "not-a-number" };
}

// ---------------------------------------------------------------------------
// Dates
// ---------------------------------------------------------------------------

export type DateReading =
  | { ok: true; isoDate: string }
  | {
      ok: false;
      problem: "not-a-date" | "month-first" | "no-such-day" | "unlikely-year";
    };

const isoDate = /^(\d{4})-(\d{2})-(\d{2})$/;
const dayFirstDate = /^(\d{1,2})([./])(\d{1,2})\2(\d{4})$/;

/** Years outside this range are taken for typing mistakes. */
const earliestYear = 1900;
const latestYear = 2999;

/**
 * Reads 2025-03-01, 01.03.2025 and 01/03/2025 (day first) as "2025-03-01".
 * Slashes are always read day first; a date that only makes sense month first
 * (03/25/2025) is refused rather than guessed.
 */
// Most price lists give every row the same day: the last reading is kept.
let lastDateCell: string | null = null;
let lastDateReading: DateReading | null = null;

export function readDate(cell: string): DateReading {
  if (cell === lastDateCell) return lastDateReading!;
  const reading = readDateAfresh(cell);
  lastDateCell = cell;
  lastDateReading = reading;
  return reading;
}

function readDateAfresh(cell: string): DateReading {
  // "2025-03-01" and "01.03.2025" are ten characters; nothing longer is a date.
  if (cell.length > 10) return { ok: false, problem: "not-a-date" };
  const iso = isoDate.exec(cell);
  if (iso) return checkedDate(+iso[1]!, +iso[2]!, +iso[3]!);
  const dayFirst = dayFirstDate.exec(cell);
  if (!dayFirst) return { ok: false, problem: "not-a-date" };
  const [, day, separator, month, year] = dayFirst;
  if (separator === "/" && +month! > 12 && +day! <= 12) {
    return { ok: false, problem: "month-first" };
  }
  return checkedDate(+year!, +month!, +day!);
}

function checkedDate(year: number, month: number, day: number): DateReading {
  if (year < earliestYear || year > latestYear) {
    return { ok: false, problem: "unlikely-year" };
  }
  if (!isRealDay(year, month, day))
    return { ok: false, problem: "no-such-day" };
  return {
    ok: true,
    isoDate: `${year}-${String(month).padStart(2, "0")}-${String(day).padStart(2, "0")}`,
  };
}

/** True for a YYYY-MM-DD text that is a real day. */
export function isIsoDate(text: string): boolean {
  return isoDate.test(text) && readDate(text).ok;
}

// ---------------------------------------------------------------------------
// Words
// ---------------------------------------------------------------------------

/** Words in a cell ("Enamelled copper wire", "class 155") are never longer than this. */
const maxWordCellLength = 100;

/** "Heavy build" → "heavybuild", "G-2" → "g2", "155 °C" → "155c"; "" for a cell longer than any word we know. */
function compact(cell: string): string {
  if (cell.length > maxWordCellLength) return "";
  return cell
    .normalize("NFD")
    .replace(/\p{M}/gu, "")
    .toLowerCase()
    .replace(/[^\p{L}\p{N}]+/gu, "");
}

/** What each cell text was last looked up as, per word table: most files repeat a few words. */
const lookUpsByWords = new WeakMap<object, Map<string, unknown>>();
const maxRememberedLookUps = 1_000;

function lookUp<Value>(
  words: Readonly<Record<string, Value>>,
  cell: string,
): Value | undefined {
  let remembered = lookUpsByWords.get(words);
  if (!remembered) {
    remembered = new Map();
    lookUpsByWords.set(words, remembered);
  }
  if (cell.length > maxWordCellLength) return undefined;
  if (remembered.has(cell)) return remembered.get(cell) as Value | undefined;
  const key = compact(cell);
  const value = Object.hasOwn(words, key) ? words[key] : undefined;
  if (remembered.size >= maxRememberedLookUps) remembered.clear();
  remembered.set(cell, value);
  return value;
}

const kindWords: Readonly<Record<string, ItemKind>> = {
  wire: "wire",
  magnetwire: "wire",
  windingwire: "wire",
  enamelledwire: "wire",
  enameledwire: "wire",
  copperwire: "wire",
  aluminiumwire: "wire",
  aluminumwire: "wire",
  magnet: "magnet",
  magnets: "magnet",
  permanentmagnet: "magnet",
  part: "part",
  parts: "part",
  other: "part",
  component: "part",
};

/** "wire", "Magnet wire", "magnets", "part", "other" … */
export function readKind(cell: string): ItemKind | undefined {
  return lookUp(kindWords, cell);
}

const unitWords: Readonly<Record<string, StockUnit>> = {
  kg: "kg",
  kgs: "kg",
  kilo: "kg",
  kilogram: "kg",
  kilograms: "kg",
  kilogramme: "kg",
  pcs: "pcs",
  pc: "pcs",
  piece: "pcs",
  pieces: "pcs",
  ea: "pcs",
  each: "pcs",
  stk: "pcs",
  st: "pcs",
  stuck: "pcs",
  m: "m",
  metre: "m",
  metres: "m",
  meter: "m",
  meters: "m",
};

/** "kg", "pcs", "pc", "each", "m", "metre" … */
export function readUnit(cell: string): StockUnit | undefined {
  return lookUp(unitWords, cell);
}

/** "AWG", "NEMA MW 1000" → AWG; "IEC", "IEC 60317", "metric" → IEC. */
export function readWireStandard(cell: string): WireStandard | undefined {
  const key = compact(cell);
  if (key === "awg" || key.startsWith("nema")) return "AWG";
  if (key.startsWith("iec") || key === "metric") return "IEC";
  return undefined;
}

const insulationWords: Readonly<Record<string, InsulationKey>> = {
  grade1: "grade1",
  grad1: "grade1",
  gr1: "grade1",
  g1: "grade1",
  grade2: "grade2",
  grad2: "grade2",
  gr2: "grade2",
  g2: "grade2",
  grade3: "grade3",
  grad3: "grade3",
  gr3: "grade3",
  g3: "grade3",
  single: "single",
  singlebuild: "single",
  sb: "single",
  heavy: "heavy",
  heavybuild: "heavy",
  hb: "heavy",
  double: "heavy",
  doublebuild: "heavy",
  triple: "triple",
  triplebuild: "triple",
  tb: "triple",
};

/** "grade 2", "Grade2", "G2", "gr. 2", "heavy build", "HB", "double" … */
export function readInsulation(cell: string): InsulationKey | undefined {
  return lookUp(insulationWords, cell);
}

/** The standard an insulation key belongs to: grades are IEC, builds are AWG. */
export function insulationStandard(key: InsulationKey): WireStandard {
  return key.startsWith("grade") ? "IEC" : "AWG";
}

/** "155", "155 °C", "class 155", "F", "Class F" → 155. */
export function readThermalClass(cell: string): ThermalClass | undefined {
  let key = compact(cell);
  if (key.startsWith("class")) key = key.slice("class".length);
  if (key.endsWith("c")) key = key.slice(0, -1);
  const row = THERMAL_CLASSES.find(
    (thermal) =>
      String(thermal.classC) === key || thermal.letter.toLowerCase() === key,
  );
  return row?.classC;
}

/**
 * An IEC size cell as a number of mm: "0.5", "0.500", "0,5" (with
 * `decimalComma`), "0.5 mm", "Ø 0.5". Undefined when it is not a number.
 */
export function readDiameterMm(
  cell: string,
  decimalComma: boolean,
): number | undefined {
  if (cell.length > maxNumberTextLength) return undefined;
  const bare = withoutSuffix(cell.replace(/^[Ø⌀ø]\s*/, ""), "mm").trim();
  // Diameters never group thousands, so a point is always a decimal point.
  const reading = readDecimal(decimalComma ? bare.replace(",", ".") : bare, {
    decimals: 6,
    maxWholeDigits: 3,
    decimalComma: false,
  });
  return reading.ok ? Number(reading.text) : undefined;
}

/**
 * An AWG size cell as the reference tables label it: "20", "#20", "20 AWG", "4/0",
 * "0000". Undefined when it is not an AWG size from 0000 (4/0) to 46.
 */
export function readAwgSize(cell: string): string | undefined {
  if (cell.length > maxNumberTextLength) return undefined;
  const bare = withoutSuffix(cell.replace(/^#\s*/, ""), "awg");
  return findAwgSize(bare)?.label;
}
