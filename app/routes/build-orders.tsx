import {
  getFormProps,
  useForm,
  type SubmissionResult,
} from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { createColumnHelper } from "@tanstack/react-table";
import { data, Form, Link, redirect, useNavigation } from "react-router";
import type { z } from "zod";
import type { Route } from "./+types/build-orders";
import { requireRole, requireUser } from "~/auth/guard.server";
import { isBuildOrderError } from "~/build-orders/build-order-errors";
import {
  createFormFieldOf,
  createFormSchema,
} from "~/build-orders/build-order-forms";
import {
  buildOrderReference,
  buildOrderStatusLabels,
  type BuildOrderStatus,
} from "~/build-orders/build-order-status";
import {
  createBuildOrder,
  listBuildOrders,
  listReleasedRevisions,
} from "~/build-orders/build-orders.server";
import { BuildOrderStatusBadge } from "~/components/build-order-status-badge";
import { DataTable } from "~/components/data-table";
import { QuantityField } from "~/components/quantity-field";
import { SelectField } from "~/components/select-field";
import { FormMessages, TextField } from "~/components/text-field";
import { buildOrderStatuses } from "~/db/tables/build-order-enums";
import { redirectWithFlash } from "~/lib/flash.server";
import { formatDateTime } from "~/lib/format";
import { pageFromSearch } from "~/lib/search-params";
import { userHasRole } from "~/lib/roles";
import { countText } from "~/lib/unit-text";

const pageSize = 25;

function statusFrom(value: string | null): BuildOrderStatus | undefined {
  return (buildOrderStatuses as readonly string[]).includes(value ?? "")
    ? (value as BuildOrderStatus)
    : undefined;
}

export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireUser(request);
  const url = new URL(request.url);
  const status = statusFrom(url.searchParams.get("status"));
  const page = pageFromSearch(url.searchParams.get("page"));
  const canCreate = userHasRole(user, ["builder"]);
  const [{ total, buildOrders }, revisions] = await Promise.all([
    listBuildOrders({ status, page, pageSize }),
    canCreate ? listReleasedRevisions() : Promise.resolve([]),
  ]);
  const pageCount = Math.max(1, Math.ceil(total / pageSize));
  if (page > pageCount) {
    const params = new URLSearchParams(status ? { status } : {});
    if (pageCount > 1) params.set("page", String(pageCount));
    throw redirect(`/build-orders${params.size ? `?${params}` : ""}`);
  }
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
  const user = await requireRole(request, ["builder"]);
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
    const result = submission.reply(
      field
        ? { fieldErrors: { [field]: [error.message] } }
        : { formErrors: [error.message] },
    );
    return data(
      { result },
      { status: error.status === 404 ? 400 : error.status },
    );
  }
}

export const meta: Route.MetaFunction = () => [
  { title: "Build orders · Turnledger" },
];

type Order = Route.ComponentProps["loaderData"]["buildOrders"][number];
const column = createColumnHelper<Order>();
const columns = [
  column.accessor("id", {
    header: "Order",
    cell: (info) => (
      <Link
        to={`/build-orders/${info.getValue()}`}
        className="font-medium whitespace-nowrap text-copper-700 underline-offset-2 hover:underline"
      >
        {buildOrderReference(info.getValue())}
      </Link>
    ),
  }),
  column.display({
    id: "design",
    header: "Design",
    cell: ({ row }) => (
      <>
        {row.original.design.name}{" "}
        <span className="text-graphite-500">rev. {row.original.revision}</span>
      </>
    ),
  }),
  column.accessor("quantity", {
    header: "Motors",
    cell: (info) => (
      <span className="whitespace-nowrap">
        {countText(info.getValue(), "motor")}
      </span>
    ),
    meta: { numeric: true },
  }),
  column.accessor("status", {
    header: "Status",
    cell: (info) => <BuildOrderStatusBadge status={info.getValue()} />,
  }),
  column.accessor("createdBy", { header: "Made by" }),
  column.accessor("createdAt", {
    header: "Made",
    cell: (info) => (
      <span className="whitespace-nowrap">
        {formatDateTime(info.getValue())}
      </span>
    ),
  }),
  column.accessor("note", {
    header: "Note",
    cell: (info) => (
      <span className="text-graphite-500">{info.getValue() || ""}</span>
    ),
  }),
];

