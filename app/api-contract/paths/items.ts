/** The catalogue's items in the contract: the list, one item, adding and changing one. */
import { z } from "zod";
import type { ZodOpenApiPathsObject } from "zod-openapi";
import { itemKinds } from "~/db/tables/stock-enums";
import { itemCreateSchema, itemPatchSchema } from "~/stock/item-schemas";
import { itemListQuerySchema } from "~/stock/item-list-query";
import { apiOperation, jsonAnswer } from "../operation";
import { pageOf } from "../pages";

const quantity = (description: string) =>
  z.number().meta({ description: `${description}, in the item's unit.` });

export const itemSummarySchema = z
  .object({
    sku: z.string(),
    name: z.string(),
    kind: z.enum(itemKinds),
    unit: z
      .string()
      .meta({ description: "kg for wire, pcs for magnets and parts." }),
    sizeOrGrade: z.string(),
    onHand: quantity("On hand"),
    reserved: quantity("Held for build orders"),
    held: quantity("On lots on quality hold"),
    available: quantity("On hand less reserved and held"),
    onOrder: quantity("Still to come on sent purchase orders"),
    reorderPoint: quantity("Reorder point"),
    reorderQuantity: quantity("Reorder quantity"),
    belowReorder: z.boolean(),
    averageCost: z
      .number()
      .meta({ description: "Moving average cost per unit, EUR." }),
    value: z.number().meta({ description: "On hand at average cost, EUR." }),
    active: z.boolean().meta({ description: "False once archived." }),
  })
  .meta({
    id: "ItemSummary",
    example: {
      sku: "CU-IEC-0500",
      name: "Enamelled copper 0.50 mm",
      kind: "wire",
      unit: "kg",
      sizeOrGrade: "0.50",
      onHand: 23.4,
      reserved: 2.1,
      held: 0,
      available: 21.3,
      onOrder: 10,
      reorderPoint: 8,
      reorderQuantity: 20,
      belowReorder: false,
      averageCost: 14.85,
      value: 347.49,
      active: true,
    },
  });

export const itemSchema = itemSummarySchema
  .extend({
    balances: z.array(
      z.object({
        lotId: z.number().int().nullable(),
        lot: z.string().nullable(),
        location: z.string(),
        locationName: z.string(),
        tareKg: z
          .number()
          .nullable()
          .meta({ description: "The empty spool's mass, for wire lots." }),
        onHand: z.number(),
        reserved: z.number(),
        holdReason: z
          .string()
          .nullable()
          .meta({ description: "Set while the lot is on quality hold." }),
      }),
    ),
  })
  .meta({
    id: "Item",
    description:
      "An item with its balances by lot and location, oldest lot first.",
  });

/**
 * A page of items: a search counts its matches only up to 1,000 past the page's first row
 * (decision 057-trigram-search), so its total may be a lower bound.
 */
const itemPageSchema = pageOf("ItemPage", "items", itemSummarySchema)
  .extend({
    total: z.number().int().min(0).meta({
      description:
        "Items matching. Exact without a search; with one, counted only up to 1,000 past the page's first row: when `totalExact` is false, more than `total` items match.",
    }),
    totalExact: z.boolean().meta({
      description:
        "False when a search's count stopped at its reach (more than `total` items match, and the next page is worth asking for); always true without a search.",
    }),
  })
  .meta({ id: "ItemPage", description: "A page of items." });

/** The SKU in an item's address. */
export const skuPath = z.object({
  sku: z
    .string()
    .meta({ description: "The item's SKU.", example: "CU-IEC-0500" }),
});

export const itemPaths: ZodOpenApiPathsObject = {
  "/api/v1/items": {
    get: apiOperation({
      operationId: "listItems",
      summary: "A page of items",
      description: "Filtered, sorted and paged on the server.",
      tag: "Stock",
      caller: "signedIn",
      query: itemListQuerySchema,
      answers: {
        200: jsonAnswer("A page of items.", itemPageSchema),
      },
    }),
    post: apiOperation({
      operationId: "createItem",
      summary: "Add an item to the catalogue",
      tag: "Stock",
      caller: "keepCatalogue",
      body: itemCreateSchema,
      answers: { 201: jsonAnswer("The new item.", itemSchema) },
      refusals: { 409: "An item with that SKU already exists." },
    }),
  },
  "/api/v1/items/{sku}": {
    get: apiOperation({
      operationId: "getItem",
      summary: "One item with its balances",
      tag: "Stock",
      caller: "signedIn",
      path: skuPath,
      answers: { 200: jsonAnswer("The item.", itemSchema) },
      refusals: { 404: "No item with that SKU." },
    }),
    patch: apiOperation({
      operationId: "changeItem",
      summary: "Change an item's name, reorder levels or archive state",
      description:
        "Storekeepers may change the reorder point and quantity only; the name and archive state need a buyer.",
      tag: "Stock",
      caller: "keepReorderLevels",
      path: skuPath,
      body: itemPatchSchema,
      answers: { 200: jsonAnswer("The changed item.", itemSchema) },
      refusals: { 404: "No item with that SKU." },
    }),
  },
};
