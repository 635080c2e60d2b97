/**
 * Reads a chosen price-list file in the browser: size check, encoding, header
 * row and the first data row — the same reading the server does, so the
 * headers the buyer maps are the headers the server finds.
 */
import Papa from "papaparse";
import {
  checkPriceListSize,
  decodePriceListBytes,
  maxPriceListBytes,
} from "~/price-lists/decode-csv";
import { openPriceListCsv } from "~/price-lists/parse-price-list";

export type PriceListHeaderReading =
  | { ok: true; headers: string[]; sampleRow: string[]; encoding: string }
  | { ok: false; message: string };

export function fileSizeProblem(size: number): string | null {
  if (!checkPriceListSize(size)) return null;
  const megabytes = (size / 1024 / 1024).toLocaleString("en-GB", {
    maximumFractionDigits: 1,
  });
  return `The file is ${megabytes} MB; a price list can be at most ${maxPriceListBytes / 1024 / 1024} MB. Split it into smaller files, or leave out columns that are not needed.`;
}

export async function readPriceListHeader(
  file: File,
): Promise<PriceListHeaderReading> {
  const tooLarge = fileSizeProblem(file.size);
  if (tooLarge) return { ok: false, message: tooLarge };
  const decoded = decodePriceListBytes(
    new Uint8Array(await file.arrayBuffer()),
  );
  if (!decoded.ok) return decoded;
  const opened = openPriceListCsv(decoded.text);
  if (!opened.ok) return opened;
  const { headers, delimiter } = opened.layout;
  return {
    ok: true,
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