function listHref(status: string | null, page = 1): string {
  const params = new URLSearchParams();
  if (status) params.set("status", status);
  if (page > 1) params.set("page", String(page));
  const query = params.toString();
  return `/build-orders${query ? `?${query}` : ""}`;
}

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
        <nav aria-label="Filter by status">
          <ul className="flex flex-wrap gap-2 text-sm">
            {[null, ...buildOrderStatuses].map((candidate) => (
              <li key={candidate ?? "all"}>
                <Link
                  to={listHref(candidate)}
                  aria-current={candidate === status ? "page" : undefined}
                  className={`inline-flex min-h-9 items-center rounded-md border px-3 font-medium ${
                    candidate === status
                      ? "border-graphite-800 bg-graphite-800 text-white"
                      : "border-graphite-300 bg-sheet text-graphite-800 hover:border-graphite-500"
                  }`}
                >
                  {candidate ? buildOrderStatusLabels[candidate] : "All"}
                </Link>
              </li>
            ))}
          </ul>
        </nav>
        <DataTable
          caption="Build orders, newest first"
          columns={columns}
          rows={buildOrders}
          page={page}
          pageCount={pageCount}
          pageHref={(target) => listHref(status, target)}
          emptyText={
            status
              ? `No build order is ${buildOrderStatusLabels[status].toLowerCase()}.`
              : "No build orders yet."
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

function NewBuildOrderForm({
  revisions,
  lastResult,
}: {
  revisions: { value: string; label: string }[];
  lastResult?: SubmissionResult<string[]>;
}) {
  const navigation = useNavigation();
  const [form, fields] = useForm<
    { designRevision: string; quantity: string; note: string },
    z.output<typeof createFormSchema>
  >({
    id: "new-build-order",
    lastResult: navigation.state === "idle" ? lastResult : null,
    shouldValidate: "onSubmit",
    shouldRevalidate: "onInput",
    onValidate({ formData }) {
      return parseWithZod(formData, {
        schema: createFormSchema,
        disableAutoCoercion: true,
      });
    },
  });
  return (
    <section aria-labelledby="new-build-order-heading" className="panel h-fit">
      <h2 id="new-build-order-heading" className="mb-1 text-lg font-semibold">
        New build order
      </h2>
      <p className="mb-3 text-sm text-graphite-500">
        Only a released revision can be built. Wire is worked out in kg drawn
        from stock, scrap included.
      </p>
      {revisions.length === 0 ? (
        <p className="text-sm text-graphite-700">
          No design revision is released yet.{" "}
          <Link
            to="/designs"
            className="text-copper-700 underline underline-offset-2"
          >
            Designs
          </Link>
        </p>
      ) : (
        <Form method="post" {...getFormProps(form)} className="space-y-4">
          <FormMessages id={form.errorId} errors={form.errors} />
          <SelectField
            field={fields.designRevision}
            label="Design revision"
            placeholder="Choose…"
          >
            {revisions.map((revision) => (
              <option key={revision.value} value={revision.value}>
                {revision.label}
              </option>
            ))}
          </SelectField>
          <QuantityField
            field={fields.quantity}
            label="Motors to build"
            unit="motors"
          />
          <TextField
            field={fields.note}
            label="Note (optional)"
            autoComplete="off"
          />
          <button
            type="submit"
            className="button-primary w-full"
            disabled={navigation.state !== "idle"}
          >
            Create build order
          </button>
        </Form>
      )}
    </section>
  );
}
