/**
 * The answers of the Purchasing operations in the contract: suppliers, price-list uploads
 * and purchase orders, each written to match what the route's server code returns
 * (suppliers.server.ts, price-import.server.ts, purchase-order-details.server.ts,
 * receive-against-order.server.ts). Examples come from the demo scenario (seed/).
 */
import { z } from "zod";
import { stockUnits, itemKinds } from "~/db/tables/stock-enums";
import {
  linePriceSources,
  metalBaseFixings,
  purchaseOrderStatuses,
} from "~/db/tables/purchase-order-enums";
import { priceListFieldKeys } from "~/price-lists/column-mapping";

const day = (description: string) =>
  z.iso.date().meta({ description: `${description} (YYYY-MM-DD).` });
const time = (description: string) =>
  z.iso.datetime().meta({ description: `${description} (ISO 8601, UTC).` });
const currencyCode = z
  .string()
  .meta({ description: "ISO 4217 code.", example: "EUR" });
const metalBaseFixedAt = z.enum(metalBaseFixings).meta({
  description:
    "When the metal base of a wire price is fixed: when the order is sent, or on the delivery day.",
});
const orderStatus = z.enum(purchaseOrderStatuses).meta({
  description:
    "draft → sent → partly_received → received; cancelled (nothing arrived) or closed_short (nothing more will come).",
});

// ——— Suppliers ———

export const supplierAnswerSchema = z
  .object({
    id: z.number().int().meta({
      description: "The supplier's id, for /api/v1/suppliers/{supplierId}.",
    }),
    name: z.string(),
    email: z.string().nullable().meta({ description: "General address." }),
    currency: currencyCode.meta({
      description: "The currency the supplier quotes in (ISO 4217).",
    }),
    leadTimeDays: z.number().int().nullable().meta({
      description:
        "Days from order to delivery, unless a price line says otherwise.",
    }),
    notes: z.string().nullable(),
    orderEmail: z.string().nullable().meta({
      description:
        "Where purchase orders are e-mailed; the general address when null.",
    }),
    metalBaseFixedAt,
    wireTolerancePercent: z.number().meta({
      description:
        "How far past the ordered weight a wire delivery may go, percent.",
    }),
    pieceTolerancePercent: z.number().meta({
      description:
        "How far past the ordered count a delivery in pieces may go, percent.",
    }),
  })
  .meta({
    id: "Supplier",
    example: {
      id: 1,
      name: "Quillan Drawn Wire GmbH",
      email: "verkauf@quillan-wire.example.test",
      currency: "EUR",
      leadTimeDays: 21,
      notes:
        "Enamelled copper wire in IEC sizes, priced on the copper base plus an adder per kg.",
      orderEmail: null,
      metalBaseFixedAt: "order",
      wireTolerancePercent: 10,
      pieceTolerancePercent: 0,
    },
  });

export const supplierListSchema = z.array(supplierAnswerSchema).meta({
  id: "SupplierList",
  description: "Every supplier by name (at most 1,000).",
});

// ——— Price-list uploads ———

/** The multipart form of POST /api/v1/price-lists, as the route reads it. */
export const priceListUploadFormSchema = z
  .object({
    file: z.string().meta({
      format: "binary",
      description:
        "The price list: a CSV file (UTF-8, UTF-16 or Windows-1252; comma, semicolon or tab separated) or an .xlsx workbook, told apart by its content. At most 20 MB.",
    }),
    sheet: z.string().optional().meta({
      description:
        "For a workbook: the sheet to read, by name. Default: its first visible sheet.",
    }),
    supplier: z.string().optional().meta({
      description:
        "The supplier's name, as stored. Needed except with ?layout=1.",
      example: "Quillan Drawn Wire GmbH",
    }),
    mapping: z
      .string()
      .optional()
      .meta({
        description: `JSON object: our field → the file's column header. Fields: ${priceListFieldKeys.join(", ")}. supplierSku and itemSku may name the same header. Needed except with ?layout=1.`,
        example:
          '{"supplierSku":"Artikel-Nr.","description":"Bezeichnung","standard":"Norm","size":"Nenn-Ø mm","adderPerKg":"Zuschlag je kg","minQuantity":"ab Menge kg","validFrom":"gültig ab"}',
      }),
  })
  .meta({ id: "PriceListUploadForm" });

