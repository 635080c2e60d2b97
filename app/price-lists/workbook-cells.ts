/**
 * Turns the typed cells of a spreadsheet workbook (as exceljs reads them) into
 * the text the price-list row reader takes, so a workbook row is read by the
 * same rules as a CSV row:
 *
 * - a number cell becomes plain decimal text with a point, at the 15
 *   significant digits a spreadsheet keeps and shows (12.345 → "12.345", even
 *   when the file stores 12.344999999999999; 1e-7 → "0.0000001");
 * - a date cell becomes its calendar day, YYYY-MM-DD, as typed (the reader
 *   gives it as that day's midnight in UTC; no time zone moves it);
 * - a formula cell is read by its saved result (a formula the spreadsheet
 *   program never calculated has none: that is a problem for the row);
 * - text, rich text and links are their text; TRUE/FALSE and errors
 *   ("#N/A") are written as the spreadsheet shows them, so a row reading them
 *   as a number says which value it could not read.
 *
 * Pure: imports no exceljs at run time.
 */

/** The values a cell may hold, as exceljs gives them (a structural copy of its `CellValue`). */
export type WorkbookCellValue =
  | null
  | undefined
  | number
  | string
  | boolean
  | Date
  | { error: string }
  | { richText: readonly { text: string }[] }
  | { text: unknown; hyperlink: string }
  | {
      formula?: string;
      sharedFormula?: string;
      result?: WorkbookCellValue;
    };

export type WorkbookCellReading =
  { ok: true; text: string } | { ok: false; problem: "formula-without-result" };

/** Significant digits a spreadsheet keeps of a number (IEEE 754 doubles shown to 15 digits). */
export const spreadsheetDigits = 15;

/** The text of one cell; empty and missing cells are "". */
export function workbookCellText(
  value: WorkbookCellValue,
): WorkbookCellReading {
  if (value === null || value === undefined) return { ok: true, text: "" };
  if (typeof value === "string") return { ok: true, text: value };
  if (typeof value === "number") return { ok: true, text: numberText(value) };
  if (typeof value === "boolean")
    return { ok: true, text: value ? "TRUE" : "FALSE" };
  if (value instanceof Date) return { ok: true, text: dayText(value) };
  if ("error" in value) return { ok: true, text: String(value.error) };
  if ("richText" in value)
    return {
      ok: true,
      text: value.richText.map((run) => run.text).join(""),
    };
  if ("hyperlink" in value) {
    const text = value.text;
    // A link's shown text may itself be rich text.
    return typeof text === "object" && text !== null
      ? workbookCellText(text as WorkbookCellValue)
      : { ok: true, text: text === undefined ? "" : String(text) };
  }
  if ("formula" in value || "sharedFormula" in value) {
    if (value.result === undefined)
      return { ok: false, problem: "formula-without-result" };
    return workbookCellText(value.result);
  }
  return { ok: true, text: "" };
}

/**
 * A number as plain decimal text at 15 significant digits: "12.345", "1200",
 * "0.0000001", "-3.5". Never an exponent; -0 is "0". Not-a-number and
 * infinities (which a workbook cannot hold) come back as "NaN"/"Infinity" so
 * that a row reading them reports them.
 */
export function numberText(value: number): string {
  if (!Number.isFinite(value)) return String(value);
  if (value === 0) return "0";
  const [mantissa, exponentText] = value
    .toPrecision(spreadsheetDigits)
    .split("e");
  const negative = mantissa!.startsWith("-");
  const unsigned = negative ? mantissa!.slice(1) : mantissa!;
  const [whole, fraction = ""] = unsigned.split(".");
  const exponent = exponentText === undefined ? 0 : Number(exponentText);
  // Digits without the point, and where the point goes after shifting by the exponent.
  const digits = whole! + fraction;
  const point = whole!.length + exponent;
  let text: string;
  if (point <= 0) text = `0.${"0".repeat(-point)}${digits}`;
  else if (point >= digits.length)
    text = digits + "0".repeat(point - digits.length);
  else text = `${digits.slice(0, point)}.${digits.slice(point)}`;
  text = trimNumber(text);
  return negative ? `-${text}` : text;
}

/** Leading zeros of the whole part and trailing zeros of the fraction dropped. */
function trimNumber(text: string): string {
  let [whole, fraction = ""] = text.split(".");
  whole = whole!.replace(/^0+(?=\d)/, "");
  fraction = fraction.replace(/0+$/, "");
  return fraction === "" ? whole : `${whole}.${fraction}`;
}

/** The calendar day of a date cell: the reader gives the typed day at midnight UTC. */
function dayText(date: Date): string {
  if (Number.isNaN(date.getTime())) return "#DATE";
  return date.toISOString().slice(0, 10);
}
