import { createColumnHelper } from "~/lib/table-columns";
import { useMemo } from "react";
import { Form } from "react-router";
import type {
  DesignPageData,
  DesignPageLine,
} from "~/designs/design-page.server";
import { ESTIMATED_TORQUE_PER_NM_LABEL } from "~/designs/design-costing";
import { costBasisLabels } from "~/designs/cost-basis";
import type { CostQuery } from "~/designs/design-page";
import { formatQuantity } from "~/lib/format";
import { countText, moneyText, quantityText } from "~/lib/unit-text";
import { formatMass } from "~/reference/quantity-display";
import { DataTableView } from "~/components/data-table-view";
import { costBasisText, PriceBasisNote } from "./price-basis-note";
import { DesignCostSplit } from "./cost-split";

type Costing = DesignPageData["costing"];
type CostLine = Costing["lines"][number];

const kindNames = { coil: "Coil", magnet: "Magnet", part: "Part" } as const;

/** A line's quantity per motor with its unit: wire as the mass drawn, scrap included. */
export function perMotorText(line: CostLine): string {
  if (line.unit === "kg" && line.kind === "coil")
    return `${formatMass(line.perMotorQuantity)} drawn${line.massBasis === "bare" ? " (bare conductor)" : ""}`;
  return quantityText(
    line.perMotorQuantity,
    line.unit,
    Number.isInteger(line.perMotorQuantity) ? 0 : 3,
  );
}

/** What "per N·m" is over: the rated torque, or the first-order estimate (labelled so). */
export function perNmTorqueText(
  torque: Costing["perNmTorque"],
  torqueBasis: string,
): string {
  if (!torque)
    return "Give the rated torque, or the air-gap radius and flux density for an estimate, to see it.";
  return torque.source === "rated"
    ? `per N·m of rated torque ${formatQuantity(torque.torqueNm, "N·m", 3)}, ${torqueBasis}`
    : `${ESTIMATED_TORQUE_PER_NM_LABEL}, ${formatQuantity(torque.torqueNm, "N·m", 3)}`;
}

interface PriceRow {
  line: CostLine;
  position: number;
  itemName: string;
}
const priceColumn = createColumnHelper<PriceRow>();

/** Every line's price and where it comes from. */
export function DesignPriceTable({
  costing,
  lines,
}: {
  costing: Costing;
  lines: DesignPageLine[];
}) {
  const currency = costing.currency;
  const rows: PriceRow[] = costing.lines.map((line, index) => ({
    line,
    position: index + 1,
    itemName: lines[index]?.itemName ?? "",
  }));
  const columns = useMemo(
    () => [
      priceColumn.accessor("position", {
        header: "Line",
        meta: { numeric: true },
      }),
      priceColumn.display({
        id: "item",
        header: "Item",
        cell: ({ row }) => (
          <div className="min-w-36">
            <div className="font-medium">{row.original.itemName}</div>
            <div className="text-xs text-graphite-500">
              {kindNames[row.original.line.kind as keyof typeof kindNames] ??
                row.original.line.kind}{" "}
              · {row.original.line.sku}
            </div>
          </div>
        ),
      }),
      priceColumn.display({
        id: "perMotor",
        header: "Per motor",
        meta: { numeric: true },
        cell: ({ row }) => perMotorText(row.original.line),
      }),
      priceColumn.display({
        id: "unitPrice",
        header: "Unit price",
        meta: { numeric: true },
        cell: ({ row }) =>
          moneyText(
            row.original.line.unitPrice,
            currency,
            row.original.line.unit,
          ),
      }),
      priceColumn.display({
        id: "cost",
        header: "Cost per motor",
        meta: { numeric: true },
        cell: ({ row }) =>
          row.original.line.cost === null ? (
            <span className="font-medium text-caution">no price</span>
          ) : (
            moneyText(row.original.line.cost, currency)
          ),
      }),
      priceColumn.display({
        id: "source",
        header: "Price source",
        cell: ({ row }) => (
          <span className="block min-w-56 text-xs text-graphite-700">
            {row.original.line.priceSource ??
              "No price: import a supplier price list, or receive stock with a unit cost."}
          </span>
        ),
      }),
    ],
    [currency],
  );
  return (
    <DataTableView
      caption={`Each line's price per motor at the ${costBasisText(costing.basis)}, and where the price comes from`}
      columns={columns}
      rows={rows}
      emptyText="No lines to price yet."
    />
  );
}

function Figure({
  label,
  value,
  wide = false,
  children,
}: {
  label: string;
  value: React.ReactNode;
  /** Across the whole row (a figure with a longer explanation). */
  wide?: boolean;
  children?: React.ReactNode;
}) {
  return (
    <div
      role="group"
      aria-label={label}
      className={`rounded-md border border-rule bg-white/60 px-4 py-3 ${wide ? "sm:col-span-2 xl:col-span-4" : ""}`}
    >
      <dl>
        <dt className="text-xs font-medium uppercase tracking-wide text-graphite-500">
          {label}
        </dt>
        <dd className="mt-1 text-xl font-semibold tabular-nums">{value}</dd>
        {children ? (
          <dd className="mt-1 text-xs text-graphite-500">{children}</dd>
        ) : null}
      </dl>
    </div>
  );
}