const lineErrorSchema = z
  .object({
    line: z.number().int().meta({ description: "The line in the file." }),
    message: z.string(),
  })
  .meta({ id: "PriceListLineError" });

const decimalText = (description: string) =>
  z.string().meta({ description: `${description}, decimal text.` });

const priceRowBase = {
  line: z.number().int().meta({ description: "The line the row starts on." }),
  supplierSku: z.string(),
  itemSku: z.string().nullable().meta({
    description: "Our SKU when the file names it, else null.",
  }),
  description: z.string(),
  price: decimalText("Price per unit, 4 places").nullable(),
  adderPerKg: decimalText(
    "Adder per kg on the metal base, 4 places",
  ).nullable(),
  currency: currencyCode,
  minQuantity: decimalText("The quantity the price starts at, 3 places"),
  validFrom: day("The day the price starts"),
  leadTimeDays: z.number().int().nullable(),
  packQuantity: decimalText("Pack or spool size, 3 places").nullable(),
  match: z
    .object({
      sku: z.string(),
      name: z.string(),
      kind: z.enum(itemKinds),
      newItem: z
        .boolean()
        .meta({ description: "True when the import creates the item." }),
      by: z.enum([
        "our-sku",
        "supplier-sku",
        "wire-size",
        "magnet-grade",
        "new-item",
      ]),
    })
    .meta({
      description: "The catalogue item the row prices, or the one it creates.",
    }),
};

const previewRowSchema = z
  .discriminatedUnion("kind", [
    z.object({
      ...priceRowBase,
      kind: z.literal("wire"),
      unit: z.literal("kg"),
      standard: z.enum(["AWG", "IEC"]),
      size: z
        .string()
        .meta({ description: '"20", "0000" (AWG) or "0.500" (IEC, mm).' }),
      insulation: z
        .enum(["grade1", "grade2", "grade3", "single", "heavy", "triple"])
        .nullable(),
      thermalClass: z
        .union([
          z.literal(130),
          z.literal(155),
          z.literal(180),
          z.literal(200),
          z.literal(220),
        ])
        .nullable(),
    }),
    z.object({
      ...priceRowBase,
      kind: z.literal("magnet"),
      unit: z.literal("pcs"),
      grade: z.string(),
      gradeMatch: z
        .string()
        .meta({ description: "The known grade it matched, lower case." }),
    }),
    z.object({
      ...priceRowBase,
      kind: z.literal("part"),
      unit: z.enum(stockUnits),
    }),
  ])
  .meta({ id: "PriceListPreviewRow" });

const importWarningSchema = z
  .object({
    kind: z.enum(["no-exchange-rate", "metal-base-derived", "no-metal-base"]),
    currency: z.string(),
    conductor: z.enum(["copper", "aluminium"]).optional(),
    message: z.string(),
  })
  .meta({
    id: "PriceImportWarning",
    description:
      "A missing currency rate or metal base: never stops an import.",
  });

const invalidLines = {
  valid: z.number().int().meta({ description: "Rows that would be imported." }),
  invalid: z.array(lineErrorSchema).meta({
    description: "The first 1,000 lines with errors, in file order.",
  }),
  invalidCount: z
    .number()
    .int()
    .meta({ description: "Every line with an error." }),
  invalidTruncated: z.boolean(),
};

export const priceListPreviewSchema = z
  .object({
    rows: z
      .array(previewRowSchema)
      .meta({ description: "The first 20 good rows." }),
    ...invalidLines,
    matched: z
      .number()
      .int()
      .meta({ description: "Rows that price an existing item." }),
    newItems: z
      .number()
      .int()
      .meta({ description: "Items the import would create." }),
    warnings: z.array(importWarningSchema),
  })
  .meta({
    id: "PriceListPreview",
    description: "?dryRun=1: what a commit would do; nothing is written.",
  });

