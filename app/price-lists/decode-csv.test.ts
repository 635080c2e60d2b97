import { describe, expect, it } from "vitest";
import {
  checkPriceListSize,
  decodePriceListBytes,
  maxPriceListBytes,
} from "./decode-csv";

const utf8 = (text: string) => new TextEncoder().encode(text);

describe("size and emptiness", () => {
  it("refuses a 25 MB file and accepts one of exactly 20 MB", () => {
    const big = new Uint8Array(25 * 1024 * 1024);
    expect(checkPriceListSize(big.byteLength)).toBe(
      "The file is larger than 20 MB.",
    );
    expect(decodePriceListBytes(big)).toEqual({
      ok: false,
      message: "The file is larger than 20 MB.",
    });
    expect(maxPriceListBytes).toBe(20_971_520);
    expect(checkPriceListSize(maxPriceListBytes)).toBeNull();
    expect(checkPriceListSize(maxPriceListBytes + 1)).not.toBeNull();
  });

  it("refuses an empty file, and one with only a byte order mark or blank lines", () => {
    expect(decodePriceListBytes(new Uint8Array(0))).toEqual({
      ok: false,
      message: "The file is empty.",
    });
    expect(decodePriceListBytes(new Uint8Array([0xef, 0xbb, 0xbf]))).toEqual({
      ok: false,
      message: "The file is empty.",
    });
    expect(decodePriceListBytes(utf8("\r\n \r\n"))).toMatchObject({
      ok: false,
      message: "The file is empty.",
    });
  });
});

describe("binary files", () => {
  it("refuses a PNG image renamed to .csv", () => {
    const png = new Uint8Array([
      0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0x00, 0x00, 0x00, 0x0d,
      0x49, 0x48, 0x44, 0x52, 0x00, 0x00, 0x01, 0x00,
    ]);
    expect(decodePriceListBytes(png)).toEqual({
      ok: false,
      message: "This file is not a text CSV.",
    });
  });

  it("refuses a workbook renamed to .csv and says to save it as CSV", () => {
    const workbook = new Uint8Array([
      0x50, 0x4b, 0x03, 0x04, 0x14, 0x00, 0x06, 0x00, 0x08, 0x00,
    ]);
    const result = decodePriceListBytes(workbook);
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.message).toMatch(/^This file is not a text CSV\./);
      expect(result.message).toContain("save it as CSV");
    }
  });

  it("refuses a file with a NUL byte even when the rest looks like text", () => {
    const bytes = utf8(`SKU,Price\n${"A-1,2\n".repeat(500)}`);
    bytes[100] = 0x00;
    expect(decodePriceListBytes(bytes)).toEqual({
      ok: false,
      message: "This file is not a text CSV.",
    });
  });

  it("refuses text with many control characters but accepts tabs and line breaks", () => {
    const noisy = new Uint8Array(200).map((_, index) =>
      index % 10 === 0 ? 0x07 : 0x41,
    );
    expect(decodePriceListBytes(noisy)).toMatchObject({ ok: false });
    expect(decodePriceListBytes(utf8("a\tb\r\n1\t2\n"))).toMatchObject({
      ok: true,
    });
  });
});

describe("encodings", () => {
  it("reads UTF-8 without a byte order mark", () => {
    expect(decodePriceListBytes(utf8("SKU,Grade\nM-1,N42SH ⌀10\n"))).toEqual({
      ok: true,
      text: "SKU,Grade\nM-1,N42SH ⌀10\n",
      encoding: "utf-8",
      hadByteOrderMark: false,
    });
  });

  it("drops a UTF-8 byte order mark from the text", () => {
    const bytes = new Uint8Array([0xef, 0xbb, 0xbf, ...utf8("SKU;Preis\n")]);
    const result = decodePriceListBytes(bytes);
    expect(result).toEqual({
      ok: true,
      text: "SKU;Preis\n",
      encoding: "utf-8",
      hadByteOrderMark: true,
    });
  });

  it("falls back to Windows-1252 for bytes that are not UTF-8 (Ø, µ, €, –)", () => {
    // "Ø0,5 µm 3€ –" in Windows-1252: Ø 0xD8, µ 0xB5, € 0x80, en dash 0x96.
    const bytes = new Uint8Array([
      0xd8, 0x30, 0x2c, 0x35, 0x20, 0xb5, 0x6d, 0x20, 0x33, 0x80, 0x20, 0x96,
    ]);
    expect(decodePriceListBytes(bytes)).toEqual({
      ok: true,
      text: "Ø0,5 µm 3€ –",
      encoding: "windows-1252",
      hadByteOrderMark: false,
    });
  });

  it("reads UTF-16 little endian with its byte order mark", () => {
    const text = "SKU\tPrice\nA-1\t1.5\n";
    const bytes = new Uint8Array(2 + text.length * 2);
    bytes.set([0xff, 0xfe]);
    [...text].forEach((character, index) => {
      bytes[2 + index * 2] = character.charCodeAt(0);
    });
    expect(decodePriceListBytes(bytes)).toEqual({
      ok: true,
      text,
      encoding: "utf-16le",
      hadByteOrderMark: true,
    });
  });
});
