import {
  getFormProps,
  useForm,
  type SubmissionResult,
} from "@conform-to/react";
import { getZodConstraint } from "@conform-to/zod/v4";
import { parseForm } from "~/lib/parse-form";
import { createColumnHelper } from "~/lib/table-columns";
import { data, Form, Link, useNavigation } from "react-router";
import type { Route } from "./+types/suppliers";
import { requireCapability, requireUser } from "~/auth/guard.server";
import { DataTable } from "~/components/data-table";
import {
  IgnoredFilters,
  ListEmptyText,
  ListSearchForm,
} from "~/components/lists/list-search-form";
import { EmptyState } from "~/components/empty-state";
import { SupplierFields } from "~/components/suppliers/supplier-fields";
import { FormMessages } from "~/components/text-field";
import { redirectWithFlash } from "~/lib/flash.server";
import { formatDateTime, formatQuantity } from "~/lib/format";
import { userCan } from "~/lib/capabilities";
import type { CurrencyCoverage } from "~/purchasing/supplier-currency-warnings";
import { currencyCoverage } from "~/purchasing/supplier-details.server";
import { supplierSchema } from "~/purchasing/supplier-schemas";
import { supplierOrderingDefaults } from "~/purchasing/supplier-ordering-defaults";
import { useBrowserValidation } from "~/components/forms/use-browser-validation";
import { listSupplierOverview } from "~/purchasing/supplier-overview.server";
import { createSupplier } from "~/purchasing/suppliers.server";
import { isDomainError } from "~/lib/domain-error";
import {
  listHref,
  readListFilters,
  searchPageSchema,
} from "~/lib/list-filters";
import { readPageOrLast } from "~/lib/search-params";

const pageSize = 50;

export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireUser(request);
  const { query, ignored } = readListFilters(
    searchPageSchema,
    new URL(request.url).searchParams,
  );
  const [list, coverage] = await Promise.all([
    readPageOrLast(query.page, pageSize, (page) =>
      listSupplierOverview({ search: query.search, page, pageSize }),
    ),
    currencyCoverage(),
  ]);
  return {
    suppliers: list.suppliers,
    total: list.total,
    page: list.page,
    pageCount: list.pageCount,
    search: query.search,
    ignored,
    coverage,
    canKeep: userCan(user, "keepSuppliers"),
    constraint: getZodConstraint(supplierSchema),
  };
}

export async function action({ request }: Route.ActionArgs) {
  await requireCapability(request, "keepSuppliers");
  const submission = parseForm(await request.formData(), {
    schema: supplierSchema,
  });
  if (submission.status !== "success") {
    return data({ result: submission.reply() }, { status: 400 });
  }
  let id: number;
  try {
    id = await createSupplier(submission.value);
  } catch (error) {
    if (!isDomainError(error)) throw error;
    const result = submission.reply({
      fieldErrors: { [error.field ?? "name"]: [error.message] },
    });
    return data({ result }, { status: error.status });
  }
  return redirectWithFlash("/suppliers", { code: "supplier-added", id });
}

export const meta: Route.MetaFunction = () => [
  { title: "Suppliers · Turnledger" },
];

type Supplier = Route.ComponentProps["loaderData"]["suppliers"][number];
const column = createColumnHelper<Supplier>();
const columns = [
  column.accessor("name", {
    header: "Supplier",
    cell: (info) => (
      <Link
        to={`/suppliers/${info.row.original.id}`}
        className="font-medium text-copper-700 underline-offset-2 hover:underline"
      >
        {info.getValue()}
      </Link>
    ),
  }),
  column.accessor("email", {
    header: "E-mail",
    cell: (info) => info.getValue() ?? "—",
  }),
  column.accessor("currency", { header: "Quotes in" }),
  column.accessor("leadTimeDays", {
    header: "Lead time",
    meta: { numeric: true },
    cell: (info) => {
      const days = info.getValue();
      return days === null
        ? "—"
        : formatQuantity(days, days === 1 ? "day" : "days");
    },
  }),
  column.accessor("priceLines", {
    header: "Price lines",
    meta: { numeric: true },
    cell: (info) => formatQuantity(info.getValue(), ""),
  }),
  column.accessor("lastImportAt", {
    header: "Last import",
    cell: (info) => (
      <span className="whitespace-nowrap">
        {info.getValue() ? formatDateTime(info.getValue()) : "never"}
      </span>
    ),
  }),
  column.accessor("notes", {
    header: "Notes",
    cell: (info) => (
      <span className="text-graphite-500">{info.getValue() ?? ""}</span>
    ),
  }),
];

