import { parseForm } from "~/lib/parse-form";
import { data } from "react-router";
import type { Route } from "./+types/build-orders";
import { requireCapability, requireUser } from "~/auth/guard.server";
import { isBuildOrderError } from "~/build-orders/build-order-errors";
import {
  createFormFieldOf,
  createFormSchema,
} from "~/build-orders/build-order-forms";
import { buildOrderListFilterSchema } from "~/build-orders/build-order-list-address";
import { buildOrderListHref } from "~/build-orders/build-order-list-href";
import { buildOrderStatusLabels } from "~/build-orders/build-order-status";
import {
  createBuildOrder,
  listBuildOrders,
  listReleasedRevisions,
} from "~/build-orders/build-orders.server";
import { buildOrderListColumns } from "~/components/build-orders/build-order-list-columns";
import { BuildOrderStatusFilter } from "~/components/build-orders/build-order-status-filter";
import { NewBuildOrderForm } from "~/components/build-orders/new-build-order-form";
import { DataTable } from "~/components/data-table";
import {
  IgnoredFilters,
  ListEmptyText,
  ListSearchForm,
} from "~/components/lists/list-search-form";
import { EmptyState } from "~/components/empty-state";
import { redirectWithFlash } from "~/lib/flash.server";
import { pageParam, readPageOrLast } from "~/lib/search-params";
import { isFiltered, listHref, readListFilters } from "~/lib/list-filters";
import { userCan } from "~/lib/capabilities";
import { countText } from "~/lib/unit-text";
import { refusalReply } from "~/lib/refusal-reply";

const pageSize = 25;

const buildOrderListPageSchema = buildOrderListFilterSchema.extend({
  page: pageParam,
});

export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireUser(request);
  const { query, ignored } = readListFilters(
    buildOrderListPageSchema,
    new URL(request.url).searchParams,
  );
  const { page, ...filter } = query;
  const canCreate = userCan(user, "createBuildOrders");
  const [list, revisions] = await Promise.all([
    readPageOrLast(page, pageSize, (asked) =>
      listBuildOrders({ ...filter, page: asked, pageSize }),
    ),
    canCreate ? listReleasedRevisions() : Promise.resolve([]),
  ]);
  return {
    buildOrders: list.buildOrders,
    total: list.total,
    page: list.page,
    pageCount: list.pageCount,
    filter,
    ignored,
    canCreate,
    revisions: revisions.map((revision) => ({
      value: `${revision.designId}/${revision.revision}`,
      label: `${revision.designName} · rev. ${revision.revision}`,
    })),
  };
}

export async function action({ request }: Route.ActionArgs) {
  const user = await requireCapability(request, "createBuildOrders");
  const submission = parseForm(await request.formData(), {
    schema: createFormSchema,
    disableAutoCoercion: true,
  });
  if (submission.status !== "success") {
    return data({ result: submission.reply() }, { status: 400 });
  }
  try {
    const created = await createBuildOrder(submission.value, user.id);
    return redirectWithFlash(`/build-orders/${created.id}`, {
      code: "order-created",
    });
  } catch (error) {
    if (!isBuildOrderError(error)) throw error;
    const field = createFormFieldOf(error.field);
    const result = refusalReply(submission, field, error.message);
    return data(
      { result },
      { status: error.status === 404 ? 400 : error.status },
    );
  }
}

export const meta: Route.MetaFunction = () => [
  { title: "Build orders · Turnledger" },
];

export default function BuildOrders({
  loaderData,
  actionData,
}: Route.ComponentProps) {
  const {
    buildOrders,
    total,
    page,
    pageCount,
    filter,
    ignored,
    canCreate,
    revisions,
  } = loaderData;
  const filtered = isFiltered(filter);
  return (
    <div
      className={
        canCreate ? "grid gap-8 lg:grid-cols-[minmax(0,1fr)_22rem]" : undefined
      }
    >
      <section aria-labelledby="build-orders-heading" className="space-y-4">
        <div className="flex flex-wrap items-end justify-between gap-4">
          <div>
            <h1 id="build-orders-heading" className="text-2xl font-semibold">
              Build orders
            </h1>
            <p className="mt-1 text-graphite-500">
              Motors to build from released designs: what each needs, what the
              store holds for it and what has gone to the bench.
            </p>
          </div>
          <a
            href={listHref("/build-orders/export.csv", filter)}
            download
            className="button-quiet"
          >
            Download CSV
          </a>
        </div>
        <ListSearchForm
          path="/build-orders"
          label="Search the build orders"
          search={{ value: filter.search, placeholder: "BO-12 or design name" }}
          filtered={Boolean(filter.search)}
          keep={{ status: filter.status }}
        />
        <BuildOrderStatusFilter filter={filter} />
        <IgnoredFilters names={ignored} />
        <DataTable
          caption="Build orders, newest first"
          columns={buildOrderListColumns}
          rows={buildOrders}
          page={page}
          pageCount={pageCount}
          pageHref={(target) => buildOrderListHref(filter, target)}
          emptyText={
            filter.status && !filter.search ? (
              <EmptyState
                message={`No build order is ${buildOrderStatusLabels[filter.status].toLowerCase()}.`}
                clear={{ to: "/build-orders", label: "Show every build order" }}
              />
            ) : (
              <ListEmptyText
                filtered={filtered}
                clearHref="/build-orders"
                emptyText={
                  <EmptyState
                    message="No build orders yet."
                    next={{
                      capability: "createBuildOrders",
                      to: "#new-build-order",
                      label: "Start a build order",
                      does: "start build orders",
                    }}
                  />
                }
              />
            )
          }
        />
        {total > 0 ? (
          <p className="text-sm text-graphite-500">
            {countText(total, "order")}
          </p>
        ) : null}
      </section>
      {canCreate ? (
        <NewBuildOrderForm
          revisions={revisions}
          lastResult={actionData?.result}
        />
      ) : null}
    </div>
  );
}
