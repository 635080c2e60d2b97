import { describe, expect, it } from "vitest";
import { formFieldOf, movementFormSchema } from "./movement-form";

describe("record-movement form values", () => {
  it("reads a decimal comma and splits the chosen balance into lot and location", () => {
    const parsed = movementFormSchema.parse({
      type: "issue",
      sku: "CU-050",
      balance: "SP-7|MAIN",
      quantity: "1,25",
    });
    expect(parsed).toMatchObject({
      type: "issue",
      sku: "CU-050",
      lot: "SP-7",
      location: "MAIN",
      quantity: 1250n,
    });
  });
  it("names a quantity that is no number", () => {
    const parsed = movementFormSchema.safeParse({
      type: "scrap",
      sku: "X",
      location: "MAIN",
      quantity: "ten",
    });
    expect(parsed.error?.issues[0]?.path).toEqual(["quantity"]);
  });
  it("treats an empty lot as no lot", () => {
    const parsed = movementFormSchema.parse({
      type: "scrap",
      sku: "MG-1",
      balance: "|BENCH",
      quantity: "2",
    });
    expect(parsed.lot).toBeUndefined();
    expect(parsed.location).toBe("BENCH");
  });
  it("refuses a build-order reference on an issue that names no build order, saying how", () => {
    const base = {
      type: "issue",
      sku: "CU-050",
      balance: "SP-7|MAIN",
      quantity: "0.5",
    };
    const refused = movementFormSchema.safeParse({
      ...base,
      reference: "bo 12",
    });
    expect(refused.error?.issues.map((issue) => issue.path)).toEqual([
      ["reference"],
    ]);
    expect(refused.error?.issues[0]?.message).toContain(
      "choose BO-12 under “Build order”",
    );
    // Picked from the list, the same issue goes to the order.
    expect(
      movementFormSchema.parse({ ...base, buildOrderId: "12" }),
    ).toMatchObject({ buildOrderId: 12, lot: "SP-7", quantity: 500n });
    // A scrap or a return with such a reference is not an issue to the order.
    expect(
      movementFormSchema.safeParse({
        ...base,
        type: "scrap",
        reference: "BO-12",
      }).success,
    ).toBe(true);
  });
  it("takes a build order only on an issue, and one order at a time", () => {
    const receipt = movementFormSchema.safeParse({
      type: "receipt",
      sku: "MG-1",
      location: "MAIN",
      quantity: "2",
      unitCost: "1",
      buildOrderId: "3",
    });
    expect(receipt.error?.issues[0]?.path).toEqual(["buildOrderId"]);
    const twoOrders = movementFormSchema.safeParse({
      type: "issue",
      sku: "MG-1",
      balance: "|MAIN",
      quantity: "2",
      buildOrderId: "3",
      reference: "BO-4",
    });
    expect(twoOrders.error?.issues[0]?.path).toEqual(["reference"]);
  });
  it("takes an issue's quantity or the spool's gross weight, not both, to an order or not", () => {
    // Both given, the weigh-back would silently win over the quantity typed.
    for (const buildOrderId of [undefined, "3"]) {
      const both = movementFormSchema.safeParse({
        type: "issue",
        sku: "CU-050",
        balance: "SP-7|MAIN",
        quantity: "0.5",
        grossKg: "4.5",
        buildOrderId,
      });
      expect(
        both.error?.issues.map((issue) => issue.path),
        String(buildOrderId),
      ).toEqual([["grossKg"]]);
    }
  });
  it("shows a build order's refusals at the order's choice", () => {
    expect(formFieldOf(undefined, "issue", true)).toBe("buildOrderId");
    expect(formFieldOf("sku", "issue", true)).toBe("buildOrderId");
    expect(formFieldOf("lot", "issue", true)).toBe("balance");
    expect(formFieldOf("quantity", "issue", true)).toBe("quantity");
    expect(formFieldOf(undefined, "issue")).toBe("");
  });
  it("shows a refused amount at the gross weight when the spool was weighed back", () => {
    // The weigh-back form has no quantity field: "holds only 1.8 kg … cannot issue 2.4 kg" must show beside the weight.
    expect(formFieldOf("quantity", "issue", true, true)).toBe("grossKg");
    expect(formFieldOf("quantity", "issue", false, true)).toBe("grossKg");
    expect(formFieldOf("quantity", "issue", true, false)).toBe("quantity");
    // A receipt's form shows a quantity refusal at the gross weight itself.
    expect(formFieldOf("quantity", "receipt", false, true)).toBe("quantity");
  });
});
