/** Purchasing in the contract: suppliers, price-list uploads and purchase orders with their steps and receipts. */
import { z } from "zod";
import type { ZodOpenApiPathsObject } from "zod-openapi";
import {
  supplierPatchSchema,
  supplierSchema,
} from "~/purchasing/supplier-schemas";
import { priceListUploadQuerySchema } from "~/price-lists/upload-query";
import {
  endOrderSchema,
  purchaseOrderCreateSchema,
  purchaseOrderListQuerySchema,
  purchaseOrderPatchSchema,
} from "~/purchase-orders/purchase-order-forms";
import { receiptRequestSchema } from "~/purchase-orders/receipt-request";
import { apiOperation, errorBodySchema, jsonAnswer } from "../operation";
import { pageOf } from "../pages";
import {
  priceListAlreadyImportedSchema,
  priceListImportedSchema,
  priceListInvalidSchema,
  priceListLayoutSchema,
  priceListPreviewSchema,
  priceListProgressEventSchema,
  priceListUploadFormSchema,
  purchaseOrderSchema,
  purchaseOrderSummarySchema,
  receiptResultSchema,
  supplierAnswerSchema,
  supplierListSchema,
} from "../schemas/purchasing";

const tag = "Purchasing";

const supplierPath = z.object({
  supplierId: z.string().meta({
    description: "The supplier's id (a whole number).",
    example: "1",
  }),
});

const orderPath = z.object({
  orderId: z.string().meta({
    description: "The order's id, a whole number (PO-000003 is 3).",
    example: "3",
  }),
});

const receiptOrderPath = z.object({
  orderId: z.string().meta({
    description:
      'The order: its id or its number as people write it ("3", "PO-000003", "po 3").',
    example: "PO-000003",
  }),
});

const noSuchOrder = "No purchase order with that id.";

/**
 * A 422 refusal, given as an answer: the operation spec's `refusals` takes only the
 * shared statuses (see the report to the lead), so it has the ErrorBody shape here.
 */
const unprocessable = (description: string) => ({
  422: jsonAnswer(description, errorBodySchema),
});

const orderAnswer = (description: string) =>
  jsonAnswer(description, purchaseOrderSchema);

/** The end steps of an order share their shape: the order's id, an optional reason, the order after the step. */
function orderStep(spec: {
  operationId: string;
  summary: string;
  description: string;
  withReason: boolean;
  conflict: string;
  unprocessable?: string;
}) {
  return apiOperation({
    operationId: spec.operationId,
    summary: spec.summary,
    description: spec.description,
    tag,
    caller: "orderPurchases",
    path: orderPath,
    ...(spec.withReason ? { body: endOrderSchema, bodyOptional: true } : {}),
    answers: {
      200: orderAnswer("The order after the step."),
      ...(spec.unprocessable ? unprocessable(spec.unprocessable) : {}),
    },
    refusals: { 404: noSuchOrder, 409: spec.conflict },
  });
}

const streamDescription = `**Progress (opt-in).** With \`Accept: application/x-ndjson\`, a check or commit whose form is in
order answers 200 \`application/x-ndjson\`: one JSON event a line, \`progress\` events (data rows
read out of the file's) while it works, then one \`result\` event with the status and body the
request answers without the stream. Refusals before the work starts (role, size, form fields)
keep their own status and JSON body.`;

