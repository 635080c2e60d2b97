/**
 * The design half of the cost insight: the latest released revision of each design,
 * costed for a number of motors at the price basis of the query (the best supplier price
 * by default, or the moving average cost of stock; `costRevision`, the same costing as
 * `/api/v1/designs/:id/revisions/:rev/costing`), with the manager's what-if applied when
 * given (nothing saved), and on request the cost per motor a month apart over the last
 * year from the price and metal-base history (always at the best supplier price of each
 * day: the stock's average cost has no history to look back on). Read-only: nothing here writes.
 */
import { and, count, desc, eq, exists, inArray, lte, sql } from "drizzle-orm";
import { db } from "~/db/client.server";
import { designRevisions, designs, metalBasePrices } from "~/db/schema";
import { costRevision } from "~/designs/design-costing.server";
import {
  loadRevisionLines,
  type RevisionRow,
  type StoredDesignLine,
} from "~/designs/design-revisions.server";
import type { CalendarDate } from "~/lib/calendar-days";
import { parseMoney } from "~/pricing/money";
import {
  loadItemsPricing,
  type ItemPricing,
} from "~/purchasing/item-prices.server";
import { companyCurrency } from "~/purchasing/suppliers.server";
import { splitPerNewtonMetre } from "./design-insight";
import { monthlyDates } from "./insight-periods";
import { whatIfForDesign, type InsightQuery } from "./what-if";

/** Months of cost history per design (monthly points ending on the costing day). */
export const costHistoryMonths = 12;

/** Designs with a released revision, newest design first, a page at a time. */
async function releasedDesignPage(page: number, perPage: number) {
  const released = db
    .select({ one: sql`1` })
    .from(designRevisions)
    .where(
      and(
        eq(designRevisions.designId, designs.id),
        eq(designRevisions.status, "released"),
      ),
    );
  const [rows, [counted]] = await Promise.all([
    db
      .select({
        id: designs.id,
        name: designs.name,
        motorType: designs.motorType,
      })
      .from(designs)
      .where(exists(released))
      .orderBy(desc(designs.id))
      .limit(perPage)
      .offset((page - 1) * perPage),
    db
      .select({ total: count(sql`DISTINCT ${designRevisions.designId}`) })
      .from(designRevisions)
      .where(eq(designRevisions.status, "released")),
  ]);
  const revisions =
    rows.length === 0
      ? []
      : await db
          .select()
          .from(designRevisions)
          .where(
            and(
              inArray(
                designRevisions.designId,
                rows.map((row) => row.id),
              ),
              eq(designRevisions.status, "released"),
            ),
          )
          .orderBy(desc(designRevisions.revision));
  return {
    total: Number(counted?.total ?? 0),
    designs: rows.flatMap((design) => {
      // Newest first, so the first released one is the latest.
      const revision = revisions.find((row) => row.designId === design.id);
      return revision ? [{ design, revision }] : [];
    }),
  };
}

/** Reads every item's prices once for many costings (a page of designs, twelve months). */
function pricingReader(preloaded: Map<string, ItemPricing>) {
  return async (skus: readonly string[]) => {
    const missing = skus.filter((sku) => !preloaded.has(sku));
    if (missing.length > 0)
      for (const [sku, pricing] of await loadItemsPricing(missing))
        preloaded.set(sku, pricing);
    return new Map(
      skus.flatMap((sku) => {
        const pricing = preloaded.get(sku);
        return pricing ? [[sku, pricing] as const] : [];
      }),
    );
  };
}

function lineSku(line: StoredDesignLine): string {
  switch (line.kind) {
    case "coil":
      return line.wire.sku;
    case "magnet":
      return line.magnet.sku;
    case "part":
      return line.part.sku;
  }
}

