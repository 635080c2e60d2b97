/**
 * What the cost insight page and the manager's start page load: the released designs
 * costed with the what-if of the address (read-only: the what-if lives in the query
 * string, nothing is written), the stored metal bases the what-if fields start from, and
 * the stock figures. The page also gets the weekly stock-value trend, as a promise the
 * page streams in when it is ready.
 */
import { readPageOrLast, searchParamsObject } from "~/lib/search-params";
import { moneyToJson } from "./design-insight";
import { designInsight, storedMetalBases } from "./design-insight.server";
import {
  prepareStockValueTrend,
  stockValueInsight,
  stockValueTrend,
} from "./stock-value.server";
import { readInsightSearch } from "./what-if";
import { todayUtc } from "~/lib/calendar-days";

/** The form's fields as typed (so a bad value stays in its box beside its message). */
function typedFields(params: Record<string, string>) {
  const endTurn: Record<string, string> = {};
  for (const [key, value] of Object.entries(params))
    if (key.startsWith("endTurn."))
      endTurn[key.slice("endTurn.".length)] = value;
  return {
    quantity: params.quantity ?? "",
    copperBase: params.copperBase ?? "",
    aluminiumBase: params.aluminiumBase ?? "",
    date: params.date ?? "",
    basis: params.basis ?? "",
    endTurn,
  };
}

export async function loadInsight(
  request: Request,
  options: { page: "insight" | "start" },
) {
  const params = searchParamsObject(new URL(request.url).searchParams);
  const { query, errors } = readInsightSearch(params);
  const today = todayUtc();
  const fullPage = options.page === "insight";
  if (!fullPage) prepareStockValueTrend();
  const [designs, bases, stock] = await Promise.all([
    // A page past the end (a typed address, or designs withdrawn since) shows the last one.
    readPageOrLast(query.page, query.perPage, (page) =>
      designInsight({ ...query, page }, { today, history: fullPage }),
    ),
    storedMetalBases(query.date ?? today),
    stockValueInsight({ trend: false }),
  ]);
  return {
    today,
    fields: typedFields(params),
    errors,
    whatIf: {
      copperBase:
        query.copperBase === undefined ? null : moneyToJson(query.copperBase),
      aluminiumBase:
        query.aluminiumBase === undefined
          ? null
          : moneyToJson(query.aluminiumBase),
      endTurn: query.endTurn,
    },
    quantity: query.quantity,
    basis: query.basis,
    designs,
    bases,
    stock,
    /** Streams in after the page (the first read after a restart walks the journal). */
    trend: fullPage ? stockValueTrend() : null,
  };
}

export type InsightLoaderData = Awaited<ReturnType<typeof loadInsight>>;
