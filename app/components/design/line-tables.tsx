import type { ColumnDef } from "@tanstack/react-table";
import { createColumnHelper } from "~/lib/table-columns";
import { useMemo } from "react";
import { useFetcher } from "react-router";
import type {
  DesignPageData,
  DesignPageLine,
} from "~/designs/design-page.server";
import { formatQuantity } from "~/lib/format";
import { countText, quantityText } from "~/lib/unit-text";
import { formatMass, formatSignificant } from "~/reference/quantity-display";
import type { DesignActionAnswer } from "./action-answer";
import { ConfirmButton } from "~/components/confirm-button";
import { DataTableView } from "~/components/data-table-view";

type Costing = DesignPageData["costing"];
export type CoilFigures = Costing["coils"][number];
export type DesignWarning = Costing["warnings"][number];
type CoilLine = Extract<DesignPageLine, { kind: "coil" }>;
type MagnetLine = Extract<DesignPageLine, { kind: "magnet" }>;
type PartLine = Extract<DesignPageLine, { kind: "part" }>;

/** A few words for each check, beside its line; the whole message is listed under the table. */
const warningLabels: Record<string, string> = {
  "wire-class-below-insulation-class": "Wire class below the insulation class",
  "above-random-round-wire-practice": "Slot fill above 0.45",
  "above-square-packing-limit": "Slot fill above π/4",
  "above-hexagonal-packing-limit": "Slot fill above π/√12: cannot fit",
  "magnet-above-max-working-temperature":
    "Hotter than the grade's working temperature",
};

export function warningLabel(warning: DesignWarning): string {
  return warningLabels[warning.code] ?? warning.message;
}

function WarningMark() {
  return (
    <svg
      viewBox="0 0 16 16"
      aria-hidden="true"
      className="mt-0.5 h-3.5 w-3.5 shrink-0 text-caution"
    >
      <path
        d="M8 1.5 15 14.5H1L8 1.5Z"
        fill="none"
        stroke="currentColor"
        strokeWidth="1.6"
        strokeLinejoin="round"
      />
      <path d="M8 6v4" stroke="currentColor" strokeWidth="1.6" />
      <circle cx="8" cy="12.1" r="0.9" fill="currentColor" />
    </svg>
  );
}

/** The checks of one line, in a few words each (the full text is listed under the table). */
function LineChecks({ warnings }: { warnings: DesignWarning[] }) {
  if (warnings.length === 0)
    return <span className="text-graphite-500">none</span>;
  return (
    <ul className="space-y-1">
      {warnings.map((warning) => (
        <li
          key={warning.code}
          className="flex gap-1.5 font-medium text-caution"
        >
          <WarningMark />
          <span>Check: {warningLabel(warning)}</span>
        </li>
      ))}
    </ul>
  );
}

/** Every check of the lines of one table in full, with its line number. */
export function DesignWarningList({
  warnings,
  label,
}: {
  warnings: DesignWarning[];
  label: string;
}) {
  if (warnings.length === 0) return null;
  return (
    <div
      role="note"
      aria-label={label}
      className="rounded-md border border-caution/40 bg-caution/5 px-4 py-3 text-sm"
    >
      <ul className="space-y-1.5">
        {warnings.map((warning) => (
          <li key={`${warning.line}-${warning.code}`} className="flex gap-2">
            <WarningMark />
            <span>
              <span className="font-semibold">Line {warning.line}:</span>{" "}
              {warning.message}
            </span>
          </li>
        ))}
      </ul>
    </div>
  );
}

/** Removes one line of a draft through the page's action (a fetcher: no reload). */
function RemoveLineButton({
  line,
  onRemove,
}: {
  line: DesignPageLine;
  onRemove: () => void;
}) {
  const fetcher = useFetcher<DesignActionAnswer>();
  const refused =
    fetcher.state === "idle" && fetcher.data && !fetcher.data.ok
      ? (fetcher.data.message ??
        fetcher.data.result?.error?.[""]?.join(" ") ??
        "Not removed.")
      : null;
  return (
    <fetcher.Form method="post" onSubmit={onRemove}>
      <input type="hidden" name="intent" value="remove-line" />
      <input type="hidden" name="lineId" value={line.id} />
      <ConfirmButton
        className="button-quiet"
        disabled={fetcher.state !== "idle"}
        aria-label={`Remove line ${line.position} (${line.input.sku})`}
        question={{
          title: `Remove line ${line.position} (${line.input.sku})?`,
          consequence: (
            <p>
              The line leaves this draft revision and the lines after it move up
              one place. To have it back, add it again.
            </p>
          ),
          confirmLabel: `Remove line ${line.position}`,
          keepLabel: "Keep the line",
        }}
      >
        Remove
      </ConfirmButton>
      {refused ? (
        <p role="alert" className="field-error">
          {refused}
        </p>
      ) : null}
    </fetcher.Form>
  );
}

