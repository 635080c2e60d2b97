import { describe, expect, it } from "vitest";
import { parseQuantity } from "~/lib/decimal-amounts";
import { unitPriceLine } from "~/pricing/price-line.test-support";
import { buyingPlan, remainingNeed, type BuyingPlanInput } from "./buying-plan";

const q = parseQuantity;
const nbsp = "\u00a0";

const wire = {
  itemId: 1,
  sku: "W-050",
  name: "Copper 0.50 mm grade 2",
  unit: "kg",
  onHand: q("12"),
  reserved: q("3"),
  held: 0n,
  reorderPoint: q("5"),
  reorderQuantity: q("10"),
};
const magnet = {
  itemId: 2,
  sku: "M-ARC",
  name: "N42SH arc",
  unit: "pcs",
  onHand: q("40"),
  reserved: 0n,
  held: 0n,
  reorderPoint: 0n,
  reorderQuantity: 0n,
};

/**
 * A small worked example, done by hand below. Today is Thursday 3 December 2026: the
 * four weeks start on Mondays 30 Nov, 7 Dec, 14 Dec and 21 Dec.
 */
const example: BuyingPlanInput = {
  today: "2026-12-03",
  weeks: 4,
  companyCurrency: "EUR",
  bases: [],
  rates: [],
  items: [wire, magnet],
  needs: [
    // Wire: BO-15 has no planned start (needed this week), BO-12 starts Wed 16 Dec,
    // BO-20 starts after the horizon (left out).
    { itemId: 1, buildOrderId: 15, plannedStart: null, remaining: q("2") },
    {
      itemId: 1,
      buildOrderId: 12,
      plannedStart: "2026-12-16",
      remaining: q("7"),
    },
    {
      itemId: 1,
      buildOrderId: 20,
      plannedStart: "2027-02-01",
      remaining: q("50"),
    },
    // Magnets: BO-12 on Mon 7 Dec, BO-21 on Wed 23 Dec.
    {
      itemId: 2,
      buildOrderId: 12,
      plannedStart: "2026-12-07",
      remaining: q("130"),
    },
    {
      itemId: 2,
      buildOrderId: 21,
      plannedStart: "2026-12-23",
      remaining: q("25"),
    },
  ],
  arrivals: [
    // Overdue since 25 Nov: counts this week. Due 22 Dec: the last week.
    { itemId: 1, orderId: 7, expectedDate: "2026-11-25", open: q("1") },
    { itemId: 1, orderId: 8, expectedDate: "2026-12-22", open: q("20") },
  ],
  lines: [
    // Wire: Coilco sells 4 kg spools at 17.00 (16.00 from 25 kg), line lead time 10 days;
    // Wirehaus any quantity at 21.00, lead time 14 days.
    unitPriceLine("17.00", {
      itemId: "1",
      supplier: "Coilco",
      supplierSku: "CC-050",
      supplierId: 1,
      minQuantity: 0n,
      packQuantity: q("4"),
      leadTimeDays: 10,
    }),
    unitPriceLine("16.00", {
      itemId: "1",
      supplier: "Coilco",
      supplierSku: "CC-050",
      supplierId: 1,
      minQuantity: q("25"),
      packQuantity: q("4"),
      leadTimeDays: 10,
    }),
    unitPriceLine("21.00", {
      itemId: "1",
      supplier: "Wirehaus",
      supplierSku: "WH-050",
      supplierId: 2,
      minQuantity: 0n,
      leadTimeDays: 14,
    }),
    // Magnets: Magnetix in boxes of 10, 2.40 each, 2.10 from 100, lead time 21 days.
    unitPriceLine("2.40", {
      itemId: "2",
      supplier: "Magnetix",
      supplierSku: "MX-ARC",
      supplierId: 3,
      minQuantity: q("1"),
      packQuantity: q("10"),
      leadTimeDays: 21,
    }),
    unitPriceLine("2.10", {
      itemId: "2",
      supplier: "Magnetix",
      supplierSku: "MX-ARC",
      supplierId: 3,
      minQuantity: q("100"),
      packQuantity: q("10"),
      leadTimeDays: 21,
    }),
  ],
};

describe("remainingNeed", () => {
  it("is required − issued − reserved, never below zero", () => {
    expect(
      remainingNeed({ required: q("10"), issued: q("1"), reserved: q("3") }),
    ).toBe(q("6"));
    expect(
      remainingNeed({ required: q("10"), issued: q("8"), reserved: q("3") }),
    ).toBe(0n);
  });
});

