/**
 * What the import step of the price-list page says about a checked file: what to fix,
 * the import button, and the note beside it. Pure: no framework.
 */
import { formatQuantity } from "~/lib/format";
import type { PriceListCheck } from "./price-list-upload";

type CheckCounts = Pick<PriceListCheck, "valid" | "invalidCount" | "newItems">;

/** " Fix the 3 rows with problems …" after "all or nothing"; empty when every row is good. */
export function fixRowsText(check: CheckCounts): string {
  return check.invalidCount > 0
    ? ` Fix the ${check.invalidCount === 1 ? "row" : `${formatQuantity(check.invalidCount, "")} rows`} with problems in the file, choose it again and check again.`
    : "";
}

/** "Import 1,200 rows", or "Importing…" while it is sent. */
export function importButtonText(
  check: CheckCounts,
  importing: boolean,
): string {
  return importing
    ? "Importing…"
    : `Import ${formatQuantity(check.valid, "")} ${check.valid === 1 ? "row" : "rows"}`;
}

/** Beside the import button: why it cannot be pressed, or for whom and how many new items. */
export function importNoteText(
  check: CheckCounts,
  supplierName: string | undefined,
): string {
  return check.invalidCount > 0
    ? "Not possible while rows have problems."
    : `For ${supplierName ?? "the supplier"}; ${check.newItems === 1 ? "1 new catalogue item" : `${check.newItems} new catalogue items`} will be created.`;
}