export interface LineTableActions {
  /** Null when the revision cannot be changed (released, or the reader is no builder). */
  onEdit: ((line: DesignPageLine) => void) | null;
  onRemove: () => void;
  /** The line open in the editor, marked in its row. */
  editingPosition: number | null;
}

function actionsColumn<Row extends { line: DesignPageLine }>(
  actions: LineTableActions,
): ColumnDef<Row, unknown>[] {
  const onEdit = actions.onEdit;
  if (!onEdit) return [];
  return [
    createColumnHelper<Row>().display({
      id: "actions",
      // Visible text: a visually hidden header would escape the table's scroll box on a phone.
      header: "Change",
      cell: ({ row }) => {
        const line = row.original.line;
        const editing = actions.editingPosition === line.position;
        return (
          <div className="flex flex-col items-stretch gap-1.5 print:hidden">
            <button
              type="button"
              className="button-quiet"
              aria-pressed={editing}
              aria-label={`${editing ? "Editing" : "Edit"} line ${line.position} (${line.input.sku})`}
              onClick={() => onEdit(line)}
            >
              {editing ? "Editing" : "Edit"}
            </button>
            <RemoveLineButton line={line} onRemove={actions.onRemove} />
          </div>
        );
      },
    }) as ColumnDef<Row, unknown>,
  ];
}

function ItemCell({
  name,
  details,
}: {
  name: string;
  details: (string | null)[];
}) {
  return (
    <div className="min-w-36">
      <div className="font-medium">{name}</div>
      <div className="text-xs text-graphite-500">
        {details.filter(Boolean).join(" · ")}
      </div>
    </div>
  );
}

interface CoilRow {
  line: CoilLine;
  figures: CoilFigures | undefined;
  warnings: DesignWarning[];
}

/** A coil line's wire and winding: the item, its wire, turns, strands, coils and lengths. */
function CoilCell({ line }: { line: CoilLine }) {
  const input = line.input;
  if (input.kind !== "coil") return null;
  return (
    <div className="min-w-48">
      <div className="font-medium">{line.itemName}</div>
      <div className="text-xs text-graphite-500">
        {input.sku} · {formatQuantity(line.wire.bareDiameterMm, "mm", 3)} bare ·
        class {line.wire.thermalClassC}
      </div>
      <div className="mt-1 text-xs leading-5">
        <div>
          {countText(input.turns, "turn")} ×{" "}
          {countText(input.strandsInHand, "strand")} ·{" "}
          {countText(input.coilsPerMotor, "coil")}
        </div>
        <div>
          active {formatQuantity(input.activeLengthMm, "mm", 1)} · end turn{" "}
          {formatQuantity(input.endTurnLengthMm, "mm", 1)} · leads{" "}
          {formatQuantity(input.leadLengthMm, "mm", 0)}
        </div>
        <div className="text-graphite-500">
          scrap {formatQuantity(input.scrapPercent, "%", 1)} · at{" "}
          {formatQuantity(input.operatingTemperatureC, "°C", 0)}
        </div>
      </div>
    </div>
  );
}

const coilColumn = createColumnHelper<CoilRow>();

/** Copper fill and gross fill (over the enamel, liner taken off); the limits are judged on gross. */
function SlotFillCell({ fill }: { fill: CoilLine["slotFill"] }) {
  if (!fill) return "—";
  return (
    <div className="whitespace-nowrap">
      <div>
        {fill.grossFill === null ? "—" : formatQuantity(fill.grossFill, "", 3)}{" "}
        <span className="text-xs text-graphite-500">gross, over enamel</span>
      </div>
      <div>
        {formatQuantity(fill.copperFill, "", 3)}{" "}
        <span className="text-xs text-graphite-500">copper</span>
      </div>
      {fill.judgedOn === "copper" ? (
        <div className="text-xs text-graphite-500">
          overall diameter unknown
        </div>
      ) : null}
    </div>
  );
}

