import type { ColumnDef } from "@tanstack/react-table";
import { createColumnHelper } from "~/lib/table-columns";
import { useMemo } from "react";
import { Form, useFetcher } from "react-router";
import type { SubstituteQuery } from "~/designs/wire-substitute-schemas";
import type { SubstitutePanel } from "~/designs/wire-substitutes.server";
import { formatQuantity } from "~/lib/format";
import { moneyText } from "~/lib/unit-text";
import { formatMass } from "~/reference/quantity-display";
import { DataTableView } from "~/components/data-table-view";
import type { DesignActionAnswer } from "./action-answer";

type Substitute = SubstitutePanel["substitutes"][number];

/** "+0.82 %", "−0.81 %", "0.00 %": a change with its sign (a true minus), none when it shows as zero. */
function signed(value: number, text: (magnitude: number) => string): string {
  const shown = text(Math.abs(value));
  if (!/[1-9]/.test(shown)) return shown;
  return `${value < 0 ? "\u2212" : "+"}${shown}`;
}

const percent = (value: number) =>
  signed(value, (magnitude) => formatQuantity(magnitude, "%", 2));

/** The "Use this" button of one proposal: a post to the page's action, its refusal beside it. */
function UseSubstitute({
  position,
  substitute,
  tolerancePercent,
}: {
  position: number;
  substitute: Substitute;
  tolerancePercent: number;
}) {
  const fetcher = useFetcher<DesignActionAnswer>();
  const busy = fetcher.state !== "idle";
  const refusal =
    fetcher.data && !fetcher.data.ok
      ? (fetcher.data.message ??
        Object.values(fetcher.data.result?.error ?? {})
          .flat()
          .join(" "))
      : null;
  return (
    <fetcher.Form method="post" className="space-y-1">
      <input type="hidden" name="intent" value="use-substitute" />
      <input type="hidden" name="line" value={position} />
      <input type="hidden" name="sku" value={substitute.sku} />
      <input type="hidden" name="strands" value={substitute.strands} />
      <input type="hidden" name="tolerance" value={tolerancePercent} />
      <button
        type="submit"
        className="button-quiet whitespace-nowrap"
        disabled={busy}
        aria-label={`Use ${substitute.strands} × ${substitute.sku} on line ${position}`}
      >
        {busy ? "Applying…" : "Use this"}
      </button>
      {refusal ? (
        <p role="alert" className="field-error max-w-xs">
          {refusal}
        </p>
      ) : null}
    </fetcher.Form>
  );
}

const column = createColumnHelper<Substitute>();

function useSubstituteColumns(
  position: number,
  currency: string,
  canEdit: boolean,
  tolerancePercent: number,
) {
  return useMemo(() => {
    const list: ColumnDef<Substitute, unknown>[] = [
      column.display({
        id: "wire",
        header: "Wire in hand",
        cell: ({ row }) => (
          <div>
            <div className="font-medium">
              {row.original.strands} × {row.original.sku}
            </div>
            <div className="text-xs text-graphite-500">
              {row.original.name}, bare{" "}
              {formatQuantity(row.original.bareDiameterMm, "mm", 3)}
            </div>
          </div>
        ),
      }) as ColumnDef<Substitute, unknown>,
      column.accessor("areaChangePercent", {
        header: "Copper area",
        meta: { numeric: true },
        cell: ({ getValue }) => percent(getValue()),
      }) as ColumnDef<Substitute, unknown>,
      column.accessor("resistanceChangePercent", {
        header: "Resistance",
        meta: { numeric: true },
        cell: ({ getValue }) => percent(getValue()),
      }) as ColumnDef<Substitute, unknown>,
      column.accessor("copperLossChangeW", {
        header: "Copper loss per motor",
        meta: { numeric: true },
        cell: ({ getValue }) => {
          const value = getValue();
          return value === null
            ? "—"
            : signed(value, (magnitude) => formatQuantity(magnitude, "W", 2));
        },
      }) as ColumnDef<Substitute, unknown>,
      column.accessor("massChangeKg", {
        header: "Wire per motor",
        meta: { numeric: true },
        cell: ({ getValue }) => signed(getValue(), formatMass),
      }) as ColumnDef<Substitute, unknown>,
      column.display({
        id: "fill",
        header: "Slot fill",
        meta: { numeric: true },
        cell: ({ row }) =>
          row.original.grossFill === null
            ? row.original.copperFill === null
              ? "no slot area"
              : `${formatQuantity(row.original.copperFill, "", 3)} copper`
            : `${formatQuantity(row.original.grossFill, "", 3)} gross`,
      }) as ColumnDef<Substitute, unknown>,
      column.accessor("costPerMotorChange", {
        header: "Cost per motor",
        meta: { numeric: true },
        cell: ({ getValue }) => {
          const value = getValue();
          return value === null
            ? "no cost known"
            : signed(value, (magnitude) => moneyText(magnitude, currency));
        },
      }) as ColumnDef<Substitute, unknown>,
      column.accessor("onHandKg", {
        header: "On hand",
        meta: { numeric: true },
        cell: ({ getValue }) => formatQuantity(getValue(), "kg", 3),
      }) as ColumnDef<Substitute, unknown>,
    ];
    if (canEdit)
      list.push(
        column.display({
          id: "use",
          header: "",
          cell: ({ row }) => (
            <UseSubstitute
              position={position}
              substitute={row.original}
              tolerancePercent={tolerancePercent}
            />
          ),
        }) as ColumnDef<Substitute, unknown>,
      );
    return list;
  }, [position, currency, canEdit, tolerancePercent]);
}

