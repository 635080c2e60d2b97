/**
 * The answers of the build-order operations, as the routes build them
 * (app/build-orders/*.server.ts, app/lots/where-used.server.ts). Examples from the demo:
 * the Kestrel 60-30 outrunner, Ines Calloway building, Piet Varga issuing. Pure.
 */
import { z } from "zod";
import { buildOrderStatuses } from "~/db/tables/build-order-enums";
import { itemKinds } from "~/db/tables/stock-enums";

const status = z.enum(buildOrderStatuses);
const day = z.iso.date().meta({ description: "A calendar day, YYYY-MM-DD." });
const time = z.iso.datetime().meta({ description: "ISO 8601, UTC." });
const quantity = (description: string) =>
  z.number().meta({ description: `${description}, in the item's unit.` });
const money = (description: string) =>
  z.number().meta({ description: `${description}, in the company currency.` });

const design = z.object({
  id: z.number().int(),
  name: z.string(),
});

const summaryFields = {
  id: z
    .number()
    .int()
    .meta({ description: "The order's number: BO-12 is 12." }),
  status,
  design,
  revision: z.number().int(),
  quantity: z.number().int().meta({ description: "Motors to build." }),
  note: z.string(),
  plannedStart: day
    .nullable()
    .meta({ description: "When building starts; null when not planned." }),
  createdBy: z.string().meta({ description: "The name of who created it." }),
  createdAt: time,
  updatedAt: time,
};

const summaryExample = {
  id: 3,
  status: "reserved",
  design: { id: 1, name: "Kestrel 60-30 outrunner" },
  revision: 2,
  quantity: 6,
  note: "Second batch for the cart drives.",
  plannedStart: "2026-12-14",
  createdBy: "Ines Calloway",
  createdAt: "2026-12-01T08:12:40.000Z",
  updatedAt: "2026-12-01T08:15:02.000Z",
};

export const buildOrderSummarySchema = z.object(summaryFields).meta({
  id: "BuildOrderSummary",
  description: "A build order as the list shows it.",
  example: summaryExample,
});

export const buildOrderCreatedSchema = z
  .object({ id: z.number().int(), status: z.literal("draft") })
  .meta({
    id: "BuildOrderCreated",
    description: "The new order: a draft until stock is reserved for it.",
    example: { id: 4, status: "draft" },
  });

const heldExample = {
  sku: "CU-IEC-0500",
  lot: "Q-25-11873",
  location: "WIRE-A1",
  quantity: 1.84,
  unit: "kg",
};

const shortageExample = {
  sku: "MG-N42SH-B20105",
  required: 168,
  available: 120,
  short: 48,
  unit: "pcs",
};

/** What an order holds or gave back on one lot and location (HeldStock). */
export const heldStockSchema = z
  .object({
    sku: z.string(),
    lot: z
      .string()
      .nullable()
      .meta({ description: "Null for items not kept in lots." }),
    location: z.string(),
    quantity: z.number(),
    unit: z.string(),
  })
  .meta({
    id: "BuildOrderHeldStock",
    description: "Stock on one lot and location, in the item's unit.",
    example: heldExample,
  });

export const shortageSchema = z
  .object({
    sku: z.string(),
    required: quantity("Still to reserve for the line"),
    available: quantity("Free to reserve now"),
    short: quantity("What the free stock cannot cover"),
    unit: z.string(),
  })
  .meta({
    id: "BuildOrderShortage",
    description: "An item a reservation could not cover.",
    example: shortageExample,
  });

const line = z.object({
  sku: z.string(),
  name: z.string(),
  kind: z.enum(itemKinds),
  unit: z.string(),
  required: quantity("Needed for all the motors"),
  reserved: quantity("Held for this order now"),
  issued: quantity("Issued to this order"),
  toReserve: quantity("Still to reserve: required − issued − reserved"),
  available: quantity(
    "Free stock of the item now (on hand − reserved − held, all orders)",
  ),
  short: quantity("What the free stock cannot cover of toReserve"),
  difference: quantity("Issued − required (positive: used more than planned)"),
  plannedUnitCost: money("Average cost per unit when the order was made")
    .nullable()
    .meta({ description: "Null when the item had no cost yet." }),
  plannedCost: money("plannedUnitCost × required").nullable(),
  actualCost: money("What the issues cost"),
  held: z
    .array(
      z.object({
        lot: z.string().nullable(),
        location: z.string(),
        receivedOn: day.nullable(),
        quantity: quantity("Held for this order"),
        onHand: quantity("On hand on that lot and location"),
        tareKg: z
          .number()
          .nullable()
          .meta({ description: "The empty spool's mass, for wire lots." }),
      }),
    )
    .meta({ description: "What this order holds, oldest lot first." }),
  stock: z
    .array(
      z.object({
        lot: z.string().nullable(),
        location: z.string(),
        receivedOn: day.nullable(),
        onHand: z.number(),
        reserved: quantity("Reserved by all orders"),
        free: quantity("On hand − reserved; 0 on a lot on hold"),
        onHold: z.boolean(),
      }),
    )
    .meta({ description: "Where the item is, oldest lot first." }),
  issues: z.array(
    z.object({
      movementId: z.number().int(),
      at: time,
      lot: z.string().nullable(),
      location: z.string(),
      quantity: z.number(),
      grossKg: z
        .number()
        .nullable()
        .meta({ description: "The spool's weight when issued by weighing." }),
      unitCost: money("Cost per unit of the issue"),
      by: z.string(),
    }),
  ),
});

