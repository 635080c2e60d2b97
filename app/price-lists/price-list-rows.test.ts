import { describe, expect, it } from "vitest";
import type { FieldColumns, PriceListField } from "./column-mapping";
import {
  PriceListRowCollector,
  readPriceListRow,
  type PriceListRowContext,
  type PriceListRowReading,
} from "./price-list-rows";

/** The columns of the test file, in this order. */
const testFields: readonly PriceListField[] = [
  "supplierSku",
  "description",
  "kind",
  "standard",
  "size",
  "grade",
  "insulation",
  "thermalClass",
  "unit",
  "price",
  "adderPerKg",
  "currency",
  "minQuantity",
  "validFrom",
  "leadTimeDays",
  "packQuantity",
];
const allColumns: FieldColumns = Object.fromEntries(
  testFields.map((field, index) => [field, index]),
);

const context: PriceListRowContext = {
  columns: allColumns,
  headers: testFields,
  decimalComma: false,
  importDay: "2025-06-02",
  knownGrades: new Set(["n42sh", "n52", "y30", "c5 (y30)"]),
};

/** A data row from the fields given; the rest are blank cells. */
function dataRow(
  line: number,
  values: Partial<Record<PriceListField, string>>,
) {
  return { line, cells: testFields.map((field) => values[field] ?? "") };
}

function read(
  values: Partial<Record<PriceListField, string>>,
  overrides: Partial<PriceListRowContext> = {},
): PriceListRowReading {
  return readPriceListRow(dataRow(14, values), { ...context, ...overrides });
}

function messageOf(reading: PriceListRowReading): string {
  if (reading.ok) throw new Error("expected an error");
  return reading.error.message;
}

const awgWire = {
  supplierSku: "CU-20H",
  standard: "AWG",
  size: "20",
  price: "14.20",
  currency: "USD",
};
const magnet = {
  supplierSku: "BLK-20-10-5",
  grade: "N42SH",
  price: "1.85",
  currency: "EUR",
};

describe("good rows", () => {
  it("reads an AWG wire row with defaults for unit, quantity and day", () => {
    expect(
      read({ ...awgWire, insulation: "heavy build", thermalClass: "F" }),
    ).toEqual({
      ok: true,
      row: {
        line: 14,
        supplierSku: "CU-20H",
        itemSku: null,
        description: "",
        kind: "wire",
        unit: "kg",
        standard: "AWG",
        size: "20",
        insulation: "heavy",
        thermalClass: 155,
        price: "14.2000",
        adderPerKg: null,
        currency: "USD",
        minQuantity: "1.000",
        validFrom: "2025-06-02",
        leadTimeDays: null,
        packQuantity: null,
      },
    });
  });

  it("reads an IEC wire row priced as an adder on the metal base", () => {
    const reading = read(
      {
        supplierSku: "CU-0500-G2",
        description: "  Enamelled copper Ø0,5 mm  ",
        standard: "IEC",
        size: "0,5",
        insulation: "G2",
        thermalClass: "180",
        adderPerKg: "3,15",
        currency: "eur",
        minQuantity: "25,5",
        validFrom: "01.07.2025",
      },
      { decimalComma: true },
    );
    expect(reading).toMatchObject({
      ok: true,
      row: {
        kind: "wire",
        description: "Enamelled copper Ø0,5 mm",
        size: "0.500",
        insulation: "grade2",
        thermalClass: 180,
        price: null,
        adderPerKg: "3.1500",
        currency: "EUR",
        minQuantity: "25.500",
        validFrom: "2025-07-01",
      },
    });
  });

  it("reads an IEC size between the R20/R40 steps, 0,35 mm (issue 19, fix 8)", () => {
    // 0.350 mm is commonly stocked but not an R40 number (0.335 and 0.355 are, ISO 3).
    expect(
      read(
        { ...awgWire, standard: "IEC", size: "0,35", insulation: "G2" },
        { decimalComma: true },
      ),
    ).toMatchObject({ ok: true, row: { size: "0.350", insulation: "grade2" } });
  });

  it("reads the aught AWG sizes as the reference tables label them", () => {
    expect(read({ ...awgWire, size: "4/0" })).toMatchObject({
      row: { size: "0000" },
    });
    expect(read({ ...awgWire, size: "AWG 46" })).toMatchObject({
      row: { size: "46" },
    });
  });

  it("reads a magnet row with a quantity break, and a part row", () => {
    expect(read({ ...magnet, minQuantity: "500", unit: "pcs" })).toMatchObject({
      ok: true,
      row: {
        kind: "magnet",
        unit: "pcs",
        grade: "N42SH",
        gradeMatch: "n42sh",
        minQuantity: "500.000",
      },
    });
    expect(
      read({ supplierSku: "6204-2RS", price: "2.10", currency: "EUR" }),
    ).toMatchObject({ ok: true, row: { kind: "part", unit: "pcs" } });
    expect(
      read({ supplierSku: "SLEEVE", unit: "m", price: "0.4", currency: "EUR" }),
    ).toMatchObject({ ok: true, row: { kind: "part", unit: "m" } });
  });

  it("takes the supplier's currency when the row has none", () => {
    expect(
      read({ ...magnet, currency: "" }, { supplierCurrency: "CHF" }),
    ).toMatchObject({ ok: true, row: { currency: "CHF" } });
  });

  it("follows the kind column over the inference", () => {
    expect(read({ ...magnet, kind: "part", grade: "anything" })).toMatchObject({
      ok: true,
      row: { kind: "part" },
    });
    // A magnet list with a dimension column mapped to size is still magnets.
    expect(read({ ...magnet, size: "20x10x5" })).toMatchObject({
      ok: true,
      row: { kind: "magnet" },
    });
  });
});

