/**
 * Opens a price list sent as an .xlsx workbook (exceljs) and hands over the
 * rows of one sheet as the CSV reader hands over its rows: the first non-blank
 * row is the header, each data row is its cells as text (workbook-cells.ts)
 * with the sheet's row number as its line, so the same column mapping, row
 * checks, preview and all-or-nothing commit apply.
 *
 * The sheet is the one asked for by name, else the first visible one that has
 * a header row (a cover sheet before the prices is passed over). The
 * header is the first row that names two columns or more (a title or a note
 * in one cell above it is passed over). Cells right of the last named column
 * are not read (they have no header to map).
 * A workbook is read in memory, so it is first checked, without unpacking,
 * to be a workbook at all and to unpack to at most {@link maxWorkbookUnpackedBytes}.
 */
import ExcelJS from "exceljs";
import { LineErrorList } from "./line-errors";
import {
  lineError,
  noDataRowsMessage,
  type CsvDataRow,
  type CsvRowsOutcome,
} from "./parse-price-list";
import type { OpenedPriceListRows, RowsLayout } from "./read-price-list";
import { workbookCellText, type WorkbookCellValue } from "./workbook-cells";
import { readZipContents } from "./zip-contents";

/**
 * The most a workbook may unpack to (16 MB): about 100,000 rows of ten
 * columns, which exceljs holds in a few hundred MB while reading.
 */
export const maxWorkbookUnpackedBytes = 16 * 1024 * 1024;

export const notAWorkbookMessage =
  "This file is a ZIP package but not an .xlsx workbook. Upload the price list as an .xlsx workbook or as CSV.";
export const unreadableWorkbookMessage =
  "This workbook could not be read; it may be damaged. Open it in the spreadsheet program, save it again as .xlsx (Excel workbook) and upload that file, or save the sheet as CSV.";

export interface WorkbookSheet {
  name: string;
  hidden: boolean;
}

export interface WorkbookLayout extends RowsLayout {
  format: "xlsx";
  /** Every worksheet, in the workbook's order. */
  sheets: WorkbookSheet[];
  /** The sheet read. */
  sheet: string;
  /** The row the header is on. */
  headerLine: number;
}

export type OpenedWorkbook =
  | ({ ok: true } & OpenedPriceListRows<WorkbookLayout> & {
        /** The first data row's cells, for the mapping screen. */
        sampleRow: string[];
      })
  | { ok: false; message: string };

/** Opens the workbook in `bytes` at the sheet named `sheetName` (any letter case), or its first visible sheet. */
export async function openPriceListWorkbook(
  bytes: Uint8Array,
  sheetName?: string | null,
): Promise<OpenedWorkbook> {
  const contents = readZipContents(bytes);
  if (!contents.ok) return { ok: false, message: unreadableWorkbookMessage };
  if (!contents.names.includes("xl/workbook.xml"))
    return { ok: false, message: notAWorkbookMessage };
  if (contents.unpackedBytes > maxWorkbookUnpackedBytes) {
    const megabytes = Math.ceil(contents.unpackedBytes / 1024 / 1024);
    return {
      ok: false,
      message: `The workbook unpacks to ${megabytes} MB; at most ${maxWorkbookUnpackedBytes / 1024 / 1024} MB can be read. Delete the sheets that are not the price list, or save the price list as CSV (CSV files of up to 20 MB are read).`,
    };
  }

  const workbook = new ExcelJS.Workbook();
  try {
    await workbook.xlsx.load(
      Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength) as never,
    );
  } catch {
    return { ok: false, message: unreadableWorkbookMessage };
  }
  const sheets = workbook.worksheets.map((worksheet) => ({
    name: worksheet.name,
    hidden: worksheet.state !== "visible" && worksheet.state !== undefined,
  }));
  const wanted = sheetName?.trim();
  if (wanted) {
    const worksheet = workbook.worksheets.find(
      (entry) => entry.name.toLowerCase() === wanted.toLowerCase(),
    );
    if (!worksheet)
      return {
        ok: false,
        message: `The workbook has no sheet named "${wanted}"; its sheets are ${sheets.map((sheet) => `"${sheet.name}"`).join(", ")}.`,
      };
    return openSheet(worksheet, sheets);
  }
  // The first visible sheet with a header row: a cover or notes sheet before the prices is passed over.
  const visible = workbook.worksheets.filter(
    (_, index) => !sheets[index]!.hidden,
  );
  let first: OpenedWorkbook | null = null;
  for (const worksheet of visible) {
    const opened = openSheet(worksheet, sheets);
    if (opened.ok) return opened;
    first ??= opened;
  }
  return first ?? { ok: false, message: "The workbook has no visible sheets." };
}

