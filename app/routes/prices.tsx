import { getZodConstraint } from "@conform-to/zod/v4";
import { parseForm } from "~/lib/parse-form";
import { createColumnHelper } from "~/lib/table-columns";
import { data, useLocation } from "react-router";
import type { Route } from "./+types/prices";
import { requireCapability, requireUser } from "~/auth/guard.server";
import { CurrencyRateForm } from "~/components/currency-rate-form";
import { DataTable } from "~/components/data-table";
import { MetalBaseForm } from "~/components/metal-base-form";
import { redirectWithFlash } from "~/lib/flash.server";
import { formatQuantity } from "~/lib/format";
import { userCan } from "~/lib/capabilities";
import { companyCurrencyRateRefusal } from "~/purchasing/currency-rate-rules";
import { todayUtc } from "~/lib/calendar-days";
import { entriesInForce } from "~/purchasing/current-entries";
import {
  currencyRateSchema,
  metalBaseSchema,
} from "~/purchasing/supplier-schemas";
import {
  companyCurrency,
  listCurrencyRates,
  listMetalBase,
  setCurrencyRate,
  setMetalBase,
} from "~/purchasing/suppliers.server";

export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireUser(request);
  const [currency, metalBase, rates] = await Promise.all([
    companyCurrency(),
    listMetalBase(200),
    listCurrencyRates(200),
  ]);
  const today = todayUtc();
  return {
    companyCurrency: currency,
    today,
    metalBase,
    currentMetalBase: entriesInForce(
      metalBase,
      (entry) => `${entry.conductor} ${entry.currency}`,
      today,
    ),
    rates,
    currentRates: entriesInForce(rates, (entry) => entry.currency, today),
    canKeep: userCan(user, "keepPrices"),
    // The forms' field constraints; their checks load after hydration (useBrowserValidation).
    constraints: {
      metalBase: getZodConstraint(metalBaseSchema),
      currencyRate: getZodConstraint(currencyRateSchema),
    },
  };
}

export async function action({ request }: Route.ActionArgs) {
  const user = await requireCapability(request, "keepPrices");
  const formData = await request.formData();
  const intent = formData.get("intent");
  if (intent === "metal-base") {
    const submission = parseForm(formData, { schema: metalBaseSchema });
    if (submission.status !== "success") {
      return data({ intent, result: submission.reply() }, { status: 400 });
    }
    await setMetalBase(submission.value, user.id);
    return redirectWithFlash("/prices", { code: "metal-base-saved" });
  }
  if (intent === "currency-rate") {
    const submission = parseForm(formData, { schema: currencyRateSchema });
    if (submission.status !== "success") {
      return data({ intent, result: submission.reply() }, { status: 400 });
    }
    const refusal = companyCurrencyRateRefusal(
      submission.value.currency,
      await companyCurrency(),
    );
    if (refusal) {
      const result = submission.reply({
        fieldErrors: { currency: [refusal] },
      });
      return data({ intent, result }, { status: 400 });
    }
    await setCurrencyRate(submission.value, user.id);
    return redirectWithFlash("/prices", { code: "currency-rate-saved" });
  }
  return data(
    { intent: null, result: undefined },
    { status: 400, statusText: "Unknown form" },
  );
}

export const meta: Route.MetaFunction = () => [
  { title: "Metal base and currency rates · Turnledger" },
];

type LoaderData = Route.ComponentProps["loaderData"];
type MetalBaseEntry = LoaderData["metalBase"][number];
type RateEntry = LoaderData["rates"][number];

const conductorLabels: Record<string, string> = {
  copper: "Copper",
  aluminium: "Aluminium",
};

const perKg = (entry: MetalBaseEntry) =>
  formatQuantity(entry.pricePerKg, `${entry.currency}/kg`, 4);

const baseColumn = createColumnHelper<MetalBaseEntry>();
const metalBaseColumns = [
  baseColumn.accessor("validFrom", {
    header: "Valid from",
    cell: (info) => <span className="tabular-nums">{info.getValue()}</span>,
  }),
  baseColumn.accessor("conductor", {
    header: "Conductor",
    cell: (info) => conductorLabels[info.getValue()] ?? info.getValue(),
  }),
  baseColumn.accessor("pricePerKg", {
    header: "Base",
    meta: { numeric: true },
    cell: (info) => perKg(info.row.original),
  }),
];

