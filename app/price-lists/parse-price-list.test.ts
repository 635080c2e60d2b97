import { describe, expect, it } from "vitest";
import {
  noDataRowsMessage,
  openPriceListCsv,
  parsePriceList,
  type CsvDataRow,
} from "./parse-price-list";

function parsed(text: string) {
  const result = parsePriceList(text);
  if (!result.ok) throw new Error(`expected a parsed file: ${result.message}`);
  return result;
}

describe("separator and header", () => {
  it("reads a comma-separated file with CRLF line ends", () => {
    const result = parsed(
      "SKU,Price,Currency\r\nA-1,12.50,EUR\r\nA-2,3,USD\r\n",
    );
    expect(result.layout).toEqual({
      delimiter: ",",
      decimalComma: false,
      headers: ["SKU", "Price", "Currency"],
      headerLine: 1,
    });
    expect(result.rows).toEqual([
      { line: 2, cells: ["A-1", "12.50", "EUR"] },
      { line: 3, cells: ["A-2", "3", "USD"] },
    ]);
    expect(result.errors).toEqual([]);
  });

  it("finds the semicolon even when values hold decimal commas, and allows them", () => {
    const result = parsed(
      "Art.-Nr.;Bezeichnung;Preis EUR/kg, netto\nCU-05;Kupferlackdraht 0,5 mm;12,5\n",
    );
    expect(result.layout.delimiter).toBe(";");
    expect(result.layout.decimalComma).toBe(true);
    expect(result.layout.headers).toEqual([
      "Art.-Nr.",
      "Bezeichnung",
      "Preis EUR/kg, netto",
    ]);
    expect(result.rows[0]!.cells).toEqual([
      "CU-05",
      "Kupferlackdraht 0,5 mm",
      "12,5",
    ]);
  });

  it("finds a tab separator", () => {
    const result = parsed(
      "SKU\tDescription, long\tPrice\nA-1\tWire, red\t1.5\n",
    );
    expect(result.layout.delimiter).toBe("\t");
    expect(result.layout.decimalComma).toBe(false);
    expect(result.rows).toEqual([
      { line: 2, cells: ["A-1", "Wire, red", "1.5"] },
    ]);
  });

  it('follows a "sep=;" first line and counts it as line 1', () => {
    const result = parsed("sep=;\nSKU;Price\nA-1;1,5\n");
    expect(result.layout.delimiter).toBe(";");
    expect(result.layout.headerLine).toBe(2);
    expect(result.rows).toEqual([{ line: 3, cells: ["A-1", "1,5"] }]);
  });

  it("counts lines as a person does: blank lines and quoted line breaks included", () => {
    const result = parsed(
      '\nSKU,Description,Price\n\nA-1,"two\nlines",1\r\n,,\nA-2,plain,2\n',
    );
    expect(result.layout.headerLine).toBe(2);
    expect(result.rows).toEqual([
      { line: 4, cells: ["A-1", "two\nlines", "1"] },
      { line: 7, cells: ["A-2", "plain", "2"] },
    ]);
  });

  it("trims cells and tolerates blank extra columns at the end of a row", () => {
    const result = parsed("SKU;Price\n A-1 ; 2 ;\n");
    expect(result.rows).toEqual([{ line: 2, cells: ["A-1", "2"] }]);
  });
});

describe("file-level problems", () => {
  it("refuses an empty text", () => {
    expect(parsePriceList("")).toEqual({
      ok: false,
      message: "The file is empty.",
    });
  });

  it("refuses a header row with no data rows", () => {
    expect(parsePriceList("SKU,Price,Currency\n")).toEqual({
      ok: false,
      message: noDataRowsMessage,
    });
    expect(parsePriceList("SKU,Price,Currency\n\n,,\n")).toEqual({
      ok: false,
      message: noDataRowsMessage,
    });
  });

  it("refuses a file with one column", () => {
    const result = parsePriceList("SKU|Price\nA-1|2\n");
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.message).toContain("only one column");
  });

  it("refuses a header row that names a column twice", () => {
    expect(parsePriceList("SKU,Price,Price\nA,1,2\n")).toEqual({
      ok: false,
      message:
        'The header row names the column "Price" twice. Each column needs its own name.',
    });
  });

  it("refuses a header row with an unclosed quotation mark", () => {
    const message =
      "The header row (line 1) has a quotation mark that is not closed properly.";
    expect(parsePriceList('SKU,"Price\nA,1\n')).toEqual({ ok: false, message });
    expect(parsePriceList('"SKU,Price\nA,1\n')).toEqual({ ok: false, message });
  });
});