function openSheet(
  worksheet: ExcelJS.Worksheet,
  sheets: WorkbookSheet[],
): OpenedWorkbook {
  const lastRow = worksheet.rowCount;
  const rowValues = (number: number): WorkbookCellValue[] | null => {
    const row = worksheet.findRow(number);
    return row ? (row.values as WorkbookCellValue[]) : null;
  };
  let headerLine = 0;
  let headerValues: WorkbookCellValue[] = [];
  for (let number = 1; number <= lastRow; number += 1) {
    const values = rowValues(number);
    if (values && filledCells(values) >= 2) {
      headerLine = number;
      headerValues = values;
      break;
    }
  }
  if (headerLine === 0)
    return {
      ok: false,
      message: `The sheet "${worksheet.name}" has no header row: no row names two columns or more.`,
    };
  // row.values counts columns from 1: index 0 is always empty.
  const headers = headerValues
    .slice(1)
    .map((value) => cellTextOrEmpty(value).trim());
  while (headers.length > 0 && headers.at(-1) === "") headers.pop();
  const repeated = headers.find(
    (header, index) => header !== "" && headers.indexOf(header) !== index,
  );
  if (repeated !== undefined)
    return {
      ok: false,
      message: `The header row names the column "${repeated}" twice. Each column needs its own name.`,
    };

  const layout: WorkbookLayout = {
    format: "xlsx",
    sheets,
    sheet: worksheet.name,
    headerLine,
    headers,
    decimalComma: false,
  };

  /** Reads the data rows from `from`; hands each good row to `onRow` until `limit` rows are read. */
  function readRows(
    from: number,
    errors: LineErrorList,
    onRow: (row: CsvDataRow) => void,
    limit = Infinity,
  ): { next: number; dataRows: number } {
    let dataRows = 0;
    let number = from;
    for (; number <= lastRow && dataRows < limit; number += 1) {
      const values = rowValues(number);
      if (!values || isBlank(values, headers.length)) continue;
      dataRows += 1;
      const row = dataRow(number, values, headers, errors);
      if (row) onRow(row);
    }
    return { next: number, dataRows };
  }

  const outcome = (errors: LineErrorList, dataRows: number): CsvRowsOutcome =>
    dataRows === 0
      ? { ok: false, message: noDataRowsMessage }
      : {
          ok: true,
          dataRowCount: dataRows,
          errors: errors.errors,
          errorCount: errors.errorCount,
        };

  let sampleRow: string[] = [];
  readRows(
    headerLine + 1,
    new LineErrorList(),
    (row) => (sampleRow = row.cells),
    1,
  );

  return {
    ok: true,
    layout,
    sampleRow,
    forEachRow(onRow) {
      const errors = new LineErrorList();
      const { dataRows } = readRows(headerLine + 1, errors, onRow);
      return outcome(errors, dataRows);
    },
    countDataRows() {
      let dataRows = 0;
      for (let number = headerLine + 1; number <= lastRow; number += 1) {
        const values = rowValues(number);
        if (values && !isBlank(values, headers.length)) dataRows += 1;
      }
      return dataRows;
    },
    async forEachBatch(batchRows, onBatch) {
      const errors = new LineErrorList();
      let dataRows = 0;
      let next = headerLine + 1;
      while (next <= lastRow) {
        const batch: CsvDataRow[] = [];
        const read = readRows(
          next,
          errors,
          (row) => batch.push(row),
          batchRows,
        );
        next = read.next;
        dataRows += read.dataRows;
        if (batch.length > 0) await onBatch(batch, errors.errorCount, dataRows);
      }
      return outcome(errors, dataRows);
    },
  };
}

/** One data row's cells as text, or null with a line error when a formula has no saved result. */
function dataRow(
  number: number,
  values: WorkbookCellValue[],
  headers: readonly string[],
  errors: LineErrorList,
): CsvDataRow | null {
  const cells: string[] = [];
  const unsaved: string[] = [];
  for (let column = 1; column <= headers.length; column += 1) {
    const reading = workbookCellText(values[column]);
    if (reading.ok) cells.push(reading.text.trim());
    else {
      cells.push("");
      unsaved.push(
        `${columnLetters(column)}${number}${headers[column - 1] ? ` (column "${headers[column - 1]}")` : ""}`,
      );
    }
  }
  if (unsaved.length > 0) {
    errors.add(
      lineError(
        number,
        `the formula in cell ${unsaved.join(", ")} has no saved result; open the workbook in the spreadsheet program, let it calculate, save it and upload it again.`,
      ),
    );
    return null;
  }
  return { line: number, cells };
}

/** How many cells of the row hold something. */
function filledCells(values: WorkbookCellValue[]): number {
  let filled = 0;
  for (let column = 1; column < values.length; column += 1)
    if (cellTextOrEmpty(values[column]).trim() !== "") filled += 1;
  return filled;
}

function cellTextOrEmpty(value: WorkbookCellValue): string {
  const reading = workbookCellText(value);
  return reading.ok ? reading.text : "";
}

/** True when no cell (of the first `width` columns, when given) holds anything but blanks. */
function isBlank(values: WorkbookCellValue[], width = values.length): boolean {
  for (let column = 1; column <= width && column < values.length; column += 1) {
    const value = values[column];
    if (value === null || value === undefined) continue;
    const reading = workbookCellText(value);
    if (!reading.ok || reading.text.trim() !== "") return false;
  }
  return true;
}

/** The column's letters as the spreadsheet shows them: 1 → A, 28 → AB. */
export function columnLetters(column: number): string {
  let letters = "";
  for (let rest = column; rest > 0; rest = Math.floor((rest - 1) / 26))
    letters = String.fromCharCode(65 + ((rest - 1) % 26)) + letters;
  return letters;
}