function rateColumns(company: string) {
  const column = createColumnHelper<RateEntry>();
  return [
    column.accessor("validFrom", {
      header: "Valid from",
      cell: (info) => <span className="tabular-nums">{info.getValue()}</span>,
    }),
    column.accessor("currency", { header: "Currency" }),
    column.accessor("rate", {
      header: `Rate to ${company}`,
      meta: { numeric: true },
      cell: (info) =>
        `1 ${info.row.original.currency} = ${formatQuantity(info.getValue(), company, 6)}`,
    }),
  ];
}

function InForce({
  label,
  items,
}: {
  label: string;
  items: { key: string; name: string; value: string; since: string }[];
}) {
  return (
    <dl aria-label={label} className="mb-4 flex flex-wrap gap-3">
      {items.length === 0 ? (
        <p className="text-sm text-graphite-500">Nothing in force yet.</p>
      ) : null}
      {items.map((item) => (
        <div
          key={item.key}
          className="min-w-44 rounded-md border border-rule bg-sheet px-3 py-2"
        >
          <dt className="text-xs text-graphite-500">{item.name}</dt>
          <dd className="text-lg font-semibold tabular-nums text-copper-700">
            {item.value}
          </dd>
          <dd className="text-xs text-graphite-500">since {item.since}</dd>
        </div>
      ))}
    </dl>
  );
}

export default function Prices({
  loaderData,
  actionData,
}: Route.ComponentProps) {
  const { companyCurrency: company, today, canKeep } = loaderData;
  // A new key after each save starts the forms afresh instead of keeping the saved values.
  const { key: visit } = useLocation();
  const twoColumns = canKeep
    ? "grid gap-6 lg:grid-cols-[1fr_22rem]"
    : "max-w-3xl";
  return (
    <div className="space-y-10">
      <header>
        <h1 className="text-2xl font-semibold">
          Metal base and currency rates
        </h1>
        <p className="mt-1 text-sm text-graphite-500">
          What wire prices are built on, and how other currencies convert to{" "}
          {company}, the company currency. Dates are UTC days.
        </p>
      </header>

      <section aria-labelledby="metal-base-heading">
        <h2 id="metal-base-heading" className="mb-3 text-lg font-semibold">
          Metal base
        </h2>
        <div className={twoColumns}>
          <div>
            <InForce
              label="Metal base in force today"
              items={loaderData.currentMetalBase.map((entry) => ({
                key: `${entry.conductor} ${entry.currency}`,
                name: `${conductorLabels[entry.conductor] ?? entry.conductor} (${entry.currency})`,
                value: perKg(entry),
                since: entry.validFrom,
              }))}
            />
            <DataTable
              caption="Metal base history, newest first"
              columns={metalBaseColumns}
              rows={loaderData.metalBase}
              emptyText="No metal base set yet."
            />
          </div>
          {canKeep ? (
            <MetalBaseForm
              key={visit}
              constraint={loaderData.constraints.metalBase}
              lastResult={
                actionData?.intent === "metal-base"
                  ? actionData.result
                  : undefined
              }
              companyCurrency={company}
              today={today}
            />
          ) : null}
        </div>
      </section>

      <section aria-labelledby="currency-rates-heading">
        <h2 id="currency-rates-heading" className="mb-3 text-lg font-semibold">
          Currency rates
        </h2>
        <div className={twoColumns}>
          <div>
            <InForce
              label="Currency rates in force today"
              items={loaderData.currentRates.map((entry) => ({
                key: entry.currency,
                name: `1 ${entry.currency}`,
                value: formatQuantity(entry.rate, company, 6),
                since: entry.validFrom,
              }))}
            />
            <DataTable
              caption="Currency rate history, newest first"
              columns={rateColumns(company)}
              rows={loaderData.rates}
              emptyText="No currency rates yet."
            />
          </div>
          {canKeep ? (
            <CurrencyRateForm
              key={visit}
              constraint={loaderData.constraints.currencyRate}
              lastResult={
                actionData?.intent === "currency-rate"
                  ? actionData.result
                  : undefined
              }
              companyCurrency={company}
              today={today}
            />
          ) : null}
        </div>
      </section>
    </div>
  );
}
