import { describe, expect, it } from "vitest";
import { sameDrawingProps } from "./server-drawing";

describe("sameDrawingProps", () => {
  it("holds for props equal value by value, built again", () => {
    const rows = () => [{ key: "a", costPerNm: 39.22 }];
    expect(
      sameDrawingProps(
        { currency: "EUR", rows: rows() },
        { currency: "EUR", rows: rows() },
      ),
    ).toBe(true);
  });

  it("fails when a figure, a key or a function differs", () => {
    expect(
      sameDrawingProps(
        { rows: [{ costPerNm: 39.22 }] },
        { rows: [{ costPerNm: 11.75 }] },
      ),
    ).toBe(false);
    expect(sameDrawingProps({ index: 0 }, { index: 0, extra: 1 })).toBe(false);
    expect(sameDrawingProps({ format: () => "a" }, { format: () => "a" })).toBe(
      false,
    );
  });
});
