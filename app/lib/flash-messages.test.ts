import { describe, expect, it } from "vitest";
import {
  flashMessageSubjects,
  flashText,
  readFlashNote,
  subjectKindOf,
  type FlashCode,
  type FlashSubjectKind,
  type MovementSubject,
} from "./flash-messages";

const nbsp = "\u00a0";

describe("readFlashNote", () => {
  it("reads back every note the app writes", () => {
    expect(readFlashNote({ code: "metal-base-saved" })).toEqual({
      code: "metal-base-saved",
    });
    expect(readFlashNote({ code: "supplier-added", id: 42 })).toEqual({
      code: "supplier-added",
      id: 42,
    });
    expect(readFlashNote({ code: "grade-added", id: "n42sh-special" })).toEqual(
      { code: "grade-added", id: "n42sh-special" },
    );
  });

  it("refuses words, unknown codes and ids of the wrong kind", () => {
    for (const value of [
      null,
      undefined,
      "",
      "Metal base saved.",
      ["metal-base-saved"],
      {},
      { code: "Your account is locked" },
      { code: "toString" },
      { code: "__proto__" },
      { code: "metal-base-saved", text: "Send your password" },
      { code: "metal-base-saved", id: 1 },
      { code: "supplier-added" },
      { code: "supplier-added", id: "Evil Corp" },
      { code: "supplier-added", id: 0 },
      { code: "supplier-added", id: -3 },
      { code: "supplier-added", id: 1.5 },
      { code: "supplier-added", id: 2 ** 60 },
      { code: "grade-added", id: 7 },
      { code: "grade-added", id: "" },
      { code: "grade-added", id: "x".repeat(41) },
    ]) {
      expect(readFlashNote(value), JSON.stringify(value)).toBeNull();
    }
  });

  it("knows what each message is about", () => {
    expect(subjectKindOf({ code: "order-issued", id: 9 })).toBe("orderIssue");
    expect(subjectKindOf({ code: "item-archive" })).toBe("none");
  });
});

