/**
 * The manager's what-if: "what would a motor cost if copper were 10.50 per kg, or if this
 * design's end turns were 20 % longer?" Nothing is saved; the figures are worked out
 * again from the stored design and prices with these stand-ins. Pure: no framework, no
 * I/O, so the query reader and the stand-ins are tested without a server.
 *
 * Query parameters (the insight page and `GET /api/v1/insight/designs` read the same):
 * - `copperBase`, `aluminiumBase`: metal base per kg in the company currency, up to 4
 *   decimals ("10.5"). It stands in for every stored base of that metal in the company
 *   currency, whatever its date; supplier lines quoted in another currency keep the base
 *   kept in their own currency (bases are never converted, decision 006).
 * - `endTurn.<designId>`: a factor on the end-turn length of every coil line of that
 *   design (1 = as designed, 1.2 = 20 % longer, 0 = no end turns at all), 0 to 5.
 * - `quantity`: motors to cost for (quantity breaks), 1 to 1,000,000; 1 by default.
 * - `date`: the day prices are taken on, "YYYY-MM-DD"; today by default.
 * - `basis`: the price basis, `best-price` (the best current supplier price, the default)
 *   or `stock-average` (the moving average cost of stock, as build orders plan with).
 */
import { z } from "zod";
import type { ConductorKey } from "~/engineering/reference-data";
import type { DesignLine } from "~/designs/design-lines";
import { costBasisLabels, type CostBasis } from "~/designs/design-page";
import type { MetalBasePrice } from "~/pricing/metal-base";
import type { CurrencyCode, MoneyAmount } from "~/pricing/money";
import {
  dayParam,
  pageParam,
  pageSizeParam,
  readSearchLeniently,
  wholeNumberParam,
} from "~/lib/search-params";
import { parseUnitCost } from "~/lib/decimal-amounts";

/** Stand-ins for one costing; every field optional, nothing saved. */
export interface CostingWhatIf {
  /** Metal base per kg in the company currency, ten-thousandths, per conductor. */
  metalBasePerKg?: Partial<Record<ConductorKey, MoneyAmount>>;
  /** Factor on every coil line's end-turn length (1 = as designed). */
  endTurnScale?: number;
}

/**
 * Designs costed per page at most. With `history` each is costed 13 times (now and
 * twelve months back), so a page is at most 650 costings however the address is written.
 */
export const maxDesignsPerPage = 50;

/** The largest end-turn factor the what-if takes: five times as long. */
export const maxEndTurnScale = 5;

const moneyText = z
  .string()
  .trim()
  .regex(
    /^\d{1,9}(\.\d{1,4})?$/,
    "A price per kg is a number of 0 or more with at most 4 decimals, e.g. 10.5.",
  )
  .transform((text) => parseUnitCost(text));

const endTurnScale = z.coerce
  .number({ error: "The end-turn factor is a number, e.g. 1.2." })
  .min(0, "The end-turn factor is 0 or more.")
  .max(
    maxEndTurnScale,
    `The end-turn factor is at most ${maxEndTurnScale} (five times as long).`,
  )
  .refine(
    (value) => Math.abs(value * 1000 - Math.round(value * 1000)) < 1e-6,
    "The end-turn factor has at most 3 decimals.",
  );

/** The fields of the insight query, once the flat `endTurn.<id>` keys are gathered into `endTurn`. */
export const insightQueryFieldsSchema = z.object({
  quantity: wholeNumberParam("quantity", {
    min: 1,
    max: 1_000_000,
    message: "The quantity is a whole number of motors from 1 to 1,000,000.",
  }).default(1),
  date: dayParam("date", "The date is a day in YYYY-MM-DD form.").optional(),
  basis: z
    .enum(Object.keys(costBasisLabels) as [CostBasis, ...CostBasis[]], {
      error:
        "The price basis is best-price (best supplier price) or stock-average (moving average cost of stock).",
    })
    .default("best-price"),
  copperBase: moneyText.optional(),
  aluminiumBase: moneyText.optional(),
  endTurn: z
    .record(
      z.string().regex(/^[1-9]\d{0,9}$/, "A design id is a whole number."),
      endTurnScale,
    )
    .default({}),
  page: pageParam,
  perPage: pageSizeParam("perPage", maxDesignsPerPage, 20),
  history: z.enum(["0", "1"]).optional(),
});