export const priceListLayoutSchema = z
  .discriminatedUnion("format", [
    z.object({
      format: z.literal("csv"),
      headers: z.array(z.string()),
      sampleRow: z.array(z.string()),
      encoding: z.string().meta({ example: "utf-8" }),
      headerLine: z.number().int(),
    }),
    z.object({
      format: z.literal("xlsx"),
      headers: z.array(z.string()),
      sampleRow: z.array(z.string()),
      sheets: z.array(z.object({ name: z.string(), hidden: z.boolean() })),
      sheet: z.string().meta({ description: "The sheet read." }),
      headerLine: z.number().int(),
    }),
  ])
  .meta({
    id: "PriceListLayout",
    description:
      "?layout=1: the file's header row, first data row and (a workbook) its sheets, what a mapping needs. Nothing is written.",
  });

export const priceListAlreadyImportedSchema = z
  .object({
    importId: z.number().int(),
    alreadyImported: z.literal(true),
    message: z.string(),
  })
  .meta({
    id: "PriceListAlreadyImported",
    description:
      "The same file was imported for this supplier before; nothing changed.",
  });

export const priceListImportedSchema = z
  .object({
    importId: z.number().int(),
    supplier: z.string(),
    fileName: z.string(),
    rows: z.number().int().meta({ description: "Price lines written." }),
    newItems: z
      .number()
      .int()
      .meta({ description: "Catalogue items created." }),
    warnings: z.array(importWarningSchema),
  })
  .meta({
    id: "PriceListImported",
    example: {
      importId: 4,
      supplier: "Quillan Drawn Wire GmbH",
      fileName: "quillan-2026-11.csv",
      rows: 42,
      newItems: 0,
      warnings: [],
    },
  });

export const priceListInvalidSchema = z
  .object({
    error: z.object({ message: z.string() }),
    ...invalidLines,
  })
  .meta({
    id: "PriceListInvalid",
    description: "Rows with errors: nothing was imported.",
  });

/** One line of the streamed answer (`Accept: application/x-ndjson`). */
export const priceListProgressEventSchema = z
  .discriminatedUnion("type", [
    z.object({
      type: z.literal("progress"),
      step: z.enum(["check", "import"]),
      processed: z
        .number()
        .int()
        .meta({ description: "Data rows read so far." }),
      total: z.number().int().meta({ description: "The file's data rows." }),
    }),
    z.object({
      type: z.literal("result"),
      status: z.number().int().meta({
        description: "The status the request answers without the stream.",
      }),
      body: z
        .union([
          priceListPreviewSchema,
          priceListImportedSchema,
          priceListAlreadyImportedSchema,
          priceListInvalidSchema,
          z.object({
            error: z.object({
              message: z.string(),
              fields: z.record(z.string(), z.array(z.string())).optional(),
            }),
            reference: z.string().nullable().optional(),
          }),
        ])
        .meta({
          description:
            "The body the request answers without the stream (an error body, with `reference` for a 500).",
        }),
    }),
  ])
  .meta({
    id: "PriceListProgressEvent",
    description:
      "One line of the `application/x-ndjson` stream: progress events (at least every 10,000 rows or 250 ms), then one result event.",
  });

// ——— Purchase orders ———

const quantity = (description: string) =>
  z.number().meta({ description: `${description}, in the item's unit.` });
const money = (description: string) =>
  z.number().meta({ description: `${description}, in the order's currency.` });

const orderSupplierSchema = z.object({
  id: z.number().int(),
  name: z.string(),
  email: z.string().nullable(),
  orderEmail: z.string().nullable(),
  currency: z.string(),
  metalBaseFixedAt,
});

const orderLineSchema = z
  .object({
    id: z.number().int().meta({
      description: "The line's id, for changes and receipts.",
    }),
    lineNumber: z.number().int(),
    sku: z.string(),
    name: z.string(),
    unit: z.enum(stockUnits),
    supplierSku: z
      .string()
      .meta({ description: '"" when the supplier has none.' }),
    quantity: quantity("Ordered"),
    received: quantity("Received so far"),
    open: quantity("Still to come (never below 0)"),
    unitPrice: money("Price per unit"),
    lineTotal: money("Quantity × price, to the cent"),
    priceSource: z.enum(linePriceSources),
    overrideReason: z.string().nullable(),
    metalBasePerKg: money("The metal base per kg in the price").nullable(),
    adderPerKg: money("The adder per kg in the price").nullable(),
    metalBaseFixedAt: metalBaseFixedAt.nullable(),
    requestedDate: day("The day asked for").nullable(),
    leadTimeDays: z.number().int(),
    expectedDate: day("The day the line is expected"),
  })
  .meta({ id: "PurchaseOrderLine" });