/** The costing's headline figures: cost per motor and per N·m, copper loss and the torque estimate. */
export function DesignCostFigures({
  costing,
  torqueBasis,
}: {
  costing: Costing;
  torqueBasis: string;
}) {
  const currency = costing.currency;
  const estimate = costing.torqueEstimate;
  const unpriced = costing.unpriced.length;
  return (
    <div className="grid items-start gap-3 sm:grid-cols-2 xl:grid-cols-4">
      <Figure
        label="Cost per motor"
        value={moneyText(costing.costPerMotor, currency)}
      >
        {`for ${countText(costing.quantity, "motor")} `}
        <PriceBasisNote basis={costing.basis} />
        {costing.complete ? null : (
          <span className="block font-medium text-caution">
            {`Incomplete: ${countText(unpriced, "line")} without a price ${unpriced === 1 ? "is" : "are"} left out.`}
          </span>
        )}
      </Figure>
      <Figure
        label="Cost per N·m"
        value={moneyText(costing.costPerNm, currency, "N·m")}
      >
        {perNmTorqueText(costing.perNmTorque, torqueBasis)}
        {costing.costPerNm === null ? null : (
          <>
            {" "}
            <PriceBasisNote basis={costing.basis} />
          </>
        )}
      </Figure>
      <Figure
        label="Copper loss"
        value={formatQuantity(costing.copperLossW, "W", 2)}
      >
        every coil at the rated phase current ÷ parallel paths, hot
      </Figure>
      <Figure
        label="Copper loss per N·m"
        value={
          costing.copperLossPerNm === null
            ? "—"
            : formatQuantity(costing.copperLossPerNm, "W/(N·m)", 2)
        }
      >
        {!costing.perNmTorque
          ? "Give the rated torque (or the figures for an estimate) to see it."
          : costing.perNmTorque.source === "rated"
            ? "copper loss ÷ rated torque"
            : `copper loss ÷ estimated torque (first-order)`}
      </Figure>
      <Figure
        wide
        label="Torque, first-order estimate"
        value={
          "torqueNm" in estimate
            ? formatQuantity(estimate.torqueNm, "N·m", 3)
            : "—"
        }
      >
        {"torqueNm" in estimate ? (
          <>
            {estimate.label} Kt ={" "}
            {formatQuantity(estimate.constants.ktNmPerA, "N·m/A", 3)}, k_w1 ={" "}
            {formatQuantity(estimate.windingFactor, "", 3)}, B_g ={" "}
            {formatQuantity(estimate.fluxDensityT, "T", 3)} (fundamental{" "}
            {formatQuantity(estimate.fundamentalFluxDensityT, "T", 3)} with α_p
            = {formatQuantity(estimate.poleCoverage, "", 2)}
            {estimate.poleCoverageSource === "given"
              ? ", given"
              : `: ${estimate.poleCoverageSource}`}
            ), active conductor {formatQuantity(estimate.forceLengthM, "m", 3)}.
          </>
        ) : (
          <>
            {estimate.label} {estimate.missing}
          </>
        )}
      </Figure>
    </div>
  );
}

/** The build quantity and price basis of the costing (a GET form: the address keeps them). */
export function CostQueryForm({ query }: { query: CostQuery }) {
  return (
    <Form
      method="get"
      preventScrollReset
      replace
      className="flex flex-wrap items-end gap-4 print:hidden"
      aria-label="Build quantity and price basis"
    >
      <div>
        <label htmlFor="cost-quantity" className="field-label">
          Motors in the build
        </label>
        <input
          id="cost-quantity"
          name="quantity"
          inputMode="numeric"
          defaultValue={query.typed.quantity || String(query.quantity)}
          aria-invalid={query.errors.quantity ? true : undefined}
          aria-describedby={
            query.errors.quantity ? "cost-quantity-error" : undefined
          }
          className="field-input w-32 text-right tabular-nums"
        />
        {query.errors.quantity ? (
          <p id="cost-quantity-error" className="field-error">
            {query.errors.quantity} Showing 1 motor.
          </p>
        ) : null}
      </div>
      <div>
        <label htmlFor="cost-basis" className="field-label">
          Price lines by
        </label>
        <select
          id="cost-basis"
          name="basis"
          defaultValue={query.basis}
          aria-invalid={query.errors.basis ? true : undefined}
          className="field-input"
        >
          {Object.entries(costBasisLabels).map(([basis, label]) => (
            <option key={basis} value={basis}>
              {label}
            </option>
          ))}
        </select>
        {query.errors.basis ? (
          <p className="field-error">{query.errors.basis}</p>
        ) : null}
      </div>
      <button type="submit" className="button-quiet">
        Update costs
      </button>
    </Form>
  );
}

/** Cost per motor: the build quantity form, the headline figures, the split and every price. */
export function DesignCostPanel({
  costing,
  query,
  lines,
  torqueBasis,
}: {
  costing: Costing;
  query: CostQuery;
  lines: DesignPageLine[];
  torqueBasis: string;
}) {
  return (
    <section aria-labelledby="cost-heading" className="panel space-y-5">
      <div className="flex flex-wrap items-baseline justify-between gap-3">
        <h2 id="cost-heading" className="text-lg font-semibold">
          Cost per motor
        </h2>
        <p className="text-sm text-graphite-500">
          In {costing.currency} at the {costBasisText(costing.basis)}, rounded
          to the cent for display; prices as of today (UTC).
        </p>
      </div>
      <CostQueryForm query={query} />
      <DesignCostFigures costing={costing} torqueBasis={torqueBasis} />
      <DesignCostSplit split={costing.split} currency={costing.currency} />
      <div className="space-y-2">
        <h3 className="text-sm font-semibold">Prices of the lines</h3>
        <DesignPriceTable costing={costing} lines={lines} />
      </div>
    </section>
  );
}
