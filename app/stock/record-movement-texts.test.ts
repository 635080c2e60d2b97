import { describe, expect, it } from "vitest";
import { movementTypes } from "~/db/tables/stock-enums";
import {
  chosenMovementType,
  movementFieldLabels,
  movementHelp,
  recordButtonText,
  recordMovementSearch,
} from "./record-movement-texts";

describe("the kind of movement in the address", () => {
  it("is one of the kinds, else a receipt", () => {
    expect(chosenMovementType("issue")).toBe("issue");
    expect(chosenMovementType("count")).toBe("count");
    expect(chosenMovementType(null)).toBe("receipt");
    expect(chosenMovementType("")).toBe("receipt");
    expect(chosenMovementType("ISSUE")).toBe("receipt");
    expect(chosenMovementType("toString")).toBe("receipt");
  });

  it("keeps the item found when another kind is chosen", () => {
    expect(recordMovementSearch("issue", "")).toBe("?type=issue");
    expect(recordMovementSearch("count", "CU 0,50/A")).toBe(
      "?type=count&sku=CU%200%2C50%2FA",
    );
  });

  it("has a help line for every kind", () => {
    for (const type of movementTypes) expect(movementHelp[type]).toBeTruthy();
  });
});

describe("the labels named for the kind of movement", () => {
  it("asks a transfer where from and an adjustment for its reason", () => {
    expect(movementFieldLabels("transfer")).toEqual({
      balance: "From",
      quantity: "Quantity",
      reference: "Reference",
      note: "Note (optional)",
    });
    expect(movementFieldLabels("adjustment")).toEqual({
      balance: "Lot and location",
      quantity: "Change (+ or −)",
      reference: "Reference",
      note: "Reason",
    });
  });

  it("names the reference of a return and of a scrap", () => {
    expect(movementFieldLabels("return").reference).toBe("Build order");
    expect(movementFieldLabels("scrap").reference).toBe("Reason or reference");
    expect(movementFieldLabels("issue").reference).toBe("Reference");
  });
});

describe("the record button", () => {
  it("says the kind's verb", () => {
    expect(
      recordButtonText({ type: "receipt", busy: false, weighBackKg: null }),
    ).toBe("Receive");
    expect(
      recordButtonText({ type: "count", busy: false, weighBackKg: null }),
    ).toBe("Record count");
    expect(
      recordButtonText({ type: "adjustment", busy: false, weighBackKg: null }),
    ).toBe("Adjust");
  });

  it("says what a weighed-back spool issues, and to which order", () => {
    expect(
      recordButtonText({ type: "issue", busy: false, weighBackKg: 1.2 }),
    ).toBe("Issue 1.200\u00a0kg");
    expect(
      recordButtonText({
        type: "issue",
        busy: false,
        weighBackKg: 1.2,
        orderReference: "BO-7",
      }),
    ).toBe("Issue 1.200\u00a0kg to BO-7");
  });

  it("names the order when nothing is weighed back", () => {
    expect(
      recordButtonText({
        type: "issue",
        busy: false,
        weighBackKg: null,
        orderReference: "BO-7",
      }),
    ).toBe("Issue to BO-7");
    expect(
      recordButtonText({
        type: "issue",
        busy: false,
        weighBackKg: 0,
        orderReference: "BO-7",
      }),
    ).toBe("Issue to BO-7");
    expect(
      recordButtonText({ type: "issue", busy: false, weighBackKg: -0.5 }),
    ).toBe("Issue");
  });

  it("says it is recording while the form is sent", () => {
    expect(
      recordButtonText({ type: "issue", busy: true, weighBackKg: 1.2 }),
    ).toBe("Recording…");
  });
});