describe("bad prices and quantities", () => {
  it("refuses a negative price", () => {
    expect(messageOf(read({ ...magnet, price: "-3" }))).toBe(
      'Line 14: the price "-3" (column "price") is negative.',
    );
  });

  it("refuses a price longer than any number before reading it", () => {
    expect(messageOf(read({ ...magnet, price: "1".repeat(50_000) }))).toBe(
      `Line 14: the price "${"1".repeat(39)}…" (column "price") is longer than 40 characters, more than any number can be.`,
    );
  });

  it("refuses a price that is not a number", () => {
    expect(messageOf(read({ ...magnet, price: "on request" }))).toBe(
      'Line 14: the price "on request" (column "price") is not a number.',
    );
    expect(messageOf(read({ ...magnet, price: "1,85" }))).toBe(
      'Line 14: the price "1,85" (column "price") has a comma; in a file separated by commas or tabs, write numbers with a decimal point and no thousands separator (1234.50).',
    );
    expect(
      messageOf(read({ ...magnet, price: "1.850" }, { decimalComma: true })),
    ).toBe(
      'Line 14: the price "1.850" (column "price") could mean 1,850 or 1850; in a file separated by semicolons, write it with a decimal comma and no thousands separator.',
    );
  });

  it("refuses more than 4 decimals, an empty price, and both a price and an adder", () => {
    expect(messageOf(read({ ...magnet, price: "1.23456" }))).toBe(
      'Line 14: the price "1.23456" (column "price") has more than 4 decimals.',
    );
    expect(messageOf(read({ ...magnet, price: "" }))).toBe(
      'Line 14: the price (column "price") and the adder per kg (column "adderPerKg") are both empty.',
    );
    expect(messageOf(read({ ...awgWire, adderPerKg: "3" }))).toBe(
      'Line 14: the row gives both a price "14.20" (column "price") and an adder per kg "3" (column "adderPerKg"); give one of them.',
    );
  });

  it("refuses an adder per kg on a magnet", () => {
    expect(messageOf(read({ ...magnet, price: "", adderPerKg: "2" }))).toBe(
      'Line 14: an adder per kg (column "adderPerKg") is for wire priced on the metal base, and this row is a magnet.',
    );
  });

  it("refuses a minimum quantity that is not a number, zero, or part of a piece", () => {
    expect(messageOf(read({ ...magnet, minQuantity: "ten" }))).toBe(
      'Line 14: the minimum quantity "ten" (column "minQuantity") is not a number.',
    );
    expect(messageOf(read({ ...magnet, minQuantity: "0" }))).toBe(
      'Line 14: the minimum quantity "0" (column "minQuantity") must be more than zero.',
    );
    expect(messageOf(read({ ...magnet, minQuantity: "2.5" }))).toBe(
      'Line 14: the minimum quantity "2.5" (column "minQuantity") is not a whole number of pieces.',
    );
    expect(read({ ...awgWire, minQuantity: "2.5" })).toMatchObject({
      ok: true,
    });
  });
});

