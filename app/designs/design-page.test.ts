import { describe, expect, it } from "vitest";
import {
  applyLineChange,
  costQuerySearch,
  designPageIntentOf,
  lineIndexOfField,
  readCostQuery,
  type StoredLineInput,
} from "./design-page";
import type { DesignLineInput } from "./design-schemas";

const coil: DesignLineInput = {
  kind: "coil",
  sku: "CU-080",
  turns: 40,
  strandsInHand: 1,
  activeLengthMm: 50,
  endTurnLengthMm: 30,
  leadLengthMm: 150,
  coilsPerMotor: 12,
  scrapPercent: 3,
  operatingTemperatureC: 120,
};
const magnet: DesignLineInput = {
  kind: "magnet",
  sku: "N42SH",
  piecesPerMotor: 14,
};
const part: DesignLineInput = {
  kind: "part",
  sku: "BRG-608",
  quantityPerMotor: 2,
};
const stored: StoredLineInput[] = [
  { id: 71, input: coil },
  { id: 72, input: magnet },
  { id: 73, input: part },
];

describe("the design page's costing query", () => {
  it("defaults to one motor at the best supplier price", () => {
    expect(readCostQuery(new URLSearchParams(""))).toMatchObject({
      quantity: 1,
      basis: "best-price",
      errors: {},
    });
  });

  it("reads a build quantity and the stock average basis", () => {
    expect(
      readCostQuery(new URLSearchParams("quantity=500&basis=stock-average")),
    ).toMatchObject({ quantity: 500, basis: "stock-average", errors: {} });
  });

  it("falls back to the default with a message for each bad value", () => {
    const query = readCostQuery(
      new URLSearchParams("quantity=2.5&basis=cheapest"),
    );
    expect(query.quantity).toBe(1);
    expect(query.basis).toBe("best-price");
    expect(query.typed).toEqual({ quantity: "2.5", basis: "cheapest" });
    expect(query.errors.quantity).toBe(
      "Give the number of motors as a whole number.",
    );
    expect(query.errors.basis).toMatch(/best supplier price/);
    expect(
      readCostQuery(new URLSearchParams("quantity=0")).errors.quantity,
    ).toBe("A build is at least 1 motor.");
    expect(
      readCostQuery(new URLSearchParams("quantity=lots")).errors.quantity,
    ).toBe("Give the number of motors as a whole number.");
  });

  it("keeps only what differs from the defaults in the address", () => {
    expect(costQuerySearch({ quantity: 1, basis: "best-price" })).toBe("");
    expect(costQuerySearch({ quantity: 50, basis: "stock-average" })).toBe(
      "?quantity=50&basis=stock-average",
    );
  });
});

describe("one line's change to the whole list", () => {
  it("adds a new line at the end", () => {
    const next = applyLineChange(stored, {
      kind: "save",
      lineId: null,
      line: { ...part, sku: "SHAFT-8" },
    });
    expect(next?.index).toBe(3);
    expect(next?.lines.map((line) => line.sku)).toEqual([
      "CU-080",
      "N42SH",
      "BRG-608",
      "SHAFT-8",
    ]);
  });

  it("replaces the line with the id in its place, leaving the others as they are", () => {
    const next = applyLineChange(stored, {
      kind: "save",
      lineId: 71,
      line: { ...coil, endTurnLengthMm: 60 },
    });
    expect(next?.index).toBe(0);
    expect(next?.lines[0]).toEqual({ ...coil, endTurnLengthMm: 60 });
    expect(next?.lines.slice(1)).toEqual([magnet, part]);
  });

  it("removes the line with the id", () => {
    const next = applyLineChange(stored, { kind: "remove", lineId: 72 });
    expect(next?.lines).toEqual([coil, part]);
  });

  it("refuses a change to a line that is no longer there", () => {
    expect(
      applyLineChange(stored, { kind: "save", lineId: 70, line: coil }),
    ).toBeNull();
    expect(applyLineChange(stored, { kind: "remove", lineId: 70 })).toBeNull();
  });
});

describe("page intents and data-layer fields", () => {
  it("knows the page's intents and nothing else", () => {
    expect(designPageIntentOf("save-line")).toBe("save-line");
    expect(designPageIntentOf("drop-table")).toBeNull();
    expect(designPageIntentOf(null)).toBeNull();
  });

  it("finds the line a data-layer field names", () => {
    expect(lineIndexOfField("lines[3].sku")).toBe(3);
    expect(lineIndexOfField("name")).toBeNull();
    expect(lineIndexOfField(undefined)).toBeNull();
  });
});
