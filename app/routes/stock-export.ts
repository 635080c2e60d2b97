import type { Route } from "./+types/stock-export";
import { searchParamsObject } from "~/lib/search-params";
import { requireUser } from "~/auth/guard.server";
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
  if (!parsed.success) {
    const problems = parsed.error.issues.map(
      (issue) => `${issue.path.join(".")}: ${issue.message}`,
    );
    return new Response(
      `The export's filters are wrong.\n${problems.join("\n")}\n`,
      {
        status: 400,
        headers: { "Content-Type": "text/plain; charset=utf-8" },
      },
    );
  }
  const { total, items } = await listItems(
    itemListQueryOf(viewOf(parsed.data), stockCsvRowLimit),
  );
  return new Response(stockCsv(items), {
    headers: {
      "Content-Type": "text/csv; charset=utf-8",
      "Content-Disposition": `attachment; filename="${stockCsvFilename(new Date())}"`,
      "Cache-Control": "no-store",
      "X-Total-Count": String(total),
    },
  });
}
