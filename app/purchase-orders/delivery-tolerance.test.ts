import { describe, expect, it } from "vitest";
import {
  deliveryLimit,
  percentHundredths,
  toleranceFor,
  toleranceRefusal,
} from "./delivery-tolerance";

const supplier = {
  wireTolerancePercent: "10.00",
  pieceTolerancePercent: "0.00",
};

describe("which tolerance applies", () => {
  it("takes the wire tolerance for kg and the piece tolerance for pieces and metres", () => {
    expect(toleranceFor("kg", supplier)).toBe(1000n);
    expect(toleranceFor("pcs", supplier)).toBe(0n);
    expect(
      toleranceFor("m", { ...supplier, pieceTolerancePercent: "2.50" }),
    ).toBe(250n);
  });

  it("reads the stored percentages exactly", () => {
    expect(percentHundredths("10.00")).toBe(1000n);
    expect(percentHundredths("0.25")).toBe(25n);
    expect(() => percentHundredths("-1")).toThrow(RangeError);
  });
});

describe("the most a line may receive (worked examples by hand)", () => {
  it("100 kg at 10 %: 100 × 1.10 = 110 kg", () => {
    expect(deliveryLimit(100_000n, "kg", 1000n)).toBe(110_000n);
  });

  it("12.345 kg at 10 %: 13.5795 kg, rounded down to the gram: 13.579 kg", () => {
    expect(deliveryLimit(12_345n, "kg", 1000n)).toBe(13_579n);
  });

  it("7 pieces at 10 %: 7.7, rounded down to whole pieces: 7", () => {
    expect(deliveryLimit(7_000n, "pcs", 1000n)).toBe(7_000n);
  });

  it("20 pieces at 10 %: 22 pieces; at 0 %: exactly 20", () => {
    expect(deliveryLimit(20_000n, "pcs", 1000n)).toBe(22_000n);
    expect(deliveryLimit(20_000n, "pcs", 0n)).toBe(20_000n);
  });

  it("250 m at 2.5 %: 256.25 m", () => {
    expect(deliveryLimit(250_000n, "m", 250n)).toBe(256_250n);
  });
});

describe("refusing a delivery past the limit", () => {
  const line = {
    label: "Line 1 (CU-050)",
    unit: "kg",
    ordered: 100_000n,
    toleranceHundredths: 1000n,
  };

  it("accepts up to the limit, several spools together", () => {
    // 60 kg so far + two spools of 25 kg = 110 kg, exactly the limit.
    expect(
      toleranceRefusal({
        ...line,
        receivedSoFar: 60_000n,
        receivingNow: 50_000n,
      }),
    ).toBeNull();
  });

  it("refuses a gram past it, naming the line, ordered, received, limit and the total after", () => {
    const message = toleranceRefusal({
      ...line,
      receivedSoFar: 60_000n,
      receivingNow: 50_001n,
    });
    expect(message).toBe(
      "Line 1 (CU-050): ordered 100 kg, received so far 60 kg; at most 110 kg may be received (10 % over the order), but this delivery would make it 110.001 kg.",
    );
  });

  it("says pieces in words for pieces at no tolerance", () => {
    expect(
      toleranceRefusal({
        label: "Line 2 (MAG-N42)",
        unit: "pcs",
        ordered: 20_000n,
        toleranceHundredths: 0n,
        receivedSoFar: 19_000n,
        receivingNow: 2_000n,
      }),
    ).toBe(
      "Line 2 (MAG-N42): ordered 20 pieces, received so far 19 pieces; at most 20 pieces may be received (0 % over the order), but this delivery would make it 21 pieces.",
    );
  });
});
