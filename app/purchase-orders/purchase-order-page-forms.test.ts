import { parseForm } from "~/lib/parse-form";
import { describe, expect, it } from "vitest";
import type { z } from "zod";
import {
  cancelFormSchema,
  draftPatchFromForm,
  draftRefusalField,
  type DraftForm,
  closeFormSchema,
  draftFormSchema,
  fromAlertFormSchema,
  isOrderPageIntent,
  newOrderFormSchema,
  orderFormFieldOf,
} from "./purchase-order-page-forms";
import {
  purchaseOrderListHref,
  purchaseOrderListQueryFrom,
} from "./purchase-order-list-address";

/** A form as the browser sends it: every field as text, empty ones too. */
function formData(fields: Record<string, string>): FormData {
  const data = new FormData();
  for (const [name, value] of Object.entries(fields)) data.append(name, value);
  return data;
}

function parse<Schema extends z.ZodType>(
  schema: Schema,
  fields: Record<string, string>,
) {
  const submission = parseForm(formData(fields), {
    schema,
    disableAutoCoercion: true,
  });
  // The messages by field name, whatever the outcome (none on success).
  return submission as typeof submission & {
    error?: Record<string, string[] | null> | null;
  };
}

const emptyLine = (index: number) => ({
  [`lines[${index}].sku`]: "",
  [`lines[${index}].quantity`]: "",
  [`lines[${index}].requestedDate`]: "",
  [`lines[${index}].unitPrice`]: "",
  [`lines[${index}].overrideReason`]: "",
});

describe("the new-order form", () => {
  it("turns typed text into exact thousandths and ten-thousandths", () => {
    const submission = parse(newOrderFormSchema, {
      supplierId: "7",
      currency: "€",
      notes: "  Deliver to gate 2.  ",
      ...emptyLine(0),
      "lines[0].sku": " CU-0.50 ",
      // 12,5 kg with a decimal comma: 12 500 thousandths (12.5 × 1000, by hand).
      "lines[0].quantity": "12,5",
      ...emptyLine(1),
      "lines[1].sku": "MAG-N42-10",
      "lines[1].quantity": "400",
      "lines[1].requestedDate": "2027-01-15",
      // 2.3450 EUR a piece: 23 450 ten-thousandths (2.345 × 10 000, by hand).
      "lines[1].unitPrice": "2.345",
      "lines[1].overrideReason": "Quoted by phone",
    });
    expect(submission.status).toBe("success");
    if (submission.status !== "success") return;
    expect(submission.value).toEqual({
      supplierId: 7,
      currency: "EUR",
      notes: "Deliver to gate 2.",
      lines: [
        {
          id: undefined,
          sku: "CU-0.50",
          quantity: 12_500n,
          requestedDate: undefined,
          unitPrice: undefined,
          overrideReason: undefined,
        },
        {
          id: undefined,
          sku: "MAG-N42-10",
          quantity: 400_000n,
          requestedDate: "2027-01-15",
          unitPrice: 23_450n,
          overrideReason: "Quoted by phone",
        },
      ],
    });
  });

  it("leaves the currency to the supplier when it is empty", () => {
    const submission = parse(newOrderFormSchema, {
      supplierId: "3",
      currency: "",
      notes: "",
      ...emptyLine(0),
      "lines[0].sku": "A",
      "lines[0].quantity": "1",
    });
    expect(submission.status).toBe("success");
    if (submission.status === "success") {
      expect(submission.value.currency).toBeUndefined();
      expect(submission.value.notes).toBeUndefined();
    }
  });

  it("names each bad field of each line", () => {
    const submission = parse(newOrderFormSchema, {
      supplierId: "",
      currency: "dollars",
      ...emptyLine(0),
      "lines[0].quantity": "0",
      ...emptyLine(1),
      "lines[1].sku": "A",
      "lines[1].quantity": "1.2345",
      "lines[1].requestedDate": "2027-02-30",
      "lines[1].unitPrice": "3",
      ...emptyLine(2),
      "lines[2].sku": "B",
      "lines[2].quantity": "lots",
      "lines[2].unitPrice": "-1",
      "lines[2].overrideReason": "cheaper",
    });
    expect(submission.status).toBe("error");
    const errors = submission.error ?? {};
    expect(errors.supplierId).toEqual(["Choose the supplier."]);
    expect(errors.currency?.[0]).toMatch(/3-letter ISO 4217 code/);
    expect(errors["lines[0].sku"]).toEqual(["Give the item's SKU."]);
    expect(errors["lines[0].quantity"]).toEqual([
      "The quantity must be more than 0.",
    ]);
    expect(errors["lines[1].quantity"]).toEqual([
      "The quantity has at most 3 decimals.",
    ]);
    expect(errors["lines[1].requestedDate"]).toEqual([
      "Give the date as YYYY-MM-DD, a real day.",
    ]);
    expect(errors["lines[2].quantity"]).toEqual([
      "The quantity must be a number.",
    ]);
    expect(errors["lines[2].unitPrice"]).toEqual([
      "The unit price cannot be negative.",
    ]);
  });

  it("asks for the reason of a price of one's own, the price of a reason, and at least one line", () => {
    const reasonOnly = parse(newOrderFormSchema, {
      supplierId: "1",
      ...emptyLine(0),
      "lines[0].sku": "A",
      "lines[0].quantity": "2",
      "lines[0].overrideReason": "special deal",
    });
    expect(reasonOnly.error?.["lines[0].unitPrice"]?.[0]).toMatch(
      /Give the price the reason is for/,
    );
    const priceOnly = parse(newOrderFormSchema, {
      supplierId: "1",
      ...emptyLine(0),
      "lines[0].sku": "A",
      "lines[0].quantity": "2",
      "lines[0].unitPrice": "3",
    });
    expect(priceOnly.error?.["lines[0].overrideReason"]?.[0]).toMatch(
      /^Say why this price replaces/,
    );
    const noLines = parse(newOrderFormSchema, { supplierId: "1" });
    expect(noLines.error?.lines).toEqual(["Add at least one line."]);
  });

  it("takes a price of 0 with its reason (a free sample), but not five decimals", () => {
    const free = parse(newOrderFormSchema, {
      supplierId: "1",
      ...emptyLine(0),
      "lines[0].sku": "A",
      "lines[0].quantity": "1",
      "lines[0].unitPrice": "0",
      "lines[0].overrideReason": "Sample, no charge",
    });
    expect(free.status).toBe("success");
    const fine = parse(newOrderFormSchema, {
      supplierId: "1",
      ...emptyLine(0),
      "lines[0].sku": "A",
      "lines[0].quantity": "1",
      "lines[0].unitPrice": "1.23456",
      "lines[0].overrideReason": "x",
    });
    expect(fine.error?.["lines[0].unitPrice"]).toEqual([
      "The unit price has at most 4 decimals.",
    ]);
  });
});

