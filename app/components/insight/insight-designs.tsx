/**
 * The design half of the cost insight, shared by the insight page and the manager's
 * start page: the what-if form (a GET form: the what-if lives in the address, the loader
 * works the figures out again, nothing is saved), the stacked chart of cost per N·m with
 * its figures beside it, and the table of cost per motor, cost per N·m and copper loss
 * per N·m with each design's end-turn factor.
 */
import { createColumnHelper } from "@tanstack/react-table";
import { Form, Link, useNavigation } from "react-router";
import { DataTable } from "~/components/data-table";
import type { InsightLoaderData } from "~/insight/insight-page.server";
import type { DesignInsight } from "~/insight/design-insight.server";
import {
  moneyChange,
  costingMoneyText,
  moneyFromJson,
  rankByCostPerNm,
  unpricedText,
} from "~/insight/design-insight";
import { ESTIMATED_TORQUE_PER_NM_LABEL } from "~/designs/design-costing";
import { costBasisLabels } from "~/designs/design-page";
import { formatDay, formatQuantity } from "~/lib/format";
import { costBasisText, PriceBasisNote } from "../design/price-basis-note";
import { InsightCostChart } from "./insight-cost-chart";
import { splitParts, Swatch } from "../insight-patterns";
import { countText } from "~/lib/unit-text";

export const whatIfFormId = "insight-what-if";

type Data = Pick<
  InsightLoaderData,
  | "designs"
  | "bases"
  | "fields"
  | "errors"
  | "whatIf"
  | "quantity"
  | "basis"
  | "today"
>;

function designLabel(design: DesignInsight): string {
  return `${design.name} · rev ${design.revision}`;
}

function FieldError({ id, messages }: { id: string; messages?: string[] }) {
  return messages ? (
    <p id={id} className="field-error">
      {messages.join(" ")}
    </p>
  ) : null;
}

function StoredBase({
  base,
  currency,
  metal,
}: {
  base: { pricePerKg: number; validFrom: string } | null;
  currency: string;
  metal: string;
}) {
  return (
    <p className="mt-1 text-xs text-graphite-500">
      {base
        ? `Stored: ${costingMoneyText(base.pricePerKg, currency, "kg")} from ${formatDay(base.validFrom)}`
        : `No ${metal} base stored in ${currency} for this day.`}
    </p>
  );
}

/** The what-if as a sentence, or null when the figures are the stored ones. */
function whatIfSentence(data: Data): string | null {
  const currency = data.bases.currency;
  const parts: string[] = [];
  for (const metal of ["copper", "aluminium"] as const) {
    const value =
      metal === "copper" ? data.whatIf.copperBase : data.whatIf.aluminiumBase;
    if (value === null) continue;
    const stored = data.bases[metal];
    parts.push(
      `${metal} base ${costingMoneyText(value, currency, "kg")}${stored ? ` instead of the stored ${costingMoneyText(stored.pricePerKg, currency, "kg")}` : ""}`,
    );
  }
  for (const design of data.designs.designs)
    if (design.endTurnScale !== 1)
      parts.push(
        `end turns × ${formatQuantity(design.endTurnScale, "", 2)} on ${design.name}`,
      );
  return parts.length === 0 ? null : parts.join("; ");
}

function pageHref(data: Data, page: number): string {
  const params = new URLSearchParams();
  const { fields } = data;
  if (fields.quantity) params.set("quantity", fields.quantity);
  if (fields.copperBase) params.set("copperBase", fields.copperBase);
  if (fields.aluminiumBase) params.set("aluminiumBase", fields.aluminiumBase);
  if (fields.date) params.set("date", fields.date);
  if (fields.basis) params.set("basis", fields.basis);
  for (const [id, value] of Object.entries(fields.endTurn))
    if (value) params.set(`endTurn.${id}`, value);
  params.set("page", String(page));
  return `?${params.toString()}`;
}

