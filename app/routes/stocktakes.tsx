import { parseForm } from "~/lib/parse-form";
import { data } from "react-router";
import { z } from "zod";
import type { Route } from "./+types/stocktakes";
import { requireCapability } from "~/auth/guard.server";
import { DataTable } from "~/components/data-table";
import {
  FilterChoice,
  IgnoredFilters,
  ListEmptyText,
  ListSearchForm,
} from "~/components/lists/list-search-form";
import { EmptyState } from "~/components/empty-state";
import { CycleCountPanel } from "~/components/stocktakes/cycle-count-panel";
import { StartStocktakeForm } from "~/components/stocktakes/start-stocktake-form";
import { stocktakeListColumns } from "~/components/stocktakes/stocktake-list-columns";
import { userCan } from "~/lib/capabilities";
import { isDomainError } from "~/lib/domain-error";
import { redirectWithFlash } from "~/lib/flash.server";
import { refusalReply } from "~/lib/refusal-reply";
import { readPageOrLast } from "~/lib/search-params";
import {
  isFiltered,
  listHref,
  readListFilters,
  searchPageSchema,
} from "~/lib/list-filters";
import { stocktakeStatuses } from "~/db/tables/storeroom-enums";
import { stocktakeStatusLabels } from "~/stocktakes/stocktake-reference";
import { countText } from "~/lib/unit-text";
import { companyCurrency } from "~/purchasing/suppliers.server";
import { weeklyCountPlan } from "~/stocktakes/cycle-count.server";
import { requireStocktakeReader } from "~/stocktakes/stocktake-access.server";
import { startFormSchema } from "~/stocktakes/stocktake-forms";
import {
  listLocationChoices,
  listStocktakes,
  startStocktake,
} from "~/stocktakes/stocktakes.server";

const pageSize = 25;

const stocktakeListSchema = searchPageSchema.extend({
  status: z
    .enum(stocktakeStatuses, {
      error: `status must be one of ${stocktakeStatuses.join(", ")}.`,
    })
    .optional(),
});

export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireStocktakeReader(request);
  const { query, ignored } = readListFilters(
    stocktakeListSchema,
    new URL(request.url).searchParams,
  );
  const { page: asked, ...filter } = query;
  const canStart = userCan(user, "startStocktakes");
  const [list, locations, plan, currency] = await Promise.all([
    readPageOrLast(asked, pageSize, (page) =>
      listStocktakes({ ...filter, page, pageSize }),
    ),
    canStart ? listLocationChoices() : Promise.resolve([]),
    weeklyCountPlan(),
    companyCurrency(),
  ]);
  return {
    stocktakes: list.stocktakes,
    total: list.total,
    page: list.page,
    pageCount: list.pageCount,
    filter,
    ignored,
    canStart,
    locations,
    currency,
    plan: plan.map((location) => ({
      code: location.code,
      countClass: location.countClass,
      value: Number(location.value) / 10_000,
      lastCountedOn: location.lastCountedOn,
      dueOn: location.dueOn,
    })),
  };
}

export async function action({ request }: Route.ActionArgs) {
  const user = await requireCapability(request, "startStocktakes");
  const submission = parseForm(await request.formData(), {
    schema: startFormSchema,
  });
  if (submission.status !== "success")
    return data({ result: submission.reply() }, { status: 400 });
  try {
    const created = await startStocktake(submission.value, user.id);
    return redirectWithFlash(`/stocktakes/${created.id}`, {
      code: "stocktake-started",
    });
  } catch (error) {
    if (!isDomainError(error)) throw error;
    return data(
      { result: refusalReply(submission, error.field, error.message) },
      { status: error.status === 404 ? 400 : error.status },
    );
  }
}

export const meta: Route.MetaFunction = () => [
  { title: "Stocktakes · Turnledger" },
];

export default function Stocktakes({
  loaderData,
  actionData,
}: Route.ComponentProps) {
  const {
    stocktakes,
    total,
    page,
    pageCount,
    filter,
    ignored,
    canStart,
    locations,
    plan,
    currency,
  } = loaderData;
  return (
    <div
      className={
        canStart
          ? "grid grid-cols-1 gap-8 lg:grid-cols-[minmax(0,1fr)_22rem]"
          : undefined
      }
    >
      <div className="space-y-6">
        <section aria-labelledby="stocktakes-heading" className="space-y-4">
          <div>
            <h1 id="stocktakes-heading" className="text-2xl font-semibold">
              Stocktakes
            </h1>
            <p className="mt-1 text-graphite-500">
              Counts of chosen places. Nothing changes in stock until a manager
              approves the differences.
            </p>
          </div>
          <ListSearchForm
            path="/stocktakes"
            label="Search the stocktakes"
            search={{ value: filter.search, placeholder: "ST-12 or note" }}
            filtered={isFiltered(filter)}
          >
            <FilterChoice
              name="status"
              label="Status"
              value={filter.status}
              options={stocktakeStatuses.map((status) => ({
                value: status,
                label: stocktakeStatusLabels[status],
              }))}
            />
          </ListSearchForm>
          <IgnoredFilters names={ignored} />
          <DataTable
            caption="Stocktakes, newest first"
            columns={stocktakeListColumns}
            rows={stocktakes}
            page={page}
            pageCount={pageCount}
            pageHref={(target) =>
              listHref("/stocktakes", { ...filter, page: target })
            }
            emptyText={
              <ListEmptyText
                filtered={isFiltered(filter)}
                clearHref="/stocktakes"
                emptyText={
                  <EmptyState
                    message="No stocktakes yet."
                    next={{
                      capability: "startStocktakes",
                      to: "#start-stocktake",
                      label: "Start a stocktake",
                      does: "start stocktakes",
                    }}
                  />
                }
              />
            }
          />
          {total > 0 ? (
            <p className="text-sm text-graphite-500">
              {countText(total, "stocktake")}
            </p>
          ) : null}
        </section>
        <CycleCountPanel plan={plan} currency={currency} canStart={canStart} />
      </div>
      {canStart ? (
        <StartStocktakeForm
          locations={locations}
          lastResult={actionData?.result}
        />
      ) : null}
    </div>
  );
}