/** Coil lines with their copper figures per motor, the checks beside each. */
export function CoilLinesTable({
  lines,
  costing,
  actions,
}: {
  lines: CoilLine[];
  costing: Costing;
  actions: LineTableActions;
}) {
  const rows: CoilRow[] = lines.map((line) => ({
    line,
    figures: costing.coils.find((coil) => coil.line === line.position),
    warnings: costing.warnings.filter(
      (warning) => warning.line === line.position,
    ),
  }));
  const showFill = lines.some((line) => line.fillFactor !== null);
  const columns = useMemo(() => {
    const list: ColumnDef<CoilRow, unknown>[] = [
      coilColumn.accessor((row) => row.line.position, {
        id: "position",
        header: "Line",
        meta: { numeric: true },
      }) as ColumnDef<CoilRow, unknown>,
      coilColumn.display({
        id: "coil",
        header: "Wire and coil",
        cell: ({ row }) => <CoilCell line={row.original.line} />,
      }) as ColumnDef<CoilRow, unknown>,
      coilColumn.display({
        id: "copper",
        header: "Copper per motor",
        meta: { numeric: true },
        cell: ({ row }) =>
          row.original.figures
            ? formatQuantity(row.original.figures.copperLengthM, "m", 3)
            : "—",
      }) as ColumnDef<CoilRow, unknown>,
      coilColumn.display({
        id: "drawn",
        header: "Drawn from stock",
        meta: { numeric: true },
        cell: ({ row }) => {
          const figures = row.original.figures;
          // "bare conductor": no enamelled linear mass is known, so this is the copper alone.
          if (!figures) return "—";
          return (
            <div>
              <div>{formatMass(figures.drawnMassKg)}</div>
              <div className="text-xs text-graphite-500">
                {figures.massBasis === "bare"
                  ? "bare conductor"
                  : "enamelled wire"}
              </div>
            </div>
          );
        },
      }) as ColumnDef<CoilRow, unknown>,
      coilColumn.display({
        id: "resistance",
        header: "R per coil",
        meta: { numeric: true },
        cell: ({ row }) => {
          const figures = row.original.figures;
          if (!figures) return "—";
          return (
            <div className="whitespace-nowrap">
              <div>
                {formatSignificant(figures.resistance20PerCoilOhm, "Ω", 4)}{" "}
                <span className="text-xs text-graphite-500">at 20 °C</span>
              </div>
              <div>
                {formatSignificant(figures.resistancePerCoilOhm, "Ω", 4)}{" "}
                <span className="text-xs text-graphite-500">
                  at {formatQuantity(figures.operatingTemperatureC, "°C", 0)}
                </span>
              </div>
            </div>
          );
        },
      }) as ColumnDef<CoilRow, unknown>,
      coilColumn.display({
        id: "active",
        header: "Active share",
        meta: { numeric: true },
        cell: ({ row }) =>
          row.original.figures
            ? formatQuantity(row.original.figures.activeShare * 100, "%", 1)
            : "—",
      }) as ColumnDef<CoilRow, unknown>,
      coilColumn.display({
        id: "loss",
        header: "Copper loss",
        meta: { numeric: true },
        cell: ({ row }) =>
          row.original.figures?.copperLossW == null ? (
            "—"
          ) : (
            <div>
              <div>
                {formatQuantity(row.original.figures.copperLossW, "W", 2)}
              </div>
              <div className="text-xs text-graphite-500">rated current</div>
            </div>
          ),
      }) as ColumnDef<CoilRow, unknown>,
    ];
    if (showFill)
      list.push(
        coilColumn.display({
          id: "fill",
          header: "Slot fill",
          meta: { numeric: true },
          cell: ({ row }) => <SlotFillCell fill={row.original.line.slotFill} />,
        }) as ColumnDef<CoilRow, unknown>,
      );
    list.push(
      coilColumn.display({
        id: "checks",
        header: "Checks",
        cell: ({ row }) => <LineChecks warnings={row.original.warnings} />,
      }) as ColumnDef<CoilRow, unknown>,
      ...actionsColumn<CoilRow>(actions),
    );
    return list;
  }, [showFill, actions]);
  return (
    <DataTableView
      caption="Coil lines with their copper figures per motor"
      columns={columns}
      rows={rows}
      emptyText="No coil lines yet."
    />
  );
}

interface MagnetRow {
  line: MagnetLine;
  warnings: DesignWarning[];
}
const magnetColumn = createColumnHelper<MagnetRow>();