describe("bad currencies, dates and text", () => {
  it("refuses an unknown currency", () => {
    expect(messageOf(read({ ...magnet, currency: "EUX" }))).toBe(
      'Line 14: the currency "EUX" (column "currency") is not a currency code we know (use a three-letter ISO 4217 code such as EUR or USD).',
    );
    expect(messageOf(read({ ...magnet, currency: "" }))).toBe(
      'Line 14: the currency (column "currency") is empty and the supplier has no default currency.',
    );
  });

  it("refuses a month-first date and impossible days", () => {
    expect(messageOf(read({ ...magnet, validFrom: "03/25/2025" }))).toBe(
      'Line 14: the date "03/25/2025" (column "validFrom") is written month first, which is not accepted because it is easily misread; write it as YYYY-MM-DD.',
    );
    expect(messageOf(read({ ...magnet, validFrom: "2025-02-30" }))).toBe(
      'Line 14: the date "2025-02-30" (column "validFrom") does not exist.',
    );
  });

  it("refuses an empty or overlong SKU and a description over 200 characters", () => {
    expect(messageOf(read({ ...magnet, supplierSku: "" }))).toBe(
      'Line 14: the supplier SKU (column "supplierSku") is empty.',
    );
    expect(messageOf(read({ ...magnet, supplierSku: "S".repeat(61) }))).toBe(
      `Line 14: the supplier SKU "${"S".repeat(39)}…" (column "supplierSku") is longer than 60 characters.`,
    );
    expect(messageOf(read({ ...magnet, description: "x".repeat(201) }))).toBe(
      'Line 14: the description (column "description") has 201 characters; the limit is 200.',
    );
    expect(read({ ...magnet, description: "µ".repeat(200) })).toMatchObject({
      ok: true,
    });
  });

  it("lists every problem of a row in one message", () => {
    expect(messageOf(read({ ...magnet, price: "-3", currency: "EUX" }))).toBe(
      'Line 14: the price "-3" (column "price") is negative; the currency "EUX" (column "currency") is not a currency code we know (use a three-letter ISO 4217 code such as EUR or USD).',
    );
  });
});

describe("bad wire and magnet details", () => {
  it("refuses an unknown AWG size", () => {
    expect(messageOf(read({ ...awgWire, size: "47" }))).toBe(
      'Line 14: the AWG size "47" (column "size") is not an AWG size from 4/0 to 46.',
    );
    expect(messageOf(read({ ...awgWire, size: "0.5" }))).toBe(
      'Line 14: the AWG size "0.5" (column "size") is not an AWG size from 4/0 to 46.',
    );
  });

  it("refuses an IEC size that is not a nominal diameter", () => {
    expect(
      messageOf(read({ ...awgWire, standard: "IEC", size: "0.3333" })),
    ).toBe(
      'Line 14: the IEC size "0.3333" (column "size") is not an IEC 60317 nominal diameter in mm (0.020 to 5.000, given to 0.001 mm, such as 0.500 or 0.350).',
    );
    expect(
      messageOf(read({ ...awgWire, standard: "IEC", size: "6.3" })),
    ).toContain("is not an IEC 60317 nominal diameter");
  });

  it("refuses an unknown magnet grade", () => {
    expect(messageOf(read({ ...magnet, grade: "N99XX" }))).toBe(
      'Line 14: the magnet grade "N99XX" (column "grade") is not a grade we know; check the spelling, or have an admin add the grade first.',
    );
    expect(read({ ...magnet, grade: "C5  (Y30)" })).toMatchObject({
      ok: true,
      row: { gradeMatch: "c5 (y30)" },
    });
  });

  it("refuses an unknown insulation grade and one from the other standard", () => {
    expect(messageOf(read({ ...awgWire, insulation: "grade 4" }))).toBe(
      'Line 14: the insulation "grade 4" (column "insulation") is not one we know (grade 1, 2 or 3 for IEC wire; single, heavy or triple build for AWG wire).',
    );
    expect(messageOf(read({ ...awgWire, insulation: "grade 2" }))).toBe(
      'Line 14: the insulation "grade 2" (column "insulation") is an IEC grade; AWG wire takes single, heavy or triple build.',
    );
    expect(
      messageOf(
        read({ ...awgWire, standard: "IEC", size: "0.5", insulation: "heavy" }),
      ),
    ).toBe(
      'Line 14: the insulation "heavy" (column "insulation") is an AWG film build; IEC wire takes grade 1, 2 or 3.',
    );
  });

  it("refuses an unknown thermal class, standard and unit", () => {
    expect(messageOf(read({ ...awgWire, thermalClass: "170" }))).toBe(
      'Line 14: the thermal class "170" (column "thermalClass") is not 130, 155, 180, 200 or 220.',
    );
    expect(messageOf(read({ ...awgWire, standard: "SWG" }))).toBe(
      'Line 14: the wire standard "SWG" (column "standard") is not AWG or IEC.',
    );
    expect(messageOf(read({ ...awgWire, unit: "pcs" }))).toBe(
      'Line 14: wire is priced per kg, not per "pcs" (column "unit").',
    );
    expect(messageOf(read({ ...magnet, unit: "kg" }))).toBe(
      'Line 14: magnets are priced per piece, not per "kg" (column "unit").',
    );
    expect(messageOf(read({ ...magnet, unit: "box" }))).toBe(
      'Line 14: the unit "box" (column "unit") is not kg, pcs or m.',
    );
  });

  it("asks for the kind when a row looks like both wire and a magnet", () => {
    expect(messageOf(read({ ...awgWire, grade: "N42SH" }))).toBe(
      'Line 14: the row has a wire standard "AWG" (column "standard") and size "20" (column "size") and also a magnet grade "N42SH" (column "grade"); say in a kind column whether it is wire or a magnet.',
    );
    expect(messageOf(read({ ...magnet, kind: "coil" }))).toBe(
      'Line 14: the kind "coil" (column "kind") is not wire, magnet or part.',
    );
  });

  it("reports a wire standard without a size instead of making the row a part", () => {
    expect(messageOf(read({ ...awgWire, size: "" }))).toBe(
      'Line 14: wire needs a size: the size (column "size") is empty.',
    );
  });
});

