import type { Route } from "./+types/build-orders-export";
import { requireUser } from "~/auth/guard.server";
import {
  buildOrderCsvFilename,
  buildOrderCsvHeaders,
  buildOrderCsvRow,
} from "~/build-orders/build-order-list-csv";
import {
  buildOrderListFilterSchema,
  type BuildOrderListFilter,
} from "~/build-orders/build-order-list-address";
import { buildOrdersInBatches } from "~/build-orders/build-orders.server";
import { csvFileStart, csvLines } from "~/lib/csv-file";
import { csvDownload, csvFilterRefusal } from "~/lib/csv-download.server";
import { searchParamsObject } from "~/lib/search-params";

/**
 * GET /build-orders/export.csv?search=&status= → every build order of the list's filtered
 * view (not one page), newest first, streamed a batch at a time. Read by whoever may read
 * the list.
 */
export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  const values = searchParamsObject(new URL(request.url).searchParams);
  delete values.page;
  delete values.pageSize;
  const parsed = buildOrderListFilterSchema.safeParse(values);
  if (!parsed.success) return csvFilterRefusal(parsed.error);
  return csvDownload(
    buildOrderCsvParts(parsed.data),
    buildOrderCsvFilename(new Date()),
  );
}

async function* buildOrderCsvParts(filter: BuildOrderListFilter) {
  yield csvFileStart(buildOrderCsvHeaders);
  for await (const batch of buildOrdersInBatches(filter))
    yield csvLines(batch.map(buildOrderCsvRow));
}
