import { describe, expect, it } from "vitest";
import {
  checkFourCoil,
  n42shMagnets,
  partLine,
  WIRE_080,
} from "~/designs/design-lines.test-support";
import { parseExactDecimal } from "~/pricing/money";
import {
  addExact,
  itemRequirements,
  requiredThousandths,
} from "./build-order-requirements";

describe("required quantity for N motors", () => {
  it("rounds up to the gram for kg (0.0308378 kg × 500 = 15.4189 kg → 15.419 kg)", () => {
    expect(requiredThousandths(parseExactDecimal("0.0308378"), 500, "kg")).toBe(
      15_419n,
    );
  });

  it("keeps an exact product as it is (0.25 kg × 4 = 1.000 kg)", () => {
    expect(requiredThousandths(parseExactDecimal("0.25"), 4, "kg")).toBe(
      1_000n,
    );
  });

  it("rounds up to a whole piece for pcs (0.5 pcs × 3 = 1.5 → 2 pcs)", () => {
    expect(requiredThousandths(parseExactDecimal("0.5"), 3, "pcs")).toBe(
      2_000n,
    );
  });

  it("refuses 0 motors", () => {
    expect(() => requiredThousandths(parseExactDecimal("1"), 0, "pcs")).toThrow(
      RangeError,
    );
  });

  it("adds exact decimals of different scales without rounding", () => {
    expect(
      addExact(parseExactDecimal("0.1"), parseExactDecimal("0.0308378")),
    ).toEqual({ digits: 1_308_378n, decimals: 7 });
  });
});

describe("itemRequirements", () => {
  it("needs the coil's drawn wire, scrap included, for every motor (worked check 4, by hand)", () => {
    // MLT 2 × (50 + 30) mm = 160 mm; 40 turns → 6.4 m of 0.80 mm copper:
    // 6400 mm × π/4 · 0.8² mm² = 3217.0 mm³ × 8.89 g/cm³ (IEC 60028) = 28.599 g per coil.
    // 12 coils, 5 % scrap: 28.599 g × 12 × 1.05 = 360.348 g per motor; 3 motors 1.081044 kg → 1.082 kg.
    const [wire] = itemRequirements(
      [checkFourCoil({ coilsPerMotor: 12, scrapPercent: 5 })],
      3,
    );
    expect(wire).toMatchObject({
      itemId: WIRE_080.itemId,
      sku: WIRE_080.sku,
      unit: "kg",
      required: 1_082n,
    });
    expect(
      Number(wire!.perMotor.digits) / 10 ** wire!.perMotor.decimals,
    ).toBeCloseTo(0.360348, 6);
  });

  it("groups lines of one item and keeps the items in first-seen order", () => {
    const requirements = itemRequirements(
      [
        partLine(7, "BRG-6001", "pcs", "0.5"),
        n42shMagnets({ piecesPerMotor: 10 }),
        partLine(7, "BRG-6001", "pcs", "0.25"),
        checkFourCoil(),
        checkFourCoil({ turns: 80 }),
      ],
      3,
    );
    expect(
      requirements.map(({ sku, unit, required }) => ({ sku, unit, required })),
    ).toEqual([
      // 0.75 pcs × 3 = 2.25 → 3 pcs (a whole piece, rounded up)
      { sku: "BRG-6001", unit: "pcs", required: 3_000n },
      { sku: "MAG-N42SH-20x10x5", unit: "pcs", required: 30_000n },
      // 40 + 80 turns of the same wire: 3 × 28.599 g = 85.797 g per motor → 257.391 g
      { sku: WIRE_080.sku, unit: "kg", required: 258n },
    ]);
  });

  it("refuses a line that cannot be calculated (zero turns)", () => {
    expect(() => itemRequirements([checkFourCoil({ turns: 0 })], 1)).toThrow(
      /Turns/,
    );
  });
});
