import { describe, expect, it } from "vitest";
import { numberText, workbookCellText } from "./workbook-cells";

const text = (value: Parameters<typeof workbookCellText>[0]) => {
  const reading = workbookCellText(value);
  return reading.ok ? reading.text : reading.problem;
};

describe("numberText", () => {
  it("writes a number as typed, at the 15 significant digits a spreadsheet shows", () => {
    expect(numberText(12.345)).toBe("12.345");
    // The nearest double to 12.345 is 12.3449999999999997513…; a file may store it with 17 digits.
    expect(numberText(12.344999999999999)).toBe("12.345");
    expect(numberText(0.1 + 0.2)).toBe("0.3");
    expect(numberText(1200)).toBe("1200");
    expect(numberText(25)).toBe("25");
    expect(numberText(-3.5)).toBe("-3.5");
    expect(numberText(-0)).toBe("0");
  });

  it("never writes an exponent", () => {
    expect(numberText(1e-7)).toBe("0.0000001");
    expect(numberText(0.000123)).toBe("0.000123");
    expect(numberText(1.5e21)).toBe("1500000000000000000000");
    expect(numberText(123456789012345)).toBe("123456789012345");
  });

  it("keeps NaN and infinities as words, for the row to refuse", () => {
    expect(numberText(Number.NaN)).toBe("NaN");
    expect(numberText(Number.POSITIVE_INFINITY)).toBe("Infinity");
  });
});

describe("workbookCellText", () => {
  it("reads numbers, text and empty cells", () => {
    expect(text(12.345)).toBe("12.345");
    expect(text(10045)).toBe("10045");
    expect(text("AWG 20 heavy")).toBe("AWG 20 heavy");
    expect(text(" padded ")).toBe(" padded ");
    expect(text(null)).toBe("");
    expect(text(undefined)).toBe("");
  });

  it("reads a date cell as the calendar day typed, whatever the server's time zone", () => {
    // exceljs gives a date cell as that day's midnight UTC (serial 45717 = 2025-03-01).
    expect(text(new Date(Date.UTC(2025, 2, 1)))).toBe("2025-03-01");
    // A date with a time of day keeps its day: 23:30 stays on the 31st.
    expect(text(new Date(Date.UTC(2025, 11, 31, 23, 30)))).toBe("2025-12-31");
    expect(text(new Date(Number.NaN))).toBe("#DATE");
  });

  it("reads a formula cell by its saved result, and says when it has none", () => {
    expect(text({ formula: "B2*1.1", result: 13.5795 })).toBe("13.5795");
    expect(text({ formula: "A2", result: "N42SH" })).toBe("N42SH");
    expect(
      text({
        formula: "DATE(2025,3,1)",
        result: new Date(Date.UTC(2025, 2, 1)),
      }),
    ).toBe("2025-03-01");
    expect(text({ sharedFormula: "C2", result: 0.5 })).toBe("0.5");
    expect(text({ formula: "1/0", result: { error: "#DIV/0!" } })).toBe(
      "#DIV/0!",
    );
    expect(text({ formula: "B2*2" })).toBe("formula-without-result");
  });

  it("reads rich text, links, booleans and errors as the sheet shows them", () => {
    expect(text({ richText: [{ text: "N42" }, { text: "SH" }] })).toBe("N42SH");
    expect(
      text({ text: "Datasheet", hyperlink: "https://example.com/n42sh" }),
    ).toBe("Datasheet");
    expect(text(true)).toBe("TRUE");
    expect(text(false)).toBe("FALSE");
    expect(text({ error: "#N/A" })).toBe("#N/A");
  });
});