describe("the order page's steps", () => {
  it("keeps the ids of the draft's lines and refuses one that is no id", () => {
    const saved = parse(draftFormSchema, {
      intent: "save",
      currency: "USD",
      ...emptyLine(0),
      "lines[0].id": "41",
      "lines[0].sku": "A",
      "lines[0].quantity": "3",
      ...emptyLine(1),
      "lines[1].sku": "B",
      "lines[1].quantity": "0.001",
    });
    expect(saved.status).toBe("success");
    if (saved.status === "success") {
      expect(saved.value.lines.map((line) => line.id)).toEqual([41, undefined]);
      expect(saved.value.lines[1]?.quantity).toBe(1n);
    }
    const forged = parse(draftFormSchema, {
      intent: "save",
      ...emptyLine(0),
      "lines[0].id": "-4",
      "lines[0].sku": "A",
      "lines[0].quantity": "3",
    });
    expect(forged.error?.["lines[0].id"]).toEqual(["Unknown order line."]);
  });

  it("asks why an order is cancelled or closed short", () => {
    expect(
      parse(cancelFormSchema, { intent: "cancel", reason: "  " }).error?.reason,
    ).toEqual(["Say why the order is cancelled."]);
    expect(
      parse(closeFormSchema, { intent: "close", reason: "" }).error?.reason,
    ).toEqual(["Say why the order is closed short."]);
    const closed = parse(closeFormSchema, {
      intent: "close",
      reason: " Mill stopped the size ",
    });
    expect(closed.status === "success" && closed.value.reason).toBe(
      "Mill stopped the size",
    );
  });

  it("knows its intents and reads an alert's id", () => {
    expect(["save", "send", "cancel", "close"].every(isOrderPageIntent)).toBe(
      true,
    );
    expect(isOrderPageIntent("receive")).toBe(false);
    const alert = parse(fromAlertFormSchema, {
      intent: "from-alert",
      alertId: "12",
    });
    expect(alert.status === "success" && alert.value.alertId).toBe(12);
    expect(
      parse(fromAlertFormSchema, { intent: "from-alert", alertId: "1e3" }).error
        ?.alertId,
    ).toEqual(["Choose an alert."]);
  });

  it("puts a domain refusal of a line beside that line's field", () => {
    expect(orderFormFieldOf("lines.2.quantity")).toBe("lines[2].quantity");
    expect(orderFormFieldOf("supplierId")).toBe("supplierId");
    expect(orderFormFieldOf(undefined)).toBe("");
  });
});