describe("flashText", () => {
  it("takes its words from the table", () => {
    expect(flashText("metal-base-saved", null)).toBe("Metal base saved.");
    expect(flashText("item-reorder", null)).toBe(
      "Reorder point and quantity saved.",
    );
    expect(flashText("supplier-added", { name: "Spool mill" })).toBe(
      "Added the supplier Spool mill.",
    );
  });

  const receipt: MovementSubject = {
    type: "receipt",
    sku: "CU-050",
    unit: "kg",
    quantity: 4.8,
    change: 4.8,
    lot: "SP-710",
    location: "RACK-A",
    toLocation: null,
    onHandAfter: 7.3,
  };

  it("tells a movement with its units, lot and places", () => {
    expect(flashText("movement-recorded", receipt)).toBe(
      `Receipt recorded: 4.800${nbsp}kg of CU-050 lot SP-710 at RACK-A. On hand now 7.300${nbsp}kg.`,
    );
    expect(
      flashText("movement-recorded", {
        ...receipt,
        type: "transfer",
        unit: "pcs",
        quantity: 20,
        lot: null,
        toLocation: "BENCH",
        onHandAfter: 120,
      }),
    ).toBe(
      `Transfer recorded: 20${nbsp}pieces of CU-050 at RACK-A → BENCH. On hand now 120${nbsp}pieces.`,
    );
  });

  it("tells a count's difference and an adjustment with the sign", () => {
    // The books held 20 pieces, 18 were counted: the difference is −2 (counted − books).
    expect(
      flashText("movement-recorded", {
        ...receipt,
        type: "count",
        unit: "pcs",
        quantity: 2,
        change: -2,
        lot: null,
        onHandAfter: 18,
      }),
    ).toBe(
      `Count recorded: difference −2${nbsp}pieces of CU-050 at RACK-A. On hand now 18${nbsp}pieces.`,
    );
    expect(
      flashText("movement-recorded", {
        ...receipt,
        type: "adjustment",
        quantity: 0.25,
        change: -0.25,
      }),
    ).toMatch(/^Adjustment recorded: −0\.250\u00a0kg of CU-050/);
  });

  it("tells a build order's stock and what is still short", () => {
    const order = {
      reference: "BO-0007",
      quantity: 4,
      held: [
        { sku: "CU-050", quantity: 1.442, unit: "kg" },
        { sku: "N42SH-B", quantity: 56, unit: "pcs" },
      ],
      short: [],
    };
    expect(flashText("order-reserved", order)).toBe(
      `Held for BO-0007: 1.442${nbsp}kg of CU-050, 56${nbsp}pieces of N42SH-B.`,
    );
    expect(
      flashText("order-reserved", {
        ...order,
        short: [{ sku: "N42SH-B", quantity: 76, unit: "pcs" }],
      }),
    ).toMatch(/\. Still short: 76\u00a0pieces of N42SH-B\.$/);
    expect(flashText("order-quantity-changed", order)).toBe(
      `BO-0007 is now for 4${nbsp}motors.`,
    );
    // One motor, one piece: English singular for exactly 1 (CLDR plural rules).
    expect(flashText("order-quantity-changed", { ...order, quantity: 1 })).toBe(
      `BO-0007 is now for 1${nbsp}motor.`,
    );
    expect(
      flashText("order-quantity-changed-released", { ...order, quantity: 1 }),
    ).toMatch(/^BO-0007 is now for 1\u00a0motor\. /);
    expect(
      flashText("order-reserved", {
        ...order,
        held: [{ sku: "N42SH-B", quantity: 1, unit: "pcs" }],
      }),
    ).toBe(`Held for BO-0007: 1${nbsp}piece of N42SH-B.`);
    expect(
      flashText("order-issued", {
        ...receipt,
        type: "issue",
        quantity: 0.8,
        reference: "BO-0007",
        issued: 0.8,
        required: 1.442,
      }),
    ).toBe(
      `Issued 0.800${nbsp}kg of CU-050 lot SP-710 at RACK-A to BO-0007. Issued so far 0.800${nbsp}kg of 1.442${nbsp}kg.`,
    );
  });

  it("says where a purchase order was sent, or only that it was", () => {
    const order = {
      number: "PO-000123",
      supplier: "Spool mill",
      orderEmail: "orders@mill.example",
    };
    expect(flashText("purchase-order-sent", order)).toBe(
      "PO-000123 sent to orders@mill.example with the order as PDF and CSV. Its lines can no longer change.",
    );
    expect(
      flashText("purchase-order-sent", { ...order, orderEmail: null }),
    ).toBe(
      "PO-000123 sent with the order as PDF and CSV. Its lines can no longer change.",
    );
  });

  it("tells a receipt against an order with its spools and the order's status", () => {
    expect(
      flashText("purchase-received", {
        reference: "PO-000123",
        entries: 2,
        statusLabel: "Partly received",
      }),
    ).toBe(
      `Received 2${nbsp}spools or lots against PO-000123. The order is now partly received.`,
    );
    expect(
      flashText("purchase-received", {
        reference: "PO-000123",
        entries: 1,
        statusLabel: "Received",
      }),
    ).toBe(
      `Received 1${nbsp}spool or lot against PO-000123. The order is now received.`,
    );
  });

  it("tells which line of which revision a substitute wire went to", () => {
    expect(
      flashText("wire-substitute-applied", {
        position: 1,
        sku: "CU-0.71",
        strands: 2,
        revision: 3,
      }),
    ).toBe(
      "Line 1 of revision 3 now winds 2 × CU-0.71 in hand. The revision is a draft: check its figures, then release it.",
    );
  });

  it("tells a lot's hold with its reason, and its release", () => {
    const lot = {
      number: "S-24-117",
      sku: "CU-0.71",
      holdReason: "Enamel cracks on the wrap test",
    };
    expect(flashText("lot-held", lot)).toBe(
      "Lot S-24-117 of CU-0.71 is on hold: Enamel cracks on the wrap test. It cannot be issued or reserved until it is released.",
    );
    expect(flashText("lot-released", { ...lot, holdReason: null })).toBe(
      "Lot S-24-117 of CU-0.71 is released: it can be issued and reserved again.",
    );
  });

  it("names the person or the revision an admin's or a builder's change was about", () => {
    const ada = { name: "Ada Winder", email: "ada@shop.example" };
    expect(flashText("person-deactivated", ada)).toBe(
      "Ada Winder is deactivated, signed out everywhere, and their API tokens are revoked.",
    );
    expect(flashText("person-invited", ada)).toBe(
      "Invitation sent to ada@shop.example.",
    );
    expect(
      flashText("design-revision-released", {
        design: "Hub motor 48V",
        revision: 2,
      }),
    ).toBe(
      "Revision 2 of Hub motor 48V is released: it is read-only from now on.",
    );
  });

  it("reads a person's id as text, never as a number", () => {
    expect(
      readFlashNote({ code: "person-deactivated", id: "u_7h2k9x" }),
    ).toEqual({ code: "person-deactivated", id: "u_7h2k9x" });
    expect(readFlashNote({ code: "person-deactivated", id: 7 })).toBeNull();
    expect(readFlashNote({ code: "token-revoked", id: 7 })).toBeNull();
  });

  it("has a sentence for every code, whatever its subject", () => {
    const order = { reference: "BO-0001", quantity: 2, held: [], short: [] };
    const subjects: Record<FlashSubjectKind, unknown> = {
      none: null,
      supplier: { name: "Spool mill" },
      grade: { name: "N42SH" },
      movement: receipt,
      order,
      orderIssue: { ...receipt, reference: "BO-0001", issued: 1, required: 2 },
      purchaseOrder: {
        number: "PO-000001",
        supplier: "Spool mill",
        orderEmail: "orders@mill.example",
      },
      purchaseReceipt: {
        reference: "PO-000001",
        entries: 2,
        statusLabel: "Partly received",
      },
      designLine: { position: 1, sku: "CU-0.71", strands: 2, revision: 3 },
      lot: { number: "S-24-117", sku: "CU-0.71", holdReason: "Enamel cracks" },
      person: { name: "Ada Winder", email: "ada@shop.example" },
      revision: { design: "Hub motor 48V", revision: 2 },
    };
    for (const code of Object.keys(flashMessageSubjects) as FlashCode[]) {
      const subject = subjects[flashMessageSubjects[code]];
      expect(flashText(code, subject as never), code).toMatch(/^[A-Z].*\.$/);
    }
  });
});