/** One design's figures as the insight page and `GET /api/v1/insight/designs` give them. */
async function designFigures(input: {
  design: { id: number; name: string; motorType: string };
  revision: RevisionRow;
  lines: StoredDesignLine[];
  query: InsightQuery;
  date: CalendarDate;
  loadPricing: ReturnType<typeof pricingReader>;
  currency: string;
  history: boolean;
}) {
  const { design, revision, lines, query, date, loadPricing, currency } = input;
  const whatIf = whatIfForDesign(query, design.id);
  const common = {
    revision,
    lines,
    quantity: query.quantity,
    basis: query.basis,
    loadPricing,
    currency,
  };
  const [costing, stored, history] = await Promise.all([
    costRevision({ ...common, date, whatIf }),
    whatIf ? costRevision({ ...common, date }) : null,
    input.history
      ? Promise.all(
          monthlyDates(date, costHistoryMonths).map(async (day) => {
            const past = await costRevision({
              ...common,
              basis: "best-price",
              date: day,
            });
            return {
              date: day,
              costPerMotor: past.costPerMotor,
              costPerNm: past.costPerNm,
              complete: past.complete,
            };
          }),
        )
      : null,
  ]);
  return {
    designId: design.id,
    name: design.name,
    motorType: design.motorType,
    revision: revision.revision,
    releasedAt: revision.releasedAt?.toISOString() ?? null,
    ratedTorqueNm: costing.ratedTorqueNm,
    torqueBasis: costing.torqueBasis,
    /** The torque per N·m is over: rated, or the first-order estimate without one. */
    perNmTorque: costing.perNmTorque,
    /** The price basis of the costs: "best-price" or "stock-average". */
    basis: costing.basis,
    ratedCurrentA: Number(revision.ratedCurrentA),
    quantity: costing.quantity,
    currency: costing.currency,
    costPerMotor: costing.costPerMotor,
    costPerNm: costing.costPerNm,
    split: costing.split,
    splitPerNm: splitPerNewtonMetre(costing.split, costing.costPerNm),
    copperLossW: costing.copperLossW,
    copperLossPerNm: costing.copperLossPerNm,
    complete: costing.complete,
    unpriced: costing.unpriced,
    endTurnScale: whatIf?.endTurnScale ?? 1,
    /** The same figures without the what-if; null when no what-if applies to this design. */
    asStored: stored
      ? {
          costPerMotor: stored.costPerMotor,
          costPerNm: stored.costPerNm,
          copperLossPerNm: stored.copperLossPerNm,
          complete: stored.complete,
        }
      : null,
    ...(history ? { costHistory: history } : {}),
  };
}

export type DesignInsight = Awaited<ReturnType<typeof designFigures>>;

/** The released designs of one page, costed, with the what-if of the query applied. */
export async function designInsight(
  query: InsightQuery,
  options: { today: CalendarDate; history: boolean },
) {
  const date = query.date ?? options.today;
  const page = await releasedDesignPage(query.page, query.perPage);
  const withLines = await Promise.all(
    page.designs.map(async (entry) => ({
      ...entry,
      lines: await loadRevisionLines(entry.revision.id),
    })),
  );
  const [preloaded, currency] = await Promise.all([
    loadItemsPricing([
      ...new Set(withLines.flatMap((entry) => entry.lines.map(lineSku))),
    ]),
    companyCurrency(),
  ]);
  const loadPricing = pricingReader(preloaded);
  const figures = await Promise.all(
    withLines.map((entry) =>
      designFigures({
        ...entry,
        query,
        date,
        loadPricing,
        currency,
        history: options.history,
      }),
    ),
  );
  return {
    date,
    basis: query.basis,
    total: page.total,
    page: query.page,
    perPage: query.perPage,
    designs: figures,
  };
}

/**
 * The stored metal bases in the company currency on a day, per kg (what the what-if
 * fields start from); null for a metal with no base yet.
 */
export async function storedMetalBases(date: CalendarDate) {
  const currency = await companyCurrency();
  const latest = async (conductor: "copper" | "aluminium") => {
    const [row] = await db
      .select({
        pricePerKg: metalBasePrices.pricePerKg,
        validFrom: metalBasePrices.validFrom,
      })
      .from(metalBasePrices)
      .where(
        and(
          eq(metalBasePrices.conductor, conductor),
          eq(metalBasePrices.currency, currency),
          lte(metalBasePrices.validFrom, date),
        ),
      )
      .orderBy(desc(metalBasePrices.validFrom))
      .limit(1);
    return row
      ? {
          pricePerKg: Number(parseMoney(row.pricePerKg)) / 10_000,
          validFrom: row.validFrom,
        }
      : null;
  };
  const [copper, aluminium] = await Promise.all([
    latest("copper"),
    latest("aluminium"),
  ]);
  return { currency, copper, aluminium };
}
