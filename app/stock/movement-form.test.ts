import { describe, expect, it } from "vitest";
import { movementFormSchema } from "./movement-form";

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
});