describe("across rows", () => {
  function collect(rows: ReturnType<typeof dataRow>[]): PriceListRowCollector {
    const collector = new PriceListRowCollector(context);
    rows.forEach((row) => collector.add(row));
    return collector;
  }

  it("reports a repeated row with another price on the later line, naming the earlier", () => {
    const collector = collect([
      dataRow(2, { ...magnet, minQuantity: "100" }),
      dataRow(3, { ...magnet, minQuantity: "500", price: "1.60" }),
      dataRow(9, { ...magnet, minQuantity: "100", price: "1.90" }),
    ]);
    expect(collector.rows.map((row) => row.line)).toEqual([2, 3]);
    expect(collector.errors).toEqual([
      {
        line: 9,
        message:
          'Line 9: the supplier SKU "BLK-20-10-5" (column "supplierSku"; minimum quantity 100, valid from 2025-06-02) is already on line 2 with another price (1.85 EUR there, 1.9 EUR here).',
      },
    ]);
  });

  it("drops exact repeats silently, also when spelt differently", () => {
    const collector = collect([
      dataRow(2, magnet),
      dataRow(3, magnet),
      dataRow(4, {
        ...magnet,
        price: "1.8500",
        currency: "eur",
        minQuantity: "1",
      }),
    ]);
    expect(collector.rows.map((row) => row.line)).toEqual([2]);
    expect(collector.errors).toEqual([]);
  });

  it("compares SKUs without regard to letter case", () => {
    const collector = collect([
      dataRow(2, magnet),
      dataRow(3, { ...magnet, supplierSku: "blk-20-10-5", price: "2" }),
    ]);
    expect(collector.errors.map((error) => error.line)).toEqual([3]);
  });

  it("keeps the same SKU at other quantities and days, but only as the same item", () => {
    const collector = collect([
      dataRow(2, awgWire),
      dataRow(3, { ...awgWire, minQuantity: "100", price: "13.90" }),
      dataRow(4, { ...awgWire, validFrom: "2025-09-01", price: "15" }),
      dataRow(5, { ...awgWire, size: "22", minQuantity: "500" }),
    ]);
    expect(collector.rows.map((row) => row.line)).toEqual([2, 3, 4]);
    expect(collector.errors).toEqual([
      {
        line: 5,
        message:
          'Line 5: the supplier SKU "CU-20H" (column "supplierSku") is wire AWG 22 here but wire AWG 20 on line 2; one SKU must always be the same item.',
      },
    ]);
  });

  it("names a part's unit as a word when one SKU is two items", () => {
    const collector = collect([
      dataRow(2, {
        supplierSku: "SLEEVE",
        unit: "m",
        price: "0.4",
        currency: "EUR",
      }),
      dataRow(3, {
        supplierSku: "SLEEVE",
        unit: "pcs",
        price: "0.4",
        minQuantity: "10",
        currency: "EUR",
      }),
    ]);
    expect(collector.errors).toEqual([
      {
        line: 3,
        message:
          'Line 3: the supplier SKU "SLEEVE" (column "supplierSku") is part per piece here but part per m on line 2; one SKU must always be the same item.',
      },
    ]);
  });

  it("keeps the rows with errors out of the comparison", () => {
    const collector = collect([
      dataRow(2, { ...magnet, price: "x" }),
      dataRow(3, magnet),
    ]);
    expect(collector.rows.map((row) => row.line)).toEqual([3]);
    expect(collector.errors.map((error) => error.line)).toEqual([2]);
  });

  it("throws on an import day that is not a day (a programming error)", () => {
    expect(
      () => new PriceListRowCollector({ ...context, importDay: "today" }),
    ).toThrow(/importDay/);
  });
});

