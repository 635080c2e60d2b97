import { describe, expect, it } from "vitest";
import {
  chosenLabelSize,
  locationCodesFromText,
  lotIdsFromText,
} from "./label-sizes";

describe("chosenLabelSize", () => {
  it("takes the two sizes, the fallback when none is asked, null for others", () => {
    expect(chosenLabelSize("62x100", "a4")).toBe("62x100");
    expect(chosenLabelSize("A4", "62x100")).toBe("a4");
    expect(chosenLabelSize(null, "a4")).toBe("a4");
    expect(chosenLabelSize("", "62x100")).toBe("62x100");
    expect(chosenLabelSize("letter", "a4")).toBeNull();
  });
});

describe("lotIdsFromText", () => {
  it("reads ids once each, in order", () => {
    expect(lotIdsFromText("3, 1,3,2")).toEqual([3, 1, 2]);
  });
  it("refuses empty, non-numeric, zero, too large and too many", () => {
    expect(lotIdsFromText(null)).toBeNull();
    expect(lotIdsFromText(" , ")).toBeNull();
    expect(lotIdsFromText("1,x")).toBeNull();
    expect(lotIdsFromText("0")).toBeNull();
    expect(lotIdsFromText("2147483648")).toBeNull();
    expect(
      lotIdsFromText(Array.from({ length: 61 }, (_, i) => i + 1).join(",")),
    ).toBeNull();
  });
});

describe("locationCodesFromText", () => {
  it("reads codes once each and refuses empty or overlong ones", () => {
    expect(locationCodesFromText("MAIN, WIRE-A1,MAIN")).toEqual([
      "MAIN",
      "WIRE-A1",
    ]);
    expect(locationCodesFromText("")).toBeNull();
    expect(locationCodesFromText("A".repeat(21))).toBeNull();
  });
});