export const purchaseOrderSchema = z
  .object({
    id: z.number().int(),
    number: z.string().meta({ example: "PO-000003" }),
    status: orderStatus,
    currency: currencyCode,
    notes: z.string(),
    orderDate: day(
      "The day lead times count from: the sending day, else the creation day",
    ),
    orderedOn: day("The day it was sent").nullable(),
    sentAt: time("When it was sent").nullable(),
    endReason: z.string().nullable().meta({
      description: "Why it was cancelled or closed short.",
    }),
    createdAt: time("Created"),
    updatedAt: time("Last changed"),
    createdBy: z.string().meta({ description: "The person's name." }),
    supplier: orderSupplierSchema,
    total: money("The lines' totals"),
    lines: z.array(orderLineSchema),
    events: z.array(
      z.object({
        kind: z.string().meta({
          description:
            "created, edited, line-added, line-changed, line-removed, price-overridden, sent, received, cancelled, closed_short …",
        }),
        detail: z.string(),
        at: time("When"),
        person: z.string(),
      }),
    ),
    receipts: z.array(
      z.object({
        id: z.number().int(),
        receivedOn: day("The delivery day"),
        person: z.string(),
        createdAt: time("Booked"),
        lines: z.array(
          z.object({
            orderLineId: z.number().int(),
            movementId: z.number().int().meta({
              description: "The stock movement the receipt booked.",
            }),
            quantity: quantity("Received"),
            unitPrice: money("Price per unit"),
          }),
        ),
      }),
    ),
  })
  .meta({
    id: "PurchaseOrder",
    description: "An order with its supplier, lines, history and receipts.",
  });

export const purchaseOrderSummarySchema = z
  .object({
    id: z.number().int(),
    number: z.string(),
    status: orderStatus,
    statusLabel: z.string().meta({ example: "Partly received" }),
    supplier: z.object({ id: z.number().int(), name: z.string() }),
    currency: currencyCode,
    orderedOn: day("The day it was sent").nullable(),
    createdAt: time("Created"),
    lineCount: z.number().int(),
    total: money("The lines' totals"),
    nextExpectedDate: day(
      "The earliest expected day of a line still open; null when none is",
    ).nullable(),
  })
  .meta({
    id: "PurchaseOrderSummary",
    example: {
      id: 3,
      number: "PO-000003",
      status: "partly_received",
      statusLabel: "Partly received",
      supplier: { id: 1, name: "Quillan Drawn Wire GmbH" },
      currency: "EUR",
      orderedOn: "2026-11-12",
      createdAt: "2026-11-12T09:30:00.000Z",
      lineCount: 2,
      total: 512.4,
      nextExpectedDate: "2026-12-03",
    },
  });

export const receiptResultSchema = z
  .object({
    receipt: z.object({
      id: z.number().int(),
      receivedOn: day("The delivery day"),
      lines: z.array(
        z.object({
          lineId: z.number().int(),
          movementId: z.number().int(),
          sku: z.string(),
          lot: z.string().nullable(),
          location: z.string(),
          quantity: quantity("Received"),
          unit: z.enum(stockUnits),
          unitCost: z.number().meta({
            description: "Cost per unit in the company currency (EUR).",
          }),
        }),
      ),
    }),
    order: z.object({
      id: z.number().int(),
      number: z.string(),
      status: orderStatus,
      lines: z.array(
        z.object({
          id: z.number().int(),
          sku: z.string(),
          unit: z.enum(stockUnits),
          quantity: quantity("Ordered"),
          received: quantity("Received so far"),
          open: quantity("Still to come"),
        }),
      ),
    }),
  })
  .meta({
    id: "PurchaseReceipt",
    description:
      "The receipt booked (one stock movement a spool or lot) and the order after it.",
  });