describe("messages that name the column and the value", () => {
  /** The file's own headers for the test columns, as a supplier might write them. */
  const fileHeaders: Record<PriceListField, string> = {
    supplierSku: "Art. no",
    itemSku: "Our SKU",
    description: "Text",
    kind: "Type",
    standard: "Norm",
    size: "Gauge",
    grade: "Quality",
    insulation: "Build",
    thermalClass: "Temp class",
    unit: "UoM",
    price: "Net price",
    adderPerKg: "Adder EUR/kg",
    currency: "Cur",
    minQuantity: "MOQ",
    validFrom: "Date",
    leadTimeDays: "Lead time",
    packQuantity: "Spool kg",
  };
  const named = { ...context, headers: testFields.map((f) => fileHeaders[f]) };
  const readNamed = (values: Partial<Record<PriceListField, string>>) =>
    readPriceListRow(dataRow(14, values), named);

  it("reports a typo in the adder before what the row's kind says about adders", () => {
    expect(
      messageOf(
        readNamed({
          supplierSku: "BRG-6001",
          adderPerKg: "2.4O",
          currency: "EUR",
        }),
      ),
    ).toBe(
      'Line 14: the adder per kg "2.4O" (column "Adder EUR/kg") is not a number; an adder per kg (column "Adder EUR/kg") is for wire priced on the metal base, and this row is a part.',
    );
    // A wire row with the same typo: only the number is wrong.
    expect(
      messageOf(readNamed({ ...awgWire, price: "", adderPerKg: "2.4O" })),
    ).toBe(
      'Line 14: the adder per kg "2.4O" (column "Adder EUR/kg") is not a number.',
    );
  });

  it("puts the number problems before the others", () => {
    expect(
      messageOf(readNamed({ ...magnet, grade: "N99XX", price: "1,85" })),
    ).toMatch(
      /^Line 14: the price "1,85" \(column "Net price"\) has a comma;.*; the magnet grade "N99XX" \(column "Quality"\) is not a grade we know/,
    );
  });

  it.each<[string, Partial<Record<PriceListField, string>>, string]>([
    [
      "a negative price",
      { ...magnet, price: "-3" },
      '"-3" (column "Net price")',
    ],
    [
      "a bad quantity",
      { ...magnet, minQuantity: "ten" },
      '"ten" (column "MOQ")',
    ],
    [
      "a part of a piece",
      { ...magnet, minQuantity: "2.5" },
      '"2.5" (column "MOQ")',
    ],
    [
      "an unknown currency",
      { ...magnet, currency: "EUX" },
      '"EUX" (column "Cur")',
    ],
    [
      "a day that does not exist",
      { ...magnet, validFrom: "2025-02-30" },
      '"2025-02-30" (column "Date")',
    ],
    [
      "an unknown AWG size",
      { ...awgWire, size: "47" },
      '"47" (column "Gauge")',
    ],
    [
      "an unknown standard",
      { ...awgWire, standard: "SWG" },
      '"SWG" (column "Norm")',
    ],
    [
      "an unknown insulation",
      { ...awgWire, insulation: "grade 4" },
      '"grade 4" (column "Build")',
    ],
    [
      "an unknown thermal class",
      { ...awgWire, thermalClass: "170" },
      '"170" (column "Temp class")',
    ],
    ["an unknown unit", { ...magnet, unit: "box" }, '"box" (column "UoM")'],
    [
      "a unit wire is not priced in",
      { ...awgWire, unit: "pcs" },
      '"pcs" (column "UoM")',
    ],
    ["an unknown kind", { ...magnet, kind: "coil" }, '"coil" (column "Type")'],
    [
      "an unknown grade",
      { ...magnet, grade: "N99XX" },
      '"N99XX" (column "Quality")',
    ],
    [
      "an overlong SKU",
      { ...magnet, supplierSku: "S".repeat(61) },
      '…" (column "Art. no")',
    ],
    [
      "an empty SKU",
      { ...magnet, supplierSku: "" },
      '(column "Art. no") is empty',
    ],
    ["an empty price", { ...magnet, price: "" }, '(column "Net price")'],
    ["a missing size", { ...awgWire, size: "" }, '(column "Gauge") is empty'],
  ])("names the column and the value for %s", (_label, values, expected) => {
    expect(messageOf(readNamed(values))).toContain(expected);
  });
});

