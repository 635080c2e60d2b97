import { describe, expect, it } from "vitest";
import { describeMatch } from "./price-import-preview";

describe("a previewed row's catalogue item", () => {
  it("says how an existing item was matched", () => {
    const matched = { sku: "BRG-6001", name: "Bearing", kind: "part" as const };
    expect(describeMatch({ ...matched, newItem: false, by: "our-sku" })).toBe(
      "by our SKU",
    );
    expect(
      describeMatch({ ...matched, newItem: false, by: "supplier-sku" }),
    ).toBe("by the supplier's SKU");
  });

  it("says which kind of item the import will create", () => {
    const created = { sku: "S3-A-1", name: "AWG 39 wire", newItem: true };
    expect(describeMatch({ ...created, kind: "wire", by: "new-item" })).toBe(
      "New wire item",
    );
    expect(describeMatch({ ...created, kind: "part", by: "new-item" })).toBe(
      "New part",
    );
  });
});
