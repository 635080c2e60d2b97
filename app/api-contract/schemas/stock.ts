/**
 * What the storeroom's operations answer (paths/stock.ts): locations, scanned codes, the
 * movement journal and a recorded movement, lots (hold, where used, certificates) and
 * low-stock alerts. Each schema lists exactly the fields the route's server code builds.
 * Examples come from the demo store (seed/demo-stock.ts). Pure: Zod only.
 */
import { z } from "zod";
import { buildOrderStatuses } from "~/db/tables/build-order-enums";
import { movementTypes } from "~/db/tables/stock-enums";

const time = (description: string) =>
  z.iso.datetime().meta({ description: `${description} (ISO 8601, UTC).` });
const inUnit = (description: string) =>
  z.number().meta({ description: `${description}, in the item's unit.` });

export const locationSchema = z
  .object({
    code: z.string().meta({ description: "The short code on labels." }),
    name: z.string(),
  })
  .meta({
    id: "Location",
    description: "A store or bin.",
    example: { code: "WIRE-A2", name: "Wire rack A, shelf 2 (medium gauges)" },
  });

export const scanLookupSchema = z
  .discriminatedUnion("kind", [
    z
      .object({
        kind: z.literal("lot"),
        code: z
          .string()
          .meta({ description: "The bare code, `L` and the lot's id." }),
        lotId: z.number().int(),
        sku: z.string(),
        name: z.string().meta({ description: "The item's name." }),
        lot: z.string().meta({ description: "The lot's number." }),
        unit: z.string(),
        onHand: inUnit("Net on hand of the lot, all locations together"),
        location: z.string().nullable().meta({
          description:
            "The one location the lot has stock at; null when none or several.",
        }),
        locations: z
          .array(z.string())
          .meta({ description: "Every location the lot has stock at." }),
      })
      .meta({
        id: "ScannedLot",
        example: {
          kind: "lot",
          code: "L123",
          lotId: 123,
          sku: "CU-IEC-0500",
          name: "Enamelled copper 0.500 mm",
          lot: "S24143",
          unit: "kg",
          onHand: 4.62,
          location: "WIRE-A2",
          locations: ["WIRE-A2"],
        },
      }),
    z
      .object({
        kind: z.literal("location"),
        code: z.string(),
        name: z.string(),
      })
      .meta({
        id: "ScannedLocation",
        example: {
          kind: "location",
          code: "WIRE-A2",
          name: "Wire rack A, shelf 2 (medium gauges)",
        },
      }),
  ])
  .meta({
    id: "ScanLookup",
    description: "What a scanned label stands for: a lot or a location.",
  });

export const journalMovementSchema = z
  .object({
    id: z.number().int(),
    type: z.enum(movementTypes),
    sku: z.string(),
    itemName: z.string(),
    unit: z.string(),
    lotId: z.number().int().meta({
      description: "The lot's id; 0 when the item is not kept in lots.",
    }),
    lot: z.string().nullable().meta({ description: "The lot's number." }),
    location: z.string().meta({ description: "The location's code." }),
    quantity: inUnit("Signed: + into the location, − out of it"),
    unitCost: z
      .number()
      .nullable()
      .meta({ description: "EUR per unit, for receipts." }),
    countedQuantity: z.number().nullable().meta({
      description: "For a count: what was found; `quantity` is the difference.",
    }),
    grossKg: z
      .number()
      .nullable()
      .meta({ description: "A weighed spool's gross mass, kg." }),
    itemOnHandAfter: inUnit("The item's stock on hand after this movement"),
    transferId: z
      .number()
      .int()
      .nullable()
      .meta({ description: "Both rows of one transfer carry the same id." }),
    reference: z.string().nullable(),
    note: z.string().nullable(),
    user: z.string().meta({ description: "Who recorded it (their name)." }),
    createdAt: time("When it was recorded"),
    purchaseOrderId: z.number().int().nullable().meta({
      description: "The purchase order a receipt was booked against.",
    }),
    purchaseOrder: z.string().nullable().meta({
      description: "That order's number; null for every other movement.",
    }),
  })
  .meta({
    id: "JournalMovement",
    description: "One row of the movement journal.",
    example: {
      id: 5120,
      type: "issue",
      sku: "CU-IEC-0500",
      itemName: "Enamelled copper 0.500 mm",
      unit: "kg",
      lotId: 123,
      lot: "S24143",
      location: "WIRE-A2",
      quantity: -0.42,
      unitCost: null,
      countedQuantity: null,
      grossKg: null,
      itemOnHandAfter: 4.2,
      transferId: null,
      reference: null,
      note: null,
      user: "Piet Varga",
      createdAt: "2026-11-24T09:12:44.120Z",
      purchaseOrderId: null,
      purchaseOrder: null,
    },
  });

