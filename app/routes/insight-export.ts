import { data } from "react-router";
import type { Route } from "./+types/insight-export";
import { requireUser } from "~/auth/guard.server";
import {
  insightCsv,
  insightCsvFilename,
  insightCsvNeeds,
  isInsightCsvTable,
  type InsightCsvInput,
} from "~/insight/insight-csv";
import { designInsight } from "~/insight/design-insight.server";
import {
  stockValueInsight,
  stockValueTrend,
} from "~/insight/stock-value.server";
import { maxDesignsPerPage, readInsightSearch } from "~/insight/what-if";
import { todayUtc } from "~/lib/calendar-days";
import { searchParamsObject } from "~/lib/search-params";
import { companyCurrency } from "~/purchasing/suppliers.server";

/**
 * GET /insight/csv/:table?<the page's what-if> → one table of the cost insight page as a
 * CSV download (every released design, not one page). Whoever may read the page may
 * download its tables: any signed-in person, as the page itself.
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  await requireUser(request);
  const name = params.table;
  if (!isInsightCsvTable(name))
    throw data({ message: "There is no such insight table." }, { status: 404 });
  const { query, errors } = readInsightSearch(
    searchParamsObject(new URL(request.url).searchParams),
  );
  const problems = Object.entries(errors).flatMap(([field, messages]) =>
    messages.map((message) => `${field}: ${message}`),
  );
  if (problems.length > 0)
    return new Response(
      `The export's what-if is wrong.\n${problems.join("\n")}\n`,
      {
        status: 400,
        headers: { "Content-Type": "text/plain; charset=utf-8" },
      },
    );
  const today = todayUtc();
  const needs = insightCsvNeeds(name);
  const designs: InsightCsvInput["designs"] = [];
  if (needs.designs) {
    // Every released design, a page of the most the page shows at a time.
    for (let page = 1; ; page += 1) {
      const read = await designInsight(
        { ...query, page, perPage: maxDesignsPerPage },
        { today, history: needs.history },
      );
      designs.push(...read.designs);
      if (page * maxDesignsPerPage >= read.total) break;
    }
  }
  const [currency, stock, weeks] = await Promise.all([
    companyCurrency(),
    needs.stock
      ? stockValueInsight({ trend: false })
      : { byKind: [], byLocation: [], otherLocations: null },
    needs.weeks ? stockValueTrend() : [],
  ]);
  const date = query.date ?? today;
  return new Response(
    insightCsv(name, { currency, date, designs, stock, weeks }),
    {
      headers: {
        "Content-Type": "text/csv; charset=utf-8",
        "Content-Disposition": `attachment; filename="${insightCsvFilename(name, today)}"`,
        "Cache-Control": "no-store",
      },
    },
  );
}
