import { describe, expect, it } from "vitest";
import { apportion, weightsFromShares } from "./apportion";
import { seededRandom } from "./design-lines.test-support";

describe("apportion (largest remainder)", () => {
  it("gives exact shares when they are whole (worked by hand: 10 by 1:2:3:4 → 1, 2, 3, 4)", () => {
    expect(apportion(10n, [1n, 2n, 3n, 4n])).toEqual([1n, 2n, 3n, 4n]);
  });

  it("hands the units left over to the largest remainders (worked by hand)", () => {
    // 3855 by 178744 : 107246 : 22388 (Σ 308378): exact shares 2234.459, 1340.671,
    // 279.870; floors add to 3853, so the 2 units left go to 279.870 and 1340.671.
    expect(apportion(3855n, [178744n, 107246n, 22388n])).toEqual([
      2234n,
      1341n,
      280n,
    ]);
  });

  it("breaks a tie towards the earlier part (100 by 1:1:1 → 34, 33, 33)", () => {
    expect(apportion(100n, [1n, 1n, 1n])).toEqual([34n, 33n, 33n]);
  });

  it("gives nothing to a zero weight, and zeros for a zero total", () => {
    expect(apportion(7n, [0n, 5n, 0n])).toEqual([0n, 7n, 0n]);
    expect(apportion(0n, [0n, 0n])).toEqual([0n, 0n]);
  });

  it("adds up exactly, never goes negative and stays within one unit of the exact share (seeded random)", () => {
    const random = seededRandom(6);
    for (let run = 0; run < 500; run += 1) {
      const total = BigInt(Math.floor(random() * 1e9));
      const count = 1 + Math.floor(random() * 5);
      const weights = Array.from({ length: count }, () =>
        BigInt(Math.floor(random() * 1e6)),
      );
      const weightSum = weights.reduce((sum, weight) => sum + weight, 0n);
      if (weightSum === 0n) continue;
      const parts = apportion(total, weights);
      expect(parts.reduce((sum, part) => sum + part, 0n)).toBe(total);
      parts.forEach((part, index) => {
        expect(part >= 0n).toBe(true);
        // |part − total·w/W| < 1  ⇔  |part·W − total·w| < W
        const gap = part * weightSum - total * weights[index]!;
        expect((gap < 0n ? -gap : gap) < weightSum).toBe(true);
      });
    }
  });

  it("refuses a negative total or weight, and a total over zero weights", () => {
    expect(() => apportion(-1n, [1n])).toThrow(RangeError);
    expect(() => apportion(1n, [1n, -1n])).toThrow(RangeError);
    expect(() => apportion(1n, [0n, 0n])).toThrow(RangeError);
  });
});

describe("weightsFromShares", () => {
  it("keeps the proportions of lengths (4.0 : 2.4 : 0.3 m → 2^50 : 0.6·2^50 : 0.075·2^50)", () => {
    const [active, endTurn, leads] = weightsFromShares([4.0, 2.4, 0.3]);
    expect(active).toBe(2n ** 50n);
    expect(Number(endTurn) / Number(active)).toBeCloseTo(0.6, 14);
    expect(Number(leads) / Number(active)).toBeCloseTo(0.075, 14);
  });

  it("gives zeros for all-zero shares and refuses negative ones", () => {
    expect(weightsFromShares([0, 0])).toEqual([0n, 0n]);
    expect(() => weightsFromShares([1, -0.1])).toThrow(RangeError);
  });
});
