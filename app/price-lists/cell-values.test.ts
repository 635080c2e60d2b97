import { describe, expect, it } from "vitest";
import {
  moneyRules,
  quantityRules,
  readAwgSize,
  readDate,
  readDecimal,
  readDiameterMm,
  readInsulation,
  readKind,
  readThermalClass,
  readUnit,
  readWireStandard,
} from "./cell-values";

const money = { ...moneyRules, decimalComma: false };
const moneyWithComma = { ...moneyRules, decimalComma: true };

describe("decimal numbers", () => {
  it("reads prices exactly to 4 places", () => {
    expect(readDecimal("12.5", money)).toEqual({
      ok: true,
      text: "12.5000",
      isZero: false,
    });
    expect(readDecimal("0012.34560", money)).toMatchObject({ text: "12.3456" });
    expect(readDecimal("0", money)).toEqual({
      ok: true,
      text: "0.0000",
      isZero: true,
    });
    expect(readDecimal("7", { ...quantityRules, decimalComma: false })).toEqual(
      { ok: true, text: "7.000", isZero: false },
    );
  });

  it("reads a decimal comma only when allowed", () => {
    expect(readDecimal("12,5", moneyWithComma)).toMatchObject({
      text: "12.5000",
    });
    expect(readDecimal("12.5", moneyWithComma)).toMatchObject({
      text: "12.5000",
    });
    expect(readDecimal("12,5", money)).toEqual({
      ok: false,
      problem: "comma-not-allowed",
    });
    expect(readDecimal("1,234.50", money)).toEqual({
      ok: false,
      problem: "comma-not-allowed",
    });
  });

  it("reads points between thousands in decimal-comma files, but not a lone 1.234", () => {
    expect(readDecimal("1.234,50", moneyWithComma)).toMatchObject({
      text: "1234.5000",
    });
    expect(readDecimal("1.234.567", moneyWithComma)).toMatchObject({
      text: "1234567.0000",
    });
    expect(readDecimal("1.234", moneyWithComma)).toEqual({
      ok: false,
      problem: "ambiguous-point",
    });
    expect(readDecimal("0.125", moneyWithComma)).toMatchObject({
      text: "0.1250",
    });
    expect(readDecimal("1234.500", moneyWithComma)).toMatchObject({
      text: "1234.5000",
    });
    expect(readDecimal("1.234", money)).toMatchObject({ text: "1.2340" });
    expect(readDecimal("1.234,50", money)).toMatchObject({ ok: false });
  });

  it("names what is wrong", () => {
    expect(readDecimal("-3", money)).toEqual({
      ok: false,
      problem: "negative",
    });
    expect(readDecimal("abc", money)).toEqual({
      ok: false,
      problem: "not-a-number",
    });
    for (const cell of ["1,234.50", "1e3", "€12", "12 50", "", "+1", "1."]) {
      expect(readDecimal(cell, moneyWithComma)).toMatchObject({ ok: false });
    }
    expect(readDecimal("1.23456", money)).toEqual({
      ok: false,
      problem: "too-many-decimals",
    });
    expect(readDecimal("12345678901", money)).toEqual({
      ok: false,
      problem: "too-large",
    });
  });
});

describe("cells longer than any value", () => {
  it("refuses a number cell of more than 40 characters before reading it", () => {
    const zeros = `1.${"0".repeat(38)}`; // 40 characters: still a number
    expect(readDecimal(zeros, money)).toMatchObject({
      ok: true,
      text: "1.0000",
    });
    expect(readDecimal(`${zeros}0`, money)).toEqual({
      ok: false,
      problem: "too-long",
    });
    expect(readDecimal("1".repeat(41), moneyWithComma)).toEqual({
      ok: false,
      problem: "too-long",
    });
    expect(readDiameterMm(`0.5${" ".repeat(40)}mm`, false)).toBeUndefined();
    expect(readDate(`01.03.2025${" ".repeat(10)}`)).toEqual({
      ok: false,
      problem: "not-a-date",
    });
    expect(readUnit(`${"k".repeat(100)}g`)).toBeUndefined();
  });
});

describe("AWG sizes", () => {
  it.each([
    ["20", "20"],
    ["#20", "20"],
    ["# 20", "20"],
    ["20 AWG", "20"],
    ["20awg", "20"],
    ["4/0", "0000"],
    ["0000", "0000"],
  ])("reads %s as %s", (cell, label) => {
    expect(readAwgSize(cell)).toBe(label);
  });

  it.each(["99", "20 mm", "AWG", "", `20${" ".repeat(40)}AWG`])(
    "does not read %j",
    (cell) => {
      expect(readAwgSize(cell)).toBeUndefined();
    },
  );
});

