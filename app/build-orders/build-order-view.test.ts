import { describe, expect, it } from "vitest";
import {
  heldSpots,
  heldSpotsKey,
  issuesNewestFirst,
  primaryStepOf,
  stockPlaceText,
  weighBackPreview,
} from "./build-order-view";

describe("stockPlaceText", () => {
  it("names the lot before the location, or the location alone", () => {
    expect(stockPlaceText({ lot: "SP-7", location: "A1" })).toBe(
      "lot SP-7 · A1",
    );
    expect(stockPlaceText({ lot: null, location: "A1" })).toBe("A1");
  });
});

describe("issuesNewestFirst", () => {
  it("lists every line's issues with its item, newest first", () => {
    const issues = issuesNewestFirst([
      {
        sku: "W-1",
        unit: "kg",
        issues: [
          { at: "2026-01-01T10:00:00.000Z", quantity: 1 },
          { at: "2026-01-03T10:00:00.000Z", quantity: 3 },
        ],
      },
      {
        sku: "M-1",
        unit: "pcs",
        issues: [{ at: "2026-01-02T10:00:00.000Z", quantity: 2 }],
      },
    ]);
    expect(
      issues.map((issue) => [issue.sku, issue.unit, issue.quantity]),
    ).toEqual([
      ["W-1", "kg", 3],
      ["M-1", "pcs", 2],
      ["W-1", "kg", 1],
    ]);
  });
});

const wire = {
  sku: "W-1",
  name: "Wire",
  unit: "kg",
  kind: "wire",
  held: [
    { lot: "SP-1", location: "A1", quantity: 1.5, onHand: 4.8, tareKg: 0.6 },
    { lot: null, location: "B2", quantity: 0.5, onHand: 2, tareKg: null },
  ],
};

describe("heldSpots", () => {
  it("gives each held lot and location the key the issue form sends", () => {
    const spots = heldSpots([wire]);
    expect(spots.map((spot) => spot.key)).toEqual(["W-1|SP-1|A1", "W-1||B2"]);
    expect(spots[0]).toMatchObject({
      sku: "W-1",
      kind: "wire",
      quantity: 1.5,
      onHand: 4.8,
      tareKg: 0.6,
    });
    expect(heldSpotsKey(spots)).toBe("W-1|SP-1|A1:1.5,W-1||B2:0.5");
  });
});

describe("primaryStepOf", () => {
  const lines = (toReserve: number, held: number) => [
    { toReserve, held: Array.from({ length: held }) },
  ];
  const both = { build: true, issue: true };

  it("offers reserving a draft, issuing held stock, then completing", () => {
    expect(primaryStepOf({ status: "draft", lines: lines(1, 0) }, both)).toBe(
      "reserve",
    );
    expect(
      primaryStepOf({ status: "reserved", lines: lines(0, 1) }, both),
    ).toBe("issue");
    expect(
      primaryStepOf({ status: "in_progress", lines: lines(1, 0) }, both),
    ).toBe("complete");
  });

  it("offers only the steps of the person's roles", () => {
    const storekeeper = { build: false, issue: true };
    const builder = { build: true, issue: false };
    expect(
      primaryStepOf({ status: "draft", lines: lines(1, 0) }, storekeeper),
    ).toBeNull();
    expect(
      primaryStepOf({ status: "reserved", lines: lines(1, 1) }, builder),
    ).toBe("reserve");
    expect(
      primaryStepOf({ status: "reserved", lines: lines(0, 1) }, builder),
    ).toBeNull();
    expect(
      primaryStepOf({ status: "complete", lines: lines(0, 0) }, both),
    ).toBeNull();
  });
});

describe("weighBackPreview", () => {
  const spool = { kind: "wire", tareKg: 0.6, onHand: 4.8 };

  it("issues what left the spool: its net before less its net now", () => {
    expect(weighBackPreview(spool, "4.6")).toEqual({
      netNowKg: expect.closeTo(4, 9),
      issueKg: 0.8,
    });
    expect(weighBackPreview(spool, " 4,6 ")?.issueKg).toBe(0.8);
  });

  it("shows nothing to issue when the spool weighs as much as its net", () => {
    expect(weighBackPreview(spool, "5.4")?.issueKg).toBeCloseTo(0, 9);
    expect(weighBackPreview(spool, "6")?.issueKg).toBe(-0.6);
  });

  it("has no net when the gross is below the tare", () => {
    expect(weighBackPreview(spool, "0.5")).toEqual({
      netNowKg: null,
      issueKg: null,
    });
  });

  it("asks for the quantity instead while there is nothing to weigh", () => {
    expect(weighBackPreview(spool, "")).toBeNull();
    expect(weighBackPreview(spool, "four")).toBeNull();
    expect(weighBackPreview({ ...spool, tareKg: null }, "4.6")).toBeNull();
    expect(weighBackPreview({ ...spool, kind: "magnet" }, "4.6")).toBeNull();
    expect(weighBackPreview(undefined, "4.6")).toBeNull();
  });
});
