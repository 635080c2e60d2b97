/**
 * The message for a chosen price-list file that is too large, told before it is read
 * (without papaparse, which comes only with the file's reading: read-price-list-header.ts).
 */
import { formatNumber } from "~/lib/format";
import {
  checkPriceListSize,
  maxPriceListBytes,
} from "~/price-lists/decode-csv";

export function fileSizeProblem(size: number): string | null {
  if (!checkPriceListSize(size)) return null;
  const megabytes = formatNumber(size / 1024 / 1024, 1);
  return `The file is ${megabytes} MB; a price list can be at most ${maxPriceListBytes / 1024 / 1024} MB. Split it into smaller files, or leave out columns that are not needed.`;
}
