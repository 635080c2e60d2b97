import { describe, expect, it } from "vitest";
import { coilLineFigures } from "~/designs/coil-line-figures";
import {
  checkFourCoil,
  n42shMagnets,
} from "~/designs/design-lines.test-support";
import { findMetalBase, type MetalBasePrice } from "~/pricing/metal-base";
import { searchParamsObject } from "~/lib/search-params";
import {
  insightQuerySchema,
  metalBasesWithWhatIf,
  readInsightSearch,
  scaleEndTurns,
  whatIfForDesign,
} from "./what-if";

const parse = (query: string) =>
  insightQuerySchema.safeParse(searchParamsObject(new URLSearchParams(query)));

describe("the insight query", () => {
  it("reads the what-if, the quantity and the end-turn factors per design", () => {
    const parsed = parse(
      "copperBase=10.5&endTurn.12=1.2&endTurn.40=0&quantity=100&date=2031-06-01",
    );
    expect(parsed.success).toBe(true);
    expect(parsed.data).toMatchObject({
      quantity: 100,
      date: "2031-06-01",
      copperBase: 105_000n, // 10.5 per kg in ten-thousandths
      endTurn: { "12": 1.2, "40": 0 },
      page: 1,
      perPage: 20,
    });
  });

  it("takes the defaults from an empty form (empty fields dropped)", () => {
    const parsed = parse("quantity=&copperBase=&endTurn.12=");
    expect(parsed.data).toEqual({
      quantity: 1,
      basis: "best-price",
      endTurn: {},
      page: 1,
      perPage: 20,
    });
  });

  it("takes the price basis, and names a basis it does not know", () => {
    expect(parse("basis=stock-average").data?.basis).toBe("stock-average");
    const refused = readInsightSearch({ basis: "cheapest" });
    expect(refused.query.basis).toBe("best-price");
    expect(refused.errors.basis?.[0]).toContain("stock-average");
  });

  it("names each bad parameter", () => {
    const parsed = parse(
      "copperBase=10.12345&aluminiumBase=-2&endTurn.12=9&endTurn.x=1&quantity=1.5&date=2026-02-30",
    );
    expect(parsed.success).toBe(false);
    const paths = parsed.error!.issues.map((issue) => issue.path.join("."));
    expect(paths.sort()).toEqual([
      "aluminiumBase",
      "copperBase",
      "date",
      "endTurn.12",
      "endTurn.x",
      "quantity",
    ]);
  });
});

describe("whatIfForDesign", () => {
  const query = {
    copperBase: 105_000n,
    aluminiumBase: undefined,
    endTurn: { "12": 1.2, "13": 1 },
  };
  it("gives the metal base to every design and the end-turn factor to its own design", () => {
    expect(whatIfForDesign(query, 12)).toEqual({
      metalBasePerKg: { copper: 105_000n },
      endTurnScale: 1.2,
    });
    expect(whatIfForDesign(query, 99)).toEqual({
      metalBasePerKg: { copper: 105_000n },
    });
  });
  it("is nothing when nothing changes (a factor of 1 is the design as it is)", () => {
    expect(
      whatIfForDesign({ ...query, copperBase: undefined }, 13),
    ).toBeUndefined();
  });
});

describe("metalBasesWithWhatIf", () => {
  const bases: MetalBasePrice[] = [
    {
      conductor: "copper",
      currency: "EUR",
      pricePerKg: 90_000n,
      validFrom: "2026-01-01",
    },
    {
      conductor: "copper",
      currency: "EUR",
      pricePerKg: 95_000n,
      validFrom: "2026-06-01",
    },
    {
      conductor: "copper",
      currency: "USD",
      pricePerKg: 99_000n,
      validFrom: "2026-01-01",
    },
    {
      conductor: "aluminium",
      currency: "EUR",
      pricePerKg: 30_000n,
      validFrom: "2026-01-01",
    },
  ];
  const replaced = metalBasesWithWhatIf(bases, { copper: 105_000n }, "EUR");

  it("stands in for the company-currency copper base on every day", () => {
    for (const day of ["2020-01-01", "2026-03-01", "2031-06-01"]) {
      const lookup = findMetalBase(replaced, "copper", "EUR", day);
      expect(lookup.ok && lookup.base.pricePerKg).toBe(105_000n);
    }
  });

  it("leaves other currencies and metals as stored", () => {
    const usd = findMetalBase(replaced, "copper", "USD", "2026-03-01");
    expect(usd.ok && usd.base.pricePerKg).toBe(99_000n);
    const aluminium = findMetalBase(replaced, "aluminium", "EUR", "2026-03-01");
    expect(aluminium.ok && aluminium.base.pricePerKg).toBe(30_000n);
    expect(replaced).toHaveLength(3);
  });
});

describe("scaleEndTurns", () => {
  it("lengthens only the end turns of coil lines", () => {
    const [coil, magnets] = scaleEndTurns([checkFourCoil(), n42shMagnets()], 2);
    expect(coil).toMatchObject({ endTurnLengthMm: 60, activeLengthMm: 50 });
    expect(magnets).toEqual(n42shMagnets());
    // Worked by hand: a turn is two sides and two end turns, 2 × (50 + 30) = 160 mm, so
    // 40 turns hold 6.4 m; with the end turns doubled 2 × (50 + 60) = 220 mm → 8.8 m.
    if (coil!.kind !== "coil") throw new Error("a coil line");
    expect(coilLineFigures(checkFourCoil()).copperLengthM).toBeCloseTo(6.4, 9);
    expect(coilLineFigures(coil!).copperLengthM).toBeCloseTo(8.8, 9);
  });

  it("refuses a negative factor", () => {
    expect(() => scaleEndTurns([checkFourCoil()], -1)).toThrow(RangeError);
  });
});

describe("readInsightSearch", () => {
  it("keeps the good fields and names the bad ones by their form name", () => {
    const { query, errors } = readInsightSearch(
      searchParamsObject(
        new URLSearchParams(
          "copperBase=abc&endTurn.12=1.1&endTurn.13=7&quantity=5",
        ),
      ),
    );
    expect(query).toMatchObject({
      quantity: 5,
      endTurn: { "12": 1.1 },
    });
    expect(query.copperBase).toBeUndefined();
    expect(Object.keys(errors).sort()).toEqual(["copperBase", "endTurn.13"]);
  });
});
