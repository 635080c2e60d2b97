import { getFormProps, useForm } from "@conform-to/react";
import { getZodConstraint } from "@conform-to/zod/v4";
import { parseForm } from "~/lib/parse-form";
import { createColumnHelper } from "~/lib/table-columns";
import { data, Form, Link, useNavigation } from "react-router";
import type { Route } from "./+types/supplier";
import { requireCapability, requireUser } from "~/auth/guard.server";
import { DataTable } from "~/components/data-table";
import { EmptyState } from "~/components/empty-state";
import { SupplierDeliveryPanel } from "~/components/suppliers/supplier-delivery-panel";
import { SupplierSummaryFigures } from "~/components/suppliers/supplier-summary-figures";
import {
  SupplierCurrencyWarnings,
  SupplierFields,
} from "~/components/suppliers/supplier-fields";
import { FormMessages } from "~/components/text-field";
import { redirectWithFlash } from "~/lib/flash.server";
import {
  formatDateTime,
  formatQuantity,
  formatNumberForField,
} from "~/lib/format";
import { userCan } from "~/lib/capabilities";
import { idFromText } from "~/lib/search-params";
import {
  currencyCoverage,
  findSupplier,
  listSupplierImports,
  supplierImportLimit,
  updateSupplier,
} from "~/purchasing/supplier-details.server";
import { supplierSchema } from "~/purchasing/supplier-schemas";
import { useBrowserValidation } from "~/components/forms/use-browser-validation";
import { isDomainError } from "~/lib/domain-error";
import { todayUtc } from "~/lib/calendar-days";
import { supplierDeliveryPerformance } from "~/purchase-orders/supplier-deliveries.server";
import { refusalReply } from "~/lib/refusal-reply";
import { BackLink } from "~/components/back-link";

function notFound(): never {
  throw data({ message: "No such supplier." }, { status: 404 });
}

export async function loader({ request, params }: Route.LoaderArgs) {
  const user = await requireUser(request);
  const id = idFromText(params.supplierId);
  const supplier = id === null ? null : await findSupplier(id);
  if (!supplier) notFound();
  const [history, coverage, performance] = await Promise.all([
    listSupplierImports(supplier.id),
    currencyCoverage(),
    supplierDeliveryPerformance(supplier.id, todayUtc()),
  ]);
  return {
    supplier,
    performance,
    ...history,
    importLimit: supplierImportLimit,
    coverage,
    canKeep: userCan(user, "keepSuppliers"),
    constraint: getZodConstraint(supplierSchema),
  };
}

export async function action({ request, params }: Route.ActionArgs) {
  await requireCapability(request, "keepSuppliers");
  const id = idFromText(params.supplierId);
  if (id === null || !(await findSupplier(id))) notFound();
  const submission = parseForm(await request.formData(), {
    schema: supplierSchema,
  });
  if (submission.status !== "success") {
    return data({ result: submission.reply() }, { status: 400 });
  }
  const input = submission.value;
  try {
    // The form holds every field: one left empty is cleared.
    await updateSupplier(id, {
      name: input.name,
      email: input.email ?? null,
      currency: input.currency,
      leadTimeDays: input.leadTimeDays ?? null,
      notes: input.notes ?? null,
      orderEmail: input.orderEmail ?? null,
      metalBaseFixedAt: input.metalBaseFixedAt,
      wireTolerancePercent: input.wireTolerancePercent,
      pieceTolerancePercent: input.pieceTolerancePercent,
    });
  } catch (error) {
    if (!isDomainError(error)) throw error;
    const result = refusalReply(submission, error.field, error.message);
    return data({ result }, { status: error.status });
  }
  return redirectWithFlash(`/suppliers/${id}`, { code: "supplier-saved", id });
}

export const meta: Route.MetaFunction = ({ data: loaderData }) => [
  {
    title: `${loaderData ? loaderData.supplier.name : "Supplier"} · Suppliers · Turnledger`,
  },
];

type Import = Route.ComponentProps["loaderData"]["imports"][number];
const column = createColumnHelper<Import>();
const importColumns = [
  column.accessor("createdAt", {
    header: "When",
    cell: (info) => (
      <span className="whitespace-nowrap">
        {formatDateTime(info.getValue())}
      </span>
    ),
  }),
  column.accessor("fileName", {
    header: "File",
    cell: (info) => (
      <Link
        to={`/suppliers/imports?import=${info.row.original.id}`}
        className="font-medium text-copper-700 underline-offset-2 hover:underline"
      >
        {info.getValue()}
      </Link>
    ),
  }),
  column.accessor("rowCount", {
    header: "Rows",
    meta: { numeric: true },
    cell: (info) => formatQuantity(info.getValue(), ""),
  }),
  column.accessor("createdItems", {
    header: "New items",
    meta: { numeric: true },
    cell: (info) => formatQuantity(info.getValue(), ""),
  }),
  column.accessor("user", { header: "By" }),
];