export const movementJournalPageSchema = z
  .object({
    movements: z.array(journalMovementSchema),
    page: z.number().int().min(1),
    pageSize: z.number().int().min(1),
    hasMore: z.boolean().meta({
      description:
        "Whether a next page has rows (the journal is not counted: a total would cost more than the page).",
    }),
    nextCursor: z.string().nullable().meta({
      description:
        "Pass as `after` (with `page` one higher, if you keep count) for the next, older page; null on the last page. Read from the index at that place, it costs what the first page does.",
      example: "1764806400123-98765",
    }),
    previousCursor: z.string().nullable().meta({
      description:
        "Pass as `before` for the previous, newer page; null on the first page.",
      example: "1764806400456-98815",
    }),
  })
  .meta({
    id: "MovementJournalPage",
    description: "A page of the movement journal, newest first.",
  });

export const recordedMovementSchema = z
  .object({
    movement: z.object({
      id: z.number().int(),
      type: z.enum(movementTypes),
      sku: z.string(),
      lot: z.string().nullable(),
      location: z.string(),
      toLocation: z
        .string()
        .nullable()
        .meta({ description: "For a transfer: where the stock went." }),
      quantity: inUnit("Signed change at `location`"),
      unit: z.string(),
      createdAt: time("When it was recorded"),
    }),
    balance: z
      .object({
        onHand: z.number(),
        reserved: z.number(),
        available: z.number(),
      })
      .meta({
        description: "The item's totals after the movement, in its unit.",
      }),
    buildOrder: z
      .object({
        id: z.number().int(),
        reference: z.string().meta({ example: "BO-12" }),
        status: z.enum(buildOrderStatuses),
        line: z.object({
          sku: z.string(),
          required: z.number(),
          reserved: z.number(),
          issued: z.number(),
          unit: z.string(),
        }),
      })
      .optional()
      .meta({
        description:
          "Only for an issue with `buildOrderId`: the order and its line for the item after the issue.",
      }),
  })
  .meta({
    id: "RecordedMovement",
    description: "The movement as recorded and the item's balance after it.",
    example: {
      movement: {
        id: 5121,
        type: "receipt",
        sku: "CU-IEC-0500",
        lot: "S24188",
        location: "WIRE-A2",
        toLocation: null,
        quantity: 5,
        unit: "kg",
        createdAt: "2026-12-01T10:02:13.511Z",
      },
      balance: { onHand: 9.2, reserved: 0.8, available: 8.4 },
    },
  });

/** A wire spool of the demo store, as the lot operations show it. */
const demoLot = {
  id: 123,
  number: "S24143",
  sku: "CU-IEC-0500",
  supplier: { id: 1, name: "Quillan Drawn Wire GmbH" },
  supplierBatch: null,
};

export const apiLotSchema = z
  .object({
    id: z.number().int(),
    number: z.string(),
    sku: z.string(),
    supplier: z
      .object({ id: z.number().int(), name: z.string() })
      .nullable()
      .meta({ description: "Where the lot came from, when known." }),
    supplierBatch: z.string().nullable(),
  })
  .meta({
    id: "LotReference",
    description: "A lot: its number, its item and its origin.",
    example: demoLot,
  });

export const lotHoldSchema = z
  .object({
    id: z.number().int(),
    number: z.string(),
    sku: z.string(),
    held: z.boolean(),
    holdReason: z.string().nullable(),
    heldAt: time("Since when it is held").nullable(),
    heldBy: z
      .string()
      .nullable()
      .meta({ description: "The name of who put it on hold." }),
  })
  .meta({
    id: "LotHold",
    description:
      "A lot's quality hold: while held, it cannot be issued or transferred.",
    example: {
      id: 123,
      number: "S24143",
      sku: "CU-IEC-0500",
      held: true,
      holdReason:
        "Enamel cracks on the outer turns; waiting for the supplier's report.",
      heldAt: "2026-12-02T14:30:00.000Z",
      heldBy: "Piet Varga",
    },
  });

