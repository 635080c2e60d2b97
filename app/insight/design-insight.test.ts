import { describe, expect, it } from "vitest";
import {
  costHistoryChange,
  costingMoneyText,
  moneyChange,
  moneyFromJson,
  rankByCostPerNm,
  splitPerNewtonMetre,
  unpricedText,
} from "./design-insight";

describe("splitPerNewtonMetre", () => {
  it("shares the cost per N·m out like the cost per motor (worked by hand)", () => {
    // 9.0000 per motor at 0.5 N·m is 18.0000 per N·m; each part doubles.
    expect(
      splitPerNewtonMetre(
        {
          activeCopper: 2,
          endTurnCopper: 1,
          leadsAndScrap: 0.5,
          magnets: 4,
          parts: 1.5,
        },
        18,
      ),
    ).toEqual({
      activeCopper: 4,
      endTurnCopper: 2,
      leadsAndScrap: 1,
      magnets: 8,
      parts: 3,
    });
  });

  it("adds up to the cost per N·m exactly when the parts do not divide evenly", () => {
    // 2.0000 per motor as 0.6667 + 0.6667 + 0.6666 at 3 N·m: 2 ÷ 3 = 0.6667 per N·m (the
    // costing's rounding), 6667 ten-thousandths over weights 6667 : 6667 : 6666 (Σ 20000):
    // 6667 × 6667 ÷ 20000 = 2222.44, again 2222.44, 6667 × 6666 ÷ 20000 = 2222.11 →
    // 2222 each (6666), 1 left for the largest remainder, the earlier part on a tie.
    const thirds = splitPerNewtonMetre(
      {
        activeCopper: 0.6667,
        endTurnCopper: 0.6667,
        leadsAndScrap: 0.6666,
        magnets: 0,
        parts: 0,
      },
      0.6667,
    )!;
    expect(thirds).toEqual({
      activeCopper: 0.2223,
      endTurnCopper: 0.2222,
      leadsAndScrap: 0.2222,
      magnets: 0,
      parts: 0,
    });
    const sum = Object.values(thirds).reduce(
      (total, part) => total + moneyFromJson(part),
      0n,
    );
    expect(sum).toBe(6667n);
  });

  it("gives nothing without a cost per N·m or with a credit line", () => {
    const split = {
      activeCopper: 1,
      endTurnCopper: 1,
      leadsAndScrap: 0,
      magnets: 0,
      parts: 0,
    };
    expect(splitPerNewtonMetre(split, null)).toBeNull();
    expect(splitPerNewtonMetre({ ...split, parts: -0.5 }, 3)).toBeNull();
  });
});

describe("moneyChange", () => {
  it("subtracts exactly, without binary float residue", () => {
    // 0.3 − 0.1 is 0.19999999999999998 in binary floating point; exact it is 0.2.
    expect(moneyChange(0.3, 0.1)).toBe(0.2);
    expect(moneyChange(12.0042, 11.7484)).toBe(0.2558);
    expect(moneyChange(null, 1)).toBeNull();
  });
});

describe("costHistoryChange", () => {
  const point = (date: string, costPerMotor: number, complete = true) => ({
    date,
    costPerMotor,
    complete,
  });
  it("compares the first and last fully priced months (worked by hand)", () => {
    // 5.8742 → 5.9042 is +0.0300; 0.0300 ÷ 5.8742 = 0.5107 % → 0.5 %.
    expect(
      costHistoryChange([
        point("2033-01-01", 1.5, false),
        point("2033-02-01", 5.8742),
        point("2033-03-01", 5.9042),
        point("2033-04-01", 2, false),
      ]),
    ).toEqual({
      from: { date: "2033-02-01", costPerMotor: 5.8742 },
      to: { date: "2033-03-01", costPerMotor: 5.9042 },
      change: 0.03,
      percent: 0.5,
    });
    // 86.12 → 86.28: +0.16 ÷ 86.12 = 0.1858 % → 0.2 %; a fall keeps its sign:
    // 10.00 → 9.25 is −0.75, −7.5 % exactly.
    expect(
      costHistoryChange([point("a", 86.12), point("b", 86.28)])?.percent,
    ).toBe(0.2);
    expect(costHistoryChange([point("a", 10), point("b", 9.25)])).toMatchObject(
      { change: -0.75, percent: -7.5 },
    );
  });
  it("needs two priced months", () => {
    expect(costHistoryChange([point("a", 1), point("b", 2, false)])).toBeNull();
  });
});

describe("rankByCostPerNm", () => {
  const design = (
    name: string,
    costPerNm: number | null,
    unpriced: string[] = [],
  ) => ({ name, costPerNm, complete: unpriced.length === 0, unpriced });

  it("ranks priced designs cheapest first and sets incomplete ones apart, however cheap they look", () => {
    const { ranked, incomplete, withoutTorque } = rankByCostPerNm([
      design("hub", 11.75),
      design("half-priced", 2.1, ["MAG-1", "BRG-2"]),
      design("spindle", 9.4),
      design("no torque", null),
      design("fan", 11.75),
    ]);
    expect(ranked.map((entry) => entry.name)).toEqual([
      "spindle",
      "hub",
      "fan",
    ]);
    expect(incomplete.map((entry) => entry.name)).toEqual(["half-priced"]);
    expect(withoutTorque.map((entry) => entry.name)).toEqual(["no torque"]);
  });

  it("names how many lines are unpriced, in the singular for one", () => {
    expect(unpricedText(1)).toBe("incomplete — 1\u00a0line unpriced");
    expect(unpricedText(2)).toBe("incomplete — 2\u00a0lines unpriced");
  });
});

describe("costingMoneyText", () => {
  // Worked by hand: exact ten-thousandths rounded half away from zero (decision 006),
  // where a float would give 12.34 for 12.345.
  it("rounds a costing figure to the cent exactly, with or without its currency", () => {
    expect(costingMoneyText(12.345, "EUR")).toBe("12.35\u00a0EUR");
    expect(costingMoneyText(1234.5, "EUR", "N·m")).toBe(
      "1,234.50\u00a0EUR/N·m",
    );
    expect(costingMoneyText(11.745)).toBe("11.75");
  });
});
