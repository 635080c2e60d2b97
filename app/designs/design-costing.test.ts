import { describe, expect, it } from "vitest";
import { fullWirePricePerKg } from "~/pricing/metal-base";
import {
  formatExactDecimal,
  formatMoneyText,
  parseExactDecimal,
  parseMoney,
  type MoneyAmount,
} from "~/pricing/money";
import {
  costDesign,
  costPerNewtonMetre,
  designCostingJson,
  perNmTorque,
  requiredStockQuantity,
  type DesignCostingInput,
  type DesignCostSplit,
  type ItemUnitPrice,
} from "./design-costing";
import type { DesignLine } from "./design-lines";
import {
  checkFourCoil,
  fieldOfError,
  n42shMagnets,
  partLine,
  seededRandom,
  WIRE_080,
} from "./design-lines.test-support";

const money = (amount: MoneyAmount | null) =>
  amount === null ? null : formatMoneyText(amount);

function price(text: string, source = "test price"): ItemUnitPrice {
  return { unitPrice: parseMoney(text), source };
}

/** Adder 3.50/kg + copper base 9.00/kg (worked example of issues #5 and #6). */
const WIRE_PRICE: ItemUnitPrice = {
  unitPrice: fullWirePricePerKg(parseMoney("3.50"), parseMoney("9.00")),
  source: "adder 3.50/kg + copper base 9.00/kg",
};

function splitTotal(split: DesignCostSplit): MoneyAmount {
  return (
    split.activeCopper +
    split.endTurnCopper +
    split.leadsAndScrap +
    split.magnets +
    split.parts
  );
}

function costing(
  lines: DesignLine[],
  prices: [number, ItemUnitPrice][],
  overrides: Partial<DesignCostingInput> = {},
) {
  return costDesign({
    lines,
    quantity: 1,
    currency: "EUR",
    prices: new Map(prices),
    ratedTorqueNm: null,
    ...overrides,
  });
}

describe("worked example of issues #5 and #6: 29.94 g of wire at 12.50/kg costs 0.3742", () => {
  it("prices the coil of worked check 4 with its two 150 mm leads", () => {
    // Adder 3.50/kg + copper base 9.00/kg = 12.50/kg. The coil's wound mass is 29.9396 g
    // (brief, worked check 4: 29.94 g); 0.0299396 kg × 12.50 = 0.374245 → 0.3742.
    expect(money(WIRE_PRICE.unitPrice)).toBe("12.5000");
    const result = costing(
      [checkFourCoil({ leadLengthMm: 150 })],
      [[WIRE_080.itemId, WIRE_PRICE]],
    );
    const [line] = result.lines;
    expect(formatExactDecimal(line!.perMotorQuantity)).toBe("0.0299396");
    expect(line!.unit).toBe("kg");
    expect(line!.massBasis).toBe("bare");
    expect(money(line!.cost)).toBe("0.3742");
    expect(money(result.costPerMotor)).toBe("0.3742");
    expect(splitTotal(result.split)).toBe(result.costPerMotor);
  });
});

