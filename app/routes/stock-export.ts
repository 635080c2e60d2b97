import type { Route } from "./+types/stock-export";
import { searchParamsObject } from "~/lib/search-params";
import { requireUser } from "~/auth/guard.server";
import { csvDownload, csvFilterRefusal } from "~/lib/csv-download.server";
import { itemListQuerySchema } from "~/stock/item-list-query";
import { listItems } from "~/stock/items.server";
import {
  stockCsv,
  stockCsvFilename,
  stockCsvRowLimit,
} from "~/stock/stock-csv";
import { itemListQueryOf, viewOf } from "~/stock/stock-list-view";

/**
 * GET /stock/export.csv?search=&kind=&belowReorder=1&archived=1&sort=&order=
 * → every item of the stock list's view (not one page), up to 50,000 rows, as
 * a CSV download. X-Total-Count says how many matched, so a cut is visible.
 */
export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  const values = searchParamsObject(new URL(request.url).searchParams);
  delete values.page;
  delete values.pageSize;
  const parsed = itemListQuerySchema.safeParse(values);
  if (!parsed.success) return csvFilterRefusal(parsed.error);
  // Every match is counted: the export says how many matched beside its own row limit.
  const { total, items } = await listItems(
    itemListQueryOf(viewOf(parsed.data), stockCsvRowLimit),
    { exactTotal: true },
  );
  return csvDownload(stockCsv(items), stockCsvFilename(new Date()), {
    "X-Total-Count": String(total),
  });
}
