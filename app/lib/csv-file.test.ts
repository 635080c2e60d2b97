import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { csvFile, type CsvCell } from "./csv-file";

/** The cell of a one-row file holding `cell`, as a spreadsheet program reads it. */
function written(cell: CsvCell): string {
  const text = csvFile(["cell", "next"], [[cell, "x"]]);
  const rows = Papa.parse<string[]>(text.replace(/^\uFEFF/, ""), {
    skipEmptyLines: true,
  }).data;
  return rows[1]![0]!;
}

describe("CSV files", () => {
  it("puts an apostrophe before text that a spreadsheet would run", () => {
    // The starting characters named by OWASP's "CSV Injection" page (from memory): = + - @ tab CR.
    expect(written('=HYPERLINK("x")')).toBe(`'=HYPERLINK("x")`);
    expect(written("+1+2")).toBe("'+1+2");
    expect(written("-2+3")).toBe("'-2+3");
    expect(written("@SUM(A1:A2)")).toBe("'@SUM(A1:A2)");
    expect(written("\t=1")).toBe("'\t=1");
    expect(written("\r=1")).toBe("'\r=1");
  });

  it("escapes formula text that runs over several lines (papaparse's default lets it through)", () => {
    expect(written("=1+2\nx")).toBe("'=1+2\nx");
  });

  it("leaves ordinary text alone, formula characters inside it too", () => {
    expect(written("Enamelled copper 0.50 mm")).toBe(
      "Enamelled copper 0.50 mm",
    );
    expect(written("N42SH block 20×10×5")).toBe("N42SH block 20×10×5");
    expect(written("a=b")).toBe("a=b");
    expect(written("a, b")).toBe("a, b");
    expect(written("")).toBe("");
  });

  it("escapes text cells only: numbers stay numbers, negative ones included", () => {
    expect(written(-4.8)).toBe("-4.8");
    expect(written(0)).toBe("0");
    expect(written(true)).toBe("true");
    expect(written(null)).toBe("");
    expect(written("-4.8")).toBe("'-4.8");
  });

  it("starts with a byte-order mark and ends every line with CRLF", () => {
    const text = csvFile(["a", "b"], [["x", 1]]);
    expect(text).toBe("\uFEFFa,b\r\nx,1\r\n");
  });
});
