import { parseWithZod } from "@conform-to/zod/v4";
import { data, redirect } from "react-router";
import type { Route } from "./+types/build-orders";
import { requireCapability, requireUser } from "~/auth/guard.server";
import { isBuildOrderError } from "~/build-orders/build-order-errors";
import {
  createFormFieldOf,
  createFormSchema,
} from "~/build-orders/build-order-forms";
import {
  buildOrderListHref,
  buildOrderStatusFrom,
} from "~/build-orders/build-order-list-address";
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
import { EmptyState } from "~/components/empty-state";
import { redirectWithFlash } from "~/lib/flash.server";
import { pageFromSearch } from "~/lib/search-params";
import { userCan } from "~/lib/capabilities";
import { countText } from "~/lib/unit-text";
import { refusalReply } from "~/lib/refusal-reply";

const pageSize = 25;

export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireUser(request);
  const url = new URL(request.url);
  const status = buildOrderStatusFrom(url.searchParams.get("status"));
  const page = pageFromSearch(url.searchParams.get("page"));
  const canCreate = userCan(user, "createBuildOrders");
  const [{ total, buildOrders }, revisions] = await Promise.all([
    listBuildOrders({ status, page, pageSize }),
    canCreate ? listReleasedRevisions() : Promise.resolve([]),
  ]);
  const pageCount = Math.max(1, Math.ceil(total / pageSize));
  if (page > pageCount) throw redirect(buildOrderListHref(status, pageCount));
  return {
    buildOrders,
    total,
    page,
    pageCount,
    status: status ?? null,
    canCreate,
    revisions: revisions.map((revision) => ({
      value: `${revision.designId}/${revision.revision}`,
      label: `${revision.designName} · rev. ${revision.revision}`,
    })),
  };
}

export async function action({ request }: Route.ActionArgs) {
  const user = await requireCapability(request, "createBuildOrders");
  const submission = parseWithZod(await request.formData(), {
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
  const { buildOrders, total, page, pageCount, status, canCreate, revisions } =
    loaderData;
  return (
    <div
      className={
        canCreate ? "grid gap-8 lg:grid-cols-[minmax(0,1fr)_22rem]" : undefined
      }
    >
      <section aria-labelledby="build-orders-heading" className="space-y-4">
        <div>
          <h1 id="build-orders-heading" className="text-2xl font-semibold">
            Build orders
          </h1>
          <p className="mt-1 text-graphite-500">
            Motors to build from released designs: what each needs, what the
            store holds for it and what has gone to the bench.
          </p>
        </div>
        <BuildOrderStatusFilter status={status} />
        <DataTable
          caption="Build orders, newest first"
          columns={buildOrderListColumns}
          rows={buildOrders}
          page={page}
          pageCount={pageCount}
          pageHref={(target) => buildOrderListHref(status, target)}
          emptyText={
            status ? (
              <EmptyState
                message={`No build order is ${buildOrderStatusLabels[status].toLowerCase()}.`}
                clear={{ to: "/build-orders", label: "Show every build order" }}
              />
            ) : (
              <EmptyState
                message="No build orders yet."
                next={{
                  capability: "createBuildOrders",
                  to: "#new-build-order",
                  label: "Start a build order",
                  does: "start build orders",
                }}
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