describe("a design with wire, magnets and parts (worked by hand)", () => {
  const lines: DesignLine[] = [
    checkFourCoil({ leadLengthMm: 150, scrapPercent: 3 }),
    n42shMagnets(),
    partLine(3, "BRG-608", "pcs", "1"),
    partLine(4, "SLEEVE-6", "m", "0.35"),
  ];
  const prices: [number, ItemUnitPrice][] = [
    [1, WIRE_PRICE],
    [2, price("1.25", "best price for 10 pcs")],
    [3, price("4.00", "moving average cost of stock")],
    [4, price("2.00")],
  ];

  it("costs each line at its per-motor quantity, half away from zero to 0.0001", () => {
    const result = costing(lines, prices);
    // Wire: 30.8378 g drawn with 3 % scrap (brief, worked check 4: 30.84 g) × 12.50/kg
    //   = 0.38547250 → 0.3855; magnets 10 × 1.2500 = 12.5000; bearing 1 × 4.0000;
    //   sleeve 0.35 m × 2.0000 = 0.7000.
    expect(
      result.lines.map((line) => [
        line.kind,
        line.sku,
        formatExactDecimal(line.perMotorQuantity),
        line.unit,
        money(line.unitPrice),
        line.priceSource,
        money(line.cost),
      ]),
    ).toEqual([
      [
        "coil",
        "CU-0.80-G2",
        "0.0308378",
        "kg",
        "12.5000",
        WIRE_PRICE.source,
        "0.3855",
      ],
      [
        "magnet",
        "MAG-N42SH-20x10x5",
        "10",
        "pcs",
        "1.2500",
        "best price for 10 pcs",
        "12.5000",
      ],
      [
        "part",
        "BRG-608",
        "1",
        "pcs",
        "4.0000",
        "moving average cost of stock",
        "4.0000",
      ],
      ["part", "SLEEVE-6", "0.35", "m", "2.0000", "test price", "0.7000"],
    ]);
    // 0.3855 + 12.5000 + 4.0000 + 0.7000 = 17.5855
    expect(money(result.costPerMotor)).toBe("17.5855");
    expect(result.complete).toBe(true);
    expect(result.unpriced).toEqual([]);
  });

  it("splits the wire cost by its drawn mass, largest remainder, and the split adds up to the cost per motor exactly", () => {
    const result = costing(lines, prices);
    // The drawn 0.0308378 kg splits 0.0178744 / 0.0107246 / 0.0022388 kg (coil-line
    // figures). 3855 ten-thousandths by those weights: exact shares 2234.459, 1340.671,
    // 279.870 → floors 2234, 1340, 279; the 2 left over go to the two largest remainders.
    expect(money(result.split.activeCopper)).toBe("0.2234");
    expect(money(result.split.endTurnCopper)).toBe("0.1341");
    expect(money(result.split.leadsAndScrap)).toBe("0.0280");
    expect(money(result.split.magnets)).toBe("12.5000");
    expect(money(result.split.parts)).toBe("4.7000");
    expect(splitTotal(result.split)).toBe(result.costPerMotor);
  });

  it("cost per N·m = cost per motor ÷ rated torque, half away from zero", () => {
    // 17.5855 / 2 = 8.79275 exactly: a tie, so 8.7928.
    const result = costing(lines, prices, { ratedTorqueNm: 2 });
    expect(result.ratedTorqueNm).toBe(2);
    expect(money(result.costPerNm)).toBe("8.7928");
  });

  it("without a rated torque, takes cost per N·m over the first-order estimate and says so", () => {
    // 17.5855 / 0.5 = 35.171 exactly (by hand).
    const estimated = costing(lines, prices, { estimatedTorqueNm: 0.5 });
    expect(estimated.ratedTorqueNm).toBeNull();
    expect(estimated.perNmTorque).toEqual({
      torqueNm: 0.5,
      source: "estimated",
    });
    expect(money(estimated.costPerNm)).toBe("35.1710");
    expect(designCostingJson(estimated).perNmTorque?.source).toBe("estimated");
    // A rated torque, when given, wins over the estimate.
    const rated = costing(lines, prices, {
      ratedTorqueNm: 2,
      estimatedTorqueNm: 0.5,
    });
    expect(rated.perNmTorque).toEqual({ torqueNm: 2, source: "rated" });
    expect(money(rated.costPerNm)).toBe("8.7928");
  });

  it("has no torque to divide by when neither is a positive number", () => {
    expect(perNmTorque(null, null)).toBeNull();
    expect(perNmTorque(0, 0)).toBeNull();
    expect(perNmTorque(null, Number.NaN)).toBeNull();
    expect(perNmTorque(0, 1.2)).toEqual({ torqueNm: 1.2, source: "estimated" });
  });

  it("a new metal base moves the copper lines only", () => {
    const before = costing(lines, prices);
    const after = costing(lines, [
      ...prices,
      [1, { ...WIRE_PRICE, unitPrice: parseMoney("13.90") }],
    ]);
    // 0.0308378 kg × 13.90 = 0.42864542 → 0.4286
    expect(money(after.lines[0]!.cost)).toBe("0.4286");
    expect(after.lines.slice(1)).toEqual(before.lines.slice(1));
    expect(after.split.magnets).toBe(before.split.magnets);
    expect(after.split.parts).toBe(before.split.parts);
    expect(after.costPerMotor - before.costPerMotor).toBe(
      parseMoney("0.4286") - parseMoney("0.3855"),
    );
  });

  it("reports a line without a price as unpriced, never as zero", () => {
    const result = costing(
      lines,
      prices.filter(([itemId]) => itemId !== 2),
      { ratedTorqueNm: 2 },
    );
    const magnetLine = result.lines[1]!;
    expect(magnetLine.unitPrice).toBeNull();
    expect(magnetLine.priceSource).toBeNull();
    expect(magnetLine.cost).toBeNull();
    expect(result.complete).toBe(false);
    expect(result.unpriced).toEqual([
      { kind: "magnet", itemId: 2, sku: "MAG-N42SH-20x10x5" },
    ]);
    // The priced lines only: 0.3855 + 4.0000 + 0.7000 = 5.0855.
    expect(money(result.costPerMotor)).toBe("5.0855");
    expect(splitTotal(result.split)).toBe(result.costPerMotor);
  });

  it("gives the API's JSON with money as numbers to 0.0001", () => {
    const json = designCostingJson(
      costing(lines, prices, { quantity: 500, ratedTorqueNm: 2 }),
    );
    expect(json.quantity).toBe(500);
    expect(json.currency).toBe("EUR");
    expect(json.costPerMotor).toBe(17.5855);
    expect(json.costPerNm).toBe(8.7928);
    expect(json.split).toEqual({
      activeCopper: 0.2234,
      endTurnCopper: 0.1341,
      leadsAndScrap: 0.028,
      magnets: 12.5,
      parts: 4.7,
    });
    expect(json.lines[0]).toEqual({
      kind: "coil",
      sku: "CU-0.80-G2",
      perMotorQuantity: 0.0308378,
      unit: "kg",
      unitPrice: 12.5,
      priceSource: WIRE_PRICE.source,
      cost: 0.3855,
      massBasis: "bare",
    });
    expect(json.complete).toBe(true);
  });
});