/** Magnet lines with their mass and temperature against the grade's limit. */
export function MagnetLinesTable({
  lines,
  costing,
  actions,
}: {
  lines: MagnetLine[];
  costing: Costing;
  actions: LineTableActions;
}) {
  const rows: MagnetRow[] = lines.map((line) => ({
    line,
    warnings: costing.warnings.filter(
      (warning) => warning.line === line.position,
    ),
  }));
  const columns = useMemo(
    (): ColumnDef<MagnetRow, unknown>[] => [
      magnetColumn.accessor((row) => row.line.position, {
        id: "position",
        header: "Line",
        meta: { numeric: true },
      }) as ColumnDef<MagnetRow, unknown>,
      magnetColumn.display({
        id: "magnet",
        header: "Magnet",
        cell: ({ row }) => (
          <ItemCell
            name={row.original.line.itemName}
            details={[
              row.original.line.input.sku,
              row.original.line.magnet.gradeName,
            ]}
          />
        ),
      }) as ColumnDef<MagnetRow, unknown>,
      magnetColumn.display({
        id: "pieces",
        header: "Pieces per motor",
        meta: { numeric: true },
        cell: ({ row }) => {
          const input = row.original.line.input;
          return input.kind === "magnet"
            ? quantityText(input.piecesPerMotor, "pcs")
            : null;
        },
      }) as ColumnDef<MagnetRow, unknown>,
      magnetColumn.display({
        id: "mass",
        header: "Magnet mass per motor",
        meta: { numeric: true },
        cell: ({ row }) => {
          const magnet = row.original.line.magnet;
          if (!(magnet.massPerPieceKg > 0)) return "unknown shape";
          return (
            <div>
              <div>{formatMass(magnet.massPerMotorKg)}</div>
              <div className="text-xs text-graphite-500">
                {formatMass(magnet.massPerPieceKg)} each
              </div>
            </div>
          );
        },
      }) as ColumnDef<MagnetRow, unknown>,
      magnetColumn.display({
        id: "temperature",
        header: "Magnet temperature",
        meta: { numeric: true },
        cell: ({ row }) => {
          const { input, magnet } = row.original.line;
          const temperature =
            input.kind === "magnet" ? input.operatingTemperatureC : undefined;
          return (
            <div>
              <div>
                {temperature === undefined
                  ? "not given"
                  : formatQuantity(temperature, "°C", 0)}
              </div>
              <div className="text-xs text-graphite-500">
                grade limit{" "}
                {magnet.maxWorkingTemperatureC === null
                  ? "unknown"
                  : formatQuantity(magnet.maxWorkingTemperatureC, "°C", 0)}
              </div>
            </div>
          );
        },
      }) as ColumnDef<MagnetRow, unknown>,
      magnetColumn.display({
        id: "checks",
        header: "Checks",
        cell: ({ row }) => <LineChecks warnings={row.original.warnings} />,
      }) as ColumnDef<MagnetRow, unknown>,
      ...actionsColumn<MagnetRow>(actions),
    ],
    [actions],
  );
  return (
    <DataTableView
      caption="Magnet lines with their mass per motor"
      columns={columns}
      rows={rows}
      emptyText="No magnet lines yet."
    />
  );
}

interface PartRow {
  line: PartLine;
}
const partColumn = createColumnHelper<PartRow>();

/** Other parts with their quantity per motor. */
export function PartLinesTable({
  lines,
  actions,
}: {
  lines: PartLine[];
  actions: LineTableActions;
}) {
  const rows: PartRow[] = lines.map((line) => ({ line }));
  const columns = useMemo(
    (): ColumnDef<PartRow, unknown>[] => [
      partColumn.accessor((row) => row.line.position, {
        id: "position",
        header: "Line",
        meta: { numeric: true },
      }) as ColumnDef<PartRow, unknown>,
      partColumn.display({
        id: "item",
        header: "Item",
        cell: ({ row }) => (
          <ItemCell
            name={row.original.line.itemName}
            details={[row.original.line.input.sku]}
          />
        ),
      }) as ColumnDef<PartRow, unknown>,
      partColumn.display({
        id: "quantity",
        header: "Quantity per motor",
        meta: { numeric: true },
        cell: ({ row }) => {
          const { input, unit } = row.original.line;
          return input.kind === "part"
            ? quantityText(
                input.quantityPerMotor,
                unit,
                Number.isInteger(input.quantityPerMotor) ? 0 : 3,
              )
            : null;
        },
      }) as ColumnDef<PartRow, unknown>,
      ...actionsColumn<PartRow>(actions),
    ],
    [actions],
  );
  return (
    <DataTableView
      caption="Other parts with their quantity per motor"
      columns={columns}
      rows={rows}
      emptyText="No other parts yet."
    />
  );
}