function splitColumns() {
  const column = createColumnHelper<DesignInsight>();
  return [
    column.accessor((design) => designLabel(design), {
      id: "design",
      header: "Design",
      cell: (info) => <span className="block min-w-28">{info.getValue()}</span>,
    }),
    ...splitParts.map((part) =>
      column.display({
        id: part.key,
        header: () => (
          <span className="flex flex-col items-end gap-1">
            <Swatch part={part} />
            <span>{part.label}</span>
          </span>
        ),
        cell: ({ row }) => {
          const split = row.original.splitPerNm;
          return split ? costingMoneyText(split[part.key]) : "—";
        },
        meta: { numeric: true },
      }),
    ),
    column.display({
      id: "total",
      header: `Total`,
      cell: ({ row }) =>
        !row.original.complete ? (
          <span className="text-xs text-caution">
            {unpricedText(row.original.unpriced.length)}
          </span>
        ) : row.original.costPerNm === null ? (
          "—"
        ) : (
          <span className="font-semibold">
            {costingMoneyText(row.original.costPerNm)}
          </span>
        ),
      meta: { numeric: true },
    }),
  ];
}

function designColumns(data: Data) {
  const column = createColumnHelper<DesignInsight>();
  const currency = data.bases.currency;
  const whatIfShown = data.designs.designs.some(
    (design) => design.asStored !== null,
  );
  return [
    column.display({
      id: "design",
      header: "Design",
      cell: ({ row }) => {
        const design = row.original;
        return (
          <span>
            <Link
              to={`/designs/${design.designId}/revisions/${design.revision}`}
              className="font-medium text-copper-700 underline-offset-2 hover:underline"
            >
              {design.name}
            </Link>
            <span className="block text-xs text-graphite-500">
              revision {design.revision}
              {design.motorType ? ` · ${design.motorType}` : ""}
            </span>
          </span>
        );
      },
    }),
    column.display({
      id: "torque",
      header: "Rated torque",
      cell: ({ row }) =>
        row.original.ratedTorqueNm === null ? (
          <span className="text-graphite-500">
            not given
            {row.original.perNmTorque?.source === "estimated" ? (
              <span className="block text-xs whitespace-nowrap">
                estimate{" "}
                {formatQuantity(row.original.perNmTorque.torqueNm, "N·m", 3)}{" "}
                (first-order)
              </span>
            ) : null}
          </span>
        ) : (
          <span className="whitespace-nowrap">
            {formatQuantity(row.original.ratedTorqueNm, "N·m", 3)}
            <span className="block text-xs text-graphite-500">
              {row.original.torqueBasis}
            </span>
          </span>
        ),
      meta: { numeric: true },
    }),
    column.display({
      id: "costPerMotor",
      header: () => (
        <span>
          Cost per motor
          <PriceBasisNote basis={data.basis} className="block" />
        </span>
      ),
      cell: ({ row }) => (
        <span>
          <span className="whitespace-nowrap">
            {costingMoneyText(row.original.costPerMotor, currency)}
          </span>
          {row.original.complete ? null : (
            <span className="ml-auto block max-w-48 text-xs text-caution">
              {unpricedText(row.original.unpriced.length)}:{" "}
              {row.original.unpriced.map((line) => line.sku).join(", ")}
            </span>
          )}
        </span>
      ),
      meta: { numeric: true },
    }),
    column.display({
      id: "costPerNm",
      header: () => (
        <span>
          Cost per N·m
          <PriceBasisNote basis={data.basis} className="block" />
        </span>
      ),
      cell: ({ row }) =>
        row.original.costPerNm === null ? (
          <span className="text-graphite-500">no torque</span>
        ) : (
          <span>
            <span className="font-semibold whitespace-nowrap">
              {costingMoneyText(row.original.costPerNm, currency, "N·m")}
            </span>
            {row.original.perNmTorque?.source === "estimated" ? (
              <span className="ml-auto block max-w-40 text-xs text-graphite-500">
                {ESTIMATED_TORQUE_PER_NM_LABEL}
              </span>
            ) : null}
          </span>
        ),
      meta: { numeric: true },
    }),
    ...(whatIfShown
      ? [
          column.display({
            id: "stored",
            header: "Stored cost per N·m",
            cell: ({ row }) => {
              const stored = row.original.asStored;
              if (!stored)
                return <span className="text-graphite-500">same</span>;
              return (
                <span className="whitespace-nowrap text-graphite-700">
                  {stored.costPerNm === null
                    ? "—"
                    : costingMoneyText(stored.costPerNm, currency, "N·m")}
                  {stored.costPerNm !== null &&
                  row.original.costPerNm !== null ? (
                    <span className="block text-xs">
                      what-if{" "}
                      {signed(
                        moneyChange(row.original.costPerNm, stored.costPerNm)!,
                      )}
                    </span>
                  ) : null}
                </span>
              );
            },
            meta: { numeric: true },
          }),
        ]
      : []),
    column.display({
      id: "copperLoss",
      header: "Copper loss per N·m",
      cell: ({ row }) =>
        row.original.copperLossPerNm === null ? (
          "—"
        ) : (
          <span className="whitespace-nowrap">
            {formatQuantity(row.original.copperLossPerNm, "W/N·m", 2)}
            <span className="block text-xs text-graphite-500">
              {formatQuantity(row.original.copperLossW, "W", 1)} at{" "}
              {formatQuantity(row.original.ratedCurrentA, "A", 1)}
            </span>
          </span>
        ),
      meta: { numeric: true },
    }),
    column.display({
      id: "endTurn",
      header: "End turns ×",
      cell: ({ row }) => {
        const id = row.original.designId;
        const name = `endTurn.${id}`;
        const errors = data.errors[name];
        return (
          <div className="relative w-24">
            <label htmlFor={`end-turn-${id}`} className="sr-only">
              End-turn factor for {row.original.name}
            </label>
            <input
              id={`end-turn-${id}`}
              form={whatIfFormId}
              name={name}
              type="number"
              min={0}
              max={5}
              step={0.05}
              inputMode="decimal"
              defaultValue={data.fields.endTurn[String(id)] ?? ""}
              placeholder="1"
              aria-invalid={errors ? true : undefined}
              aria-describedby={errors ? `${name}-error` : undefined}
              className="field-input mt-0 py-1 text-right print:hidden"
            />
            <span aria-hidden="true" className="hidden print:inline">
              × {formatQuantity(row.original.endTurnScale, "", 2)}
            </span>
            <FieldError id={`${name}-error`} messages={errors} />
          </div>
        );
      },
    }),
  ];
}