export const lotWhereUsedSchema = z
  .object({
    lot: apiLotSchema,
    uses: z.array(
      z.object({
        buildOrderId: z.number().int(),
        reference: z.string(),
        design: z.string(),
        revision: z.number().int(),
        motorQuantity: z
          .number()
          .int()
          .meta({ description: "Motors the order builds." }),
        issued: z.number(),
        returned: z.number(),
        net: z.number(),
        unit: z.string(),
        firstIssuedAt: time("The first issue").nullable(),
        lastMovementAt: time("The last issue or return"),
      }),
    ),
    otherIssues: z
      .object({ count: z.number().int(), quantity: z.number() })
      .meta({ description: "Issues of the lot made to no build order." }),
  })
  .meta({
    id: "LotWhereUsed",
    description:
      "Every build order that drew from the lot, issues net of the returns that name it, in the item's unit.",
    example: {
      lot: demoLot,
      uses: [
        {
          buildOrderId: 12,
          reference: "BO-12",
          design: "Kestrel 60-30 outrunner",
          revision: 2,
          motorQuantity: 10,
          issued: 1.8,
          returned: 0.2,
          net: 1.6,
          unit: "kg",
          firstIssuedAt: "2026-11-20T08:15:00.000Z",
          lastMovementAt: "2026-11-21T16:40:00.000Z",
        },
      ],
      otherIssues: { count: 0, quantity: 0 },
    },
  });

export const lotDocumentsSchema = z
  .object({
    lot: apiLotSchema,
    documents: z.array(
      z.object({
        id: z.number().int(),
        fileName: z.string(),
        title: z.string().meta({ description: "Empty when none was given." }),
        contentType: z.string(),
        sizeBytes: z.number().int(),
        sha256: z.string().meta({ description: "The file's SHA-256, hex." }),
        addedBy: z.string().meta({ description: "Who added it (their name)." }),
        addedAt: time("When it was added"),
        url: z
          .string()
          .meta({ description: "Where to download the file (signed in)." }),
      }),
    ),
  })
  .meta({
    id: "LotDocuments",
    description: "A lot's certificates, newest first.",
    example: {
      lot: demoLot,
      documents: [
        {
          id: 7,
          fileName: "S24143-test-certificate.pdf",
          title: "Mill test certificate",
          contentType: "application/pdf",
          sizeBytes: 48213,
          sha256:
            "9f2c6a1d0e3b4c5d6e7f8091a2b3c4d5e6f708192a3b4c5d6e7f8091a2b3c4d5",
          addedBy: "Piet Varga",
          addedAt: "2026-11-18T11:05:00.000Z",
          url: "/stock/lots/123/documents/7",
        },
      ],
    },
  });

export const stockAlertSchema = z
  .object({
    id: z.number().int(),
    sku: z.string(),
    name: z.string(),
    unit: z.string(),
    status: z.enum(["open", "closed"]),
    availableNow: inUnit("Available now (on hand − reserved − held)"),
    availableAtOpen: inUnit("Available when the alert opened"),
    reorderPoint: z.number(),
    reorderQuantity: z.number(),
    openedAt: time("When the alert opened"),
    closedAt: time("When it closed").nullable(),
    availableAtClose: z.number().nullable(),
    coveredBy: z
      .object({
        orderId: z.number().int(),
        order: z.string().meta({ description: "The purchase order's number." }),
        due: z.iso
          .date()
          .nullable()
          .meta({ description: "When it is due (YYYY-MM-DD)." }),
        text: z
          .string()
          .meta({ description: "The same in words, as the pages show it." }),
      })
      .nullable()
      .meta({
        description: "A sent purchase order that covers the shortfall.",
      }),
    told: z
      .array(
        z.object({
          kind: z.enum(["alert", "digest"]),
          name: z.string(),
          email: z.string(),
          at: time("When they were told"),
        }),
      )
      .meta({
        description: "Who was told, by an alert e-mail or the daily digest.",
      }),
  })
  .meta({
    id: "StockAlert",
    description:
      "A low-stock alert: an item whose available stock fell to its reorder point.",
    example: {
      id: 31,
      sku: "MG-N42SH-B20105",
      name: "NdFeB block N42SH 20 × 10 × 5 mm",
      unit: "pcs",
      status: "open",
      availableNow: 340,
      availableAtOpen: 380,
      reorderPoint: 400,
      reorderQuantity: 2000,
      openedAt: "2026-11-28T07:45:10.000Z",
      closedAt: null,
      availableAtClose: null,
      coveredBy: null,
      told: [
        {
          kind: "alert",
          name: "Tobias Reyne",
          email: "buyer@turnledger.test",
          at: "2026-11-28T07:45:11.000Z",
        },
      ],
    },
  });