export const purchasingPaths: ZodOpenApiPathsObject = {
  "/api/v1/suppliers": {
    get: apiOperation({
      operationId: "listSuppliers",
      summary: "Every supplier",
      description: "By name, at most 1,000.",
      tag,
      caller: "signedIn",
      answers: { 200: jsonAnswer("The suppliers.", supplierListSchema) },
    }),
    post: apiOperation({
      operationId: "createSupplier",
      summary: "Add a supplier",
      description:
        "Ordering settings left out take their defaults: metal base fixed at order, wire tolerance 10 %, pieces 0 %.",
      tag,
      caller: "keepSuppliers",
      body: supplierSchema,
      answers: { 201: jsonAnswer("The new supplier.", supplierAnswerSchema) },
      refusals: { 409: "Another supplier has that name." },
    }),
  },
  "/api/v1/suppliers/{supplierId}": {
    get: apiOperation({
      operationId: "getSupplier",
      summary: "One supplier",
      tag,
      caller: "signedIn",
      path: supplierPath,
      answers: { 200: jsonAnswer("The supplier.", supplierAnswerSchema) },
      refusals: { 404: "No supplier with that id." },
    }),
    patch: apiOperation({
      operationId: "changeSupplier",
      summary: "Change a supplier",
      description:
        "Only the fields sent change; null clears email, leadTimeDays, notes or orderEmail. Price lines keep their own currency: a new quoting currency applies to the next import.",
      tag,
      caller: "keepSuppliers",
      path: supplierPath,
      body: supplierPatchSchema,
      answers: {
        200: jsonAnswer("The changed supplier.", supplierAnswerSchema),
      },
      refusals: {
        404: "No supplier with that id.",
        409: "Another supplier has that name.",
      },
    }),
  },
  "/api/v1/price-lists": {
    post: apiOperation({
      operationId: "uploadPriceList",
      summary: "Read, check or import a supplier's price list",
      description: `A multipart upload with three modes: \`?layout=1\` reads the file's header row and first row
(what a mapping needs), \`?dryRun=1\` checks every row and answers a preview, and without either the
list is imported in one transaction: all rows or none. The same file imported again for the same
supplier changes nothing.

${streamDescription}`,
      tag,
      caller: "importPriceLists",
      query: priceListUploadQuerySchema,
      answers: {
        200: {
          description:
            "?layout=1: the file's layout. ?dryRun=1: the preview. A commit of a file imported before: nothing changed. With `Accept: application/x-ndjson`: the progress stream.",
          content: {
            "application/json": {
              schema: z.union([
                priceListLayoutSchema,
                priceListPreviewSchema,
                priceListAlreadyImportedSchema,
              ]),
            },
            "application/x-ndjson": {
              schema: priceListProgressEventSchema,
              example: {
                type: "progress",
                step: "check",
                processed: 10000,
                total: 42000,
              },
            },
          },
        },
        201: jsonAnswer("The list was imported.", priceListImportedSchema),
        422: jsonAnswer(
          "Some rows are invalid; nothing was imported. `invalid` lists the first 1,000 lines with errors.",
          priceListInvalidSchema,
        ),
      },
      refusals: {
        400: "The form was refused (`error.fields` names file, supplier or mapping), no supplier has that name, or the file cannot be read as a price list.",
        413: "The file is larger than 20 MB.",
      },
      extra: {
        requestBody: {
          required: true,
          content: {
            "multipart/form-data": {
              schema: priceListUploadFormSchema,
              encoding: {
                file: {
                  contentType:
                    "text/csv, application/vnd.openxmlformats-officedocument.spreadsheetml.sheet, application/octet-stream",
                },
              },
            },
          },
        },
      },
    }),
  },
  "/api/v1/purchase-orders": {
    get: apiOperation({
      operationId: "listPurchaseOrders",
      summary: "A page of purchase orders",
      description: "Newest first, filtered by status, supplier or search text.",
      tag,
      caller: "signedIn",
      query: purchaseOrderListQuerySchema,
      answers: {
        200: jsonAnswer(
          "A page of orders.",
          pageOf("PurchaseOrderPage", "orders", purchaseOrderSummarySchema),
        ),
      },
    }),
    post: apiOperation({
      operationId: "createPurchaseOrder",
      summary: "Start a draft purchase order",
      description:
        "Each line is priced from the supplier's price list on the day unless a unit price is given (with an optional reason). Quantities are in the item's unit, prices in the order's currency (the supplier's by default).",
      tag,
      caller: "orderPurchases",
      body: purchaseOrderCreateSchema,
      answers: {
        201: orderAnswer("The draft order."),
        ...unprocessable(
          "No supplier has that id, no item has a SKU, an item is archived, or no price or exchange rate prices a line.",
        ),
      },
      refusals: {
        400: "The body was refused, or a quantity is not whole for an item counted in pieces.",
      },
    }),
  },
  "/api/v1/purchase-orders/{orderId}": {
    get: apiOperation({
      operationId: "getPurchaseOrder",
      summary: "One purchase order",
      tag,
      caller: "signedIn",
      path: orderPath,
      answers: { 200: orderAnswer("The order.") },
      refusals: { 404: noSuchOrder },
    }),
    patch: apiOperation({
      operationId: "changePurchaseOrder",
      summary: "Change a draft purchase order",
      description:
        "Currency, notes and lines. Each entry of `lines` without an id adds a line; with an id it changes that line (unitPrice null: back to the price list) or removes it (`remove: true`). Lines not named stay as they are.",
      tag,
      caller: "orderPurchases",
      path: orderPath,
      body: purchaseOrderPatchSchema,
      answers: {
        200: orderAnswer("The changed order."),
        ...unprocessable(
          "The order has no line with an id given, no item has a SKU, an item is archived, or no price or exchange rate prices a line.",
        ),
      },
      refusals: {
        404: noSuchOrder,
        409: "The order is no longer a draft.",
      },
    }),
  },
  "/api/v1/purchase-orders/{orderId}/send": {
    post: orderStep({
      operationId: "sendPurchaseOrder",
      summary: "Send a draft to its supplier",
      description:
        "E-mails the order (PDF and CSV attached) to the supplier's order address, else its general one; lines priced on the metal base fixed at order are priced again on the sending day, and the lines count as stock on order.",
      withReason: false,
      conflict: "The order is not a draft, or has no lines.",
      unprocessable:
        "The supplier has no e-mail address, or no price or exchange rate prices a line on the day.",
    }),
  },
  "/api/v1/purchase-orders/{orderId}/cancel": {
    post: orderStep({
      operationId: "cancelPurchaseOrder",
      summary: "Cancel an order",
      description:
        "A draft, or a sent order nothing has arrived for. The optional reason is kept in its history.",
      withReason: true,
      conflict:
        "The order is past cancelling: something has arrived (close it short instead), or it has ended.",
    }),
  },
  "/api/v1/purchase-orders/{orderId}/close": {
    post: orderStep({
      operationId: "closePurchaseOrder",
      summary: "Close an order short",
      description:
        "A sent or partly received order that will not be delivered in full: what is still open no longer counts as on order. The optional reason is kept in its history.",
      withReason: true,
      conflict: "The order is not sent or partly received.",
    }),
  },
  "/api/v1/purchase-orders/{orderId}/receipts": {
    post: apiOperation({
      operationId: "receivePurchaseOrder",
      summary: "Receive a delivery against an order",
      description:
        "One entry a spool or lot: the order line it fills, its lot, its location and its quantity, or for wire the spool's gross and tare weights. The unit cost comes from the order line. All entries are booked or none.",
      tag,
      caller: "receivePurchases",
      path: receiptOrderPath,
      body: receiptRequestSchema,
      answers: {
        201: jsonAnswer(
          "The receipt and the order after it.",
          receiptResultSchema,
        ),
        ...unprocessable(
          "A line is not on the order, or the order is not sent (a draft, or cancelled, closed or received).",
        ),
      },
      refusals: {
        400: "The body was refused, or an entry does not fit its item (weights for an item that is not wire, no tare, an unknown location).",
        404: "No purchase order by that id or number.",
        409: "A line would go past its delivery tolerance, no rate or metal base prices it on the day, or the stock ledger refuses an entry.",
      },
    }),
  },
};