describe("per-line problems", () => {
  it("reports rows with more or fewer columns than the header, and keeps the others", () => {
    const result = parsed(
      "SKU,Price,Currency\nA-1,1,EUR\nA-2,2\nA-3,3,EUR,extra\nA-4,4,EUR\n",
    );
    expect(result.rows.map((row) => row.line)).toEqual([2, 5]);
    expect(result.errors).toEqual([
      {
        line: 3,
        message: "Line 3: the row has 2 columns but the header has 3.",
      },
      {
        line: 4,
        message: "Line 4: the row has 4 columns but the header has 3.",
      },
    ]);
  });

  it("reports an unclosed quotation mark on the line it opens, and stops there", () => {
    const result = parsed(
      'SKU,Description,Price\nA-1,ok,1\nA-2,"never closed,2\nA-3,lost,3\n',
    );
    expect(result.rows.map((row) => row.line)).toEqual([2]);
    expect(result.errors).toEqual([
      {
        line: 3,
        message:
          "Line 3: a quotation mark opens a value that is never closed, so the file cannot be read from here on.",
      },
    ]);
  });

  it("reports text after a closing quotation mark", () => {
    const result = parsed('SKU,Description,Price\nA-1,"bad"x,1\n');
    expect(result.errors[0]!.line).toBe(2);
    expect(result.errors[0]!.message).toMatch(/^Line 2: a quoted value/);
  });
});

describe("large files", () => {
  it("reads 100,000 rows (about 8 MB), visiting each row once", () => {
    const lines = ["SKU,Description,Standard,Size,Price,Currency,Min qty"];
    for (let index = 0; index < 100_000; index += 1) {
      lines.push(
        `CU-${index},Enamelled copper wire grade 2 class 180,IEC,0.500,${(index % 900) + 10}.2500,EUR,${(index % 4) * 25 + 1}`,
      );
    }
    const text = lines.join("\n");
    expect(text.length).toBeGreaterThan(7_000_000);
    expect(text.length).toBeLessThan(10_000_000);

    const opened = openPriceListCsv(text);
    if (!opened.ok) throw new Error(opened.message);
    let count = 0;
    let last: CsvDataRow | undefined;
    const outcome = opened.forEachRow((row) => {
      count += 1;
      last = row;
    });
    expect(outcome).toEqual({
      ok: true,
      dataRowCount: 100_000,
      errors: [],
      errorCount: 0,
    });
    expect(count).toBe(100_000);
    expect(last?.line).toBe(100_001);
    expect(last?.cells[0]).toBe("CU-99999");
  }, 60_000);
});

describe("reading in batches", () => {
  // Every awkward case at once: a "sep=" line, blank lines before and between rows, a quoted
  // value over two lines, a row with too few columns, CR LF ends, no newline at the end.
  const samples = [
    'SKU,Price\nA-1,1\n\nA-2,2\n"A\n3",3\nA-4\nA-5,5\nA-6,6',
    "sep=;\r\n\r\nSKU;Price\r\nB-1;1,5\r\nB-2;2\r\n\r\nB-3;3\r\n",
    'SKU,Price\nC-1,1\n"C-2,2\nC-3,3\n',
  ];

  it.each(samples)(
    "hands over the same rows and errors as one pass, whatever the batch size (%#)",
    async (text) => {
      const whole = parsed(text);
      for (const batchRows of [1, 2, 3, 1_000]) {
        const opened = openPriceListCsv(text);
        if (!opened.ok) throw new Error(opened.message);
        const rows: CsvDataRow[] = [];
        const batchSizes: number[] = [];
        const outcome = await opened.forEachBatch(batchRows, async (batch) => {
          batchSizes.push(batch.length);
          rows.push(...batch);
        });
        if (!outcome.ok) throw new Error(outcome.message);
        expect(rows).toEqual(whole.rows);
        expect(outcome.errors).toEqual(whole.errors);
        expect(Math.max(...batchSizes)).toBeLessThanOrEqual(batchRows);
      }
    },
  );
});