describe("the list's address", () => {
  it("reads a status, a supplier and a page, and ignores anything else", () => {
    expect(
      purchaseOrderListQueryFrom(
        new URLSearchParams("status=sent&supplier=4&page=3"),
      ),
    ).toEqual({ filter: { status: "sent", supplierId: 4 }, page: 3 });
    expect(
      purchaseOrderListQueryFrom(
        new URLSearchParams("status=lost&supplier=x&page=-2"),
      ),
    ).toEqual({
      filter: { status: undefined, supplierId: undefined },
      page: 1,
    });
  });

  it("writes only what differs from the default", () => {
    expect(purchaseOrderListHref({})).toBe("/purchase-orders");
    expect(purchaseOrderListHref({ status: "partly_received" }, 2)).toBe(
      "/purchase-orders?status=partly_received&page=2",
    );
    expect(purchaseOrderListHref({ supplierId: 9 })).toBe(
      "/purchase-orders?supplier=9",
    );
  });
});

describe("the draft's edit as a patch", () => {
  const stored = {
    currency: "EUR",
    notes: "Gate 2",
    lines: [
      {
        id: 1,
        sku: "CU-050",
        quantity: 25_000n,
        requestedDate: null,
        overridePrice: null,
        overrideReason: null,
      },
      {
        id: 2,
        sku: "MAG-10",
        quantity: 400_000n,
        requestedDate: "2027-01-15",
        overridePrice: 23_450n,
        overrideReason: "Phone quote",
      },
      {
        id: 3,
        sku: "TAPE",
        quantity: 5_000n,
        requestedDate: null,
        overridePrice: null,
        overrideReason: null,
      },
    ],
  };
  const line = (
    values: Partial<DraftForm["lines"][number]> & {
      sku: string;
      quantity: bigint;
    },
  ) => ({
    id: undefined,
    requestedDate: undefined,
    unitPrice: undefined,
    overrideReason: undefined,
    ...values,
  });

  it("is empty when nothing changed", () => {
    expect(
      draftPatchFromForm(stored, {
        intent: "save",
        currency: "EUR",
        notes: "Gate 2",
        lines: [
          line({ id: 1, sku: "CU-050", quantity: 25_000n }),
          line({
            id: 2,
            sku: "MAG-10",
            quantity: 400_000n,
            requestedDate: "2027-01-15",
            unitPrice: 23_450n,
            overrideReason: "Phone quote",
          }),
          line({ id: 3, sku: "tape", quantity: 5_000n }),
        ],
      }).patch,
    ).toEqual({});
  });

  it("changes, adds and removes only what differs", () => {
    expect(
      draftPatchFromForm(stored, {
        intent: "save",
        currency: "USD",
        notes: undefined,
        lines: [
          line({
            id: 1,
            sku: "CU-050",
            quantity: 30_000n,
            requestedDate: "2027-02-01",
          }),
          // The price emptied: back to the price list; the date emptied: cleared.
          line({ id: 2, sku: "MAG-10", quantity: 400_000n }),
          line({ sku: "SLOT-PAPER", quantity: 2_000n }),
          // Line 3 left out: removed.
        ],
      }),
    ).toEqual({
      positions: { add: [2], change: [0, 1] },
      patch: {
        currency: "USD",
        notes: "",
        add: [
          {
            sku: "SLOT-PAPER",
            quantity: 2_000n,
            requestedDate: undefined,
            unitPrice: undefined,
            overrideReason: undefined,
          },
        ],
        change: [
          { id: 1, quantity: 30_000n, requestedDate: "2027-02-01" },
          { id: 2, requestedDate: null, unitPrice: null },
        ],
        remove: [3],
      },
    });
  });

  it("puts a refusal of an added or changed line beside its line on the form", () => {
    const positions = { add: [2, 4], change: [0, 3] };
    expect(draftRefusalField("add.1.sku", positions)).toBe("lines[4].sku");
    expect(draftRefusalField("change[1].quantity", positions)).toBe(
      "lines[3].quantity",
    );
    expect(draftRefusalField("lines.0.unitPrice", positions)).toBe(
      "lines[2].unitPrice",
    );
    expect(draftRefusalField("add.7.sku", positions)).toBe("");
    expect(draftRefusalField("lines", positions)).toBe("lines");
    expect(draftRefusalField("currency", positions)).toBe("currency");
    expect(draftRefusalField("supplier", positions)).toBe("");
  });

  it("replaces a line whose item changed and refuses a line of another order", () => {
    const { patch } = draftPatchFromForm(stored, {
      intent: "save",
      currency: undefined,
      notes: "Gate 2",
      lines: [line({ id: 3, sku: "TAPE-WIDE", quantity: 5_000n })],
    });
    expect(patch.add?.map((added) => added.sku)).toEqual(["TAPE-WIDE"]);
    expect(patch.remove).toEqual([1, 2, 3]);
    expect(() =>
      draftPatchFromForm(stored, {
        intent: "save",
        currency: undefined,
        notes: undefined,
        lines: [line({ id: 99, sku: "X", quantity: 1n })],
      }),
    ).toThrow(RangeError);
  });
});
