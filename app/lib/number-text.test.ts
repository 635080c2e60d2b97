import { afterEach, describe, expect, it } from "vitest";
import {
  defaultDisplaySettings,
  supportedLocales,
} from "~/lib/display-settings";
import { formatNumberForField, setBrowserDisplaySettings } from "~/lib/format";
import {
  createFormSchema,
  issueFormSchema,
  quantityFormSchema,
} from "~/build-orders/build-order-forms";
import { coilLineSchema, partLineSchema } from "~/designs/design-schemas";
import { insightQuerySchema } from "~/insight/what-if";
import { isCalendarDate } from "~/lib/calendar-days";
import { parseExactDecimal, parseMoney, parseRate } from "~/pricing/money";
import {
  moneyRules,
  quantityRules,
  readDate,
  readDecimal,
  readDiameterMm,
  readInsulation,
  readThermalClass,
  readUnit,
} from "~/price-lists/cell-values";
import type { PriceListField } from "~/price-lists/column-mapping";
import { readPriceListRow } from "~/price-lists/price-list-rows";
import { parseQuantity, parseUnitCost } from "~/lib/decimal-amounts";
import { movementFormSchema } from "~/stock/movement-form";
import { countFormSchema } from "~/stocktakes/stocktake-forms";
import { parseForm } from "~/lib/parse-form";
import { z } from "zod";
import {
  ambiguousNumberMessage,
  formNumber,
  maxNumberTextLength,
  plainNumberText,
  plainDecimalText,
  typedNumber,
  withoutSuffix,
  withoutTrailingZeros,
} from "./number-text";

describe("a form's number field", () => {
  it.each([
    ["12", 12],
    ["-3", -3],
    [" 1,25 ", 1.25],
    ["12.", 12],
    [".5", 0.5],
    ["", undefined],
    ["   ", undefined],
    ["1e3", "1e3"],
    ["0x10", "0x10"],
    ["1,234.5", 1234.5],
    ["1.234,5", "1.234,5"],
    ["1,250", "1,250"],
    ["12 kg", "12 kg"],
    ["Infinity", "Infinity"],
  ])("reads %j as %j", (text, value) => {
    expect(formNumber(text)).toBe(value);
  });

  it("leaves text longer than any number as text, so the schema names the field", () => {
    const long = "1".repeat(maxNumberTextLength + 1);
    expect(formNumber(long)).toBe(long);
    expect(formNumber("1".repeat(maxNumberTextLength))).toBe(
      Number("1".repeat(maxNumberTextLength)),
    );
  });

  it("passes other values through", () => {
    expect(formNumber(5)).toBe(5);
    expect(formNumber(undefined)).toBeUndefined();
  });
});

describe("a number typed in a field", () => {
  it.each([
    ["4.6", 4.6],
    [" 4,6 ", 4.6],
    ["-2", -2],
    ["12.", 12],
    ["", null],
    ["   ", null],
    ["1e3", null],
    ["4,6,1", null],
    ["five", null],
    ["1".repeat(maxNumberTextLength + 1), null],
  ])("reads %j as %j", (text, value) => {
    expect(typedNumber(text)).toBe(value);
  });
});

describe("decimal text without patterns", () => {
  it("drops trailing zeros", () => {
    expect(withoutTrailingZeros("1.2500")).toBe("1.25");
    expect(withoutTrailingZeros("000")).toBe("");
    expect(plainDecimalText("12.5000")).toBe("12.5");
    expect(plainDecimalText("1.000")).toBe("1");
    expect(plainDecimalText("0.000")).toBe("0");
    expect(plainDecimalText("120")).toBe("120");
  });

  it("drops a unit at the end, any letter case, with the spaces before it", () => {
    expect(withoutSuffix("0.5 mm", "mm")).toBe("0.5");
    expect(withoutSuffix("0.5MM", "mm")).toBe("0.5");
    expect(withoutSuffix("20 AWG", "awg")).toBe("20");
    expect(withoutSuffix("0.5", "mm")).toBe("0.5");
    expect(withoutSuffix("m", "mm")).toBe("m");
  });
});

// ---------------------------------------------------------------------------
// Every reader of number text answers a megabyte at once
// ---------------------------------------------------------------------------

const megabyte = 1_000_000;

/**
 * Texts of about 1 MB shaped to make a backtracking pattern try every split:
 * digits that end in a letter, a decimal whose zeros run to the last digit,
 * spaces before a unit that is not quite there.
 */
