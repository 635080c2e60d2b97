import { describe, expect, it } from "vitest";
import {
  changesCatalogue,
  itemChangeSchema,
  itemPatchOf,
} from "./item-change-form";

describe("item page changes", () => {
  it("tells the catalogue changes (buyers) from the reorder change (storekeepers too)", () => {
    expect(changesCatalogue("reorder")).toBe(false);
    expect(changesCatalogue("rename")).toBe(true);
    expect(changesCatalogue("archive")).toBe(true);
    expect(changesCatalogue("restore")).toBe(true);
    expect(changesCatalogue(null)).toBe(false);
  });

  it("turns each change into the catalogue's update", () => {
    expect(
      itemPatchOf(
        itemChangeSchema.parse({
          intent: "reorder",
          reorderPoint: 2.5,
          reorderQuantity: 10,
        }),
      ),
    ).toEqual({
      reorderPoint: 2.5,
      reorderQuantity: 10,
    });
    expect(
      itemPatchOf(
        itemChangeSchema.parse({
          intent: "rename",
          name: "  Copper 0.50 mm  ",
        }),
      ),
    ).toEqual({ name: "Copper 0.50 mm" });
    expect(itemPatchOf({ intent: "archive" })).toEqual({ active: false });
    expect(itemPatchOf({ intent: "restore" })).toEqual({ active: true });
  });

  it("checks the reorder fields as the item API does", () => {
    const result = itemChangeSchema.safeParse({
      intent: "reorder",
      reorderPoint: -1,
      reorderQuantity: 1.2345,
    });
    expect(result.success).toBe(false);
    expect(result.error!.issues.map((issue) => issue.message)).toEqual([
      "The reorder point cannot be negative.",
      "The reorder quantity has at most 3 decimals.",
    ]);
    expect(
      itemChangeSchema.safeParse({ intent: "delete" }).error!.issues[0]!
        .message,
    ).toBe("Choose what to change: reorder, rename, archive or restore.");
  });
});
