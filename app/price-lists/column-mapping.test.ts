import { describe, expect, it } from "vitest";
import {
  PRICE_LIST_FIELDS,
  checkColumnMapping,
  columnMappingFromFields,
  columnMappingToFields,
  normaliseHeader,
  priceListFieldKeys,
  suggestMapping,
  type ColumnMapping,
  type PriceListField,
} from "./column-mapping";
import { columnMappingSchema } from "./column-mapping-schema";

const headers = ["Art. no", "Description", "Unit price", "Currency", "Min qty"];

function fieldsOf(mapping: ColumnMapping): Record<string, PriceListField> {
  return Object.fromEntries(
    mapping.map(({ header, field }) => [header, field]),
  );
}

describe("the field list", () => {
  it("lists every field once with a label, and says what is required", () => {
    expect(PRICE_LIST_FIELDS.map((field) => field.key)).toEqual([
      ...priceListFieldKeys,
    ]);
    const requirement = Object.fromEntries(
      PRICE_LIST_FIELDS.map((field) => [field.key, field.requirement]),
    );
    expect(requirement.supplierSku).toBe("required");
    expect(requirement.price).toBe("priceOrAdder");
    expect(requirement.adderPerKg).toBe("priceOrAdder");
    expect(requirement.currency).toBe("unlessSupplierCurrency");
    expect(requirement.kind).toBe("optional");
    expect(PRICE_LIST_FIELDS.every((field) => field.label !== "")).toBe(true);
  });
});

describe("checking a mapping", () => {
  const good: ColumnMapping = [
    { header: "Art. no", field: "supplierSku" },
    { header: "Unit price", field: "price" },
    { header: "Currency", field: "currency" },
    { header: "Min qty", field: "minQuantity" },
  ];

  it("turns a good mapping into column indexes", () => {
    expect(checkColumnMapping(good, headers)).toEqual({
      ok: true,
      columns: { supplierSku: 0, price: 2, currency: 3, minQuantity: 4 },
    });
  });

  it("refuses a mapping that misses the price column", () => {
    const result = checkColumnMapping(
      good.filter((entry) => entry.field !== "price"),
      headers,
    );
    expect(result).toEqual({
      ok: false,
      messages: [
        "The mapping misses the price column (or, for wire priced on the metal base, the adder per kg column).",
      ],
    });
  });

  it("accepts the adder per kg instead of the price", () => {
    const result = checkColumnMapping(
      [
        { header: "Art. no", field: "supplierSku" },
        { header: "Unit price", field: "adderPerKg" },
        { header: "Currency", field: "currency" },
      ],
      headers,
    );
    expect(result.ok).toBe(true);
  });

  it("needs the SKU, and the currency unless the supplier has a default", () => {
    const withoutSkuOrCurrency: ColumnMapping = [
      { header: "Unit price", field: "price" },
    ];
    expect(checkColumnMapping(withoutSkuOrCurrency, headers)).toEqual({
      ok: false,
      messages: [
        "The mapping misses the supplier SKU column.",
        "The mapping misses the currency column, and the supplier has no default currency.",
      ],
    });
    const withSku: ColumnMapping = [
      ...withoutSkuOrCurrency,
      { header: "Art. no", field: "supplierSku" },
    ];
    expect(
      checkColumnMapping(withSku, headers, { supplierCurrency: "EUR" }).ok,
    ).toBe(true);
  });

  it("refuses a header that is not in the file", () => {
    const result = checkColumnMapping(
      [...good, { header: "Valid from", field: "validFrom" }],
      headers,
    );
    expect(result).toEqual({
      ok: false,
      messages: [
        'The column "Valid from" (for Valid from) is not in the file\'s header row.',
      ],
    });
  });

  it("refuses a field mapped twice and a column used twice", () => {
    const fieldTwice = checkColumnMapping(
      [...good, { header: "Description", field: "price" }],
      headers,
    );
    expect(fieldTwice).toEqual({
      ok: false,
      messages: [
        'Price per unit is mapped twice, to "Unit price" and "Description"; choose one column.',
      ],
    });
    const columnTwice = checkColumnMapping(
      [...good, { header: "Unit price", field: "adderPerKg" }],
      headers,
    );
    expect(columnTwice).toEqual({
      ok: false,
      messages: [
        'The column "Unit price" is chosen for Price per unit and Adder per kg; a column can feed one field only (only Supplier SKU and Our SKU may share a column).',
      ],
    });
  });

  it("refuses a field name that is not ours", () => {
    const result = checkColumnMapping(
      [...good, { header: "Description", field: "colour" as PriceListField }],
      headers,
    );
    expect(result).toEqual({
      ok: false,
      messages: ['"colour" is not a price-list field.'],
    });
  });

  it("converts to and from a mapping keyed by field", () => {
    const byField = columnMappingToFields(good);
    expect(byField).toEqual({
      supplierSku: "Art. no",
      price: "Unit price",
      currency: "Currency",
      minQuantity: "Min qty",
    });
    expect(
      checkColumnMapping(columnMappingFromFields(byField), headers),
    ).toEqual(checkColumnMapping(good, headers));
  });

  it("has a schema for the API body", () => {
    expect(columnMappingSchema.safeParse(good).success).toBe(true);
    expect(
      columnMappingSchema.safeParse([{ header: "X", field: "colour" }]).success,
    ).toBe(false);
  });
});