const longTexts: Record<string, string> = {
  digits: "1".repeat(megabyte),
  "digits then a letter": `${"1".repeat(megabyte)}x`,
  "digits with a decimal comma then a letter": `1,${"1".repeat(megabyte)}x`,
  "a fraction of zeros ending in 1": `0.${"0".repeat(megabyte)}1`,
  "a comma fraction of zeros ending in 1": `0,${"0".repeat(megabyte)}1`,
  "1 and zeros in mm": `1${"0".repeat(megabyte)}mm`,
  "spaces before an unfinished mm": `1${" ".repeat(megabyte)}m`,
  "spaces before an unfinished awg": `#1${" ".repeat(megabyte)}aw`,
  "1 and zeros in awg": `1${"0".repeat(megabyte)}awg`,
  "spaces between digits": `1${" ".repeat(megabyte)}1`,
};

/** Runs `read` on each long text; each answer must come in well under a second. */
function expectQuickOnLongTexts(read: (text: string) => unknown) {
  for (const [shape, text] of Object.entries(longTexts)) {
    const started = performance.now();
    try {
      read(text);
    } catch (error) {
      // A refusal by throwing is an answer too, as long as it is not a time-out.
      if (!(error instanceof RangeError)) throw error;
    }
    const elapsedMs = performance.now() - started;
    expect(elapsedMs, `${shape}: ${elapsedMs.toFixed(0)} ms`).toBeLessThan(250);
  }
}

const priceListFields: readonly PriceListField[] = [
  "supplierSku",
  "kind",
  "standard",
  "size",
  "thermalClass",
  "unit",
  "price",
  "currency",
  "minQuantity",
  "validFrom",
];

function priceListRow(values: Partial<Record<PriceListField, string>>) {
  return readPriceListRow(
    {
      line: 2,
      cells: priceListFields.map((field) => values[field] ?? ""),
    },
    {
      columns: Object.fromEntries(
        priceListFields.map((field, index) => [field, index]),
      ),
      headers: priceListFields,
      decimalComma: true,
      importDay: "2025-06-02",
      knownGrades: new Set(["n42sh"]),
    },
  );
}

describe("number readers given a megabyte", () => {
  it("the record-movement form answers quickly and names the field", () => {
    expectQuickOnLongTexts((text) => {
      const parsed = movementFormSchema.safeParse({
        type: "receipt",
        sku: "CU-050",
        location: "MAIN",
        quantity: text,
        unitCost: text,
        grossKg: text,
        tareKg: text,
      });
      expect(parsed.success).toBe(false);
      if (!parsed.success)
        expect(
          parsed.error.issues.map((issue) => issue.path.join(".")),
        ).toContain("quantity");
    });
  });

  it("the build-order forms answer quickly", () => {
    expectQuickOnLongTexts((text) => {
      expect(
        createFormSchema.safeParse({ designRevision: "1/1", quantity: text })
          .success,
      ).toBe(false);
      expect(
        issueFormSchema.safeParse({
          intent: "issue",
          spot: "CU|L1|MAIN",
          quantity: text,
          grossKg: text,
        }).success,
      ).toBe(false);
      expect(
        quantityFormSchema.safeParse({ intent: "quantity", quantity: text })
          .success,
      ).toBe(false);
    });
  });

  it("the design line forms answer quickly", () => {
    expectQuickOnLongTexts((text) => {
      expect(
        coilLineSchema.safeParse({
          kind: "coil",
          sku: "CU-050",
          turns: text,
          strandsInHand: text,
          activeLengthMm: text,
          endTurnLengthMm: text,
          leadLengthMm: text,
          coilsPerMotor: text,
          scrapPercent: text,
          operatingTemperatureC: text,
        }).success,
      ).toBe(false);
      expect(
        partLineSchema.safeParse({
          kind: "part",
          sku: "BRG",
          quantityPerMotor: text,
        }).success,
      ).toBe(false);
    });
  });

  it("the insight what-if answers quickly", () => {
    expectQuickOnLongTexts((text) => {
      const parsed = insightQuerySchema.safeParse({
        quantity: text,
        copperBase: text,
        aluminiumBase: text,
        date: text,
        page: text,
        perPage: text,
        "endTurn.1": text,
      });
      expect(parsed.success).toBe(false);
    });
  });

  it("the exact decimal readers answer quickly", () => {
    expectQuickOnLongTexts((text) => parseQuantity(text));
    expectQuickOnLongTexts((text) => parseUnitCost(text));
    expectQuickOnLongTexts((text) => parseMoney(text));
    expectQuickOnLongTexts((text) => parseRate(text));
    expectQuickOnLongTexts((text) => parseExactDecimal(text));
    expectQuickOnLongTexts((text) => isCalendarDate(text));
  });

  it("the price-list cell readers answer quickly", () => {
    for (const decimalComma of [false, true]) {
      expectQuickOnLongTexts((text) => {
        const money = readDecimal(text, { ...moneyRules, decimalComma });
        const quantity = readDecimal(text, { ...quantityRules, decimalComma });
        expect(money.ok && quantity.ok).toBe(false);
      });
      expectQuickOnLongTexts((text) =>
        expect(readDiameterMm(text, decimalComma)).toBeUndefined(),
      );
    }
    expectQuickOnLongTexts((text) => readDate(text));
    expectQuickOnLongTexts((text) => readThermalClass(text));
    expectQuickOnLongTexts((text) => readUnit(text));
    expectQuickOnLongTexts((text) => readInsulation(text));
  });

  it("a price-list row of long cells answers quickly with one message per cell", () => {
    expectQuickOnLongTexts((text) => {
      for (const standard of ["AWG", "IEC"]) {
        const reading = priceListRow({
          supplierSku: "CU-1",
          kind: "wire",
          standard,
          size: text,
          thermalClass: text,
          price: text,
          currency: "EUR",
          minQuantity: text,
          validFrom: text,
        });
        expect(reading.ok).toBe(false);
        if (!reading.ok) {
          expect(reading.error.message).toContain("size");
          expect(reading.error.message).toContain("price");
          // The message quotes a shortened cell, never the megabyte.
          expect(reading.error.message.length).toBeLessThan(2_000);
        }
      }
    });
  });
});