describe("cost per N·m", () => {
  it("is null when the torque is missing, zero or negative", () => {
    expect(costPerNewtonMetre(parseMoney("10"), null)).toBeNull();
    expect(costPerNewtonMetre(parseMoney("10"), 0)).toBeNull();
    expect(costPerNewtonMetre(parseMoney("10"), -1)).toBeNull();
    expect(costPerNewtonMetre(parseMoney("10"), Number.NaN)).toBeNull();
  });

  it("divides exactly at the torque's micro-newton-metre (worked by hand)", () => {
    // 10.0000 / 3 = 3.33333… → 3.3333; 10.0000 / 0.648 = 15.432098… → 15.4321.
    expect(money(costPerNewtonMetre(parseMoney("10"), 3))).toBe("3.3333");
    expect(money(costPerNewtonMetre(parseMoney("10"), 0.648))).toBe("15.4321");
  });
});

describe("sums that must hold for any design (seeded random)", () => {
  it("split = cost per motor = Σ line costs, exactly", () => {
    const random = seededRandom(2026);
    for (let run = 0; run < 100; run += 1) {
      const lines: DesignLine[] = [];
      const prices: [number, ItemUnitPrice][] = [];
      const coilCount = 1 + Math.floor(random() * 3);
      for (let index = 0; index < coilCount; index += 1) {
        const itemId = 100 + index;
        lines.push(
          checkFourCoil({
            wire: { ...WIRE_080, itemId, sku: `W${index}` },
            turns: 1 + Math.floor(random() * 300),
            strandsInHand: 1 + Math.floor(random() * 4),
            activeLengthMm: 1 + random() * 200,
            endTurnLengthMm: random() * 80,
            leadLengthMm: random() * 400,
            coilsPerMotor: 1 + Math.floor(random() * 36),
            scrapPercent: random() * 10,
          }),
        );
        prices.push([
          itemId,
          {
            unitPrice: BigInt(1 + Math.floor(random() * 400_000)),
            source: "random",
          },
        ]);
      }
      lines.push(
        n42shMagnets({ piecesPerMotor: 1 + Math.floor(random() * 40) }),
      );
      prices.push([
        2,
        { unitPrice: BigInt(Math.floor(random() * 100_000)), source: "random" },
      ]);
      const result = costing(lines, prices);
      const lineSum = result.lines.reduce(
        (sum, line) => sum + (line.cost ?? 0n),
        0n,
      );
      expect(result.costPerMotor).toBe(lineSum);
      expect(splitTotal(result.split)).toBe(result.costPerMotor);
      expect(result.split.activeCopper >= 0n).toBe(true);
      expect(result.split.endTurnCopper >= 0n).toBe(true);
      expect(result.split.leadsAndScrap >= 0n).toBe(true);
    }
  });
});

describe("stock for a build", () => {
  it("rounds up to the ledger's thousandths (worked by hand)", () => {
    // 0.0308378 kg × 500 = 15.4189 kg → 15.419 kg; 10 pcs × 500 = 5000 pcs; 0.35 m × 3 = 1.05 m.
    expect(requiredStockQuantity(parseExactDecimal("0.0308378"), 500)).toBe(
      15419n,
    );
    expect(requiredStockQuantity(parseExactDecimal("10"), 500)).toBe(
      5_000_000n,
    );
    expect(requiredStockQuantity(parseExactDecimal("0.35"), 3)).toBe(1050n);
  });
});

describe("refusals", () => {
  it("refuses a build of 0 motors and a line that cannot be calculated", () => {
    expect(
      fieldOfError(() => costing([checkFourCoil()], [], { quantity: 0 })),
    ).toBe("quantity");
    expect(fieldOfError(() => costing([checkFourCoil({ turns: 0 })], []))).toBe(
      "turns",
    );
    expect(
      fieldOfError(() => costing([partLine(3, "X", "pcs", "0")], [])),
    ).toBe("quantityPerMotor");
  });
});