describe("suggesting a mapping", () => {
  it("normalises headers: case, punctuation, accents", () => {
    expect(normaliseHeader(" Art.-Nr. ")).toBe("art nr");
    expect(normaliseHeader("Währung")).toBe("wahrung");
    expect(normaliseHeader("Price EUR/kg")).toBe("price eur kg");
  });

  it("guesses common English headers", () => {
    const suggested = suggestMapping([
      "Part number",
      "Description",
      "Price EUR/kg",
      "Currency",
      "Min qty",
      "Valid from",
      "Notes",
    ]);
    expect(fieldsOf(suggested)).toEqual({
      "Part number": "supplierSku",
      Description: "description",
      "Price EUR/kg": "price",
      Currency: "currency",
      "Min qty": "minQuantity",
      "Valid from": "validFrom",
    });
    expect(suggested.every((entry) => entry.source === "guessed")).toBe(true);
  });

  it('guesses "SKU", "Art. no", "Unit price" and wire and magnet columns', () => {
    expect(
      fieldsOf(
        suggestMapping([
          "SKU",
          "Standard",
          "Size",
          "Insulation",
          "Thermal class",
          "Grade",
          "Unit",
          "Unit price",
          "Adder EUR/kg",
        ]),
      ),
    ).toEqual({
      SKU: "supplierSku",
      Standard: "standard",
      Size: "size",
      Insulation: "insulation",
      "Thermal class": "thermalClass",
      Grade: "grade",
      Unit: "unit",
      "Unit price": "price",
      "Adder EUR/kg": "adderPerKg",
    });
    expect(fieldsOf(suggestMapping(["Art. no", "Preis", "Währung"]))).toEqual({
      "Art. no": "supplierSku",
      Preis: "price",
      Währung: "currency",
    });
  });

  it("does not take a metal base price column for the row's price", () => {
    expect(
      fieldsOf(suggestMapping(["SKU", "Copper base price", "Adder per kg"])),
    ).toEqual({ SKU: "supplierSku", "Adder per kg": "adderPerKg" });
  });

  it("gives each field one column: the best match, then the leftmost", () => {
    expect(
      fieldsOf(suggestMapping(["Price list", "Price", "Net price"])),
    ).toEqual({ Price: "price" });
  });

  it("uses the supplier's saved mapping for headers it names exactly", () => {
    const saved: ColumnMapping = [
      { header: "Bestell-Nr", field: "supplierSku" },
      { header: "EK", field: "price" },
      { header: "Old column", field: "description" },
    ];
    const suggested = suggestMapping(
      ["Bestell-Nr", "EK", "Description", "Currency", "bestell-nr 2"],
      saved,
    );
    expect(suggested).toEqual([
      { header: "Bestell-Nr", field: "supplierSku", source: "saved" },
      { header: "EK", field: "price", source: "saved" },
      { header: "Description", field: "description", source: "guessed" },
      { header: "Currency", field: "currency", source: "guessed" },
    ]);
  });

  it("lets a saved column win over a guess for the same field", () => {
    const suggested = suggestMapping(
      ["Price", "Special price"],
      [{ header: "Special price", field: "price" }],
    );
    expect(suggested).toEqual([
      { header: "Special price", field: "price", source: "saved" },
    ]);
  });
});

describe("one column for the supplier's SKU and ours", () => {
  const itemCodeHeaders = ["Item code", "Description", "Unit price"];
  const bothSkus: ColumnMapping = [
    { header: "Item code", field: "supplierSku" },
    { header: "Item code", field: "itemSku" },
    { header: "Unit price", field: "price" },
  ];

  it("lets one column feed both Supplier SKU and Our SKU", () => {
    expect(
      checkColumnMapping(bothSkus, itemCodeHeaders, {
        supplierCurrency: "EUR",
      }),
    ).toEqual({ ok: true, columns: { supplierSku: 0, itemSku: 0, price: 2 } });
  });

  it("keeps every other rule: another pair on one column, required fields, unknown headers", () => {
    expect(
      checkColumnMapping(
        [...bothSkus, { header: "Unit price", field: "adderPerKg" }],
        itemCodeHeaders,
        { supplierCurrency: "EUR" },
      ),
    ).toEqual({
      ok: false,
      messages: [
        'The column "Unit price" is chosen for Price per unit and Adder per kg; a column can feed one field only (only Supplier SKU and Our SKU may share a column).',
      ],
    });
    expect(
      checkColumnMapping(
        [
          { header: "Item code", field: "itemSku" },
          { header: "Item code", field: "description" },
          { header: "Unit price", field: "price" },
        ],
        itemCodeHeaders,
        { supplierCurrency: "EUR" },
      ),
    ).toEqual({
      ok: false,
      messages: [
        'The column "Item code" is chosen for Our SKU and Description; a column can feed one field only (only Supplier SKU and Our SKU may share a column).',
        "The mapping misses the supplier SKU column.",
      ],
    });
    expect(
      checkColumnMapping(
        [
          { header: "Code", field: "supplierSku" },
          { header: "Code", field: "itemSku" },
          { header: "Unit price", field: "price" },
        ],
        itemCodeHeaders,
        { supplierCurrency: "EUR" },
      ),
    ).toEqual({
      ok: false,
      messages: [
        'The column "Code" (for Supplier SKU) is not in the file\'s header row.',
        'The column "Code" (for Our SKU) is not in the file\'s header row.',
        "The mapping misses the supplier SKU column.",
      ],
    });
  });

  it("offers a saved shared column again for the supplier's next file", () => {
    expect(suggestMapping(itemCodeHeaders, bothSkus)).toEqual([
      { header: "Item code", field: "supplierSku", source: "saved" },
      { header: "Item code", field: "itemSku", source: "saved" },
      { header: "Description", field: "description", source: "guessed" },
      { header: "Unit price", field: "price", source: "saved" },
    ]);
  });
});