// Decimal marks and thousands separators per locale as CLDR gives them (from memory of
// CLDR's decimal/group symbols: en "." ",", de "," ".", fr and fi "," and a no-break
// space), which is also what Intl.NumberFormat writes in Node and Chromium.
describe("number fields in each person's locale", () => {
  afterEach(() => setBrowserDisplaySettings(defaultDisplaySettings));

  it.each([
    // [locale, typed, read]
    ["en-GB", "1234.5", 1234.5],
    ["en-GB", "1,234.5", 1234.5],
    ["en-GB", "1,234,567", 1234567],
    ["en-GB", "1,25", 1.25],
    ["en-GB", "0,125", 0.125],
    ["en-US", "12,345.75", 12345.75],
    ["de-DE", "1,25", 1.25],
    ["de-DE", "1.234,5", 1234.5],
    ["de-DE", "1.234.567", 1234567],
    ["de-DE", "1.5", 1.5],
    ["de-DE", "0.125", 0.125],
    ["fr-FR", "1 234,5", 1234.5],
    ["fr-FR", "1\u202f234,5", 1234.5],
    ["fr-FR", "1.25", 1.25],
    ["fi-FI", "1\u00a0234,5", 1234.5],
    ["fi-FI", "-3,5", -3.5],
  ] as const)("%s reads %j as %j", (locale, typed, read) => {
    setBrowserDisplaySettings({ locale, timeZone: "UTC" });
    expect(formNumber(typed)).toBe(read);
  });

  it.each([
    // One mark before exactly three digits: a decimal in one convention, thousands in the other.
    ["en-GB", "1,250"],
    ["en-US", "-2,500"],
    ["de-DE", "1.250"],
    // Marks in the wrong places or both marks the wrong way round.
    ["de-DE", "1,234.5"],
    ["en-GB", "1.234,5"],
    ["en-GB", "12,34,567"],
    ["fr-FR", "1.234,5"],
    ["fr-FR", "1 23"],
  ] as const)("%s refuses %j as ambiguous or malformed", (locale, typed) => {
    setBrowserDisplaySettings({ locale, timeZone: "UTC" });
    expect(formNumber(typed)).toBe(typed);
    expect(typeof plainNumberText(typed, locale)).not.toBe("string");
  });

  it("reads back what formatNumberForField wrote, in every locale", () => {
    for (const locale of supportedLocales) {
      setBrowserDisplaySettings({ locale, timeZone: "UTC" });
      for (const value of [1.25, 1250, 0.125, 1234.5678, -3.5]) {
        expect(formNumber(formatNumberForField(value))).toBe(value);
      }
    }
  });
});