const orderFields = {
  ...summaryFields,
  reference: z.string().meta({ description: "BO-12 for order 12." }),
  currency: z.string().meta({ description: "The company currency." }),
  lines: z.array(line).meta({ description: "By item kind, then SKU." }),
  costs: z.object({
    plannedTotal: z.number(),
    actualTotal: z.number(),
    plannedPerMotor: z.number(),
    actualPerMotor: z.number(),
    plannedComplete: z.boolean().meta({
      description: "False when some line has no planned cost (counted as 0).",
    }),
  }),
  events: z
    .array(
      z.object({
        fromStatus: status.nullable(),
        toStatus: status,
        note: z.string(),
        at: time,
        by: z.string(),
      }),
    )
    .meta({ description: "The order's history, newest first." }),
};

const orderExample = {
  ...summaryExample,
  reference: "BO-3",
  currency: "EUR",
  lines: [
    {
      sku: "CU-IEC-0500",
      name: "Enamelled copper 0.50 mm",
      kind: "wire",
      unit: "kg",
      required: 1.84,
      reserved: 1.84,
      issued: 0,
      toReserve: 0,
      available: 19.46,
      short: 0,
      difference: -1.84,
      plannedUnitCost: 14.85,
      plannedCost: 27.32,
      actualCost: 0,
      held: [
        {
          lot: "Q-25-11873",
          location: "WIRE-A1",
          receivedOn: "2026-11-26",
          quantity: 1.84,
          onHand: 5.02,
          tareKg: 0.62,
        },
      ],
      stock: [
        {
          lot: "Q-25-11873",
          location: "WIRE-A1",
          receivedOn: "2026-11-26",
          onHand: 5.02,
          reserved: 1.84,
          free: 3.18,
          onHold: false,
        },
      ],
      issues: [],
    },
  ],
  costs: {
    plannedTotal: 27.32,
    actualTotal: 0,
    plannedPerMotor: 4.55,
    actualPerMotor: 0,
    plannedComplete: true,
  },
  events: [
    {
      fromStatus: "draft",
      toStatus: "reserved",
      note: "",
      at: "2026-12-01T08:15:02.000Z",
      by: "Ines Calloway",
    },
    {
      fromStatus: null,
      toStatus: "draft",
      note: "6 × Kestrel 60-30 outrunner revision 2.",
      at: "2026-12-01T08:12:40.000Z",
      by: "Ines Calloway",
    },
  ],
};

export const buildOrderSchema = z.object(orderFields).meta({
  id: "BuildOrder",
  description:
    "A build order with its lines (what each needs, holds, has been issued, and where the stock is), planned versus actual cost and its history.",
  example: orderExample,
});

export const buildOrderChangedSchema = z
  .object({
    id: z.number().int(),
    status,
    released: z.array(heldStockSchema).meta({
      description:
        "What the order held and gave back (a new number of motors releases it all).",
    }),
    plannedStart: day.nullable(),
  })
  .meta({
    id: "BuildOrderChanged",
    example: {
      id: 3,
      status: "draft",
      released: [heldExample],
      plannedStart: "2026-12-21",
    },
  });

export const reservationSchema = z
  .object({
    id: z.number().int(),
    status,
    reserved: z.array(heldStockSchema).meta({
      description: "What this request reserved, by lot and location.",
    }),
    shortages: z.array(shortageSchema).meta({
      description:
        "What is still short after a partial reservation; empty when every line is covered.",
    }),
  })
  .meta({
    id: "BuildOrderReservation",
    description: "The answer to `reserve`.",
    example: {
      id: 3,
      status: "reserved",
      reserved: [heldExample],
      shortages: [],
    },
  });

