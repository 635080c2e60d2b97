import { describe, expect, it } from "vitest";
import { estimatedTextWidth, widestText, wrapLabel } from "./chart-labels";

// These are layout estimates, not font metrics: the browser tests
// (tests/e2e/insight-charts.test.ts) check in Chromium that labels sized with them fit.
describe("estimatedTextWidth", () => {
  it("grows with the text and the font size", () => {
    const short = estimatedTextWidth("Hub motor", 11);
    expect(estimatedTextWidth("Hub motor · rev 12", 11)).toBeGreaterThan(short);
    expect(estimatedTextWidth("Hub motor", 22)).toBeCloseTo(short * 2, 9);
  });

  it("counts wide letters wider than narrow ones, and bold wider than regular", () => {
    expect(estimatedTextWidth("MMMM", 10)).toBeGreaterThan(
      estimatedTextWidth("iiii", 10),
    );
    expect(estimatedTextWidth("abc", 10, { bold: true })).toBeGreaterThan(
      estimatedTextWidth("abc", 10),
    );
  });

  it("is zero for no text, and widestText takes the widest", () => {
    expect(estimatedTextWidth("", 11)).toBe(0);
    expect(widestText([], 11)).toBe(0);
    expect(widestText(["ab", "abcd"], 10)).toBe(estimatedTextWidth("abcd", 10));
  });
});

describe("wrapLabel", () => {
  it("breaks at spaces and keeps every word", () => {
    expect(wrapLabel("Recent fan motor with a long name · rev 1", 20)).toEqual([
      "Recent fan motor",
      "with a long name ·",
      "rev 1",
    ]);
    expect(wrapLabel("Hub motor", 20)).toEqual(["Hub motor"]);
  });

  it("breaks a word longer than a line inside it", () => {
    expect(wrapLabel("Pump-ABCDEFGHIJ rev", 6)).toEqual([
      "Pump-A",
      "BCDEFG",
      "HIJ",
      "rev",
    ]);
  });
});