export default function Suppliers({
  loaderData,
  actionData,
}: Route.ComponentProps) {
  const { suppliers, canKeep, search, ignored, page, pageCount } = loaderData;
  return (
    <div
      className={canKeep ? "grid gap-8 lg:grid-cols-[1fr_22rem]" : undefined}
    >
      <section aria-labelledby="suppliers-heading">
        <div className="mb-4 flex flex-wrap items-baseline justify-between gap-3">
          <h1 id="suppliers-heading" className="text-2xl font-semibold">
            Suppliers
          </h1>
          <nav aria-label="Price lists" className="flex gap-4 text-sm">
            {canKeep ? (
              <Link
                to="/suppliers/import"
                className="font-medium text-copper-700 underline-offset-2 hover:underline"
              >
                Import a price list
              </Link>
            ) : null}
            <Link
              to="/suppliers/imports"
              className="font-medium text-copper-700 underline-offset-2 hover:underline"
            >
              Past imports
            </Link>
          </nav>
        </div>
        <div className="mb-4 space-y-3">
          <ListSearchForm
            path="/suppliers"
            label="Search the suppliers"
            search={{ value: search, placeholder: "Name or e-mail" }}
            filtered={Boolean(search)}
          />
          <IgnoredFilters names={ignored} />
        </div>
        <DataTable
          caption="Suppliers, their price lines and last price-list import"
          columns={columns}
          rows={suppliers}
          page={page}
          pageCount={pageCount}
          pageHref={(target) =>
            listHref("/suppliers", { search, page: target })
          }
          emptyText={
            <ListEmptyText
              filtered={Boolean(search)}
              clearHref="/suppliers"
              emptyText={
                <EmptyState
                  message="No suppliers yet."
                  next={{
                    capability: "keepSuppliers",
                    to: "#new-supplier",
                    label: "Add a supplier",
                    does: "add suppliers",
                  }}
                />
              }
            />
          }
        />
      </section>
      {canKeep ? (
        <NewSupplierForm
          lastResult={actionData?.result}
          coverage={loaderData.coverage}
          constraint={loaderData.constraint}
        />
      ) : null}
    </div>
  );
}

function NewSupplierForm({
  lastResult,
  coverage,
  constraint,
}: {
  lastResult?: SubmissionResult<string[]>;
  coverage: CurrencyCoverage;
  /** The fields' constraints (required, lengths), from the loader. */
  constraint: Route.ComponentProps["loaderData"]["constraint"];
}) {
  const navigation = useNavigation();
  const validate = useBrowserValidation(() =>
    import("~/purchasing/supplier-schemas").then(
      (module) => module.supplierSchema,
    ),
  );
  const [form, fields] = useForm({
    id: "new-supplier",
    lastResult,
    defaultValue: {
      currency: coverage.companyCurrency,
      metalBaseFixedAt: supplierOrderingDefaults.metalBaseFixedAt,
      wireTolerancePercent: String(
        supplierOrderingDefaults.wireTolerancePercent,
      ),
      pieceTolerancePercent: String(
        supplierOrderingDefaults.pieceTolerancePercent,
      ),
    },
    constraint,
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onValidate: validate,
  });
  return (
    <section aria-labelledby="new-supplier-heading" className="panel h-fit">
      <h2 id="new-supplier-heading" className="mb-3 text-lg font-semibold">
        New supplier
      </h2>
      <Form method="post" {...getFormProps(form)} className="space-y-4">
        <FormMessages id={form.errorId} errors={form.errors} />
        <SupplierFields fields={fields} coverage={coverage} />
        <button
          type="submit"
          className="button-primary w-full"
          disabled={navigation.state !== "idle"}
        >
          Add supplier
        </button>
      </Form>
    </section>
  );
}
