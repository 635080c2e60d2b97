/**
 * The cost insight page's tables as CSV files, one per table, machine-neutral (decimal
 * point, no grouping, days as YYYY-MM-DD, never the person's locale): the released
 * designs, cost per N·m by part, the year's change and month-by-month cost per motor,
 * stock value by kind, by location and by week. Money is in the company currency
 * (a column says which), to 0.0001 as the costing keeps it. Pure.
 */
import { csvFile, type CsvCell } from "~/lib/csv-file";
import { costHistoryChange, splitKeys } from "./design-insight";

export const insightCsvTables = [
  "designs",
  "cost-per-nm",
  "cost-change",
  "cost-by-month",
  "stock-by-kind",
  "stock-by-location",
  "stock-by-week",
] as const;

export type InsightCsvTable = (typeof insightCsvTables)[number];

export function isInsightCsvTable(value: string): value is InsightCsvTable {
  return (insightCsvTables as readonly string[]).includes(value);
}

/** What a design row of the insight gives the files (DesignInsight's figures). */
export interface InsightCsvDesign {
  designId: number;
  name: string;
  motorType: string;
  revision: number;
  ratedTorqueNm: number | null;
  perNmTorque: { torqueNm: number; source: string } | null;
  basis: string;
  quantity: number;
  costPerMotor: number;
  costPerNm: number | null;
  splitPerNm: Record<(typeof splitKeys)[number], number> | null;
  copperLossW: number | null;
  copperLossPerNm: number | null;
  complete: boolean;
  endTurnScale: number;
  costHistory?: { date: string; costPerMotor: number; complete: boolean }[];
}

export interface InsightCsvStock {
  byKind: { kind: string; items: number; value: number }[];
  byLocation: { code: string; name: string; items: number; value: number }[];
  otherLocations: { locations: number; value: number } | null;
}

export interface InsightCsvInput {
  currency: string;
  /** The costing day, YYYY-MM-DD. */
  date: string;
  designs: InsightCsvDesign[];
  stock: InsightCsvStock;
  weeks: { week: string; value: number; complete: boolean }[];
}

const splitColumns: Record<(typeof splitKeys)[number], string> = {
  activeCopper: "active_copper_per_nm",
  endTurnCopper: "end_turn_copper_per_nm",
  leadsAndScrap: "leads_and_scrap_per_nm",
  magnets: "magnets_per_nm",
  parts: "other_parts_per_nm",
};

function table(
  name: InsightCsvTable,
  input: InsightCsvInput,
): { fields: string[]; rows: CsvCell[][] } {
  const { currency, date } = input;
  switch (name) {
    case "designs":
      return {
        fields: [
          "design_id",
          "design",
          "revision",
          "motor_type",
          "costed_on",
          "price_basis",
          "motors",
          "currency",
          "cost_per_motor",
          "rated_torque_nm",
          "per_nm_torque_nm",
          "per_nm_torque_source",
          "cost_per_nm",
          "copper_loss_w",
          "copper_loss_per_nm_w",
          "end_turn_scale",
          "every_line_priced",
        ],
        rows: input.designs.map((design) => [
          design.designId,
          design.name,
          design.revision,
          design.motorType,
          date,
          design.basis,
          design.quantity,
          currency,
          design.costPerMotor,
          design.ratedTorqueNm,
          design.perNmTorque?.torqueNm ?? null,
          design.perNmTorque?.source ?? null,
          design.costPerNm,
          design.copperLossW,
          design.copperLossPerNm,
          design.endTurnScale,
          design.complete,
        ]),
      };
    case "cost-per-nm":
      return {
        fields: [
          "design_id",
          "design",
          "revision",
          "currency",
          ...splitKeys.map((key) => splitColumns[key]),
          "cost_per_nm",
          "every_line_priced",
        ],
        rows: input.designs.map((design) => [
          design.designId,
          design.name,
          design.revision,
          currency,
          ...splitKeys.map((key) => design.splitPerNm?.[key] ?? null),
          design.costPerNm,
          design.complete,
        ]),
      };
    case "cost-change":
      return {
        fields: [
          "design_id",
          "design",
          "revision",
          "currency",
          "from_day",
          "from_cost_per_motor",
          "to_day",
          "to_cost_per_motor",
          "change",
          "change_percent",
        ],
        rows: input.designs.flatMap((design) => {
          const change = design.costHistory
            ? costHistoryChange(design.costHistory)
            : null;
          return design.costHistory
            ? [
                [
                  design.designId,
                  design.name,
                  design.revision,
                  currency,
                  change?.from.date ?? null,
                  change?.from.costPerMotor ?? null,
                  change?.to.date ?? null,
                  change?.to.costPerMotor ?? null,
                  change?.change ?? null,
                  change?.percent ?? null,
                ],
              ]
            : [];
        }),
      };
    case "cost-by-month":
      return {
        fields: [
          "design_id",
          "design",
          "revision",
          "day",
          "currency",
          "cost_per_motor",
          "every_line_priced",
        ],
        rows: input.designs.flatMap((design) =>
          (design.costHistory ?? []).map((point) => [
            design.designId,
            design.name,
            design.revision,
            point.date,
            currency,
            point.complete ? point.costPerMotor : null,
            point.complete,
          ]),
        ),
      };
    case "stock-by-kind":
      return {
        fields: ["kind", "items_valued", "currency", "value"],
        rows: input.stock.byKind.map((kind) => [
          kind.kind,
          kind.items,
          currency,
          kind.value,
        ]),
      };
    case "stock-by-location":
      return {
        fields: ["location", "name", "items", "currency", "value"],
        rows: [
          ...input.stock.byLocation.map((location) => [
            location.code,
            location.name,
            location.items,
            currency,
            location.value,
          ]),
          ...(input.stock.otherLocations
            ? [
                [
                  null,
                  `${input.stock.otherLocations.locations} other locations`,
                  null,
                  currency,
                  input.stock.otherLocations.value,
                ],
              ]
            : []),
        ],
      };
    case "stock-by-week":
      return {
        fields: ["week_of", "currency", "value_at_end", "complete_week"],
        rows: input.weeks.map((week) => [
          week.week,
          currency,
          week.value,
          week.complete,
        ]),
      };
  }
}

/** The named table's file. */
export function insightCsv(
  name: InsightCsvTable,
  input: InsightCsvInput,
): string {
  const { fields, rows } = table(name, input);
  return csvFile(fields, rows);
}

/** "insight-stock-by-kind-2026-12-03.csv". */
export function insightCsvFilename(name: InsightCsvTable, day: string): string {
  return `insight-${name}-${day}.csv`;
}

/** What each table needs loaded: design figures (with the year's history) or the stock. */
export function insightCsvNeeds(name: InsightCsvTable): {
  designs: boolean;
  history: boolean;
  stock: boolean;
  weeks: boolean;
} {
  return {
    designs:
      name === "designs" || name === "cost-per-nm" || name.startsWith("cost-"),
    history: name === "cost-change" || name === "cost-by-month",
    stock: name === "stock-by-kind" || name === "stock-by-location",
    weeks: name === "stock-by-week",
  };
}