/** One coil line's substitutes, open at once when its wire is short for the open build orders. */
function LineSubstitutes({
  panel,
  currency,
  canEdit,
  tolerancePercent,
}: {
  panel: SubstitutePanel;
  currency: string;
  canEdit: boolean;
  tolerancePercent: number;
}) {
  const columns = useSubstituteColumns(
    panel.position,
    currency,
    canEdit,
    tolerancePercent,
  );
  const shortage = panel.shortage;
  return (
    <details
      open={shortage !== null}
      className="rounded-md border border-graphite-200 bg-white px-4 py-2"
    >
      <summary className="cursor-pointer font-medium">
        Substitutes for line {panel.position}: {panel.strands} × {panel.sku}{" "}
        <span className="font-normal text-graphite-500">
          ({panel.substitutes.length} in stock)
        </span>
      </summary>
      <div className="mt-3 space-y-3">
        {shortage ? (
          <p role="status" className="text-sm text-danger">
            {panel.sku} is short: open build orders still need{" "}
            {formatQuantity(shortage.stillNeededKg, "kg", 3)} and{" "}
            {formatQuantity(shortage.availableKg, "kg", 3)} is available. These
            wires in stock could stand in for it.
          </p>
        ) : null}
        <DataTableView
          caption={`Wire in stock that could stand in for ${panel.strands} × ${panel.sku}`}
          columns={columns}
          rows={panel.substitutes}
          emptyText={`Nothing in stock comes within ±${formatQuantity(tolerancePercent, "%", 1)} of this line's copper area and fits its slot.`}
        />
      </div>
    </details>
  );
}

/**
 * Substitutes from stock for every coil line of a revision: wire in stock wound as n strands
 * within a tolerance of the line's copper area that still fits its slot over the enamel, with
 * what changes per motor. A line whose wire is short for the open build orders shows open.
 */
export function WireSubstitutesPanel({
  panels,
  query,
  keep,
  currency,
  canEdit,
}: {
  panels: SubstitutePanel[];
  query: SubstituteQuery;
  /** The page's other query parameters, kept by the tolerance form. */
  keep: Record<string, string>;
  currency: string;
  canEdit: boolean;
}) {
  if (panels.length === 0) return null;
  return (
    <section aria-labelledby="substitutes-heading" className="panel space-y-3">
      <h2 id="substitutes-heading" className="text-lg font-semibold">
        Substitutes from stock
      </h2>
      <p className="text-sm text-graphite-600">
        Wire in stock of the same conductor and at least the design&apos;s
        insulation class, wound as several strands in hand, within the tolerance
        of each coil&apos;s copper area. Changes are per motor, at the moving
        average cost of stock. Using one on a released revision starts a new
        draft revision.
      </p>
      <Form
        method="get"
        preventScrollReset
        replace
        className="flex flex-wrap items-end gap-3"
        aria-label="Copper area tolerance"
      >
        {Object.entries(keep).map(([name, value]) => (
          <input key={name} type="hidden" name={name} value={value} />
        ))}
        <div>
          <label htmlFor="substitute-tolerance" className="field-label">
            Copper area within ±{" "}
            <span className="font-normal text-graphite-500">(%)</span>
          </label>
          <input
            id="substitute-tolerance"
            name="tolerance"
            inputMode="decimal"
            defaultValue={query.typed || String(query.tolerancePercent)}
            aria-invalid={query.error ? true : undefined}
            aria-describedby={
              query.error ? "substitute-tolerance-error" : undefined
            }
            className="field-input w-24 text-right tabular-nums"
          />
          {query.error ? (
            <p id="substitute-tolerance-error" className="field-error">
              {query.error} Showing ±
              {formatQuantity(query.tolerancePercent, "%", 0)}.
            </p>
          ) : null}
        </div>
        <button type="submit" className="button-quiet">
          Show substitutes
        </button>
      </Form>
      {panels.map((panel) => (
        <LineSubstitutes
          key={panel.position}
          panel={panel}
          currency={currency}
          canEdit={canEdit}
          tolerancePercent={query.tolerancePercent}
        />
      ))}
    </section>
  );
}