export const releasedSchema = z
  .object({
    id: z.number().int(),
    status,
    released: z.array(heldStockSchema),
  })
  .meta({
    id: "BuildOrderCancelled",
    description: "The answer to `cancel`: what the order held and gave back.",
    example: {
      id: 3,
      status: "cancelled",
      released: [heldExample],
    },
  });

export const completedSchema = z
  .object({
    ...orderFields,
    released: z.array(heldStockSchema).meta({
      description: "What the order still held and gave back.",
    }),
  })
  .meta({
    id: "BuildOrderCompleted",
    description:
      "The answer to `complete`: the order with planned versus actual, and what it gave back.",
    example: {
      ...orderExample,
      status: "complete",
      released: [],
    },
  });

export const issuedSchema = z
  .object({
    movement: z.object({
      id: z.number().int(),
      type: z.literal("issue"),
      sku: z.string(),
      lot: z.string().nullable(),
      location: z.string(),
      toLocation: z.null(),
      quantity: z.number(),
      unit: z.string(),
      createdAt: time,
    }),
    balance: z
      .object({
        onHand: z.number(),
        reserved: z.number(),
        available: z.number(),
      })
      .meta({ description: "The item's figures after the issue." }),
    id: z.number().int().meta({ description: "The build order." }),
    status,
    line: z
      .object({
        sku: z.string(),
        required: z.number(),
        reserved: z.number(),
        issued: z.number(),
        unit: z.string(),
      })
      .meta({ description: "The order's line for the item, after the issue." }),
  })
  .meta({
    id: "BuildOrderIssue",
    description:
      "The answer to `issue`: the stock movement the ledger recorded, the item's balance and the order's line.",
    example: {
      movement: {
        id: 812,
        type: "issue",
        sku: "CU-IEC-0500",
        lot: "Q-25-11873",
        location: "WIRE-A1",
        toLocation: null,
        quantity: 1.84,
        unit: "kg",
        createdAt: "2026-12-02T09:40:11.000Z",
      },
      balance: { onHand: 21.56, reserved: 0.26, available: 21.3 },
      id: 3,
      status: "in_progress",
      line: {
        sku: "CU-IEC-0500",
        required: 1.84,
        reserved: 0,
        issued: 1.84,
        unit: "kg",
      },
    },
  });

export const buildOrderRefusalSchema = z
  .object({
    error: z.object({
      message: z.string(),
      fields: z.record(z.string(), z.array(z.string())).optional(),
      shortages: z.array(shortageSchema).optional().meta({
        description:
          "For a reservation: every item the free stock cannot cover.",
      }),
    }),
  })
  .meta({
    id: "BuildOrderRefusal",
    description:
      "A step the order's state or the stock forbids: the error shape, with the shortages when a reservation could not be covered.",
    example: {
      error: {
        message:
          "Not enough stock to reserve BO-3 in full: MG-N42SH-B20105 short by 48 pcs. Nothing was reserved.",
        shortages: [shortageExample],
      },
    },
  });

export const buildOrderLotsSchema = z
  .object({
    buildOrderId: z.number().int(),
    reference: z.string(),
    lots: z.array(
      z.object({
        lotId: z.number().int(),
        lot: z.string(),
        sku: z.string(),
        itemName: z.string(),
        supplier: z
          .object({ id: z.number().int(), name: z.string() })
          .nullable(),
        supplierBatch: z.string().nullable(),
        onHold: z.boolean(),
        issued: z.number(),
        returned: z
          .number()
          .meta({ description: "Returns that name this order." }),
        net: z.number().meta({ description: "issued − returned." }),
        unit: z.string(),
        firstIssuedAt: time.nullable(),
        lastMovementAt: time,
      }),
    ),
  })
  .meta({
    id: "BuildOrderLots",
    description:
      "Every lot issued to the order, net of returns, in the order of the first issue. Items not kept in lots are not listed.",
    example: {
      buildOrderId: 1,
      reference: "BO-1",
      lots: [
        {
          lotId: 7,
          lot: "Q-25-11873",
          sku: "CU-IEC-0500",
          itemName: "Enamelled copper 0.50 mm",
          supplier: { id: 1, name: "Quillan Drawn Wire GmbH" },
          supplierBatch: "Q-25-11873",
          onHold: false,
          issued: 1.78,
          returned: 0,
          net: 1.78,
          unit: "kg",
          firstIssuedAt: "2026-11-27T10:02:13.000Z",
          lastMovementAt: "2026-11-27T10:02:13.000Z",
        },
      ],
    },
  });
