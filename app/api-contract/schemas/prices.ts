/**
 * The answers of the price operations (metal base, currency rates, an item's prices) and
 * the buying plan, as the routes build them (app/purchasing/suppliers.server.ts,
 * app/purchasing/item-prices.server.ts, app/buying-plan/plan-json.ts). Examples from the
 * demo: Quillan's copper wire on the copper base, Marrowfield's magnets in USD. Pure.
 */
import { z } from "zod";

const day = z.iso.date().meta({ description: "A calendar day, YYYY-MM-DD." });
const currency = z
  .string()
  .meta({ description: "ISO 4217 code.", example: "EUR" });
const quantity = (description: string) =>
  z.number().meta({ description: `${description}, in the item's unit.` });

const metalBaseExample = {
  conductor: "copper",
  currency: "EUR",
  pricePerKg: 9.02,
  validFrom: "2026-10-31",
};

export const metalBaseListSchema = z
  .array(
    z
      .object({
        conductor: z.enum(["copper", "aluminium"]),
        currency,
        pricePerKg: z.number(),
        validFrom: day.meta({
          description:
            "The first day the price applies; it stands until a later one.",
        }),
      })
      .meta({
        id: "MetalBasePrice",
        description: "A conductor's base price per kg in one currency.",
        example: metalBaseExample,
      }),
  )
  .meta({
    id: "MetalBaseList",
    description: "The newest 100 base prices, newest first, then by conductor.",
    example: [
      metalBaseExample,
      { ...metalBaseExample, conductor: "aluminium", pricePerKg: 2.44 },
    ],
  });

const rateExample = { currency: "USD", rate: 0.9096, validFrom: "2026-10-31" };

export const currencyRatesSchema = z
  .object({
    companyCurrency: currency,
    rates: z
      .array(
        z.object({
          currency,
          rate: z.number().meta({
            description:
              "Units of the company currency per one unit of `currency`.",
          }),
          validFrom: day,
        }),
      )
      .meta({
        description: "The newest 200 rates, newest first, then by currency.",
      }),
  })
  .meta({
    id: "CurrencyRates",
    example: { companyCurrency: "EUR", rates: [rateExample] },
  });

const money = (description: string) => z.number().meta({ description });

const priceExample = {
  supplier: "Quillan Drawn Wire GmbH",
  supplierSku: "QD-CU-0500-G2",
  currency: "EUR",
  minQuantity: 5,
  quotedUnitPrice: 13.52,
  adderPerKg: 4.5,
  metalBasePerKg: 9.02,
  metalBaseDerivedFrom: null,
  rate: null,
  unitPrice: 13.52,
  total: 135.2,
  leadTimeDays: 10,
  packQuantity: 5,
  source: { importId: "4", line: 12 },
};

const historyExample = {
  unit: "kg",
  quantity: 10,
  companyCurrency: "EUR",
  from: "2025-12-03",
  to: "2026-12-03",
  lineCount: 3,
  series: [
    {
      supplier: "Quillan Drawn Wire GmbH",
      supplierSku: "QD-CU-0500-G2",
      currency: "EUR",
      points: [
        {
          date: "2026-08-07",
          unitPrice: 13.24,
          quotedUnitPrice: 13.24,
          problems: [],
        },
      ],
    },
  ],
};

export const itemPricesSchema = z
  .object({
    sku: z.string(),
    unit: z.string(),
    quantity: quantity("The quantity priced"),
    date: day.meta({ description: "The day priced." }),
    companyCurrency: currency,
    prices: z
      .array(
        z.object({
          supplier: z.string(),
          supplierSku: z.string(),
          currency: currency.meta({
            description: "The supplier's quoting currency.",
          }),
          minQuantity: quantity("The quantity break that applies"),
          quotedUnitPrice: money(
            "Per unit as quoted, in `currency` (wire on a metal base: base + adder).",
          ),
          adderPerKg: money(
            "The adder per kg in `currency`; null for a fixed unit price.",
          ).nullable(),
          metalBasePerKg: money(
            "The metal base per kg in `currency`; null for a fixed unit price.",
          ).nullable(),
          metalBaseDerivedFrom: z
            .object({
              pricePerKg: z.number(),
              currency,
              validFrom: day,
              rate: z.number(),
              rateFrom: day,
            })
            .nullable()
            .meta({
              description:
                "Set when no base is kept in the supplier's currency: the company base and the rate it was converted with.",
            }),
          rate: z.number().nullable().meta({
            description:
              "The exchange rate used; null when quoted in the company currency.",
          }),
          unitPrice: money(
            "Per unit in the company currency: what the list is sorted by.",
          ),
          total: money("unitPrice × quantity in the company currency."),
          leadTimeDays: z.number().int().nullable(),
          packQuantity: quantity("The pack or spool size sold")
            .nullable()
            .meta({ description: "Null: any quantity." }),
          source: z
            .object({
              importId: z.string().meta({
                description: "The price-list import the line came from.",
              }),
              line: z
                .number()
                .int()
                .meta({ description: "Its line in the imported file." }),
            })
            .meta({ description: "Where the price line came from." }),
        }),
      )
      .meta({
        description: "Every offer priced for the quantity, cheapest first.",
      }),
    cannotPrice: z
      .array(
        z.object({
          supplier: z.string(),
          supplierSku: z.string(),
          reasons: z.array(z.string()),
        }),
      )
      .meta({
        description:
          "Offers with a line on the day but no price for the quantity (no rate, no base, below the smallest break), by supplier and SKU.",
      }),
    history: z
      .object({
        unit: z.string(),
        quantity: z.number(),
        companyCurrency: currency,
        from: day,
        to: day,
        lineCount: z.number().int().meta({
          description: "Price lines stored for the item, charted or not.",
        }),
        series: z.array(
          z.object({
            supplier: z.string(),
            supplierSku: z.string(),
            currency,
            points: z
              .array(
                z.object({
                  date: day,
                  unitPrice: z.number().nullable().meta({
                    description:
                      "In the company currency; null: no price from this day, see `problems`.",
                  }),
                  quotedUnitPrice: z.number().nullable(),
                  problems: z.array(z.string()),
                }),
              )
              .meta({ description: "Each point stands until the next." }),
          }),
        ),
      })
      .optional()
      .meta({
        description:
          "With `history=1`: the unit price of the quantity over the 365 days up to `date`, one series per offer.",
      }),
  })
  .meta({
    id: "ItemPrices",
    description:
      "An item's prices from every supplier for a quantity on a day.",
    example: {
      sku: "CU-IEC-0500",
      unit: "kg",
      quantity: 10,
      date: "2026-12-03",
      companyCurrency: "EUR",
      prices: [priceExample],
      cannotPrice: [],
      history: historyExample,
    },
  });

