import { describe, expect, it } from "vitest";
import { countCsvDataRows } from "./count-csv-rows";
import { openPriceListCsv } from "./parse-price-list";

/** The count before reading, and the count a full reading ends with: they must agree. */
function counts(text: string): { counted: number; read: number } {
  const opened = openPriceListCsv(text);
  if (!opened.ok) throw new Error(`expected an opened file: ${opened.message}`);
  const outcome = opened.forEachRow(() => undefined);
  if (!outcome.ok) throw new Error(`expected rows: ${outcome.message}`);
  return { counted: opened.countDataRows(), read: outcome.dataRowCount };
}

describe("counting a CSV's data rows before reading them", () => {
  it.each([
    ["plain rows", "SKU,Price\nA,1\nB,2\nC,3\n", 3],
    ["no line end at the end", "SKU,Price\nA,1\nB,2", 2],
    ["CRLF line ends", "SKU,Price\r\nA,1\r\nB,2\r\n", 2],
    [
      "blank lines before the header and between rows",
      "\n\nSKU,Price\nA,1\n\n  \n,\nB,2\n",
      2,
    ],
    ['a "sep=" first line', "sep=;\nSKU;Price\nA;1,5\nB;2\n", 2],
    [
      "a quoted value across lines",
      'SKU,Note,Price\nA,"two\nlines",1\nB,"three\n\nlines",2\n',
      2,
    ],
    [
      "escaped quotation marks",
      'SKU,Note,Price\nA,"5"" spool, ""heavy""",1\nB,x,2\n',
      2,
    ],
    [
      "an inch mark inside an unquoted value",
      'SKU,Note,Price\nA,0.5" wire,1\nB,x,2\n',
      2,
    ],
    ["a row of quoted empty values", 'SKU,Price\nA,1\n"",""\nB,2\n', 2],
    [
      "rows with too few or too many columns",
      "SKU,Price,Currency\nA,1\nB,2,EUR,x\nC,3,EUR\n",
      3,
    ],
    // The value goes on to the next closing mark: here, none, so the rest is one row.
    [
      "text after a closing quotation mark",
      'SKU,Note,Price\nA,"x"y,1\nB,z,2\n',
      1,
    ],
    [
      "text after a closing quotation mark, closed further on",
      'SKU,Note,Price\nA,"x"y,1\nB,"z",2\nC,w,3\n',
      2,
    ],
    [
      "spaces after a closing quotation mark",
      'SKU,Note,Price\nA,"x"  ,1\nB,z,2\n',
      2,
    ],
    [
      "a quotation mark never closed",
      'SKU,Note,Price\nA,x,1\nB,"open,2\nC,y,3\n',
      2,
    ],
    ["tab-separated", "SKU\tPrice\nA\t1\nB\t2\n", 2],
  ])("%s", (_name, text, expected) => {
    expect(counts(text)).toEqual({ counted: expected, read: expected });
  });

  it("agrees with the reader on generated files with quotes, blanks and line breaks", () => {
    // A fixed pseudo-random sequence, so a failure can be run again.
    let seed = 7;
    const next = (below: number) => {
      seed = (seed * 1_103_515_245 + 12_345) % 2_147_483_648;
      return seed % below;
    };
    const values = [
      "A-1",
      "",
      " ",
      '"quoted"',
      '"two\nlines"',
      '"a ""b"""',
      '5" x',
      "x y",
    ];
    for (let file = 0; file < 200; file += 1) {
      const lines = ["SKU,Note,Price"];
      const rowCount = 1 + next(30);
      for (let row = 0; row < rowCount; row += 1) {
        if (next(8) === 0) lines.push("");
        lines.push(
          [
            values[next(values.length)],
            values[next(values.length)],
            "1.5",
          ].join(","),
        );
      }
      const { counted, read } = counts(
        lines.join(next(2) === 0 ? "\n" : "\r\n"),
      );
      expect(counted, lines.join("⏎")).toBe(read);
    }
  });

  it("counts 100,000 rows quickly", () => {
    const lines = ["SKU,Description,Price"];
    for (let index = 0; index < 100_000; index += 1)
      lines.push(`BX-${index},"Bench part ${index}, longer description",1.25`);
    const text = `${lines.join("\n")}\n`;
    const started = performance.now();
    expect(countCsvDataRows(text, ",", 1)).toBe(100_000);
    // A few milliseconds on any machine; the bound only catches a pass that is not one pass.
    expect(performance.now() - started).toBeLessThan(1_000);
  });
});
