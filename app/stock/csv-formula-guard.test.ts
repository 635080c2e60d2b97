import { describe, expect, it } from "vitest";
import { guardCell, neutraliseFormula } from "./csv-formula-guard";

describe("CSV formula guard", () => {
  it("puts an apostrophe before text that a spreadsheet would run", () => {
    // The starting characters named by OWASP's "CSV Injection" page (from memory): = + - @ tab CR.
    expect(neutraliseFormula('=HYPERLINK("x")')).toBe(`'=HYPERLINK("x")`);
    expect(neutraliseFormula("+1+2")).toBe("'+1+2");
    expect(neutraliseFormula("-2+3")).toBe("'-2+3");
    expect(neutraliseFormula("@SUM(A1:A2)")).toBe("'@SUM(A1:A2)");
    expect(neutraliseFormula("\t=1")).toBe("'\t=1");
    expect(neutraliseFormula("\r=1")).toBe("'\r=1");
  });

  it("leaves ordinary text alone, formula characters inside it too", () => {
    expect(neutraliseFormula("Enamelled copper 0.50 mm")).toBe(
      "Enamelled copper 0.50 mm",
    );
    expect(neutraliseFormula("N42SH block 20×10×5")).toBe(
      "N42SH block 20×10×5",
    );
    expect(neutraliseFormula("a=b")).toBe("a=b");
    expect(neutraliseFormula("")).toBe("");
  });

  it("guards text cells only: numbers stay numbers, negative ones included", () => {
    expect(guardCell(-4.8)).toBe(-4.8);
    expect(guardCell(0)).toBe(0);
    expect(guardCell(true)).toBe(true);
    expect(guardCell(null)).toBeNull();
    expect(guardCell("-4.8")).toBe("'-4.8");
  });
});
