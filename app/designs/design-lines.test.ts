import { describe, expect, it } from "vitest";
import { estimateMagnet } from "~/engineering/magnet-estimate";
import { expectMatchesPrinted } from "~/engineering/printed-value.test-support";
import {
  assertDesignLine,
  designWireBareDiameterMm,
  lineItem,
  magnetMassPerMotorKg,
} from "./design-lines";
import {
  checkFourCoil,
  fieldOfError,
  n42shMagnets,
  partLine,
  WIRE_080,
} from "./design-lines.test-support";

describe("the wire of a coil line", () => {
  it("takes its bare diameter from the catalogued size, AWG by the ASTM B258 formula", () => {
    // Brief, worked check 1: AWG 20 is 0.81182 mm by the formula.
    expectMatchesPrinted(
      designWireBareDiameterMm({
        ...WIRE_080,
        size: { standard: "AWG", size: "20" },
      }),
      "0.81182",
    );
    expect(designWireBareDiameterMm(WIRE_080)).toBe(0.8);
  });
});

describe("magnet lines", () => {
  it("weigh mass per piece × pieces: 10 N42SH blocks of 20 × 10 × 5 mm are 75 g", () => {
    // 20 × 10 × 5 mm = 1 cm³ at 7.5 g/cm³ (brief, sintered NdFeB) = 7.5 g a piece,
    // as the magnet estimator also finds.
    const piece = estimateMagnet({
      grade: "N42SH",
      shape: { kind: "block", lengthMm: 20, widthMm: 10, heightMm: 5 },
    }).massPerPieceKg;
    expect(piece).toBeCloseTo(0.0075, 12);
    const line = n42shMagnets({
      magnet: { ...n42shMagnets().magnet, massPerPieceKg: piece },
    });
    expect(magnetMassPerMotorKg(line)).toBeCloseTo(0.075, 12);
  });
});

describe("lineItem", () => {
  it("gives the item of each kind of line", () => {
    expect(lineItem(checkFourCoil()).sku).toBe(WIRE_080.sku);
    expect(lineItem(n42shMagnets()).itemId).toBe(2);
    expect(lineItem(partLine(3, "BRG-608", "pcs", "2")).sku).toBe("BRG-608");
  });
});

describe("assertDesignLine", () => {
  it("accepts the lines the other tests use", () => {
    expect(fieldOfError(() => assertDesignLine(checkFourCoil()))).toBe(
      "no error",
    );
    expect(fieldOfError(() => assertDesignLine(n42shMagnets()))).toBe(
      "no error",
    );
    expect(
      fieldOfError(() => assertDesignLine(partLine(3, "B", "m", "0.35"))),
    ).toBe("no error");
  });

  it.each([
    ["piecesPerMotor", n42shMagnets({ piecesPerMotor: 0 })],
    ["piecesPerMotor", n42shMagnets({ piecesPerMotor: 2.5 })],
    ["quantityPerMotor", partLine(3, "B", "pcs", "0")],
    ["quantityPerMotor", partLine(3, "B", "pcs", "-1")],
    [
      "wire.enamelledLinearMassKgPerM",
      checkFourCoil({ wire: { ...WIRE_080, enamelledLinearMassKgPerM: 0 } }),
    ],
    [
      "slot.areaMm2",
      checkFourCoil({ slot: { areaMm2: 0, coilSidesPerSlot: 1 } }),
    ],
    [
      "slot.coilSidesPerSlot",
      checkFourCoil({ slot: { areaMm2: 50, coilSidesPerSlot: 0 } }),
    ],
    ["leadLengthMm", checkFourCoil({ leadLengthMm: Number.NaN })],
    [
      "operatingTemperatureC",
      checkFourCoil({ operatingTemperatureC: Infinity }),
    ],
    [
      "wire.size",
      checkFourCoil({
        wire: { ...WIRE_080, size: { standard: "AWG", size: "51" } },
      }),
    ],
  ] as const)("refuses a bad %s", (field, line) => {
    expect(fieldOfError(() => assertDesignLine(line))).toBe(field);
  });
});
