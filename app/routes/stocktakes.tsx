import { parseWithZod } from "@conform-to/zod/v4";
import { data, redirect } from "react-router";
import type { Route } from "./+types/stocktakes";
import { requireCapability } from "~/auth/guard.server";
import { DataTable } from "~/components/data-table";
import { EmptyState } from "~/components/empty-state";
import { CycleCountPanel } from "~/components/stocktakes/cycle-count-panel";
import { StartStocktakeForm } from "~/components/stocktakes/start-stocktake-form";
import { stocktakeListColumns } from "~/components/stocktakes/stocktake-list-columns";
import { userCan } from "~/lib/capabilities";
import { isDomainError } from "~/lib/domain-error";
import { redirectWithFlash } from "~/lib/flash.server";
import { refusalReply } from "~/lib/refusal-reply";
import { pageCountOf, pageFromSearch } from "~/lib/search-params";
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

export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireStocktakeReader(request);
  const page = pageFromSearch(new URL(request.url).searchParams.get("page"));
  const canStart = userCan(user, "startStocktakes");
  const [{ total, stocktakes }, locations, plan, currency] = await Promise.all([
    listStocktakes({ page, pageSize }),
    canStart ? listLocationChoices() : Promise.resolve([]),
    weeklyCountPlan(),
    companyCurrency(),
  ]);
  const pageCount = pageCountOf(total, pageSize);
  if (page > pageCount) throw redirect(`/stocktakes?page=${pageCount}`);
  return {
    stocktakes,
    total,
    page,
    pageCount,
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
  const submission = parseWithZod(await request.formData(), {
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
    canStart,
    locations,
    plan,
    currency,
  } = loaderData;
  return (
    <div
      className={
        canStart ? "grid gap-8 lg:grid-cols-[minmax(0,1fr)_22rem]" : undefined
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
          <DataTable
            caption="Stocktakes, newest first"
            columns={stocktakeListColumns}
            rows={stocktakes}
            page={page}
            pageCount={pageCount}
            pageHref={(target) => `/stocktakes?page=${target}`}
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
