import { describe, expect, it } from "vitest";
import {
  cappedTotal,
  gramsToCount,
  mostGramsCounted,
  rarestGram,
  searchCountLimit,
  termGrams,
} from "./search-grams";

describe("termGrams", () => {
  it("cuts a term into its distinct three-character pieces, in order", () => {
    expect(termGrams("bench-10")).toEqual([
      "ben",
      "enc",
      "nch",
      "ch-",
      "h-1",
      "-10",
    ]);
    expect(termGrams("aaaa")).toEqual(["aaa"]);
    expect(termGrams("ab")).toEqual([]);
  });

  it("counts characters as MariaDB's SUBSTRING does (code points, not UTF-16 units)", () => {
    expect(termGrams("ø12")).toEqual(["ø12"]);
    // 🧲 is two UTF-16 units and one character.
    expect(termGrams("a🧲bc")).toEqual(["a🧲b", "🧲bc"]);
  });

  it("keeps %, _ and \\ as the characters they are", () => {
    expect(termGrams("0%_\\")).toEqual(["0%_", "%_\\"]);
  });
});

describe("gramsToCount", () => {
  it("keeps few grams, and spreads many over the term with its last one", () => {
    expect(gramsToCount(["a", "b"])).toEqual(["a", "b"]);
    const many = Array.from({ length: 30 }, (_, index) => `g${index}`);
    const chosen = gramsToCount(many);
    expect(chosen).toHaveLength(mostGramsCounted);
    expect(chosen[0]).toBe("g0");
    expect(chosen.at(-1)).toBe("g29");
    expect(new Set(chosen).size).toBe(mostGramsCounted);
  });
});

describe("rarestGram", () => {
  it("picks the gram with the fewest postings, the later one on a tie", () => {
    expect(
      rarestGram([
        { gram: "ben", postings: 2001 },
        { gram: "-10", postings: 120 },
        { gram: "h-1", postings: 900 },
      ]),
    ).toBe("-10");
    expect(
      rarestGram([
        { gram: "ben", postings: 2001 },
        { gram: "-10", postings: 2001 },
      ]),
    ).toBe("-10");
  });

  it("says nothing can match when a gram has no posting", () => {
    expect(
      rarestGram([
        { gram: "ben", postings: 5 },
        { gram: "zzq", postings: 0 },
      ]),
    ).toBeNull();
  });
});

describe("cappedTotal", () => {
  it("is exact while the count stops short of its limit", () => {
    expect(searchCountLimit(0)).toBe(1001);
    expect(cappedTotal(1000, 0)).toEqual({ total: 1000, totalExact: true });
    expect(cappedTotal(0, 50)).toEqual({ total: 0, totalExact: true });
  });

  it("is a lower bound once the count reaches its limit", () => {
    expect(cappedTotal(1001, 0)).toEqual({ total: 1000, totalExact: false });
    expect(cappedTotal(1051, 50)).toEqual({ total: 1050, totalExact: false });
  });
});
