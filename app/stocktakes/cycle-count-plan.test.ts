import { describe, expect, it } from "vitest";
import {
  countClasses,
  cycleCountPlan,
  type LocationToPlan,
} from "./cycle-count-plan";

// Values in ten-thousandths of the currency: 5,000.00 is 50_000_000n.
const money = (units: number) => BigInt(units) * 10_000n;

/*
 * Worked by hand. Six locations holding 10,000.00 in all:
 *   L1 5,000  running total before it    0 % → A (under 80 %)
 *   L2 3,000                            50 % → A
 *   L3 1,200                            80 % → B (not under 80 %, under 95 %)
 *   L4   500                            92 % → B
 *   L5   300                            97 % → C
 *   L6     0  nothing of value          → C
 * Today Thursday 2026-12-03, so this week ends 2026-12-09. Due days (checked with GNU
 * date, e.g. `date -d "2026-09-01 + 91 days"`):
 *   L1 A last 2026-11-05 + 30  = 2026-12-05 → due
 *   L2 A last 2026-11-20 + 30  = 2026-12-20 → not this week
 *   L3 B last 2026-09-01 + 91  = 2026-12-01 → due (overdue)
 *   L4 B never counted           → due, first
 *   L5 C last 2026-06-10 + 182 = 2026-12-09 → due on the last day of the week
 *   L6 C last 2026-11-01 + 182 = 2027-05-02 → not due
 *   L7 never counted but already in an open stocktake → left out
 * Plan: L4, L3, L1, L5.
 * The 80/95 % cut-offs and the 30/91/182-day intervals are common practice (no source).
 */
const locations: LocationToPlan[] = [
  {
    id: 1,
    code: "L1",
    value: money(5000),
    lastCountedOn: "2026-11-05",
    inOpenStocktake: false,
  },
  {
    id: 2,
    code: "L2",
    value: money(3000),
    lastCountedOn: "2026-11-20",
    inOpenStocktake: false,
  },
  {
    id: 3,
    code: "L3",
    value: money(1200),
    lastCountedOn: "2026-09-01",
    inOpenStocktake: false,
  },
  {
    id: 4,
    code: "L4",
    value: money(500),
    lastCountedOn: null,
    inOpenStocktake: false,
  },
  {
    id: 5,
    code: "L5",
    value: money(300),
    lastCountedOn: "2026-06-10",
    inOpenStocktake: false,
  },
  {
    id: 6,
    code: "L6",
    value: 0n,
    lastCountedOn: "2026-11-01",
    inOpenStocktake: false,
  },
  { id: 7, code: "L7", value: 0n, lastCountedOn: null, inOpenStocktake: true },
];

describe("countClasses", () => {
  it("classes locations by the running share of stock value (hand-worked above)", () => {
    const classes = countClasses(locations.slice(0, 6));
    expect([...classes.entries()].sort((a, b) => a[0] - b[0])).toEqual([
      [1, "A"],
      [2, "A"],
      [3, "B"],
      [4, "B"],
      [5, "C"],
      [6, "C"],
    ]);
  });

  it("puts everything in C when nothing has value", () => {
    const classes = countClasses([
      { id: 1, value: 0n },
      { id: 2, value: 0n },
    ]);
    expect([...classes.values()]).toEqual(["C", "C"]);
  });
});

describe("cycleCountPlan", () => {
  it("suggests the due locations, never counted first, then by due day", () => {
    const plan = cycleCountPlan(locations, "2026-12-03");
    expect(
      plan.map((location) => [
        location.code,
        location.countClass,
        location.dueOn,
      ]),
    ).toEqual([
      ["L4", "B", null],
      ["L3", "B", "2026-12-01"],
      ["L1", "A", "2026-12-05"],
      ["L5", "C", "2026-12-09"],
    ]);
  });

  it("keeps to the limit", () => {
    const plan = cycleCountPlan(locations, "2026-12-03", 2);
    expect(plan.map((location) => location.code)).toEqual(["L4", "L3"]);
  });

  it("puts the more valuable first between locations due the same day", () => {
    const plan = cycleCountPlan(
      [
        {
          id: 1,
          code: "SMALL",
          value: money(10),
          lastCountedOn: null,
          inOpenStocktake: false,
        },
        {
          id: 2,
          code: "BIG",
          value: money(900),
          lastCountedOn: null,
          inOpenStocktake: false,
        },
      ],
      "2026-12-03",
    );
    expect(plan.map((location) => location.code)).toEqual(["BIG", "SMALL"]);
  });

  it("refuses a limit below 1", () => {
    expect(() => cycleCountPlan(locations, "2026-12-03", 0)).toThrow(
      RangeError,
    );
  });
});