describe("dates", () => {
  it("reads ISO, dotted and slashed day-first dates", () => {
    expect(readDate("2025-03-01")).toEqual({ ok: true, isoDate: "2025-03-01" });
    expect(readDate("01.03.2025")).toEqual({ ok: true, isoDate: "2025-03-01" });
    expect(readDate("1.3.2025")).toEqual({ ok: true, isoDate: "2025-03-01" });
    expect(readDate("01/03/2025")).toEqual({ ok: true, isoDate: "2025-03-01" });
    expect(readDate("25/03/2025")).toEqual({ ok: true, isoDate: "2025-03-25" });
  });

  it("refuses month-first dates, impossible days and other spellings", () => {
    expect(readDate("03/25/2025")).toEqual({
      ok: false,
      problem: "month-first",
    });
    expect(readDate("2025-02-29")).toEqual({
      ok: false,
      problem: "no-such-day",
    });
    expect(readDate("31.04.2025")).toEqual({
      ok: false,
      problem: "no-such-day",
    });
    expect(readDate("2024-02-29")).toMatchObject({ ok: true });
    expect(readDate("0025-01-01")).toEqual({
      ok: false,
      problem: "unlikely-year",
    });
    for (const cell of ["1 March 2025", "2025/03/01", "01.03.25", "45717"]) {
      expect(readDate(cell)).toEqual({ ok: false, problem: "not-a-date" });
    }
  });
});

describe("words", () => {
  it("reads kinds, units and standards", () => {
    expect(readKind("Magnet wire")).toBe("wire");
    expect(readKind("MAGNETS")).toBe("magnet");
    expect(readKind("other")).toBe("part");
    expect(readKind("spool")).toBeUndefined();
    expect(readKind("constructor")).toBeUndefined();
    expect(readUnit("Kg")).toBe("kg");
    expect(readUnit("pc.")).toBe("pcs");
    expect(readUnit("metres")).toBe("m");
    expect(readUnit("box")).toBeUndefined();
    expect(readWireStandard("awg")).toBe("AWG");
    expect(readWireStandard("IEC 60317-0-1")).toBe("IEC");
    expect(readWireStandard("SWG")).toBeUndefined();
  });

  it("reads insulation spellings", () => {
    expect(readInsulation("grade 2")).toBe("grade2");
    expect(readInsulation("G2")).toBe("grade2");
    expect(readInsulation("Gr. 3")).toBe("grade3");
    expect(readInsulation("heavy build")).toBe("heavy");
    expect(readInsulation("Single")).toBe("single");
    expect(readInsulation("TB")).toBe("triple");
    expect(readInsulation("grade 4")).toBeUndefined();
  });

  it("reads thermal classes as numbers or letters", () => {
    expect(readThermalClass("155")).toBe(155);
    expect(readThermalClass("180 °C")).toBe(180);
    expect(readThermalClass("Class F")).toBe(155);
    expect(readThermalClass("h")).toBe(180);
    expect(readThermalClass("170")).toBeUndefined();
  });

  it("reads IEC diameters with units and signs around them", () => {
    expect(readDiameterMm("0.5", false)).toBe(0.5);
    expect(readDiameterMm("Ø 0,50 mm", true)).toBe(0.5);
    expect(readDiameterMm("0,5", false)).toBeUndefined();
    expect(readDiameterMm("1.250", true)).toBe(1.25);
    expect(readDiameterMm("thin", false)).toBeUndefined();
  });
});

describe("the quick reading of plain numbers", () => {
  it("reads every plain number as the general reading does (a leading zero sends a cell there)", () => {
    // Property check: "12.50" takes the quick path, "012.50" the general one; both must agree.
    let seed = 7;
    const random = (below: number) => {
      seed = (seed * 1_103_515_245 + 12_345) % 2_147_483_648;
      return seed % below;
    };
    const digits = (count: number) =>
      Array.from({ length: count }, () => String(random(10))).join("");
    for (let index = 0; index < 2_000; index += 1) {
      const whole =
        random(4) === 0 ? "0" : `${1 + random(9)}${digits(random(12))}`;
      const cell =
        random(3) === 0 ? whole : `${whole}.${digits(1 + random(6))}`;
      for (const rules of [moneyRules, quantityRules]) {
        const plain = { ...rules, decimalComma: false };
        expect(readDecimal(cell, plain), cell).toEqual(
          readDecimal(`0${cell}`, plain),
        );
      }
    }
  });
});