const suggestionExample = {
  key: "CU-IEC-0800@2026-12-14",
  sku: "CU-IEC-0800",
  name: "Enamelled copper 0.80 mm",
  unit: "kg",
  supplierId: 1,
  supplier: "Quillan Drawn Wire GmbH",
  supplierSku: "QD-CU-0800-G2",
  quantity: 10,
  shortfall: 3.2,
  unitPrice: 13.31,
  currency: "EUR",
  total: 133.1,
  totalInCompanyCurrency: 133.1,
  packQuantity: 5,
  raisedToBreak: false,
  leadTimeDays: 10,
  needBy: "2026-12-14",
  orderBy: "2026-12-04",
  late: false,
  reason:
    "BO-3 needs 4.200 kg in week of 14 Dec 2026; projected 3.200 kg below reorder point 5.000 kg",
  draftOrders: [],
  needs: [{ buildOrderId: 3, reference: "BO-3", quantity: 4.2 }],
};

export const buyingPlanSchema = z
  .object({
    today: day,
    weeks: z.array(day).meta({
      description:
        "The Mondays of the weeks planned; the first is the week of `today`.",
    }),
    companyCurrency: currency,
    suggestions: z.array(
      z
        .object({
          key: z
            .string()
            .meta({ description: "The item and the week of its shortfall." }),
          sku: z.string(),
          name: z.string(),
          unit: z.string(),
          supplierId: z.number().int().nullable().meta({
            description:
              "The offer chosen; null (and the price fields too) when no supplier can price the item.",
          }),
          supplier: z.string().nullable(),
          supplierSku: z.string().nullable(),
          quantity: quantity(
            "To order: at least the shortfall and the reorder quantity, rounded to packs and breaks",
          ),
          shortfall: quantity("How far below the reorder point the week falls"),
          unitPrice: money(
            "Per unit as the supplier quotes it, in `currency`.",
          ).nullable(),
          currency: currency.nullable(),
          total: money("unitPrice × quantity, in `currency`.").nullable(),
          totalInCompanyCurrency: money(
            "The whole order in the company currency.",
          ).nullable(),
          packQuantity: z.number().nullable(),
          raisedToBreak: z.boolean().meta({
            description:
              "True when the quantity was raised to a cheaper quantity break.",
          }),
          leadTimeDays: z.number().int().nullable(),
          needBy: day.meta({
            description: "The Monday of the week of the shortfall.",
          }),
          orderBy: day.meta({ description: "needBy less the lead time." }),
          late: z
            .boolean()
            .meta({ description: "True when orderBy has passed." }),
          reason: z.string().meta({ description: "Why, in words." }),
          draftOrders: z
            .array(z.object({ id: z.number().int(), number: z.string() }))
            .meta({
              description:
                "Draft purchase orders already holding the item (not on order until sent).",
            }),
          needs: z.array(
            z.object({
              buildOrderId: z.number().int(),
              reference: z.string(),
              quantity: z.number(),
            }),
          ),
        })
        .meta({
          id: "BuyingSuggestion",
          description:
            "What to buy, from whom and by when, for one item and week.",
          example: suggestionExample,
        }),
    ),
    items: z
      .array(
        z.object({
          sku: z.string(),
          name: z.string(),
          unit: z.string(),
          reorderPoint: z.number(),
          available: quantity("On hand − reserved − held, now"),
          weeks: z.array(
            z.object({
              weekStart: day,
              needed: quantity("Build orders' needs in the week"),
              arriving: quantity("Due on sent purchase orders in the week"),
              suggested: quantity("Suggested to arrive in the week"),
              projected: quantity(
                "At the week's end, before this week's suggestion",
              ),
              projectedWithSuggestion: z.number(),
            }),
          ),
        }),
      )
      .meta({
        description: "The week-by-week projection of every item planned.",
      }),
  })
  .meta({
    id: "BuyingPlan",
    description:
      "What to buy and when: open build orders' needs against stock, sent purchase orders and reorder points.",
    example: {
      today: "2026-12-03",
      weeks: ["2026-11-30", "2026-12-07", "2026-12-14"],
      companyCurrency: "EUR",
      suggestions: [suggestionExample],
      items: [
        {
          sku: "CU-IEC-0800",
          name: "Enamelled copper 0.80 mm",
          unit: "kg",
          reorderPoint: 5,
          available: 6,
          weeks: [
            {
              weekStart: "2026-12-14",
              needed: 4.2,
              arriving: 0,
              suggested: 10,
              projected: 1.8,
              projectedWithSuggestion: 11.8,
            },
          ],
        },
      ],
    },
  });
