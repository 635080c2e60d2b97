import { describe, expect, it } from "vitest";
import { DomainError } from "~/lib/domain-error";
import {
  approvalBlocker,
  onHandAfterApproval,
  reviewTotals,
  varianceOf,
  weighedCount,
} from "./stocktake-figures";

// Quantities in thousandths (1.000 kg = 1000n), money in ten-thousandths (1.00 = 10_000n).
describe("weighedCount", () => {
  it("is gross − tare: worked check 6 of the engineering brief, 5.40 kg − 0.60 kg = 4.80 kg", () => {
    expect(weighedCount(5400n, 600n)).toBe(4800n);
  });
  it("is 0 for an empty spool", () => {
    expect(weighedCount(600n, 600n)).toBe(0n);
  });
  it("refuses a gross below the tare, naming the field", () => {
    expect(() => weighedCount(500n, 600n)).toThrow(DomainError);
    try {
      weighedCount(500n, 600n);
    } catch (error) {
      expect((error as DomainError).field).toBe("grossKg");
    }
  });
});

describe("varianceOf", () => {
  it("is counted − book at the count, valued at the average cost (hand-worked)", () => {
    // 144 found, book 147: −3 pieces × 2.50 = −7.50.
    expect(
      varianceOf({
        counted: 144_000n,
        bookAtCount: 147_000n,
        recountRequested: false,
        averageCost: 25_000n,
      }),
    ).toEqual({ quantity: -3_000n, value: -75_000n });
    // 10.700 kg found, book 10.845 kg: −0.145 kg × 12.00 = −1.74.
    expect(
      varianceOf({
        counted: 10_700n,
        bookAtCount: 10_845n,
        recountRequested: false,
        averageCost: 120_000n,
      }),
    ).toEqual({ quantity: -145n, value: -17_400n });
  });
  it("rounds the value to a ten-thousandth: 0.001 kg × 0.0001 per kg = 0.0000001 → 0.0000", () => {
    expect(
      varianceOf({
        counted: 1n,
        bookAtCount: 0n,
        recountRequested: false,
        averageCost: 1n,
      })!.value,
    ).toBe(0n);
  });
  it("is null until counted", () => {
    expect(
      varianceOf({
        counted: null,
        bookAtCount: null,
        recountRequested: true,
        averageCost: 1n,
      }),
    ).toBeNull();
  });
});

describe("reviewTotals", () => {
  it("adds gains and losses apart (hand-worked: −7.50 −1.74 +3.00 = −6.24)", () => {
    const totals = reviewTotals([
      {
        counted: 144_000n,
        bookAtCount: 147_000n,
        recountRequested: false,
        averageCost: 25_000n,
      },
      {
        counted: 10_700n,
        bookAtCount: 10_845n,
        recountRequested: false,
        averageCost: 120_000n,
      },
      {
        counted: 250n,
        bookAtCount: 0n,
        recountRequested: false,
        averageCost: 120_000n,
      },
      {
        counted: 5_000n,
        bookAtCount: 5_000n,
        recountRequested: false,
        averageCost: 120_000n,
      },
      {
        counted: null,
        bookAtCount: null,
        recountRequested: false,
        averageCost: 1n,
      },
      {
        counted: null,
        bookAtCount: null,
        recountRequested: true,
        averageCost: 1n,
      },
    ]);
    expect(totals).toEqual({
      lines: 6,
      counted: 4,
      toCount: 1,
      recounts: 1,
      differences: 3,
      gainValue: 30_000n,
      lossValue: -92_400n,
      netValue: -62_400n,
    });
  });
});

describe("approvalBlocker", () => {
  it("names what is missing", () => {
    expect(
      approvalBlocker([
        { counted: null, recountRequested: false },
        { counted: null, recountRequested: false },
        { counted: null, recountRequested: true },
      ]),
    ).toBe(
      "Not yet: 2 lines are not counted yet and 1 line waits for a recount.",
    );
  });
  it("is null when every line is counted", () => {
    expect(
      approvalBlocker([{ counted: 0n, recountRequested: false }]),
    ).toBeNull();
    expect(approvalBlocker([])).toBeNull();
  });
});

describe("onHandAfterApproval", () => {
  it("applies the variance to the balance now: 147 − 3 = 144; 12.845 − 0.145 = 12.700", () => {
    expect(onHandAfterApproval(147_000n, -3_000n)).toBe(144_000n);
    expect(onHandAfterApproval(12_845n, -145n)).toBe(12_700n);
  });
  it("is null when more left since the count than the count found", () => {
    expect(onHandAfterApproval(2_000n, -3_000n)).toBeNull();
  });
});
