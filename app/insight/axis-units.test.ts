import { describe, expect, it } from "vitest";
import { axisUnits } from "./axis-units";

describe("axisUnits", () => {
  it("writes ticks in units, thousands or millions", () => {
    // 317,725,511 EUR on a 350,000,000 axis: ticks 0 … 350 in millions.
    expect(axisUnits(317_725_511)).toEqual({
      divisor: 1_000_000,
      prefix: "million ",
      decimals: 0,
    });
    // 17,414 EUR: ticks 0 … 20 in thousands.
    expect(axisUnits(17_414)).toMatchObject({ divisor: 1_000, decimals: 0 });
    expect(axisUnits(86.28)).toEqual({ divisor: 1, prefix: "", decimals: 0 });
    expect(axisUnits(5.87)).toMatchObject({ divisor: 1, decimals: 2 });
  });
});
