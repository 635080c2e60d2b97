import { describe, expect, it } from "vitest";
import { suggestMapping, type ColumnMapping } from "./column-mapping";
import {
  readPriceListFile,
  readPriceListInBatches,
  readPriceListText,
} from "./read-price-list";

const knownGrades = new Set(["n42sh", "n52"]);
const importDay = "2025-06-02";

function mappingFor(text: string): ColumnMapping {
  const header = text.split(/\r?\n/).find((line) => !line.startsWith("sep="));
  return suggestMapping(header!.split(/[;,\t]/));
}

describe("reading a whole price list", () => {
  it("reads a semicolon file with decimal commas, and reports bad lines in file order", () => {
    const text = [
      "Art.-Nr.;Bezeichnung;Norm;Durchmesser;Isolierung;Sorte;Preis;Währung;Mindestmenge;Gültig ab",
      "CU-050;Kupferlackdraht;IEC;0,50;Grad 2;;14,25;EUR;25;01.07.2025",
      "CU-050;Kupferlackdraht;IEC;0,50;Grad 2;;13,90;EUR;100;01.07.2025",
      "M-42;Quader 20×10×5;;;;N42SH;1,85;EUR;;",
      "M-42;Quader 20×10×5;;;;N42SH;1,85;EUR;;",
      "CU-999;Draht;AWG;50;;;-3;EUR;;",
      "M-43;Quader;;;;N99;2;EUR;zehn;",
    ].join("\r\n");
    const mapping = mappingFor(text);
    expect(mapping.map((entry) => entry.field)).toEqual([
      "supplierSku",
      "description",
      "standard",
      "size",
      "insulation",
      "grade",
      "price",
      "currency",
      "minQuantity",
      "validFrom",
    ]);

    const result = readPriceListText(text, { mapping, importDay, knownGrades });
    if (!result.ok) throw new Error(result.messages.join(" "));
    expect(
      result.rows.map((row) => [row.line, row.supplierSku, row.price]),
    ).toEqual([
      [2, "CU-050", "14.2500"],
      [3, "CU-050", "13.9000"],
      [4, "M-42", "1.8500"],
    ]);
    expect(result.rows[0]).toMatchObject({
      kind: "wire",
      size: "0.500",
      insulation: "grade2",
      minQuantity: "25.000",
      validFrom: "2025-07-01",
    });
    expect(result.errors).toEqual([
      {
        line: 6,
        message:
          'Line 6: the price "-3" (column "Preis") is negative; the AWG size "50" (column "Durchmesser") is not an AWG size from 4/0 to 46.',
      },
      {
        line: 7,
        message:
          'Line 7: the minimum quantity "zehn" (column "Mindestmenge") is not a number; the magnet grade "N99" (column "Sorte") is not a grade we know; check the spelling, or have an admin add the grade first.',
      },
    ]);
  });

  it("gives file-level messages for a bad mapping", () => {
    const text = "SKU,Description,Currency\nA-1,Sleeve,EUR\n";
    const result = readPriceListText(text, {
      mapping: mappingFor(text),
      importDay,
      knownGrades,
    });
    expect(result).toEqual({
      ok: false,
      messages: [
        "The mapping misses the price column (or, for wire priced on the metal base, the adder per kg column).",
      ],
    });
  });

  it("gives file-level messages for bad files", () => {
    const options = { mapping: [], importDay, knownGrades };
    expect(readPriceListFile(new Uint8Array(0), options)).toEqual({
      ok: false,
      messages: ["The file is empty."],
    });
    expect(
      readPriceListFile(new TextEncoder().encode("SKU;Price\n"), options),
    ).toEqual({
      ok: false,
      messages: ["The file has a header row but no price rows below it."],
    });
    expect(
      readPriceListFile(new Uint8Array([0x00, 0x01, 0x02, 0x41]), options),
    ).toEqual({ ok: false, messages: ["This file is not a text CSV."] });
  });

  it("reads a Windows-1252 tab-separated file from bytes", () => {
    // "SKU\tDescription\tPrice\tCurrency\nW-1\tØ 0.5 µm coat\t9.5\tEUR\n"
    const bytes = new Uint8Array([
      ...new TextEncoder().encode("SKU\tDescription\tPrice\tCurrency\nW-1\t"),
      0xd8,
      ...new TextEncoder().encode(" 0.5 "),
      0xb5,
      ...new TextEncoder().encode("m coat\t9.5\tEUR\n"),
    ]);
    const result = readPriceListFile(bytes, {
      mapping: suggestMapping(["SKU", "Description", "Price", "Currency"]),
      importDay,
      knownGrades,
    });
    expect(result).toMatchObject({
      ok: true,
      rows: [{ description: "Ø 0.5 µm coat", price: "9.5000", kind: "part" }],
      errors: [],
    });
  });

  it("imports the same rows again unchanged: exact repeats collapse", () => {
    const rows = "M-1,N52,2.00,EUR\nM-2,N42SH,2.50,EUR\n";
    const text = `SKU,Grade,Price,Currency\n${rows}${rows}`;
    const result = readPriceListText(text, {
      mapping: mappingFor(text),
      importDay,
      knownGrades,
    });
    expect(result).toMatchObject({ ok: true, errors: [] });
    if (result.ok) expect(result.rows.map((row) => row.line)).toEqual([2, 3]);
  });

  it("reads 100,000 rows (about 8 MB) into typed rows", () => {
    const lines = [
      "SKU,Description,Standard,Size,Insulation,Price,Currency,Min qty",
    ];
    for (let index = 0; index < 100_000; index += 1) {
      lines.push(
        `CU-${index},Enamelled copper wire class 180,IEC,0.500,grade 2,${(index % 900) + 10}.25,EUR,${(index % 4) * 25 + 1}`,
      );
    }
    const text = lines.join("\n");
    expect(text.length).toBeGreaterThan(7_000_000);
    const result = readPriceListText(text, {
      mapping: mappingFor(text),
      importDay,
      knownGrades,
    });
    if (!result.ok) throw new Error(result.messages.join(" "));
    expect(result.errors).toEqual([]);
    expect(result.rows).toHaveLength(100_000);
    expect(result.rows.at(-1)).toMatchObject({
      line: 100_001,
      supplierSku: "CU-99999",
      size: "0.500",
      insulation: "grade2",
      price: "109.2500",
      minQuantity: "76.000",
    });
  }, 60_000);
});

