import { describe, expect, it } from "vitest";
import { roundStep } from "~/lib/chart-frame";
import { onHandChart } from "./on-hand-history-chart";

const frame = {
  width: 500,
  height: 220,
  left: 50,
  right: 10,
  top: 10,
  bottom: 10,
};

describe("on-hand chart", () => {
  it("picks round steps of 1, 2 or 5 × 10ⁿ", () => {
    expect(roundStep(4.8)).toBe(1);
    expect(roundStep(9)).toBe(2);
    expect(roundStep(240)).toBe(50);
    expect(roundStep(0.03)).toBe(0.01);
    expect(roundStep(0)).toBe(1);
  });

  it("draws a step line from the first movement to now, rising to a round top", () => {
    const chart = onHandChart(
      [
        { at: "2026-01-01T00:00:00.000Z", onHand: 4.8 },
        { at: "2026-01-02T00:00:00.000Z", onHand: 3.55 },
      ],
      "2026-01-05T00:00:00.000Z",
      2,
      frame,
    )!;
    // Plot 440 × 200 from (50, 10); 4 days wide, 0–5 kg high (1 kg steps).
    expect(chart.valueTicks.map((tick) => tick.value)).toEqual([
      0, 1, 2, 3, 4, 5,
    ]);
    expect(chart.valueTicks[0]!.y).toBe(210);
    expect(chart.valueTicks[5]!.y).toBe(10);
    expect(chart.markers).toEqual([
      { x: 50, y: 18 },
      { x: 160, y: 68 },
    ]);
    expect(chart.path).toBe("M50,18 H160 V68 H490");
    expect(chart.reorderY).toBe(130);
    expect(chart.timeTicks.map((tick) => tick.at)).toEqual([
      "2026-01-01T00:00:00.000Z",
      "2026-01-03T00:00:00.000Z",
      "2026-01-05T00:00:00.000Z",
    ]);
    expect(chart.withinTwoDays).toBe(false);
  });

  it("spans at least an hour, ending at now, when the movements are minutes apart", () => {
    const chart = onHandChart(
      [
        { at: "2026-01-05T11:59:00.000Z", onHand: 2 },
        { at: "2026-01-05T11:59:30.000Z", onHand: 1 },
      ],
      "2026-01-05T12:00:00.000Z",
      0,
      frame,
    )!;
    expect(chart.timeTicks.map((tick) => tick.at)).toEqual([
      "2026-01-05T11:00:00.000Z",
      "2026-01-05T11:30:00.000Z",
      "2026-01-05T12:00:00.000Z",
    ]);
    expect(chart.withinTwoDays).toBe(true);
    // 11:59 is 59/60 of the way along the 440-wide plot: x = 50 + 432.7.
    expect(chart.markers[0]!.x).toBe(482.7);
    expect(chart.path.endsWith("H490")).toBe(true);
  });

  it("puts ticks on whole numbers for stock counted in pieces", () => {
    // 2 pieces on hand: a 0.5 step would label half pieces, shown rounded as "1 piece" twice.
    const points = [{ at: "2026-01-01T00:00:00Z", onHand: 2 }];
    const inKg = onHandChart(points, "2026-01-05T00:00:00Z", 0, frame);
    expect(inKg!.valueTicks.map((tick) => tick.value)).toEqual([
      0, 0.5, 1, 1.5, 2,
    ]);
    const inPieces = onHandChart(
      points,
      "2026-01-05T00:00:00Z",
      0,
      frame,
      true,
    );
    expect(inPieces!.valueTicks.map((tick) => tick.value)).toEqual([0, 1, 2]);
  });

  it("has no chart without movements and no reorder line without a reorder point", () => {
    expect(onHandChart([], "2026-01-05T00:00:00Z", 0, frame)).toBeNull();
    expect(
      onHandChart(
        [{ at: "2026-01-05T00:00:00Z", onHand: 0 }],
        "2026-01-05T00:00:00Z",
        0,
        frame,
      )!.reorderY,
    ).toBeNull();
  });
});
