/** The storeroom in the contract: locations, scanning, the movement journal and recording, lots and their holds, alerts. */
import { z } from "zod";
import type { ZodOpenApiPathsObject } from "zod-openapi";
import { alertListQuerySchema } from "~/alerts/alert-list-query";
import { scanLookupQuerySchema } from "~/labels/scan-lookup-query";
import {
  holdLotSchema,
  lotQuerySchema,
  releaseLotSchema,
} from "~/lots/lot-hold-requests";
import { movementJournalQuerySchema } from "~/stock/movement-journal-query";
import { movementRequestSchema } from "~/stock/movement-request";
import { apiOperation, countedAnswer, jsonAnswer } from "../operation";
import {
  locationSchema,
  lotDocumentsSchema,
  lotHoldSchema,
  lotWhereUsedSchema,
  movementJournalPageSchema,
  recordedMovementSchema,
  scanLookupSchema,
  stockAlertSchema,
} from "../schemas/stock";

const tag = "Stock";

const lotPath = z.object({
  lot: z.string().meta({
    description:
      "The lot's number. Lot numbers are unique per item only: when several items have a lot of this number, add `?sku=`.",
    example: "S24143",
  }),
});

const lotRefusals = {
  404: "No lot of that number (of that item, with `sku`).",
  409: "Lots of several items have that number and no `sku` says which: the message lists their SKUs.",
} as const;

export const stockPaths: ZodOpenApiPathsObject = {
  "/api/v1/locations": {
    get: apiOperation({
      operationId: "listLocations",
      summary: "Every store and bin",
      tag,
      caller: "signedIn",
      answers: {
        200: jsonAnswer("The locations.", z.array(locationSchema)),
      },
    }),
  },
  "/api/v1/scan-lookup": {
    get: apiOperation({
      operationId: "lookUpScannedCode",
      summary: "What a scanned label stands for",
      description:
        "Reads a label's code as a scanner or a person gives it and answers the lot (its item, number and where it is) or the location it names.",
      tag,
      caller: "signedIn",
      query: scanLookupQuerySchema,
      answers: {
        200: jsonAnswer("The lot or location.", scanLookupSchema),
      },
      refusals: {
        400: "Not a Turnledger code: nothing scanned, another company's barcode, a GS1 code or an address of another site.",
        404: "A Turnledger code that names no lot or location.",
      },
    }),
  },
  "/api/v1/stock-movements": {
    get: apiOperation({
      operationId: "listStockMovements",
      summary: "A page of the movement journal",
      description:
        "Newest first, filtered by type, item, lot, reference, person and days (`from` and `to` inclusive, UTC).",
      tag,
      caller: "signedIn",
      query: movementJournalQuerySchema,
      answers: {
        200: jsonAnswer("A page of movements.", movementJournalPageSchema),
      },
    }),
    post: apiOperation({
      operationId: "recordStockMovement",
      summary: "Record a receipt, issue, return, transfer, count or adjustment",
      description: [
        "The ledger is append-only: a correction is a new movement. A wire spool may be received or weighed back by `grossKg` (and `tareKg`) instead of `quantity`.",
        "An issue with `buildOrderId` goes through that build order: it takes what the order holds and counts as issued to it (the answer then has `buildOrder`). A plain issue whose reference names a build order (`BO-12`) is refused on `reference`.",
        "A receipt may name its supplier (`supplierId`): a lot it creates keeps it as its origin.",
      ].join("\n\n"),
      tag,
      caller: "recordStock",
      body: movementRequestSchema,
      answers: {
        201: jsonAnswer(
          "The movement and the item's balance after it.",
          recordedMovementSchema,
        ),
      },
      refusals: {
        400: "The body was refused (`error.fields` names each field), or it names no such item, location, lot or supplier, a unit other than the item's, or a part of a piece.",
        404: "No build order with that `buildOrderId`.",
        409: "The stock would go below zero or take what build orders hold, the item is archived, the lot is on quality hold, or the build order is not open or needs no such item. Nothing was recorded.",
      },
    }),
  },
  "/api/v1/lots/{lot}/hold": {
    post: apiOperation({
      operationId: "holdLot",
      summary: "Put a lot on quality hold",
      description:
        "While held, the lot's free stock (on hand less reserved) counts as held, not available, and the lot cannot be issued or transferred.",
      tag,
      caller: "holdLots",
      path: lotPath,
      query: lotQuerySchema,
      body: holdLotSchema,
      answers: { 200: jsonAnswer("The lot, now held.", lotHoldSchema) },
      refusals: {
        ...lotRefusals,
        409: "The lot is on hold already, or lots of several items have that number and no `sku` says which.",
      },
    }),
  },
  "/api/v1/lots/{lot}/release": {
    post: apiOperation({
      operationId: "releaseLot",
      summary: "Release a lot from quality hold",
      description: "The body may be left out, or give a note on why.",
      tag,
      caller: "holdLots",
      path: lotPath,
      query: lotQuerySchema,
      body: releaseLotSchema,
      bodyOptional: true,
      answers: { 200: jsonAnswer("The lot, now free.", lotHoldSchema) },
      refusals: {
        ...lotRefusals,
        409: "The lot is not on hold, or lots of several items have that number and no `sku` says which.",
      },
    }),
  },
  "/api/v1/lots/{lot}/where-used": {
    get: apiOperation({
      operationId: "getLotWhereUsed",
      summary: "Where a lot went",
      description:
        "Every build order that drew from the lot, read from the journal, and the issues of it made to no order.",
      tag,
      caller: "signedIn",
      path: lotPath,
      query: lotQuerySchema,
      answers: { 200: jsonAnswer("The lot's uses.", lotWhereUsedSchema) },
      refusals: lotRefusals,
    }),
  },
  "/api/v1/lots/{lot}/documents": {
    get: apiOperation({
      operationId: "listLotDocuments",
      summary: "A lot's certificates",
      description:
        "The certificates kept with the lot, newest first; `url` downloads each (signed in).",
      tag,
      caller: "signedIn",
      path: lotPath,
      query: lotQuerySchema,
      answers: {
        200: jsonAnswer("The lot's certificates.", lotDocumentsSchema),
      },
      refusals: lotRefusals,
    }),
  },
  "/api/v1/alerts": {
    get: apiOperation({
      operationId: "listStockAlerts",
      summary: "Low-stock alerts, newest first",
      tag,
      caller: "signedIn",
      query: alertListQuerySchema,
      answers: {
        200: countedAnswer(
          "A page of alerts; `X-Total-Count` gives how many match.",
          z.array(stockAlertSchema),
        ),
      },
    }),
  },
};
