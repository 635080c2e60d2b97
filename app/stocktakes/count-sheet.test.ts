import { describe, expect, it } from "vitest";
import { countSheet, nextLineId, type BlindLineRow } from "./count-sheet";

const row = (
  id: number,
  location: string,
  extra: Partial<BlindLineRow> = {},
): BlindLineRow => ({
  id,
  location,
  locationName: `Bin ${location}`,
  sku: `SKU-${id}`,
  name: "Thing",
  kind: "part",
  unit: "pcs",
  lot: null,
  lotTareKg: null,
  counted: null,
  grossKg: null,
  tareKg: null,
  recountRequested: false,
  addedDuringCount: false,
  ...extra,
});

describe("countSheet", () => {
  it("groups lines by location in order and marks wire in kg as weighable", () => {
    const sheet = countSheet([
      row(3, "A"),
      row(1, "A", {
        kind: "wire",
        unit: "kg",
        lot: "SP1",
        lotTareKg: "0.600",
        counted: "10.700",
        grossKg: "11.300",
        tareKg: "0.600",
      }),
      row(2, "B"),
    ]);
    expect(
      sheet.map((location) => [
        location.code,
        location.lines.map((line) => line.id),
      ]),
    ).toEqual([
      ["A", [3, 1]],
      ["B", [2]],
    ]);
    expect(sheet[0]!.lines[1]).toMatchObject({
      weighable: true,
      lotTareKg: 0.6,
      counted: 10.7,
      weighed: { grossKg: 11.3, tareKg: 0.6 },
    });
    expect(sheet[0]!.lines[0]!.weighable).toBe(false);
  });
  it("has no book figure in its shape", () => {
    const [location] = countSheet([row(1, "A")]);
    expect(
      Object.keys(location!.lines[0]!).some((key) => /book/i.test(key)),
    ).toBe(false);
  });
});

describe("nextLineId", () => {
  it("moves on across locations and stops after the last", () => {
    const sheet = countSheet([row(3, "A"), row(1, "A"), row(2, "B")]);
    expect(nextLineId(sheet, 3)).toBe(1);
    expect(nextLineId(sheet, 1)).toBe(2);
    expect(nextLineId(sheet, 2)).toBeNull();
  });
});