/** The query of the insight page and API, after the flat `endTurn.<id>` keys are gathered. */
export const insightQuerySchema = z.preprocess(
  gatherEndTurnKeys,
  insightQueryFieldsSchema,
);

export type InsightQuery = z.infer<typeof insightQuerySchema>;

/** `{ "endTurn.12": "1.2", quantity: "5" }` → `{ endTurn: { "12": "1.2" }, quantity: "5" }`. */
function gatherEndTurnKeys(input: unknown): unknown {
  if (typeof input !== "object" || input === null) return input;
  const gathered: Record<string, unknown> = {};
  const endTurn: Record<string, unknown> = {};
  for (const [key, value] of Object.entries(input)) {
    if (key.startsWith("endTurn."))
      endTurn[key.slice("endTurn.".length)] = value;
    else gathered[key] = value;
  }
  return { ...gathered, endTurn };
}

/** The stand-ins for one design from the query; undefined when the query changes nothing. */
export function whatIfForDesign(
  query: Pick<InsightQuery, "copperBase" | "aluminiumBase" | "endTurn">,
  designId: number,
): CostingWhatIf | undefined {
  const metalBasePerKg: Partial<Record<ConductorKey, MoneyAmount>> = {};
  if (query.copperBase !== undefined) metalBasePerKg.copper = query.copperBase;
  if (query.aluminiumBase !== undefined)
    metalBasePerKg.aluminium = query.aluminiumBase;
  const scale = query.endTurn[String(designId)];
  const whatIf: CostingWhatIf = {};
  if (Object.keys(metalBasePerKg).length > 0)
    whatIf.metalBasePerKg = metalBasePerKg;
  if (scale !== undefined && scale !== 1) whatIf.endTurnScale = scale;
  return Object.keys(whatIf).length > 0 ? whatIf : undefined;
}

/** Day before every real base, so the stand-in applies on any pricing date. */
const whatIfValidFrom = "0001-01-01";

/**
 * The metal bases with the what-if in place: for each conductor given, every stored base
 * of that metal in the company currency is dropped and the stand-in takes their place, on
 * every day. Bases of other metals, or kept in other currencies, stay as stored.
 */
export function metalBasesWithWhatIf(
  bases: readonly MetalBasePrice[],
  perKg: Partial<Record<ConductorKey, MoneyAmount>>,
  companyCurrency: CurrencyCode,
): MetalBasePrice[] {
  const replaced = Object.keys(perKg) as ConductorKey[];
  return [
    ...bases.filter(
      (base) =>
        base.currency !== companyCurrency || !replaced.includes(base.conductor),
    ),
    ...replaced.map((conductor) => ({
      conductor,
      currency: companyCurrency,
      pricePerKg: perKg[conductor]!,
      validFrom: whatIfValidFrom,
    })),
  ];
}

/** The lines with every coil line's end-turn length multiplied by `scale`; other lines as they are. */
export function scaleEndTurns<Line extends DesignLine>(
  lines: readonly Line[],
  scale: number,
): Line[] {
  if (!Number.isFinite(scale) || scale < 0) {
    throw new RangeError(`an end-turn factor is 0 or more, not ${scale}`);
  }
  return lines.map((line) =>
    line.kind === "coil"
      ? { ...line, endTurnLengthMm: line.endTurnLengthMm * scale }
      : line,
  );
}

/**
 * The query of the insight pages, which show a bad field beside it instead of refusing
 * the page: the fields that do not read are left out (the stored figures stand for them)
 * and their messages come back by the form's field name ("copperBase", "endTurn.12").
 */
export function readInsightSearch(params: Record<string, string>): {
  query: InsightQuery;
  errors: Record<string, string[]>;
} {
  return readSearchLeniently(insightQuerySchema, params);
}
