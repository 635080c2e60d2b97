import { describe, expect, it } from "vitest";
import { newItemFormSchema, unitOfNewItem } from "./new-item-form";

const wire = {
  kind: "wire",
  sku: "CU-0000-H",
  name: "Copper AWG 4/0 heavy",
  conductor: "copper",
  standard: "AWG",
  size: "0000",
  insulation: "heavy",
  thermalClass: 200,
  enamel: "polyamide-imide-overcoat",
};

const magnet = {
  kind: "magnet",
  sku: "MG-ARC-1",
  name: "N42SH arc",
  grade: "N42SH",
  shape: {
    kind: "arc",
    outerRadiusMm: 30,
    innerRadiusMm: 25,
    angleDeg: 40,
    axialLengthMm: 50,
  },
  coating: "NiCuNi",
  magnetisation: "radial",
};

function issues(input: unknown) {
  const result = newItemFormSchema.safeParse(input);
  return result.success
    ? {}
    : Object.fromEntries(
        result.error.issues.map((issue) => [
          issue.path.join("."),
          issue.message,
        ]),
      );
}

describe("new-item form", () => {
  it("keeps an AWG aught size as its label", () => {
    const result = newItemFormSchema.parse(wire);
    expect(result.kind === "wire" && result.size).toBe("0000");
    expect(result.reorderPoint).toBe(0);
  });

  it("asks for a choice in each select, and for a kind", () => {
    expect(issues({ ...wire, size: " " })).toEqual({
      size: "Choose the size.",
    });
    expect(
      issues({ ...wire, insulation: undefined, enamel: "shellac" }),
    ).toEqual({
      insulation: "Choose the insulation.",
      enamel: "Choose the enamel.",
    });
    expect(issues({ ...magnet, grade: "" })).toEqual({
      grade: "Choose the grade.",
    });
    expect(Object.values(issues({ sku: "X", name: "Y" }))).toEqual([
      "Choose what kind of item this is: wire, magnet or other part.",
    ]);
  });

  it("counts magnets and parts in pieces whole, but not wire or parts by the metre", () => {
    expect(issues({ ...magnet, reorderPoint: 2.5 })).toEqual({
      reorderPoint: "Pieces are counted whole: give a whole number.",
    });
    expect(
      issues({
        kind: "part",
        sku: "B-6204",
        name: "Bearing 6204",
        unit: "pcs",
        reorderQuantity: 0.5,
      }),
    ).toHaveProperty("reorderQuantity");
    expect(
      issues({
        kind: "part",
        sku: "SL-1",
        name: "Slot liner",
        unit: "m",
        reorderQuantity: 0.5,
      }),
    ).toEqual({});
    expect(issues({ ...wire, reorderPoint: 2.5 })).toEqual({});
  });

  it("refuses a magnet shape that cannot be made, at the dimension's field", () => {
    expect(
      issues({ ...magnet, shape: { ...magnet.shape, innerRadiusMm: 35 } }),
    ).toEqual({
      "shape.innerRadiusMm":
        "The inner radius must be smaller than the outer radius.",
    });
  });

  it("names the unit of each kind", () => {
    expect(unitOfNewItem("wire", "m")).toBe("kg");
    expect(unitOfNewItem("magnet", undefined)).toBe("pcs");
    expect(unitOfNewItem("part", "m")).toBe("m");
    expect(unitOfNewItem("part", "")).toBe("pcs");
  });
});
