/**
 * The columns of the design insight's two tables: the cost per N·m split by part (the
 * chart's figures) and the released designs with cost per motor, cost per N·m, the stored
 * figure beside a what-if, copper loss per N·m and the end-turn factor input.
 */
import { createColumnHelper } from "~/lib/table-columns";
import { Link } from "react-router";
import type { DesignInsight } from "~/insight/design-insight.server";
import {
  costingMoneyText,
  moneyChange,
  unpricedText,
} from "~/insight/design-insight";
import { ESTIMATED_TORQUE_PER_NM_LABEL } from "~/designs/design-costing";
import { formatQuantity } from "~/lib/format";
import { PriceBasisNote } from "../design/price-basis-note";
import { splitParts, Swatch } from "../insight-patterns";
import {
  designLabel,
  type InsightDesignsData,
  signedChangeText,
  whatIfFormId,
} from "./design-insight-text";
import { FieldError } from "./field-error";

export function splitColumns() {
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

function DesignCell({ design }: { design: DesignInsight }) {
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
}

function TorqueCell({ design }: { design: DesignInsight }) {
  return design.ratedTorqueNm === null ? (
    <span className="text-graphite-500">
      not given
      {design.perNmTorque?.source === "estimated" ? (
        <span className="block text-xs whitespace-nowrap">
          estimate {formatQuantity(design.perNmTorque.torqueNm, "N·m", 3)}{" "}
          (first-order)
        </span>
      ) : null}
    </span>
  ) : (
    <span className="whitespace-nowrap">
      {formatQuantity(design.ratedTorqueNm, "N·m", 3)}
      <span className="block text-xs text-graphite-500">
        {design.torqueBasis}
      </span>
    </span>
  );
}

function CostPerMotorCell({
  design,
  currency,
}: {
  design: DesignInsight;
  currency: string;
}) {
  return (
    <span>
      <span className="whitespace-nowrap">
        {costingMoneyText(design.costPerMotor, currency)}
      </span>
      {design.complete ? null : (
        <span className="ml-auto block max-w-48 text-xs text-caution">
          {unpricedText(design.unpriced.length)}:{" "}
          {design.unpriced.map((line) => line.sku).join(", ")}
        </span>
      )}
    </span>
  );
}

function CostPerNmCell({
  design,
  currency,
}: {
  design: DesignInsight;
  currency: string;
}) {
  return design.costPerNm === null ? (
    <span className="text-graphite-500">no torque</span>
  ) : (
    <span>
      <span className="font-semibold whitespace-nowrap">
        {costingMoneyText(design.costPerNm, currency, "N·m")}
      </span>
      {design.perNmTorque?.source === "estimated" ? (
        <span className="ml-auto block max-w-40 text-xs text-graphite-500">
          {ESTIMATED_TORQUE_PER_NM_LABEL}
        </span>
      ) : null}
    </span>
  );
}

/** The stored cost per N·m beside a what-if, with the what-if's change. */
function StoredCostCell({
  design,
  currency,
}: {
  design: DesignInsight;
  currency: string;
}) {
  const stored = design.asStored;
  if (!stored) return <span className="text-graphite-500">same</span>;
  return (
    <span className="whitespace-nowrap text-graphite-700">
      {stored.costPerNm === null
        ? "—"
        : costingMoneyText(stored.costPerNm, currency, "N·m")}
      {stored.costPerNm !== null && design.costPerNm !== null ? (
        <span className="block text-xs">
          what-if{" "}
          {signedChangeText(moneyChange(design.costPerNm, stored.costPerNm)!)}
        </span>
      ) : null}
    </span>
  );
}

function CopperLossCell({ design }: { design: DesignInsight }) {
  return design.copperLossPerNm === null ? (
    "—"
  ) : (
    <span className="whitespace-nowrap">
      {formatQuantity(design.copperLossPerNm, "W/N·m", 2)}
      <span className="block text-xs text-graphite-500">
        {formatQuantity(design.copperLossW, "W", 1)} at{" "}
        {formatQuantity(design.ratedCurrentA, "A", 1)}
      </span>
    </span>
  );
}

/** The end-turn factor of one design: an input of the what-if form, by the form's id. */
function EndTurnCell({
  design,
  data,
}: {
  design: DesignInsight;
  data: InsightDesignsData;
}) {
  const id = design.designId;
  const name = `endTurn.${id}`;
  const errors = data.errors[name];
  return (
    <div className="relative w-24">
      <label htmlFor={`end-turn-${id}`} className="sr-only">
        End-turn factor for {design.name}
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
        × {formatQuantity(design.endTurnScale, "", 2)}
      </span>
      <FieldError id={`${name}-error`} messages={errors} />
    </div>
  );
}

function PerBasisHeader({
  title,
  basis,
}: {
  title: string;
  basis: InsightDesignsData["basis"];
}) {
  return (
    <span>
      {title}
      <PriceBasisNote basis={basis} className="block" />
    </span>
  );
}

export function designColumns(data: InsightDesignsData) {
  const column = createColumnHelper<DesignInsight>();
  const currency = data.bases.currency;
  const whatIfShown = data.designs.designs.some(
    (design) => design.asStored !== null,
  );
  return [
    column.display({
      id: "design",
      header: "Design",
      cell: ({ row }) => <DesignCell design={row.original} />,
    }),
    column.display({
      id: "torque",
      header: "Rated torque",
      cell: ({ row }) => <TorqueCell design={row.original} />,
      meta: { numeric: true },
    }),
    column.display({
      id: "costPerMotor",
      header: () => (
        <PerBasisHeader title="Cost per motor" basis={data.basis} />
      ),
      cell: ({ row }) => (
        <CostPerMotorCell design={row.original} currency={currency} />
      ),
      meta: { numeric: true },
    }),
    column.display({
      id: "costPerNm",
      header: () => <PerBasisHeader title="Cost per N·m" basis={data.basis} />,
      cell: ({ row }) => (
        <CostPerNmCell design={row.original} currency={currency} />
      ),
      meta: { numeric: true },
    }),
    ...(whatIfShown
      ? [
          column.display({
            id: "stored",
            header: "Stored cost per N·m",
            cell: ({ row }) => (
              <StoredCostCell design={row.original} currency={currency} />
            ),
            meta: { numeric: true },
          }),
        ]
      : []),
    column.display({
      id: "copperLoss",
      header: "Copper loss per N·m",
      cell: ({ row }) => <CopperLossCell design={row.original} />,
      meta: { numeric: true },
    }),
    column.display({
      id: "endTurn",
      header: "End turns ×",
      cell: ({ row }) => <EndTurnCell design={row.original} data={data} />,
    }),
  ];
}
