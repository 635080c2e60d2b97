/** Prices in the contract: metal base, currency rates, an item's prices, and the buying plan. */
import type { ZodOpenApiPathsObject } from "zod-openapi";
import { buyingPlanQuerySchema } from "~/buying-plan/plan-query";
import { itemPricesQuerySchema } from "~/purchasing/item-prices-query";
import {
  currencyRateSchema,
  metalBaseSchema,
} from "~/purchasing/supplier-schemas";
import { apiOperation, jsonAnswer } from "../operation";
import { skuPath } from "./items";
import {
  buyingPlanSchema,
  currencyRatesSchema,
  itemPricesSchema,
  metalBaseListSchema,
} from "../schemas/prices";

const tag = "Purchasing";

export const pricePaths: ZodOpenApiPathsObject = {
  "/api/v1/metal-base": {
    get: apiOperation({
      operationId: "listMetalBase",
      summary: "The copper and aluminium base prices",
      description:
        "Wire quoted as an adder per kg is priced on the base valid on the day.",
      tag,
      caller: "signedIn",
      answers: { 200: jsonAnswer("The base prices.", metalBaseListSchema) },
    }),
    put: apiOperation({
      operationId: "setMetalBase",
      summary: "Set a conductor's base price from a day",
      description:
        "The same conductor, currency and day again replaces the price.",
      tag,
      caller: "keepPrices",
      body: metalBaseSchema,
      answers: {
        200: jsonAnswer(
          "The base prices, with the new one.",
          metalBaseListSchema,
        ),
      },
    }),
  },
  "/api/v1/currency-rates": {
    get: apiOperation({
      operationId: "listCurrencyRates",
      summary: "The exchange rates to the company currency",
      tag,
      caller: "signedIn",
      answers: { 200: jsonAnswer("The rates.", currencyRatesSchema) },
    }),
    put: apiOperation({
      operationId: "setCurrencyRate",
      summary: "Set a currency's rate from a day",
      description:
        "`rate` is units of the company currency per one unit of `currency`; the same currency and day again replaces the rate.",
      tag,
      caller: "keepPrices",
      body: currencyRateSchema,
      answers: {
        200: jsonAnswer("The rates, with the new one.", currencyRatesSchema),
      },
      refusals: {
        400: "The body was refused (`error.fields` names each field), or it names the company currency itself, which needs no rate.",
      },
    }),
  },
  "/api/v1/items/{sku}/prices": {
    get: apiOperation({
      operationId: "getItemPrices",
      summary: "An item's prices from every supplier",
      description:
        "For a quantity on a day (today when not given), cheapest first in the company currency, each with its currency, rate, metal base and source line; offers that cannot be priced are listed with the reasons.",
      tag,
      caller: "signedIn",
      query: itemPricesQuerySchema,
      path: skuPath,
      answers: { 200: jsonAnswer("The item's prices.", itemPricesSchema) },
      refusals: { 404: "No item with that SKU." },
    }),
  },
  "/api/v1/buying-plan": {
    get: apiOperation({
      operationId: "getBuyingPlan",
      summary: "What to buy and when",
      description:
        "Open build orders' needs (by their planned start) against stock, sent purchase orders and reorder points, week by week, with a suggestion per item and week of shortfall.",
      tag,
      caller: "signedIn",
      query: buyingPlanQuerySchema,
      answers: { 200: jsonAnswer("The plan.", buyingPlanSchema) },
    }),
  },
};
