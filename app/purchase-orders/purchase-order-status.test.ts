import { describe, expect, it } from "vitest";
import {
  canCancel,
  canCloseShort,
  canEdit,
  canReceive,
  purchaseOrderIdFromNumber,
  purchaseOrderNumber,
} from "./purchase-order-status";

describe("purchase order numbers", () => {
  it("writes six digits after PO-", () => {
    expect(purchaseOrderNumber(123)).toBe("PO-000123");
    expect(purchaseOrderNumber(1_234_567)).toBe("PO-1234567");
  });

  it("reads what people type", () => {
    expect(purchaseOrderIdFromNumber("PO-000123")).toBe(123);
    expect(purchaseOrderIdFromNumber(" po 123 ")).toBe(123);
    expect(purchaseOrderIdFromNumber("123")).toBe(123);
    expect(purchaseOrderIdFromNumber("PO-0")).toBeNull();
    expect(purchaseOrderIdFromNumber("BO-12")).toBeNull();
    expect(purchaseOrderIdFromNumber("PO-99999999999")).toBeNull();
  });
});

describe("what each status allows", () => {
  it("edits only drafts, receives only sent orders", () => {
    expect(canEdit("draft")).toBe(true);
    expect(canEdit("sent")).toBe(false);
    expect(canReceive("draft")).toBe(false);
    expect(canReceive("partly_received")).toBe(true);
    expect(canReceive("cancelled")).toBe(false);
    expect(canCancel("partly_received")).toBe(false);
    expect(canCloseShort("partly_received")).toBe(true);
    expect(canCloseShort("draft")).toBe(false);
  });
});
