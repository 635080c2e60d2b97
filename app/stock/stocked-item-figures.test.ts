import { describe, expect, it } from "vitest";
import { findMagnetGrade } from "~/engineering/reference-data";
import {
  magnetDimensionsText,
  magnetShapeOf,
  magnetStockFigures,
  wireSpecOf,
  wireStockFigures,
} from "./stocked-item-figures";

describe("wire stock length", () => {
  it("gives the most metres a copper stock can be, from the bare conductor", () => {
    // IEC 1.000 mm copper: π/4 · 1.0² = 0.7854 mm² × 8.89 g/cm³ = 6.982 g/m (IEC 60028 density, brief);
    // 10 kg ÷ 0.006982 kg/m = 1,432.2 m, worked by hand.
    const figures = wireStockFigures({
      conductor: "copper",
      standard: "IEC",
      sizeLabel: "1.000",
      onHandKg: 10,
    });
    expect(figures.bareDiameterMm).toBe(1);
    expect(figures.linearMassKgPerM).toBeCloseTo(0.0069822, 6);
    expect(figures.maxLengthM).toBeCloseTo(1432.2, 1);
  });

  it("reads AWG labels, the aught sizes too", () => {
    // AWG 20 by the ASTM B258 formula: 0.8118 mm (brief, AWG table).
    expect(
      wireStockFigures({
        conductor: "copper",
        standard: "AWG",
        sizeLabel: "20",
        onHandKg: 1,
      }).bareDiameterMm,
    ).toBeCloseTo(0.8118, 4);
    expect(wireSpecOf("AWG", "0000")).toEqual({
      standard: "AWG",
      size: "0000",
    });
    expect(wireSpecOf("IEC", "0.500")).toEqual({
      standard: "IEC",
      diameterMm: 0.5,
    });
  });

  it("gives no length for no stock", () => {
    expect(
      wireStockFigures({
        conductor: "aluminium",
        standard: "IEC",
        sizeLabel: "0.500",
        onHandKg: 0,
      }).maxLengthM,
    ).toBe(0);
  });
});

describe("stocked magnets", () => {
  it("rebuilds the stored shape", () => {
    expect(
      magnetShapeOf("block", '{"lengthMm":20,"widthMm":10,"heightMm":5}'),
    ).toEqual({ kind: "block", lengthMm: 20, widthMm: 10, heightMm: 5 });
    expect(magnetShapeOf("cube", "{}")).toBeNull();
    expect(magnetShapeOf("disc", "not json")).toBeNull();
  });

  it("weighs one piece and the pieces on hand", () => {
    // 20 × 10 × 5 mm = 1,000 mm³ at 7.5 g/cm³ (NdFeB, brief) = 7.5 g; 100 pieces = 0.75 kg.
    const grade = findMagnetGrade("N42SH")!;
    const figures = magnetStockFigures({
      grade,
      shape: { kind: "block", lengthMm: 20, widthMm: 10, heightMm: 5 },
      pieces: 100,
    });
    expect(figures.massPerPieceKg).toBeCloseTo(0.0075, 9);
    expect(figures.totalMassKg).toBeCloseTo(0.75, 9);
    expect(
      magnetStockFigures({
        grade,
        shape: { kind: "disc", diameterMm: 10, thicknessMm: 2 },
        pieces: 0,
      }).totalMassKg,
    ).toBe(0);
  });

  it("spells the dimensions with their units", () => {
    expect(
      magnetDimensionsText({ kind: "disc", diameterMm: 10, thicknessMm: 2.5 }),
    ).toBe("diameter 10\u00a0mm × thickness 2.5\u00a0mm");
  });
});
