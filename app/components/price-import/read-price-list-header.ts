/**
 * Reads a chosen price-list file's header: a CSV in the browser (size check,
 * encoding, header row and the first data row — the same reading the server
 * does, so the headers the buyer maps are the headers the server finds); an
 * .xlsx workbook, told by its first bytes, is read by the server
 * (POST /api/v1/price-lists?layout=1), which also names its sheets.
 *
 * The import page loads this module (and papaparse with it) with import() when a
 * file is chosen: see docs/decisions/051-precompressed-assets-and-page-weight.md.
 */
import Papa from "papaparse";
import { decodePriceListBytes } from "~/price-lists/decode-csv";
import { fileSizeProblem } from "./price-list-file-size";
import { openPriceListCsv } from "~/price-lists/parse-price-list";
import { startsLikeZip } from "~/price-lists/zip-contents";

export interface WorkbookSheetChoice {
  name: string;
  hidden: boolean;
}

export type PriceListHeaderReading =
  | {
      ok: true;
      format: "csv";
      headers: string[];
      sampleRow: string[];
      encoding: string;
    }
  | {
      ok: true;
      format: "xlsx";
      headers: string[];
      sampleRow: string[];
      sheets: WorkbookSheetChoice[];
      sheet: string;
    }
  | { ok: false; message: string };

/** Reads the header of `file`; for a workbook, of its sheet `sheet` (else its first visible sheet). */
export async function readPriceListHeader(
  file: File,
  sheet?: string,
): Promise<PriceListHeaderReading> {
  const tooLarge = fileSizeProblem(file.size);
  if (tooLarge) return { ok: false, message: tooLarge };
  const start = new Uint8Array(await file.slice(0, 4).arrayBuffer());
  if (startsLikeZip(start)) return readWorkbookLayout(file, sheet);
  if (/\.xlsx$|\.xlsm$/i.test(file.name) && file.size > 0)
    return {
      ok: false,
      message: `The file "${file.name}" is named as an .xlsx workbook but is not one (an .xlsx file is a ZIP package). Save it again from the spreadsheet program as .xlsx, or as CSV.`,
    };
  const decoded = decodePriceListBytes(
    new Uint8Array(await file.arrayBuffer()),
  );
  if (!decoded.ok) return decoded;
  const opened = openPriceListCsv(decoded.text);
  if (!opened.ok) return opened;
  const { headers, delimiter } = opened.layout;
  return {
    ok: true,
    format: "csv",
    headers,
    sampleRow: firstDataRow(decoded.text, delimiter, headers),
    encoding: decoded.encoding,
  };
}

/** The row after the header, read from the first lines only (a large file is not parsed twice). */
function firstDataRow(
  text: string,
  delimiter: string,
  headers: string[],
): string[] {
  const parsed = Papa.parse<string[]>(text.slice(0, 64 * 1024), {
    delimiter,
    preview: 12,
    skipEmptyLines: "greedy",
  });
  const headerIndex = parsed.data.findIndex(
    (cells) =>
      cells.map((cell) => cell.trim()).join("\t") === headers.join("\t"),
  );
  return (parsed.data[headerIndex + 1] ?? []).map((cell) => cell.trim());
}

/** Asks the server for a workbook's sheets and the chosen sheet's header and first row. */
async function readWorkbookLayout(
  file: File,
  sheet: string | undefined,
): Promise<PriceListHeaderReading> {
  const body = new FormData();
  body.append("file", file, file.name);
  if (sheet) body.append("sheet", sheet);
  let response: Response;
  try {
    response = await fetch("/api/v1/price-lists?layout=1", {
      method: "POST",
      headers: { Accept: "application/json" },
      body,
    });
  } catch {
    return {
      ok: false,
      message:
        "Turnledger could not be reached to read the workbook. Check the connection and choose the file again.",
    };
  }
  const parsed = (await response.json().catch(() => null)) as {
    format?: string;
    headers?: string[];
    sampleRow?: string[];
    sheets?: WorkbookSheetChoice[];
    sheet?: string;
    error?: { message?: string };
  } | null;
  if (!response.ok || parsed?.format !== "xlsx")
    return {
      ok: false,
      message:
        response.status === 401
          ? "Your session has ended: sign in again, then choose the file again."
          : (parsed?.error?.message ??
            `The workbook could not be read (status ${response.status}).`),
    };
  return {
    ok: true,
    format: "xlsx",
    headers: parsed.headers ?? [],
    sampleRow: parsed.sampleRow ?? [],
    sheets: parsed.sheets ?? [],
    sheet: parsed.sheet ?? "",
  };
}
