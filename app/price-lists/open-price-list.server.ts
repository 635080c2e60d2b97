/**
 * Opens an uploaded price list as what it is: an .xlsx workbook or a CSV
 * text. The kind is told by the content first (a workbook is a ZIP package,
 * starting "PK\x03\x04"), and the name only confirms it: a file named .xlsx
 * that is not a ZIP package is refused, and a workbook is read as one whatever
 * it is named.
 */
import { decodePriceListBytes } from "./decode-csv";
import {
  openPriceListCsv,
  type CsvLayout,
  type OpenedPriceListCsv,
} from "./parse-price-list";
import {
  openPriceListWorkbook,
  type WorkbookLayout,
} from "./read-workbook.server";
import type { OpenedPriceListRows } from "./read-price-list";
import { startsLikeZip } from "./zip-contents";

export type PriceListFileFormat = "csv" | "xlsx";

export type OpenedPriceList =
  | {
      ok: true;
      format: "csv";
      opened: OpenedPriceListCsv;
      encoding: string;
    }
  | {
      ok: true;
      format: "xlsx";
      opened: OpenedPriceListRows<WorkbookLayout>;
      sampleRow: string[];
    }
  | { ok: false; message: string };

const workbookNames = /\.(xlsx|xlsm)$/i;

/** "csv" or "xlsx" from the content; the name is not trusted for it. */
export function priceListFormatOf(bytes: Uint8Array): PriceListFileFormat {
  return startsLikeZip(bytes) ? "xlsx" : "csv";
}

/**
 * Opens the file for reading its rows: a workbook at `sheet` (or its first
 * visible sheet), a CSV as text (`sheet` does not apply and is ignored).
 */
export async function openPriceList(
  bytes: Uint8Array,
  fileName: string,
  sheet?: string | null,
): Promise<OpenedPriceList> {
  if (priceListFormatOf(bytes) === "xlsx") {
    const workbook = await openPriceListWorkbook(bytes, sheet);
    if (!workbook.ok) return workbook;
    return {
      ok: true,
      format: "xlsx",
      opened: workbook,
      sampleRow: workbook.sampleRow,
    };
  }
  if (workbookNames.test(fileName.trim()) && bytes.byteLength > 0)
    return {
      ok: false,
      message: `The file "${fileName}" is named as an .xlsx workbook but is not one (an .xlsx file is a ZIP package). Save it again from the spreadsheet program as .xlsx, or as CSV.`,
    };
  const decoded = decodePriceListBytes(bytes);
  if (!decoded.ok) return decoded;
  const opened = openPriceListCsv(decoded.text);
  if (!opened.ok) return opened;
  return { ok: true, format: "csv", opened, encoding: decoded.encoding };
}

/** What the mapping screen needs of a file: its header, first row, and a workbook's sheets. */
export type PriceListLayoutAnswer =
  | {
      format: "csv";
      headers: string[];
      sampleRow: string[];
      encoding: string;
      headerLine: number;
    }
  | {
      format: "xlsx";
      headers: string[];
      sampleRow: string[];
      sheets: WorkbookLayout["sheets"];
      sheet: string;
      headerLine: number;
    };

export function layoutAnswerOf(
  opened: Extract<OpenedPriceList, { ok: true }>,
): PriceListLayoutAnswer {
  if (opened.format === "csv") {
    const layout: CsvLayout = opened.opened.layout;
    // The whole file is parsed for its first row: this answer is for scripts and small files.
    let sampleRow: string[] = [];
    opened.opened.forEachRow((row) => {
      if (sampleRow.length === 0) sampleRow = row.cells;
    });
    return {
      format: "csv",
      headers: layout.headers,
      sampleRow,
      encoding: opened.encoding,
      headerLine: layout.headerLine,
    };
  }
  const layout = opened.opened.layout;
  return {
    format: "xlsx",
    headers: layout.headers,
    sampleRow: opened.sampleRow,
    sheets: layout.sheets,
    sheet: layout.sheet,
    headerLine: layout.headerLine,
  };
}
