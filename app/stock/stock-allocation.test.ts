import { describe, expect, it } from "vitest";
import { allocateOldestFirst, compareOldestFirst } from "./stock-allocation";

const balance = (
  lotId: number,
  locationId: number,
  receivedOn: string | null,
  free: bigint,
) => ({ lotId, locationId, receivedOn, free });

describe("oldest lot first", () => {
  it("takes the earliest receipt first, then the next", () => {
    const result = allocateOldestFirst(
      [
        balance(9, 1, "2026-03-01", 5_000n),
        balance(4, 2, "2026-01-15", 2_000n),
        balance(6, 1, "2026-02-10", 4_000n),
      ],
      7_500n,
    );
    expect(result).toEqual({
      allocations: [
        { lotId: 4, locationId: 2, quantity: 2_000n },
        { lotId: 6, locationId: 1, quantity: 4_000n },
        { lotId: 9, locationId: 1, quantity: 1_500n },
      ],
      allocated: 7_500n,
      short: 0n,
    });
  });

  it("puts stock without a lot date last and breaks ties by lot, then location", () => {
    const sorted = [
      balance(0, 3, null, 1n),
      balance(5, 2, "2026-01-01", 1n),
      balance(5, 1, "2026-01-01", 1n),
      balance(2, 9, "2026-01-01", 1n),
    ].sort(compareOldestFirst);
    expect(sorted.map((row) => [row.lotId, row.locationId])).toEqual([
      [2, 9],
      [5, 1],
      [5, 2],
      [0, 3],
    ]);
  });

  it("skips balances with nothing free and says what is short", () => {
    const result = allocateOldestFirst(
      [balance(1, 1, "2026-01-01", 0n), balance(2, 1, "2026-02-01", 3_000n)],
      5_000n,
    );
    expect(result.allocations).toEqual([
      { lotId: 2, locationId: 1, quantity: 3_000n },
    ]);
    expect(result.allocated).toBe(3_000n);
    expect(result.short).toBe(2_000n);
  });

  it("allocates nothing for nothing wanted", () => {
    expect(
      allocateOldestFirst([balance(1, 1, "2026-01-01", 3_000n)], 0n),
    ).toEqual({ allocations: [], allocated: 0n, short: 0n });
  });
});