describe("reading a price list in batches", () => {
  it("hands over the same good rows and errors as a whole reading, a batch at a time", async () => {
    const text = [
      "SKU;Description;Standard;Size;Price;Currency;Min qty",
      "CU-050;Wire;IEC;0,50;14,25;EUR;25",
      "CU-050;Wire;IEC;0,50;13,90;EUR;100",
      "CU-050;Wire;IEC;0,50;13,90;EUR;100",
      "CU-050;Wire;IEC;0,50;13,80;EUR;100",
      "CU-051;Wire;IEC;0,56;-1;EUR;1",
      "CU-052;Wire;IEC;0,63;12;EUR;1",
    ].join("\n");
    const mapping = mappingFor(text);
    const whole = readPriceListText(text, { mapping, importDay, knownGrades });
    if (!whole.ok) throw new Error(whole.messages.join(" "));

    const batches: number[][] = [];
    const batched = await readPriceListInBatches(
      new TextEncoder().encode(text),
      { mapping, importDay, knownGrades },
      2,
      async (rows) => {
        batches.push(rows.map((row) => row.line));
      },
    );
    if (!batched.ok) throw new Error(batched.messages.join(" "));
    // Two file rows a batch, the header included: [1, 2], [3, 4], [5, 6], [7]. Line 4 repeats
    // line 3 exactly (kept once); line 5 gives line 3's break another price and line 6 a
    // negative price (errors, so that batch hands over nothing); line 7 is good.
    expect(batches).toEqual([[2], [3], [7]]);
    expect(batched.goodRows).toBe(whole.rows.length);
    expect(batched.errors).toEqual(whole.errors);
    expect(batched.errors.map((error) => error.line)).toEqual([5, 6]);
  });
});

describe("a file of bad lines", () => {
  /** A header of four columns, then `count` lines of one column each (every one an error). */
  function oneColumnLines(count: number): string {
    const lines = ["SKU,Grade,Price,Currency"];
    for (let index = 0; index < count; index += 1) lines.push(`bad-${index}`);
    return lines.join("\n");
  }

  it("keeps the first 1,000 lines with errors and counts the rest", () => {
    const text = oneColumnLines(250_000);
    const result = readPriceListText(text, {
      mapping: mappingFor(text),
      importDay,
      knownGrades,
    });
    if (!result.ok) throw new Error(result.messages.join(" "));
    expect(result.errors).toHaveLength(1_000);
    expect(result.errors[0]!.line).toBe(2);
    expect(result.errors.at(-1)!.line).toBe(1_001);
    expect(result.errorCount).toBe(250_000);
    expect(result.rows).toEqual([]);
  }, 60_000);

  it("keeps the first 1,000 across broken rows and bad values, in file order", async () => {
    // Odd lines have one column (the CSV reader's error), even lines a bad price (the row reader's).
    const lines = ["SKU,Grade,Price,Currency"];
    for (let index = 0; index < 5_000; index += 1)
      lines.push(index % 2 === 0 ? `bad-${index}` : `M-${index},N52,-1,EUR`);
    const text = lines.join("\n");
    const options = { mapping: mappingFor(text), importDay, knownGrades };

    const whole = readPriceListText(text, options);
    if (!whole.ok) throw new Error(whole.messages.join(" "));
    expect(whole.errorCount).toBe(5_000);
    expect(whole.errors.map((error) => error.line)).toEqual(
      Array.from({ length: 1_000 }, (_, index) => index + 2),
    );

    const errorsSoFar: number[] = [];
    const batched = await readPriceListInBatches(
      new TextEncoder().encode(text),
      options,
      700,
      async (_rows, lineErrorsSoFar) => {
        errorsSoFar.push(lineErrorsSoFar);
      },
    );
    if (!batched.ok) throw new Error(batched.messages.join(" "));
    expect(batched.errorCount).toBe(5_000);
    expect(batched.errors).toEqual(whole.errors);
  });
});