describe("currency signs", () => {
  it("reads € and £ as EUR and GBP", () => {
    expect(read({ ...magnet, currency: "€" })).toMatchObject({
      ok: true,
      row: { currency: "EUR" },
    });
    expect(read({ ...magnet, currency: " £ " })).toMatchObject({
      ok: true,
      row: { currency: "GBP" },
    });
  });

  it("asks for a code instead of $ or ¥, which stand for several currencies", () => {
    expect(messageOf(read({ ...magnet, currency: "$" }))).toContain(
      'the currency "$" (column "currency") stands for several currencies (US, Canadian, Australian and other dollars); write a code such as USD, CAD or AUD',
    );
    expect(messageOf(read({ ...magnet, currency: "¥" }))).toContain(
      'the currency "¥" (column "currency") stands for several currencies (the Japanese yen and the Chinese yuan); write JPY or CNY',
    );
  });
});

describe("lead time and pack quantity", () => {
  it("reads whole days and a pack size in the item's unit", () => {
    const wire = read({ ...awgWire, leadTimeDays: "21", packQuantity: "5" });
    expect(wire.ok && wire.row.leadTimeDays).toBe(21);
    expect(wire.ok && wire.row.packQuantity).toBe("5.000");
    // A spool of 2.5 kg is a pack of wire; a workbook's number cell 14.0 is 14 days.
    const spool = read({
      ...awgWire,
      leadTimeDays: "14.0",
      packQuantity: "2.5",
    });
    expect(
      spool.ok && [spool.row.leadTimeDays, spool.row.packQuantity],
    ).toEqual([14, "2.500"]);
    const sameDay = read({ ...magnet, leadTimeDays: "0", packQuantity: "100" });
    expect(
      sameDay.ok && [sameDay.row.leadTimeDays, sameDay.row.packQuantity],
    ).toEqual([0, "100.000"]);
  });

  it("refuses days that are not whole, negative or implausible, and packs of nothing or of part pieces", () => {
    expect(messageOf(read({ ...awgWire, leadTimeDays: "2.5" }))).toBe(
      'Line 14: the lead time "2.5" (column "leadTimeDays") is not a whole number of days.',
    );
    expect(messageOf(read({ ...awgWire, leadTimeDays: "-3" }))).toContain(
      "is negative",
    );
    expect(messageOf(read({ ...awgWire, leadTimeDays: "4000" }))).toContain(
      "more than 3,650 days",
    );
    expect(
      messageOf(read({ ...awgWire, leadTimeDays: "two weeks" })),
    ).toContain("is not a whole number of days");
    expect(messageOf(read({ ...awgWire, packQuantity: "0" }))).toBe(
      'Line 14: the pack quantity "0" (column "packQuantity") must be more than zero.',
    );
    expect(messageOf(read({ ...magnet, packQuantity: "12.5" }))).toContain(
      "is not a whole number of pieces",
    );
    expect(messageOf(read({ ...awgWire, packQuantity: "-5" }))).toContain(
      "is negative",
    );
  });

  it("treats the same break with other terms as a conflicting repeat", () => {
    const collector = new PriceListRowCollector(context);
    collector.add(dataRow(2, { ...awgWire, leadTimeDays: "14" }));
    collector.add(dataRow(3, { ...awgWire, leadTimeDays: "21" }));
    expect(collector.errors[0]?.message).toContain(
      "another lead time or pack quantity",
    );
  });
});