/**
 * The designs the ranking leaves out, set apart below the chart: with lines unpriced
 * their cost is too low to compare; without a torque there is no cost per N·m.
 */
function NotRanked({
  incomplete,
  withoutTorque,
  currency,
}: {
  incomplete: DesignInsight[];
  withoutTorque: DesignInsight[];
  currency: string;
}) {
  if (incomplete.length === 0 && withoutTorque.length === 0) return null;
  return (
    <div className="mt-3 border-t border-rule pt-2 text-sm">
      <h4 className="text-xs font-semibold tracking-wide text-graphite-500 uppercase">
        Not ranked
      </h4>
      <ul aria-label="Designs not ranked" className="mt-1 space-y-1">
        {incomplete.map((design) => (
          <li key={design.designId}>
            <span className="font-medium">{designLabel(design)}</span>:{" "}
            <span className="text-caution">
              {unpricedText(design.unpriced.length)}
            </span>
            <span className="text-graphite-500">
              {" "}
              (the priced lines alone:{" "}
              {costingMoneyText(design.costPerMotor, currency)} per motor)
            </span>
          </li>
        ))}
        {withoutTorque.map((design) => (
          <li key={design.designId}>
            <span className="font-medium">{designLabel(design)}</span>:{" "}
            <span className="text-graphite-500">
              no rated torque and no estimate, so no cost per N·m
            </span>
          </li>
        ))}
      </ul>
    </div>
  );
}

/** A change with its sign, in the unit of the figure above it: "+0.06", "−0.10", "±0.00". */
function signed(change: number): string {
  const value = moneyFromJson(change);
  const text = costingMoneyText(Number(value < 0n ? -value : value) / 10_000);
  return `${value > 0n ? "+" : value < 0n ? "−" : "±"}${text}`;
}