describe("a number that could be read two ways", () => {
  afterEach(() => setBrowserDisplaySettings(defaultDisplaySettings));

  it.each([
    // [locale, typed, the message]
    [
      "en-GB",
      "1,250",
      "“1,250” could mean 1250 or 1.25: write 1250, or 1.25 for the decimal.",
    ],
    [
      "en-US",
      "-2,500",
      "“-2,500” could mean -2500 or -2.5: write -2500, or -2.5 for the decimal.",
    ],
    [
      "de-DE",
      "1.250",
      "“1.250” could mean 1250 or 1,25: write 1250, or 1,25 for the decimal.",
    ],
    [
      "de-DE",
      " 4.000 ",
      "“4.000” could mean 4000 or 4: write 4000, or 4 for the decimal.",
    ],
  ] as const)("%s says why %j is refused", (locale, typed, message) => {
    setBrowserDisplaySettings({ locale, timeZone: "UTC" });
    expect(ambiguousNumberMessage(typed)).toBe(message);
  });

  it("says nothing about text that is a number, or no number at all, in every locale", () => {
    for (const locale of supportedLocales) {
      setBrowserDisplaySettings({ locale, timeZone: "UTC" });
      for (const typed of ["1250", "1,25", "1.234,5x", "", "abc", "1,234,567"])
        expect(ambiguousNumberMessage(typed)).toBeNull();
      expect(ambiguousNumberMessage(undefined)).toBeNull();
      expect(ambiguousNumberMessage(12)).toBeNull();
    }
  });

  it("is never ambiguous in fr-FR or fi-FI, which group with spaces: a single mark is the decimal", () => {
    for (const locale of ["fr-FR", "fi-FI"] as const) {
      setBrowserDisplaySettings({ locale, timeZone: "UTC" });
      for (const [typed, read] of [
        ["1.250", 1.25],
        ["1,250", 1.25],
      ] as const) {
        expect(ambiguousNumberMessage(typed)).toBeNull();
        expect(formNumber(typed)).toBe(read);
      }
    }
  });

  const orderForm = z.object({
    note: z.string().optional(),
    lines: z.array(
      z.object({
        quantity: z
          .number({ error: "The quantity must be a number." })
          .min(1, "The quantity must be at least 1."),
      }),
    ),
  });

  /** The field messages of a refused submission (none when it passed). */
  function errorsOf(submission: {
    status?: string;
    error?: Record<string, string[] | null> | null;
  }) {
    return submission.status === "error" ? submission.error : null;
  }

  function formOf(entries: [string, string][]): FormData {
    const form = new FormData();
    for (const [name, value] of entries) form.append(name, value);
    return form;
  }

  it("gives a form's number field its own message through parseForm, in every locale", () => {
    const cases: Record<
      (typeof supportedLocales)[number],
      { typed: string; message: string }[]
    > = {
      "en-GB": [
        {
          typed: "1,250",
          message:
            "“1,250” could mean 1250 or 1.25: write 1250, or 1.25 for the decimal.",
        },
      ],
      "en-US": [
        {
          typed: "1,250",
          message:
            "“1,250” could mean 1250 or 1.25: write 1250, or 1.25 for the decimal.",
        },
      ],
      "de-DE": [
        {
          typed: "1.250",
          message:
            "“1.250” could mean 1250 or 1,25: write 1250, or 1,25 for the decimal.",
        },
      ],
      "fr-FR": [],
      "fi-FI": [],
    };
    for (const locale of supportedLocales) {
      setBrowserDisplaySettings({ locale, timeZone: "UTC" });
      for (const { typed, message } of cases[locale]) {
        const submission = parseForm(
          formOf([
            ["lines[0].quantity", "3"],
            ["lines[1].quantity", typed],
          ]),
          { schema: orderForm },
        );
        expect(submission.status).toBe("error");
        expect(errorsOf(submission)).toEqual({
          "lines[1].quantity": [message],
        });
        // What the page shows after the action replies: the same message.
        expect(submission.reply().error).toEqual({
          "lines[1].quantity": [message],
        });
      }
      // Text that is no number keeps the field's own message.
      const wrong = parseForm(formOf([["lines[0].quantity", "three"]]), {
        schema: orderForm,
      });
      expect(errorsOf(wrong)).toEqual({
        "lines[0].quantity": ["The quantity must be a number."],
      });
      // And a number read in the locale passes.
      const fine = parseForm(
        formOf([["lines[0].quantity", formatNumberForField(1250)]]),
        { schema: orderForm },
      );
      expect(fine.status).toBe("success");
      expect(fine.status === "success" && fine.value.lines[0]?.quantity).toBe(
        1250,
      );
    }
  });

  it("reaches number fields read before the schema, as the stocktake's count form does", () => {
    setBrowserDisplaySettings({ locale: "de-DE", timeZone: "UTC" });
    const submission = parseForm(
      formOf([
        ["intent", "count"],
        ["lineId", "4"],
        ["quantity", "2.500"],
      ]),
      { schema: countFormSchema },
    );
    expect(errorsOf(submission)).toEqual({
      quantity: [
        "“2.500” could mean 2500 or 2,5: write 2500, or 2,5 for the decimal.",
      ],
    });
  });
});