export default function Supplier({
  loaderData,
  actionData,
}: Route.ComponentProps) {
  const {
    supplier,
    imports,
    importCount,
    priceLineCount,
    importLimit,
    coverage,
    canKeep,
    performance,
    constraint,
  } = loaderData;
  const navigation = useNavigation();
  const validate = useBrowserValidation(() =>
    import("~/purchasing/supplier-schemas").then(
      (module) => module.supplierSchema,
    ),
  );
  const [form, fields] = useForm({
    id: `supplier-${supplier.id}`,
    lastResult: actionData?.result,
    defaultValue: {
      name: supplier.name,
      email: supplier.email ?? "",
      currency: supplier.currency,
      leadTimeDays:
        supplier.leadTimeDays === null ? "" : String(supplier.leadTimeDays),
      notes: supplier.notes ?? "",
      orderEmail: supplier.orderEmail ?? "",
      metalBaseFixedAt: supplier.metalBaseFixedAt,
      wireTolerancePercent: formatNumberForField(supplier.wireTolerancePercent),
      pieceTolerancePercent: formatNumberForField(
        supplier.pieceTolerancePercent,
      ),
    },
    constraint,
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onValidate: validate,
  });
  return (
    <div className="space-y-6">
      <p className="text-sm">
        <BackLink to="/suppliers">Suppliers</BackLink>
      </p>
      <header>
        <p className="text-sm font-medium text-graphite-500">Supplier</p>
        <h1 className="mt-1 text-2xl font-semibold">{supplier.name}</h1>
        {supplier.notes ? (
          <p className="mt-1 max-w-3xl text-graphite-700">{supplier.notes}</p>
        ) : null}
      </header>

      <SupplierSummaryFigures
        supplier={supplier}
        priceLineCount={priceLineCount}
      />
      <SupplierDeliveryPanel performance={performance} />

      <SupplierCurrencyWarnings
        currency={supplier.currency}
        coverage={coverage}
      />

      <div className={canKeep ? "grid gap-8 lg:grid-cols-[1fr_22rem]" : ""}>
        <section aria-labelledby="imports-heading" className="space-y-2">
          <div className="flex flex-wrap items-baseline justify-between gap-3">
            <h2 id="imports-heading" className="text-lg font-semibold">
              Price lists{" "}
              <span className="font-normal text-graphite-500">
                ·{" "}
                {formatQuantity(
                  importCount,
                  importCount === 1 ? "import" : "imports",
                )}
                {importCount > importLimit
                  ? `, the latest ${importLimit} shown`
                  : ""}
              </span>
            </h2>
            {canKeep ? (
              <Link
                to="/suppliers/import"
                className="text-sm font-medium text-copper-700 underline-offset-2 hover:underline"
              >
                Import a price list
              </Link>
            ) : null}
          </div>
          <DataTable
            caption={`Price lists imported for ${supplier.name}, newest first`}
            columns={importColumns}
            rows={imports}
            emptyText={
              <EmptyState
                message="No price list imported for this supplier yet."
                next={{
                  capability: "importPriceLists",
                  to: "/suppliers/import",
                  label: "Import a price list",
                  does: "import price lists",
                }}
              />
            }
          />
        </section>

        {canKeep ? (
          <section
            aria-labelledby="edit-supplier-heading"
            className="panel h-fit"
          >
            <h2
              id="edit-supplier-heading"
              className="mb-1 text-lg font-semibold"
            >
              Edit supplier
            </h2>
            <p className="mb-3 text-sm text-graphite-500">
              Imported price lines keep the currency they were quoted in; a new
              currency applies to the next import.
            </p>
            <Form method="post" {...getFormProps(form)} className="space-y-4">
              <FormMessages id={form.errorId} errors={form.errors} />
              <SupplierFields fields={fields} coverage={coverage} />
              <button
                type="submit"
                className="button-primary w-full"
                disabled={navigation.state !== "idle"}
              >
                Save supplier
              </button>
            </Form>
          </section>
        ) : null}
      </div>
    </div>
  );
}