export function InsightDesigns({
  data,
  action,
}: {
  data: Data;
  /** Where the what-if form goes: the page it is on. */
  action: string;
}) {
  const navigation = useNavigation();
  const working =
    navigation.state === "loading" && navigation.location.pathname === action;
  const currency = data.bases.currency;
  const designs = data.designs.designs;
  const sentence = whatIfSentence(data);
  const ranking = rankByCostPerNm(designs);
  const pageCount = Math.max(
    1,
    Math.ceil(data.designs.total / data.designs.perPage),
  );
  const formKey = JSON.stringify(data.fields);
  return (
    <section aria-labelledby="insight-designs-heading" className="space-y-4">
      <div>
        <h2
          id="insight-designs-heading"
          className="break-after-avoid text-lg font-semibold"
        >
          Cost per N·m of released designs
        </h2>
        <p className="text-sm text-graphite-500">
          The latest released revision of each design, newest design first, at
          the {costBasisText(data.basis)} for{" "}
          {countText(data.quantity, "motor")} on {formatDay(data.designs.date)},
          in {currency}. Per N·m is per newton-metre of the rated torque, or of
          the first-order estimate where no rated torque is given (marked so).
        </p>
      </div>

      <Form
        key={formKey}
        id={whatIfFormId}
        method="get"
        action={action}
        preventScrollReset
        aria-label="What-if"
        className="panel flex flex-wrap items-start gap-4 py-4 print:hidden"
      >
        <div className="w-36">
          <label htmlFor="insight-quantity" className="field-label">
            Motors to cost
          </label>
          <input
            id="insight-quantity"
            name="quantity"
            type="number"
            min={1}
            max={1_000_000}
            step={1}
            inputMode="numeric"
            defaultValue={data.fields.quantity}
            placeholder="1"
            aria-invalid={data.errors.quantity ? true : undefined}
            aria-describedby={
              data.errors.quantity ? "quantity-error" : undefined
            }
            className="field-input"
          />
          <FieldError id="quantity-error" messages={data.errors.quantity} />
        </div>
        <div className="w-56">
          <label htmlFor="insight-copper" className="field-label">
            Copper base ({currency}/kg)
          </label>
          <input
            id="insight-copper"
            name="copperBase"
            type="number"
            min={0}
            step={0.0001}
            inputMode="decimal"
            defaultValue={data.fields.copperBase}
            placeholder={
              data.bases.copper ? String(data.bases.copper.pricePerKg) : ""
            }
            aria-invalid={data.errors.copperBase ? true : undefined}
            aria-describedby={
              data.errors.copperBase
                ? "copper-stored copperBase-error"
                : "copper-stored"
            }
            className="field-input"
          />
          <div id="copper-stored">
            <StoredBase
              base={data.bases.copper}
              currency={currency}
              metal="copper"
            />
          </div>
          <FieldError id="copperBase-error" messages={data.errors.copperBase} />
        </div>
        <div className="w-56">
          <label htmlFor="insight-aluminium" className="field-label">
            Aluminium base ({currency}/kg)
          </label>
          <input
            id="insight-aluminium"
            name="aluminiumBase"
            type="number"
            min={0}
            step={0.0001}
            inputMode="decimal"
            defaultValue={data.fields.aluminiumBase}
            placeholder={
              data.bases.aluminium
                ? String(data.bases.aluminium.pricePerKg)
                : ""
            }
            aria-invalid={data.errors.aluminiumBase ? true : undefined}
            aria-describedby={
              data.errors.aluminiumBase
                ? "aluminium-stored aluminiumBase-error"
                : "aluminium-stored"
            }
            className="field-input"
          />
          <div id="aluminium-stored">
            <StoredBase
              base={data.bases.aluminium}
              currency={currency}
              metal="aluminium"
            />
          </div>
          <FieldError
            id="aluminiumBase-error"
            messages={data.errors.aluminiumBase}
          />
        </div>
        <div className="w-64">
          <label htmlFor="insight-basis" className="field-label">
            Price basis
          </label>
          <select
            id="insight-basis"
            name="basis"
            defaultValue={data.basis}
            aria-invalid={data.errors.basis ? true : undefined}
            aria-describedby={data.errors.basis ? "basis-error" : undefined}
            className="field-input"
          >
            {Object.entries(costBasisLabels).map(([basis, label]) => (
              <option key={basis} value={basis}>
                {label}
              </option>
            ))}
          </select>
          <FieldError id="basis-error" messages={data.errors.basis} />
        </div>
        {data.fields.date ? (
          <input type="hidden" name="date" value={data.fields.date} />
        ) : null}
        {data.designs.page > 1 ? (
          <input type="hidden" name="page" value={data.designs.page} />
        ) : null}
        <div className="flex flex-col gap-2 pt-6">
          <div className="flex gap-2">
            <button type="submit" className="button-primary" disabled={working}>
              {working ? "Working it out…" : "Work out the what-if"}
            </button>
            {sentence ? (
              <Link to={action} preventScrollReset className="button-quiet">
                Back to stored figures
              </Link>
            ) : null}
          </div>
          <p className="max-w-md text-xs text-graphite-500">
            Nothing is saved. A metal base stands in for the stored one in{" "}
            {currency}; supplier lines quoted in another currency keep their own
            base. The end-turn factor of each design is in its row below (1 = as
            designed).
          </p>
        </div>
      </Form>

      {sentence ? (
        <p
          role="status"
          className="rounded-md border border-copper-300 bg-copper-50 px-4 py-2 text-sm"
        >
          <span className="font-semibold">What-if, not saved:</span> {sentence}.
        </p>
      ) : null}
      {data.errors.page || data.errors.perPage || data.errors.date ? (
        <p role="alert" className="field-error">
          {[
            ...(data.errors.page ?? []),
            ...(data.errors.perPage ?? []),
            ...(data.errors.date ?? []),
          ].join(" ")}
        </p>
      ) : null}

      {designs.length === 0 ? (
        <p className="panel text-sm text-graphite-500">
          No design has a released revision yet. Builders release revisions on
          the{" "}
          <Link to="/designs" className="text-copper-700 underline">
            Designs
          </Link>{" "}
          page; they appear here with their costs.
        </p>
      ) : (
        <>
          <div className="grid items-start gap-6 xl:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
            <div className="panel break-inside-avoid">
              <h3 className="mb-2 text-sm font-semibold">
                Where the money per N·m goes, cheapest first
              </h3>
              <InsightCostChart
                currency={currency}
                basis={costBasisText(data.basis)}
                rows={ranking.ranked.map((design) => ({
                  key: String(design.designId),
                  label: designLabel(design),
                  costPerNm: design.costPerNm,
                  splitPerNm: design.splitPerNm,
                  complete: design.complete,
                  estimated: design.perNmTorque?.source === "estimated",
                }))}
              />
              <NotRanked
                incomplete={ranking.incomplete}
                withoutTorque={ranking.withoutTorque}
                currency={currency}
              />
            </div>
            <div className="break-inside-avoid">
              <DataTable
                caption={`Cost per N·m by part, ${currency} per N·m at the ${costBasisText(data.basis)} (the chart's figures)`}
                columns={splitColumns()}
                rows={[
                  ...ranking.ranked,
                  ...ranking.incomplete,
                  ...ranking.withoutTorque,
                ]}
              />
              <p className="mt-1 text-xs text-graphite-500">
                In {currency} per N·m of rated torque; the five parts add up to
                the total exactly.
              </p>
            </div>
          </div>
          <DataTable
            caption={`Released designs: cost per motor and per N·m in ${currency}, copper loss per N·m at rated current`}
            columns={designColumns(data)}
            rows={designs}
            page={data.designs.page}
            pageCount={pageCount}
            pageHref={(page) => pageHref(data, page)}
          />
        </>
      )}
    </section>
  );
}