describe("buyingPlan: a small worked example done by hand", () => {
  const plan = buyingPlan(example);
  const wirePlan = plan.items.find((item) => item.item.sku === "W-050")!;
  const magnetPlan = plan.items.find((item) => item.item.sku === "M-ARC")!;

  it("starts the weeks on Monday of this week", () => {
    expect(plan.weeks).toEqual([
      "2026-11-30",
      "2026-12-07",
      "2026-12-14",
      "2026-12-21",
    ]);
  });

  /*
   * Wire, by hand: free now 12 − 3 = 9 kg.
   *   week of 30 Nov: 9 + 1 (overdue PO-7) − 2 (BO-15) = 8 ≥ 5, nothing.
   *   week of  7 Dec: 8.
   *   week of 14 Dec: 8 − 7 (BO-12) = 1 < 5: short 4 kg; at least the reorder quantity 10 kg.
   *     Coilco: 10 kg in 4 kg spools → 12 kg × 17.00 = 204.00; its 25 kg break → 28 kg ×
   *     16.00 = 448.00 (dearer). Wirehaus: 10 kg × 21.00 = 210.00. Coilco's 204.00 wins.
   *     Need by Mon 14 Dec, order by 14 Dec − 10 days = 4 Dec. Then 1 + 12 = 13.
   *   week of 21 Dec: 13 + 20 (PO-8) = 33. BO-20 (Feb) is beyond the horizon.
   */
  it("nets the wire week by week", () => {
    expect(wirePlan.weeks.map((week) => week.projected)).toEqual([
      q("8"),
      q("8"),
      q("1"),
      q("33"),
    ]);
    expect(wirePlan.weeks.map((week) => week.projectedWithSuggestion)).toEqual([
      q("8"),
      q("8"),
      q("13"),
      q("33"),
    ]);
    expect(wirePlan.weeks.map((week) => week.arriving)).toEqual([
      q("1"),
      0n,
      0n,
      q("20"),
    ]);
  });

  it("suggests 12 kg from Coilco for the week of 14 Dec", () => {
    const [suggestion, ...others] = plan.suggestions.filter(
      (entry) => entry.item.sku === "W-050",
    );
    expect(others).toEqual([]);
    expect(suggestion!.shortfall).toBe(q("4"));
    expect(suggestion!.quantity).toBe(q("12"));
    expect(suggestion!.order!.candidate.supplier).toBe("Coilco");
    expect(suggestion!.order!.candidate.line.supplierId).toBe(1);
    expect(suggestion!.order!.candidate.quotedUnitPrice).toBe(170_000n);
    expect(suggestion!.order!.candidate.totalForQuantity).toBe(2_040_000n);
    expect(suggestion!.needBy).toBe("2026-12-14");
    expect(suggestion!.orderBy).toBe("2026-12-04");
    expect(suggestion!.late).toBe(false);
    expect(suggestion!.reason).toBe(
      `BO-12 needs 7.000${nbsp}kg in week of 14 Dec 2026; projected 4.000${nbsp}kg below reorder point 5.000${nbsp}kg`,
    );
  });

  /*
   * Magnets, by hand (no reorder point: keep at or above zero): 40 pieces free.
   *   week of 30 Nov: 40.
   *   week of  7 Dec: 40 − 130 (BO-12) = −90: short 90. Boxes of 10: 90 × 2.40 = 216.00;
   *     the 100 break: 100 × 2.10 = 210.00, cheaper: 100 pieces. Need by 7 Dec, order by
   *     7 Dec − 21 days = 16 Nov, already past: late. Then −90 + 100 = 10.
   *   week of 14 Dec: 10.
   *   week of 21 Dec: 10 − 25 (BO-21) = −15: short 15 → 2 boxes, 20 × 2.40 = 48.00 (the
   *     100 break costs 210.00). Need by 21 Dec, order by 30 Nov: late. Then 5.
   */
  it("nets the magnets and makes one suggestion per shortfall", () => {
    expect(magnetPlan.weeks.map((week) => week.projected)).toEqual([
      q("40"),
      q("-90"),
      q("10"),
      q("-15"),
    ]);
    expect(
      magnetPlan.weeks.map((week) => week.projectedWithSuggestion),
    ).toEqual([q("40"), q("10"), q("10"), q("5")]);
    const suggestions = plan.suggestions.filter(
      (entry) => entry.item.sku === "M-ARC",
    );
    expect(
      suggestions.map((entry) => [
        entry.needBy,
        entry.orderBy,
        entry.late,
        entry.quantity,
        entry.order?.candidate.totalForQuantity,
      ]),
    ).toEqual([
      ["2026-12-07", "2026-11-16", true, q("100"), 2_100_000n],
      ["2026-12-21", "2026-11-30", true, q("20"), 480_000n],
    ]);
    expect(suggestions[0]!.reason).toBe(
      `BO-12 needs 130${nbsp}pieces in week of 7 Dec 2026; projected 90${nbsp}pieces short (no reorder point)`,
    );
  });

  it("lists the suggestions by order-by day", () => {
    expect(
      plan.suggestions.map((entry) => [entry.item.sku, entry.orderBy]),
    ).toEqual([
      ["M-ARC", "2026-11-16"],
      ["M-ARC", "2026-11-30"],
      ["W-050", "2026-12-04"],
    ]);
  });

  it("suggests the bare quantity without a supplier when nobody prices the item", () => {
    const unpriced = buyingPlan({ ...example, lines: [] });
    const first = unpriced.suggestions.find((s) => s.item.sku === "W-050")!;
    expect(first.order).toBeNull();
    expect(first.quantity).toBe(q("10"));
    expect(first.orderBy).toBe("2026-12-14");
  });

  it("does not count the stock of a lot on hold (decision 039)", () => {
    // 9 kg on hand of which 5 kg on a held spool: 9 − 0 − 5 = 4 kg usable, 1 kg below
    // the reorder point of 5 kg (worked by hand), the same as 4 kg on hand and no hold.
    const held = buyingPlan({
      ...example,
      items: [{ ...wire, onHand: q("9"), reserved: 0n, held: q("5") }],
      needs: [],
      arrivals: [],
    });
    expect(held.suggestions[0]!.reason).toBe(
      `Already low in week of 30 Nov 2026; projected 1.000${nbsp}kg below reorder point 5.000${nbsp}kg`,
    );
  });

  it("says when stock is already low without any build order", () => {
    const low = buyingPlan({
      ...example,
      items: [{ ...wire, onHand: q("4"), reserved: 0n }],
      needs: [],
      arrivals: [],
    });
    expect(low.suggestions).toHaveLength(1);
    expect(low.suggestions[0]!.reason).toBe(
      `Already low in week of 30 Nov 2026; projected 1.000${nbsp}kg below reorder point 5.000${nbsp}kg`,
    );
  });
});
