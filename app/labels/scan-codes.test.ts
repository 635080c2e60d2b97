import { describe, expect, it } from "vitest";
import {
  parseScannedText,
  scanCodeText,
  scanCodeUrl,
  type ScannedText,
} from "./scan-codes";

const origins = ["https://stores.example.com", "http://localhost:3000"];

describe("scanCodeText and scanCodeUrl", () => {
  it("writes a lot as L and its id, a location as B and its code", () => {
    expect(scanCodeText({ kind: "lot", lotId: 123 })).toBe("L123");
    expect(scanCodeText({ kind: "location", code: "MAIN-A3" })).toBe(
      "BMAIN-A3",
    );
  });

  it("writes the address a phone's camera opens", () => {
    expect(
      scanCodeUrl("https://stores.example.com/", { kind: "lot", lotId: 7 }),
    ).toBe("https://stores.example.com/scan/L7");
    expect(
      scanCodeUrl("https://stores.example.com", {
        kind: "location",
        code: "WIRE-A1",
      }),
    ).toBe("https://stores.example.com/scan/BWIRE-A1");
  });

  it("refuses what is not a lot id or a location code", () => {
    expect(() => scanCodeText({ kind: "lot", lotId: 0 })).toThrow(RangeError);
    expect(() => scanCodeText({ kind: "lot", lotId: 1.5 })).toThrow(RangeError);
    expect(() => scanCodeText({ kind: "lot", lotId: 2_147_483_648 })).toThrow(
      RangeError,
    );
    expect(() => scanCodeText({ kind: "location", code: "" })).toThrow(
      RangeError,
    );
    expect(() =>
      scanCodeText({ kind: "location", code: "SHELF/2 LEFT" }),
    ).toThrow(RangeError);
    expect(() =>
      scanCodeText({ kind: "location", code: "A".repeat(21) }),
    ).toThrow(RangeError);
  });
});

describe("parseScannedText", () => {
  const lot = (lotId: number): ScannedText => ({ kind: "lot", lotId });
  const location = (code: string): ScannedText => ({ kind: "location", code });

  it("reads the bare codes a wedge scanner types from the label's text", () => {
    expect(parseScannedText("L123")).toEqual(lot(123));
    expect(parseScannedText("BMAIN-A3")).toEqual(location("MAIN-A3"));
  });

  it("reads them whatever the case (Caps Lock, scanners that send lower case) and with blanks", () => {
    expect(parseScannedText("l123")).toEqual(lot(123));
    expect(parseScannedText("  L 123\n")).toEqual(lot(123));
    expect(parseScannedText("bmain-a3")).toEqual(location("MAIN-A3"));
    expect(parseScannedText("B MAIN-A3")).toEqual(location("MAIN-A3"));
  });

  it("reads the path alone and the whole address of our own hosts", () => {
    expect(parseScannedText("/scan/L42")).toEqual(lot(42));
    expect(
      parseScannedText("https://stores.example.com/scan/L42", origins),
    ).toEqual(lot(42));
    expect(
      parseScannedText("HTTP://LOCALHOST:3000/SCAN/BWIRE-A1", origins),
    ).toEqual(location("WIRE-A1"));
  });

  it("reads every code it writes back to the same thing (round trip)", () => {
    for (const code of [
      { kind: "lot", lotId: 1 },
      { kind: "lot", lotId: 2_147_483_647 },
      { kind: "location", code: "MAG-B2" },
      { kind: "location", code: "BENCH" },
    ] as const) {
      expect(parseScannedText(scanCodeText(code))).toEqual(code);
      expect(parseScannedText(scanCodeUrl(origins[0]!, code), origins)).toEqual(
        code,
      );
    }
  });

  const foreignTexts: [string, string][] = [
    ["", "an empty scan"],
    ["   ", "only blanks"],
    // An EAN-13 (GS1) product number, as printed on retail packaging: digits only.
    ["4006381333931", "a GS1 EAN-13"],
    // A GS1-128 element string with the group separator (ASCII 29) between fields.
    ["]C1010950123456789317100123\u001d10ABC123", "a GS1-128 with FNC1/GS"],
    ["(01)09501234567893(10)ABC", "a GS1 human-readable string"],
    ["https://other.example.net/scan/L123", "another host's address"],
    ["https://stores.example.com/stock/lots/5", "our address but not /scan/"],
    ["ftp://stores.example.com/scan/L1", "another scheme"],
    ["L12A", "a lot number with letters"],
    ["L0", "lot id zero"],
    ["L99999999999", "a lot id past the database's int"],
    ["X123", "another letter"],
    ["BSHELF/2", "a location code with a slash"],
    [`B${"A".repeat(21)}`, "a location code too long"],
    ["/scan/%E0%A4%A", "a broken percent escape"],
    ["L".repeat(400), "far too long"],
  ];
  it.each(foreignTexts)("calls %j foreign (%s)", (text) => {
    const read = parseScannedText(text, origins);
    expect(read.kind).toBe("foreign");
    if (read.kind === "foreign") expect(read.reason.length).toBeGreaterThan(0);
  });

  it("says plainly why an address of another host is foreign", () => {
    expect(
      parseScannedText("https://other.example.net/scan/L123", origins),
    ).toEqual({
      kind: "foreign",
      reason:
        "This code points to another address (other.example.net), not to Turnledger.",
    });
  });

  it("takes no address at all as foreign when no origin of its own is given", () => {
    expect(parseScannedText("https://stores.example.com/scan/L1").kind).toBe(
      "foreign",
    );
  });
});
